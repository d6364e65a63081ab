// Title and description in an SVG file (SVG 1.1 §5.4: the first 'title'
// and 'desc' children of the root 'svg' element describe the drawing);
// text escaped as XML 1.0 §2.4 requires for '&' and '<' ('>' escaped too).
#include "paint/svg_description.h"

#include <catch2/catch.hpp>
#include <stdexcept>

TEST_CASE("title and desc become the root element's first children", "[svg]") {
  const std::string svg = "<?xml version=\"1.0\"?>\n<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"10pt\">\n<g/>\n</svg>\n";
  CHECK(forme::add_svg_description(svg, "Loans & renewals", "A < B") ==
        "<?xml version=\"1.0\"?>\n<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"10pt\">\n"
        "<title>Loans &amp; renewals</title>\n<desc>A &lt; B</desc>\n<g/>\n</svg>\n");
}

TEST_CASE("nothing to add leaves the file as it was, and a file without a root svg is refused", "[svg]") {
  const std::string svg = "<svg>\n</svg>\n";
  CHECK(forme::add_svg_description(svg, "", "") == svg);
  CHECK(forme::add_svg_description("<svg>\n</svg>\n", "T", "") == "<svg>\n<title>T</title>\n</svg>\n");
  CHECK_THROWS_AS(forme::add_svg_description("<svgx/>", "T", "D"), std::runtime_error);
}
