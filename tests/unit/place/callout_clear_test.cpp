// A callout keeps clear of data: spots covering more marks than allowed
// are refused, and a leader is charged for each line it passes. Expected
// spots are worked by hand from the ring geometry in callout_spot.h.
#include <catch2/catch.hpp>

#include <vector>

#include "place/callout_spot.h"

using namespace forme;

TEST_CASE("distance to a segment: worked examples", "[place][callout]") {
  // Straight above the middle of a horizontal segment: the height.
  CHECK(distance_to_segment({0, 1}, {-1, 0}, {1, 0}) == Approx(1));
  // Beyond an end: the distance to that end, a 3-4-5 triangle.
  CHECK(distance_to_segment({4, 4}, {-1, 0}, {1, 0}) == Approx(5));
  // A segment of no length is its point.
  CHECK(distance_to_segment({3, 4}, {0, 0}, {0, 0}) == Approx(5));
}

TEST_CASE("a callout whose nearer spots cover a bar goes beside it instead", "[place][callout]") {
  // Target (100, 100), note 20 × 10, ring 1 at 4 + 8 = 12. A bar fills
  // everything above y = 95. Ring 1's first direction (upper right, −45°)
  // puts the box at y 81.5–91.5, over the bar; the third (0°, right)
  // centres it at (100 + 12 + 10, 100): {112, 95, 20, 10}, which only
  // touches the bar's edge, so it wins on distance alone.
  const std::vector<Rect> marks{{0, 0, 300, 95}};
  for (int max_marks : {-1, 0}) {
    const CalloutSearch s{{0, 0, 300, 300}, 4, 8, 10, max_marks};
    auto spot = find_callout_spot({100, 100}, 20, 10, s, {}, marks, {});
    REQUIRE(spot);
    CHECK(spot->marks == 0);
    CHECK(spot->box.x == Approx(112));
    CHECK(spot->box.y == Approx(95));
  }
}

TEST_CASE("with no clear room, max_marks 0 refuses every spot, without it the fewest marks win", "[place][callout]") {
  // The bar covers the whole area, so every spot covers exactly it.
  const std::vector<Rect> marks{{-1, -1, 302, 302}};
  CHECK_FALSE(find_callout_spot({100, 100}, 20, 10, CalloutSearch{{0, 0, 300, 300}, 4, 8, 10, 0}, {}, marks, {}));
  auto any = find_callout_spot({100, 100}, 20, 10, CalloutSearch{{0, 0, 300, 300}, 4, 8, 10, -1}, {}, marks, {});
  REQUIRE(any);
  CHECK(any->marks == 1);
}

TEST_CASE("a leader along another line is charged for every point of it it passes", "[place][callout]") {
  // A line of points 1.5 pt apart runs right from the target (100, 100)
  // along y = 100 (a reference line the target sits on). A leader running
  // along it passes each point beyond the 4 pt kept round the target; the
  // search prefers a leader that leaves the line at once.
  std::vector<Rect> marks;
  for (double x = 100; x <= 300; x += 1.5) marks.push_back({x, 100, 0, 0});
  const CalloutSearch s{{0, 0, 300, 300}, 4, 8, 10};
  auto spot = find_callout_spot({100, 100}, 20, 10, s, {}, marks, {});
  REQUIRE(spot);
  CHECK(spot->marks == 0);
  CHECK(spot->leader_marks == 0);
  // Ring 1, upper right: box {108.49, 81.51, 20, 10} (12·cos 45° + 10 − 10,
  // 100 − 12·sin 45° − 10), clear of the line and leaving it at 45°.
  CHECK(spot->box.x == Approx(100 + 12 * 0.70710678 - 0).margin(1e-6));
  CHECK(spot->box.y == Approx(100 - 12 * 0.70710678 - 10).margin(1e-6));
}
