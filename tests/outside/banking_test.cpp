// Banking to 45°: a line panel asked to bank gets the plot shape the
// formula predicts. Median absolute slope (Cleveland, McGill & McGill 1988;
// formula as recorded in ../shared/refs/check-values.md §8, tagged M there):
// α = h/w = (Ry/Rx) / median|s|, with Rx, Ry the ranges the axes span.
#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>

#include "cli/render_job.h"
#include "support/outside_tools.h"
#include "text/font.h"

using namespace forme::test;

TEST_CASE("a banked line panel has the aspect ratio the median-slope formula predicts", "[outside][banking]") {
  TempDir dir;
  // Slopes 1, 2, 1, 4, 2 (in data units): median |s| = 2. The data span
  // x 0..5 and y 0..10, which are also the nice-tick axis domains.
  write_file(dir.file("t.csv"), "x,y\n0,0\n1,1\n2,3\n3,4\n4,8\n5,10\n");
  write_file(dir.file("page.yaml"),
             "sheet: {size: A4, orientation: landscape}\n"
             "tables: {t: t.csv}\n"
             "panel: {kind: line, table: t, x: x, y: y, y-unit: m, aspect: bank-median-slope}\n"
             "source: invented\n");
  forme::DiagnosticSink sink;
  auto page = forme::compose_page(dir.file("page.yaml"), forme::find_font_dir(FORME_BINARY), sink);
  REQUIRE(page.plot_areas.size() == 1);
  const forme::Rect r = page.plot_areas[0];
  const double Rx = 5, Ry = 10, median_slope = 2;
  const double expected = (Ry / Rx) / median_slope;  // = 1: square
  CHECK(r.h / r.w == Approx(expected).epsilon(1e-9));
  // forme check reports the shape it chose, at the 'aspect' key.
  bool reported = false;
  for (const auto& d : sink.items())
    reported |= d.severity == forme::Severity::note && d.message.find("banked to 45 degrees") != std::string::npos &&
                d.loc.line == 3;
  CHECK(reported);
}

TEST_CASE("banking by average orientation makes the mean drawn angle 45 degrees", "[outside][banking]") {
  TempDir dir;
  write_file(dir.file("t.csv"), "x,y\n0,0\n1,1\n2,3\n3,4\n4,8\n5,10\n");
  write_file(dir.file("page.yaml"),
             "tables: {t: t.csv}\n"
             "panel: {kind: line, table: t, x: x, y: y, y-unit: m, aspect: bank-orientation}\n"
             "source: invented\n");
  forme::DiagnosticSink sink;
  auto page = forme::compose_page(dir.file("page.yaml"), forme::find_font_dir(FORME_BINARY), sink);
  const forme::Rect r = page.plot_areas.at(0);
  // Measure the drawn angles independently: physical slope = s · (w/Rx) / (h/Ry).
  const double xs[] = {0, 1, 2, 3, 4, 5}, ys[] = {0, 1, 3, 4, 8, 10};
  double mean = 0;
  for (int i = 1; i < 6; ++i) {
    const double s = (ys[i] - ys[i - 1]) / (xs[i] - xs[i - 1]);
    mean += std::atan(std::abs(s * (r.h / 10.0) / (r.w / 5.0)));
  }
  mean /= 5;
  CHECK(mean * 180 / M_PI == Approx(45).margin(1e-6));  // Cleveland 1993: mean |orientation| = 45°
}
