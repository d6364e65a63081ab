// Fitting category names into their boxes: wrap, then shrink to the
// smallest size, then shorten with "…" (layout/name_fit.h). Break
// opportunities are UAX #14's (Unicode Standard Annex #14: a break is
// allowed after a space, never inside a run of letters); widths are
// HarfBuzz's advances in the bundled Noto Sans, so every check compares
// a line with the box it must fit, measured the same way.
#include <catch2/catch.hpp>

#include "layout/name_fit.h"
#include "layout/page_style.h"
#include "text/font.h"

using namespace forme;

namespace {

FontRef regular() {
  static FontSet fonts = open_bundled_fonts(find_font_dir(FORME_BINARY));
  return fonts.regular;
}

double width_of(const std::string& s, double size) { return shape_text(s, regular(), size).width; }

std::string joined(const FittedName& n) {
  std::string out;
  for (const auto& l : n.lines) out += (out.empty() ? "" : " ") + l.utf8;
  return out;
}

const std::string kEllipsis = "\u2026";

}  // namespace

TEST_CASE("names that fit on one line are set whole at the size asked for", "[layout][fit]") {
  const double w = width_of("Lower Marsh", 8) + 1;
  NameFit f = fit_names({"Lower Marsh", "Q"}, regular(), 8, 6, w, 20);
  CHECK(f.size == 8);
  REQUIRE(f.names.size() == 2);
  CHECK(f.names[0].lines.size() == 1);
  CHECK(f.names[0].lines[0].utf8 == "Lower Marsh");
  CHECK_FALSE(f.names[0].shortened);
  CHECK(f.names[0].full == "Lower Marsh");
}

TEST_CASE("a long name wraps at spaces within its column and keeps every word", "[layout][fit]") {
  const std::string name = "Northern Uplands and Coastal Fringe Catchment";
  // Room for two lines of 8 pt text, a column narrower than the name but
  // wider than half of it plus its longest word.
  const double line = PageStyle::line_height(regular(), 8);
  const double w = width_of("Northern Uplands and", 8) + 2;
  REQUIRE(width_of(name, 8) > w);
  NameFit f = fit_names({name}, regular(), 8, 6, w, line * 2.2);
  CHECK(f.size >= 6);
  REQUIRE(f.names[0].lines.size() == 2);
  CHECK_FALSE(f.names[0].shortened);
  CHECK(joined(f.names[0]) == name);  // every word appears, in order
  for (const auto& l : f.names[0].lines) CHECK(l.width <= w);
  CHECK(f.most_lines == 2);
}

TEST_CASE("names shrink, all to one size, when wrapping alone does not fit the box", "[layout][fit]") {
  // One line of room; the name is 5% too wide at 8 pt but fits at 7.5 pt.
  const std::string name = "Brackenholt";
  const double w = width_of(name, 8) * 0.95;
  const double h = PageStyle::line_height(regular(), 8) * 1.2;
  NameFit f = fit_names({name, "Q"}, regular(), 8, 6, w, h);
  CHECK(f.size < 8);
  CHECK(f.size >= 6);
  CHECK(width_of(name, f.size) <= w);
  CHECK(f.names[1].lines[0].size == f.size);  // the short name is set at the same size
  CHECK_FALSE(f.names[0].shortened);
}

TEST_CASE("below the smallest size a name is cut at a break and ends with an ellipsis", "[layout][fit]") {
  const std::string name = "St Aldhelm's-by-the-Water Parish Joint Drainage Board Area";
  const double w = width_of("St Aldhelm's", 6) + 4;
  const double h = PageStyle::line_height(regular(), 6) * 1.1;  // one line only
  NameFit f = fit_names({name}, regular(), 8, 6, w, h);
  CHECK(f.size == 6);  // never below the smallest size
  REQUIRE(f.names[0].lines.size() == 1);
  const std::string& set = f.names[0].lines[0].utf8;
  CHECK(f.names[0].shortened);
  CHECK(f.names[0].lines[0].width <= w);
  REQUIRE(set.size() > kEllipsis.size());
  CHECK(set.substr(set.size() - kEllipsis.size()) == kEllipsis);
  // What is kept is the start of the name, ending at a break opportunity:
  // after a space or a hyphen (UAX #14 classes SP and HY).
  const std::string kept = set.substr(0, set.size() - kEllipsis.size());
  CHECK(name.rfind(kept, 0) == 0);
  const char next = name[kept.size()];
  const char last = kept.back();
  CHECK((next == ' ' || last == '-'));
}

TEST_CASE("a name keeps the lines that fit and shortens only its last line", "[layout][fit]") {
  const std::string name = "Upper Wendlecombe Reservoir Catchment including the Old Mill Leat";
  const double w = width_of("Upper Wendlecombe", 6) + 1;
  const double h = PageStyle::line_height(regular(), 6) * 2.05;  // two lines at 6 pt
  NameFit f = fit_names({name}, regular(), 8, 6, w, h);
  REQUIRE(f.names[0].lines.size() == 2);
  CHECK(f.names[0].shortened);
  CHECK(f.names[0].lines[0].utf8 == "Upper Wendlecombe");
  const std::string& last = f.names[0].lines[1].utf8;
  CHECK(last.substr(last.size() - kEllipsis.size()) == kEllipsis);
  for (const auto& l : f.names[0].lines) CHECK(l.width <= w);
}

TEST_CASE("an unbreakable word wider than the column is cut between characters", "[layout][fit]") {
  const std::string name = "Pneumonoultramicroscopicsilicovolcanoconiosis";
  const double w = width_of("Pneumono", 6);
  NameFit f = fit_names({name}, regular(), 8, 6, w, 100, 1);
  REQUIRE(f.names[0].lines.size() == 1);
  CHECK(f.names[0].shortened);
  CHECK(f.names[0].lines[0].width <= w);
}

TEST_CASE("a cut never splits a character's UTF-8 bytes", "[layout][fit]") {
  // Greek and Cyrillic letters are two bytes each in UTF-8 (RFC 3629).
  const std::string name = "ΑλφαβητικόςКатастрофическийΑλφαβητικός";
  const double w = width_of("ΑλφαβητικόςКа", 6);
  NameFit f = fit_names({name}, regular(), 8, 6, w, 100, 1);
  REQUIRE(f.names[0].lines.size() == 1);
  const std::string& set = f.names[0].lines[0].utf8;
  const std::string kept = set.substr(0, set.size() - kEllipsis.size());
  CHECK(name.compare(0, kept.size(), kept) == 0);
  // The byte after what is kept starts a character (it is not 10xxxxxx).
  CHECK((static_cast<unsigned char>(name[kept.size()]) & 0xC0) != 0x80);
}
