// Text contrast on the composed page, against what is painted behind each
// text. Worked values from check-values.md §2c (WCAG 2.x): #767676 on
// white is 4.54:1 and passes 4.5:1; #777777 on white is 4.48:1 and fails.
#include <catch2/catch.hpp>

#include "audit/colour_audit.h"

using namespace forme;

namespace {

TextItem text(const std::string& s, Rgb colour, double size, Point origin) {
  ShapedText t;
  t.utf8 = s;
  t.size = size;
  t.width = size * 2;
  t.ascent = size * 0.8;
  t.descent = size * 0.2;
  return TextItem{t, origin, colour, TextRole::note, {}};
}

std::vector<Diagnostic> audit(const DisplayPage& page) {
  PageSpec spec;
  spec.loc = {"page.yaml", 1, 1};
  DiagnosticSink sink;
  audit_colours(spec, {}, {}, page, false, sink);
  return sink.items();
}

}  // namespace

TEST_CASE("text on paper: 4.54:1 passes and 4.48:1 fails SC 1.4.3", "[audit][colour]") {
  DisplayPage page;
  page.add(text("pass", rgb8(0x76, 0x76, 0x76), 8, {10, 20}));
  page.add(text("fail", rgb8(0x77, 0x77, 0x77), 8, {10, 60}));
  auto found = audit(page);
  REQUIRE(found.size() == 1);
  CHECK(found[0].message == "text 'fail' reads at 4.48:1 against what is behind it, below the 4.5:1 of WCAG 2.x SC 1.4.3");
  CHECK(found[0].loc.line == 1);
}

TEST_CASE("text is measured against the filled shape under it, and large text needs 3:1", "[audit][colour]") {
  DisplayPage page;
  page.add(filled_rect({0, 0, 200, 200}, rgb8(0x76, 0x76, 0x76)));
  // White on #767676 is 4.54:1 (the same pair, reversed): passes.
  page.add(text("white", Rgb{1, 1, 1}, 8, {10, 20}));
  // Black on #767676: (0.1812 + 0.05) / 0.05 ≈ 4.62:1, passes.
  page.add(text("black", Rgb{0, 0, 0}, 8, {10, 60}));
  // #aaaaaa on #767676 is about 1.95:1: fails at 8 pt and at 18 pt.
  page.add(text("pale", rgb8(0xaa, 0xaa, 0xaa), 8, {10, 100}));
  page.add(text("pale large", rgb8(0xaa, 0xaa, 0xaa), 18, {10, 160}));
  auto found = audit(page);
  REQUIRE(found.size() == 2);
  CHECK(found[0].message.rfind("text 'pale' reads at 1.9", 0) == 0);
  CHECK(found[1].message.find("below the 3.0:1 of WCAG 2.x SC 1.4.3 for large text") != std::string::npos);
}

TEST_CASE("text over a fill pattern is held to the pattern's ink as well", "[audit][colour]") {
  DisplayPage page;
  PathItem bar = filled_rect({0, 0, 200, 200}, rgb8(0x20, 0x30, 0x60));
  bar.hatch = Hatch{Hatch::Kind::lines, 45, 3, 0.6, Rgb{1, 1, 1}};
  page.add(bar);
  page.add(text("on hatch", Rgb{1, 1, 1}, 8, {10, 20}));
  auto found = audit(page);
  REQUIRE(found.size() == 1);
  CHECK(found[0].message.rfind("text 'on hatch' reads at 1.00:1", 0) == 0);
}
