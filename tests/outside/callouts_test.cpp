// Callouts: a pinned note goes where the description says, a free note
// keeps clear of every other text on the page, and both are joined to
// their target. Positions are worked out here from the description
// (millimetres to points: 72 / 25.4, ISO 32000-1 §8.3.2.3).
#include <catch2/catch.hpp>

#include <cmath>
#include <string>
#include <vector>

#include "cli/render_job.h"
#include "support/outside_tools.h"
#include "text/font.h"

using namespace forme::test;

namespace {

const char* kData = "day,value\n1,3\n2,5\n3,4\n4,8\n5,6\n6,7\n";

std::string page_with(const std::string& callout) {
  return "sheet: {size: A5, orientation: landscape, margins: 12mm}\n"
         "heading: {title: A callout test page}\n"
         "tables: {t: t.csv}\n"
         "panel:\n"
         "  kind: line\n  table: t\n  x: day\n  y: value\n  x-unit: days\n  y-unit: litres\n"
         "  callouts:\n" + callout +
         "source: \"Source: invented for this test\"\n";
}

struct Drawn {
  forme::DisplayPage page;
  forme::Rect note;    // union of the callout's text boxes
  forme::Point target; // the small dot drawn at the target
  int lines = 0;
};

Drawn compose(const std::string& callout) {
  TempDir dir;
  write_file(dir.file("t.csv"), kData);
  write_file(dir.file("page.yaml"), page_with(callout));
  forme::DiagnosticSink sink;
  Drawn d{forme::compose_page(dir.file("page.yaml"), forme::find_font_dir(FORME_BINARY), sink), {}, {}, 0};
  for (const auto& item : d.page.items) {
    if (const auto* t = std::get_if<forme::TextItem>(&item); t && t->role == forme::TextRole::callout) {
      d.note = d.lines++ ? d.note.united(t->box()) : t->box();
    }
    if (const auto* c = std::get_if<forme::CircleItem>(&item); c && !c->stroke && c->radius < 1.5) d.target = c->centre;
  }
  return d;
}

double mm(double v) { return v * 72 / 25.4; }

}  // namespace

TEST_CASE("callouts: a note pinned by offset is centred that far right and up from its target", "[outside][callout]") {
  const Drawn d = compose("    - {text: Rain stopped the count on day four, x: 4, y: 8, width: 40mm, offset: 20mm -10mm}\n");
  REQUIRE(d.lines >= 1);
  CHECK(d.note.cx() == Approx(d.target.x + mm(20)).margin(1e-6));
  CHECK(d.note.cy() == Approx(d.target.y + mm(10)).margin(1e-6));  // -10mm up is 10 mm down the page
  CHECK(d.note.w <= mm(40));  // wrapped to the width asked for
}

TEST_CASE("callouts: a note pinned to a corner sits in that corner of the plot", "[outside][callout]") {
  const Drawn d = compose("    - {text: A note in the corner, x: 2, y: 5, corner: lower-left}\n");
  REQUIRE(d.lines == 1);
  const forme::Rect plot = d.page.plot_areas.front();
  CHECK(d.note.left() > plot.left());
  CHECK(d.note.left() < plot.left() + plot.w * 0.1);
  CHECK(d.note.bottom() < plot.bottom());
  CHECK(d.note.bottom() > plot.bottom() - plot.h * 0.1);
}

TEST_CASE("callouts: a free note is wrapped, inside the plot, clear of other text and led to its target", "[outside][callout]") {
  const Drawn d = compose("    - {text: The wettest day of the week brought the highest reading, x: 4, y: 8, width: 30mm}\n");
  REQUIRE(d.lines >= 2);  // the sentence is wider than 30 mm in one line
  const forme::Rect plot = d.page.plot_areas.front();
  CHECK(d.note.left() >= plot.left());
  CHECK(d.note.right() <= plot.right());
  CHECK(d.note.top() >= plot.top());
  CHECK(d.note.bottom() <= plot.bottom());
  for (const auto& item : d.page.items)
    if (const auto* t = std::get_if<forme::TextItem>(&item); t && t->role != forme::TextRole::callout) {
      INFO(t->text.utf8);
      CHECK_FALSE(t->box().overlaps(d.note));
    }
  // A leader runs from the target to the note's edge.
  bool led = false;
  for (const auto& item : d.page.items)
    if (const auto* p = std::get_if<forme::PathItem>(&item); p && p->points.size() == 2 && p->stroke) {
      const auto& a = p->points[0];
      const auto& b = p->points[1];
      const bool from_target = std::hypot(a.x - d.target.x, a.y - d.target.y) < 1e-6;
      const forme::Rect near = d.note.inflate(4);
      led = led || (from_target && near.contains(b));
    }
  CHECK(led);
}

TEST_CASE("callouts: a stretch of x is drawn as a band the height of the plot", "[outside][callout]") {
  const Drawn d = compose("    - {text: A dry spell, from: 2, to: 4}\n");
  const forme::Rect plot = d.page.plot_areas.front();
  int bands = 0;
  for (const auto& item : d.page.items)
    if (const auto* p = std::get_if<forme::PathItem>(&item); p && p->fill && !p->stroke && p->points.size() == 4) {
      const double top = std::min(p->points[0].y, p->points[2].y), bottom = std::max(p->points[0].y, p->points[2].y);
      const double left = std::min(p->points[0].x, p->points[2].x), right = std::max(p->points[0].x, p->points[2].x);
      if (top == Approx(plot.top()) && bottom == Approx(plot.bottom())) {
        ++bands;
        // Days 2 to 4 of 1 to 6 on a linear axis: two fifths of the data's run.
        CHECK((right - left) > 0);
        CHECK(left > plot.left());
        CHECK(right < plot.right());
      }
    }
  CHECK(bands == 1);
}

TEST_CASE("reference labels: the label moves below its line when the data run through the spot above", "[outside][callout]") {
  TempDir dir;
  // The data run flat at 5.1 over the last days, just above a reference at 5,
  // so the first spot (above the line at its right end) covers the line.
  write_file(dir.file("t.csv"), "day,value\n1,1\n2,1\n3,1\n4,1\n5,5.1\n6,5.1\n");
  write_file(dir.file("page.yaml"),
             "sheet: {size: A5, orientation: landscape, margins: 12mm}\n"
             "heading: {title: A reference label test page}\n"
             "tables: {t: t.csv}\n"
             "panel: {kind: line, table: t, x: day, y: value, x-unit: days, y-unit: litres, y-max: 6,\n"
             "        references: [{y: 5, label: Limit}]}\n"
             "source: \"Source: invented for this test\"\n");
  forme::DiagnosticSink sink;
  const auto page = forme::compose_page(dir.file("page.yaml"), forme::find_font_dir(FORME_BINARY), sink);
  double line_y = -1;
  for (const auto& item : page.items)
    if (const auto* p = std::get_if<forme::PathItem>(&item); p && p->stroke && !p->stroke->dash.empty()) line_y = p->points[0].y;
  REQUIRE(line_y > 0);
  int found = 0;
  for (const auto& item : page.items)
    if (const auto* t = std::get_if<forme::TextItem>(&item); t && t->text.utf8 == "Limit") {
      ++found;
      CHECK(t->box().top() > line_y);  // below the line (y grows down the page)
      CHECK(t->box().right() > page.plot_areas.front().cx());  // still at the right end
    }
  CHECK(found == 1);
}
