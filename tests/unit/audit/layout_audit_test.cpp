// The layout audit finds what a reader of the printed page would see: text
// off the sheet, text over data, lines through text, text over text, a
// callout over data, a leader crossing what it does not point to, small type.
// Pages are built by hand in page coordinates, with the bundled fonts, so
// every expected finding follows from the geometry written here.
#include <catch2/catch.hpp>

#include <algorithm>

#include "audit/layout_audit.h"
#include "text/font.h"
#include "text/shaped_text.h"

using namespace forme;

namespace {

const FontSet& fonts() {
  static FontSet f = open_bundled_fonts(find_font_dir(FORME_BINARY));
  return f;
}

TextItem text(const std::string& s, double x, double baseline, double size = 8, TextRole role = TextRole::note) {
  return TextItem{shape_text(s, fonts().regular, size), {x, baseline}, Rgb{0, 0, 0}, role, {}};
}

PathItem line(Point a, Point b, ShapeRole role, double width = 1, Rgb ink = Rgb{0.2, 0.3, 0.6}) {
  PathItem p;
  p.points = {a, b};
  p.stroke = Stroke{ink, width, {}, false};
  p.role = role;
  return p;
}

PathItem bar(const Rect& r, Rgb fill = Rgb{0.2, 0.4, 0.7}) {
  PathItem p = filled_rect(r, fill);
  p.role = ShapeRole::data;
  return p;
}

DisplayPage a5() {
  DisplayPage p;
  p.width = 420;
  p.height = 595;
  return p;
}

std::size_t count(const std::vector<LayoutFinding>& f, LayoutFault k) {
  return static_cast<std::size_t>(std::count_if(f.begin(), f.end(), [&](const LayoutFinding& x) { return x.fault == k; }));
}

}  // namespace

TEST_CASE("text past the sheet edge is found with how far it runs out", "[audit][layout]") {
  DisplayPage p = a5();
  p.add(text("Northern Uplands", -30, 100));
  p.add(text("Well inside", 100, 100));
  const auto f = find_layout_faults(p);
  REQUIRE(count(f, LayoutFault::off_sheet) == 1);
  CHECK(f.front().subject == "Northern Uplands");
  // The first glyph's advance starts at x = -30 (its left bearing is ink-free),
  // so the box runs 30 pt past the left edge.
  CHECK(f.front().detail == "runs 30.0 pt past the left edge of the sheet");
}

TEST_CASE("the trim box, when set, is the edge text must keep inside", "[audit][layout]") {
  DisplayPage p = a5();
  p.trim_box = Rect{9, 9, 402, 577};
  p.add(text("Near the cut", 5, 300));
  CHECK(count(find_layout_faults(p), LayoutFault::off_sheet) == 1);
  p.trim_box.reset();
  CHECK(count(find_layout_faults(p), LayoutFault::off_sheet) == 0);
}

TEST_CASE("overlapping texts are one finding per pair, touching faces count", "[audit][layout]") {
  DisplayPage p = a5();
  p.add(text("1,294,000", 100, 200));
  p.add(text("1,094,510", 110, 202));
  // Stacked lines at the font's line height (ascender + descender) do not touch.
  const double lh = (fonts().regular->ascent_em() + fonts().regular->descent_em()) * 8;
  p.add(text("first line", 100, 300));
  p.add(text("second line", 100, 300 + lh));
  const auto f = find_layout_faults(p);
  CHECK(count(f, LayoutFault::over_text) == 1);
}

TEST_CASE("a value wholly inside its bar is fine, one across the bar's end is not", "[audit][layout]") {
  DisplayPage p = a5();
  p.add(bar({100, 100, 120, 20}));
  p.add(text("42", 180, 114));  // inside, away from every edge
  CHECK(count(find_layout_faults(p), LayoutFault::over_data) == 0);
  p.add(text("57", 214, 114));  // straddles the right end at x = 220
  const auto f = find_layout_faults(p);
  REQUIRE(count(f, LayoutFault::over_data) == 1);
  CHECK(f.front().subject == "57");
}

