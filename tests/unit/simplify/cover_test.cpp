// The coverage pass on its own: given kept points that leave something
// uncovered, it keeps more until the independent measure (ruler.h) finds
// every original point and segment within the tolerance.
#include "simplify/cover.h"

#include <catch2/catch.hpp>
#include <vector>

#include "ruler.h"

using forme::ensure_cover;
using forme::Point;
using forme::test::Ruler;

namespace {

constexpr double kTol = 0.05;

std::vector<Point> pick(const std::vector<Point>& pts, const std::vector<std::size_t>& idx) {
  std::vector<Point> out;
  for (std::size_t k : idx) out.push_back(pts[k]);
  return out;
}

}  // namespace

TEST_CASE("a segment whose ends lie near different drawn segments but whose middle lies far from all is kept", "[simplify]") {
  // Drawn through 0, 3, 4, 5: up the left side, across the top, down the
  // right side of a 1 pt square. Points 1 and 2 lie on the sides, but the
  // original segment between them crosses the middle of the square, half
  // a point from every side.
  const std::vector<Point> pts = {{0, 0}, {0, 0.9}, {1, 0.1}, {0, 1}, {1, 1}, {1, 0}};
  const std::vector<std::size_t> given = {0, 3, 4, 5};
  const Ruler before(pick(pts, given), kTol);
  REQUIRE(before.distance(pts[1]) < kTol);
  REQUIRE(before.distance(pts[2]) < kTol);
  REQUIRE(!before.covers(pts[1], pts[2], kTol));

  const auto kept = ensure_cover(pts, given, kTol);
  const Ruler after(pick(pts, kept), kTol);
  for (std::size_t i = 0; i + 1 < pts.size(); ++i) CHECK(after.covers(pts[i], pts[i + 1], kTol));
  CHECK(kept == std::vector<std::size_t>{0, 1, 2, 3, 4, 5});
}

TEST_CASE("points left far from a line through the ends alone are kept until all are covered", "[simplify]") {
  // A zigzag 10 pt tall with 0.02 pt steps, given only its two ends.
  std::vector<Point> pts;
  for (int i = 0; i < 400; ++i) pts.push_back({i * 0.02, i % 2 ? 10.0 : 0.0});
  const auto kept = ensure_cover(pts, {0, pts.size() - 1}, kTol);
  const Ruler ruler(pick(pts, kept), kTol);
  for (std::size_t i = 0; i < pts.size(); ++i) {
    INFO("point " << i);
    CHECK(ruler.distance(pts[i]) < kTol);
    if (i + 1 < pts.size()) CHECK(ruler.covers(pts[i], pts[i + 1], kTol));
  }
  // Keeping points 0, 1, 4, 5, 8, 9, … leaves every dropped corner 0.04 pt
  // from a kept stroke: half the points would do.
  INFO("kept " << kept.size());
  CHECK(kept.size() < pts.size() * 3 / 4);
}
