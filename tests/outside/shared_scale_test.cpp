// Small multiples on one scale, checked on Anscombe's quartet (Anscombe
// 1973; data and published statistics in ../shared/refs/check-values.md §9)
// drawn as a 2 × 2 grid of dot panels with least-squares lines.
#include <catch2/catch.hpp>

#include <map>

#include "axes/axis.h"
#include "cli/render_job.h"
#include "support/outside_tools.h"
#include "text/font.h"

using namespace forme::test;

namespace {
const std::string kPage = std::string(FORME_SOURCE_DIR) + "/tests/pages/anscombe/page.yaml";
}

TEST_CASE("the quartet's four panels get identical inner boxes, aligned in rows and columns", "[outside][scale]") {
  forme::DiagnosticSink sink;
  auto page = forme::compose_page(kPage, forme::find_font_dir(FORME_BINARY), sink);
  REQUIRE(page.plot_areas.size() == 4);
  const auto& a = page.plot_areas;
  for (const auto& r : a) {
    CHECK(r.w == a[0].w);  // exactly equal: one inner box for the grid
    CHECK(r.h == a[0].h);
  }
  CHECK(a[0].y == a[1].y);  // row 1
  CHECK(a[2].y == a[3].y);  // row 2
  CHECK(a[0].x == a[2].x);  // column 1
  CHECK(a[1].x == a[3].x);  // column 2
}

TEST_CASE("pdftotext finds the same tick labels at the same offsets from every panel's inner box", "[outside][scale]") {
  forme::DiagnosticSink sink;
  auto page = forme::compose_page(kPage, forme::find_font_dir(FORME_BINARY), sink);
  TempDir dir;
  REQUIRE(run_forme("render '" + kPage + "' -o " + dir.file("q.pdf")).exit_code == 0);
  auto words = pdf_words(dir.file("q.pdf")).at(0).words;
  // Tick labels of a panel: words just left of its plot area (y) or just below it (x),
  // keyed by text, with their position relative to the plot area's corner.
  using Offsets = std::map<std::string, std::pair<double, double>>;
  std::vector<Offsets> per_panel;
  for (const auto& r : page.plot_areas) {
    Offsets o;
    for (const auto& w : words) {
      const bool y_tick = w.x_max <= r.x && w.x_max > r.x - 30 && w.y_min >= r.y - 10 && w.y_max <= r.bottom() + 10;
      const bool x_tick = w.y_min >= r.bottom() && w.y_min < r.bottom() + 15 && w.x_min >= r.x - 15 && w.x_max <= r.right() + 15;
      if (y_tick || x_tick) o[(y_tick ? "y:" : "x:") + w.text] = {w.x_min - r.x, w.y_min - r.y};
    }
    per_panel.push_back(o);
  }
  REQUIRE(per_panel[0].size() >= 8);
  for (std::size_t i = 1; i < per_panel.size(); ++i) {
    REQUIRE(per_panel[i].size() == per_panel[0].size());
    for (const auto& [text, off] : per_panel[0]) {
      INFO("panel " << i << " tick " << text);
      REQUIRE(per_panel[i].count(text) == 1);
      CHECK(per_panel[i][text].first == Approx(off.first).margin(0.01));
      CHECK(per_panel[i][text].second == Approx(off.second).margin(0.01));
    }
  }
}

TEST_CASE("each quartet panel's trend line is y = 3.00 + 0.500x, as published", "[outside][scale]") {
  // Published regression line for all four sets: y = 3.00 + 0.500x (V2 in §9).
  TempDir dir;
  REQUIRE(run_forme("render '" + kPage + "' -o " + dir.file("q.pdf")).exit_code == 0);
  auto r = run("pdftotext -layout '" + dir.file("q.pdf") + "' -");
  std::size_t count = 0;
  for (std::size_t p = r.out.find("y = 3.00 + 0.500x"); p != std::string::npos; p = r.out.find("y = 3.00 + 0.500x", p + 1))
    ++count;
  CHECK(count == 4);
}
