// Axes for data at the ends of the doubles. The largest finite double is
// 1.7976931348623157e308 (IEEE 754 binary64; std::numeric_limits).
#include <catch2/catch.hpp>

#include <cmath>
#include <limits>

#include "axes/axis.h"

namespace {

forme::PanelData one_value(const forme::PanelSpec& spec, double y) {
  forme::PanelData p;
  p.spec = &spec;
  p.kind = forme::ChartKind::line;
  p.series.push_back(forme::Series{"", {1}, {y}});
  return p;
}

}  // namespace

TEST_CASE("a lone value near the largest double gets a finite axis around it", "[axes]") {
  const double most = std::numeric_limits<double>::max();
  for (double y : {-1.7e308, 1.7e308, -most, most}) {
    INFO(y);
    forme::DiagnosticSink sink;
    forme::GridSpec grid;
    forme::PanelSpec spec;
    spec.kind = forme::ChartKind::line;
    const auto axes = forme::resolve_axes({one_value(spec, y)}, grid, sink);
    REQUIRE(axes.size() == 1);
    const forme::Axis& a = axes.front().y;
    CHECK(std::isfinite(a.lo));
    CHECK(std::isfinite(a.hi));
    CHECK(a.lo <= y);
    CHECK(a.hi >= y);
    CHECK(a.lo < a.hi);
  }
}