TEST_CASE("a data line or reference line through text is found, a gridline is not", "[audit][layout]") {
  DisplayPage p = a5();
  p.add(text("Gridline below", 100, 100));
  p.add(line({50, 97}, {300, 97}, ShapeRole::grid, 0.5, Rgb{0.5, 0.5, 0.5}));
  CHECK(find_layout_faults(p).empty());
  p.add(text("Series one", 100, 200));
  p.add(line({50, 197}, {300, 197}, ShapeRole::data));
  p.add(text("Target", 100, 300));
  p.add(line({50, 297}, {300, 297}, ShapeRole::reference));
  const auto f = find_layout_faults(p);
  CHECK(count(f, LayoutFault::over_data) == 1);
  CHECK(count(f, LayoutFault::crossed_by_line) == 1);
}

TEST_CASE("marks lighter than 1.5:1 against the paper are not seen over text", "[audit][layout]") {
  DisplayPage p = a5();
  p.add(text("Pale band", 100, 100));
  p.add(line({50, 97}, {300, 97}, ShapeRole::data, 1, Rgb{0.95, 0.95, 0.95}));  // 1.1:1 on white
  CHECK(find_layout_faults(p).empty());
}

TEST_CASE("a dot beside a short letter, clear of its ink, is not over the text", "[audit][layout]") {
  DisplayPage p = a5();
  TextItem t = text("Glow", 100, 100);
  const double right = 100 + t.text.width;
  p.add(std::move(t));
  // Above the x-height of 'w' (0.54 em up) but below the run's cap height.
  p.add(CircleItem{{right - 2, 100 - 8 * 0.54 - 1.6}, 1.2, Rgb{0.2, 0.4, 0.7}, std::nullopt, ShapeRole::data, {}});
  CHECK(count(find_layout_faults(p), LayoutFault::over_data) == 0);
  p.add(CircleItem{{right - 2, 100 - 2}, 1.2, Rgb{0.2, 0.4, 0.7}, std::nullopt, ShapeRole::data, {}});
  CHECK(count(find_layout_faults(p), LayoutFault::over_data) == 1);
}

TEST_CASE("a callout's paper box over a bar is found", "[audit][layout]") {
  DisplayPage p = a5();
  p.add(bar({100, 100, 40, 200}));
  PathItem box = filled_rect({120, 150, 80, 30}, Rgb{1, 1, 1});
  box.role = ShapeRole::callout_box;
  p.add(box);
  CHECK(count(find_layout_faults(p), LayoutFault::callout_over_data) == 1);
}

TEST_CASE("a leader crossing a reference line is found, one ending on its own dot is not", "[audit][layout]") {
  DisplayPage p = a5();
  p.add(CircleItem{{100, 100}, 2, Rgb{0.2, 0.4, 0.7}, std::nullopt, ShapeRole::data, {}});
  p.add(line({102, 100}, {160, 140}, ShapeRole::leader, 0.4, Rgb{0.3, 0.3, 0.3}));
  CHECK(count(find_layout_faults(p), LayoutFault::leader_crossing) == 0);
  p.add(line({50, 120}, {300, 120}, ShapeRole::reference));
  CHECK(count(find_layout_faults(p), LayoutFault::leader_crossing) == 1);
}

TEST_CASE("text under the smallest size is found", "[audit][layout]") {
  DisplayPage p = a5();
  p.add(text("tiny note", 100, 100, 5));
  p.add(text("fine note", 100, 200, 6));
  const auto f = find_layout_faults(p);
  REQUIRE(count(f, LayoutFault::small_text) == 1);
  CHECK(f.front().subject == "tiny note");
}

TEST_CASE("many findings of one kind print as one warning, located at the first", "[audit][layout]") {
  DisplayPage p = a5();
  for (int i = 0; i < 10; ++i) p.add(text("Off " + std::to_string(i), -20, 50 + 20 * i));
  PageSpec spec;
  spec.loc = {"page.yaml", 1, 1};
  DiagnosticSink sink;
  audit_layout(spec, p, sink);
  REQUIRE(sink.items().size() == 1);
  CHECK(sink.items().front().message.rfind("10 texts reach or run past the edge", 0) == 0);
}

TEST_CASE("a callout's target dot inside a text's ink is found", "[audit][layout]") {
  DisplayPage p = a5();
  TextItem t = text("Busiest week", 100, 100);
  const double mid = 100 + t.text.width / 2;
  p.add(std::move(t));
  p.add(CircleItem{{mid, 100 - 3}, 1.1, Rgb{0.1, 0.1, 0.1}, std::nullopt, ShapeRole::leader, {}});
  const auto f = find_layout_faults(p);
  REQUIRE(count(f, LayoutFault::crossed_by_line) == 1);
  CHECK(f.front().detail == "a callout's target dot");
}
