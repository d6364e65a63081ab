// The callout search: free spots near the target, checked by brute force
// against the rules the search promises (callout_spot.h).
#include "place/callout_spot.h"

#include <catch2/catch.hpp>
#include <cmath>
#include <vector>

#include "place/leader.h"
#include "place/spatial_index.h"

using namespace forme;

namespace {
double distance_to(const Rect& r, Point p) {
  const Point q = nearest_point_of(r, p);
  return std::hypot(q.x - p.x, q.y - p.y);
}
}  // namespace

TEST_CASE("callout search: segments cross only at a shared inner point", "[place][callout]") {
  // Worked by hand: the diagonals of the unit square meet at (0.5, 0.5).
  CHECK(segments_cross({0, 0}, {1, 1}, {0, 1}, {1, 0}));
  // Parallel, and end to end, do not cross.
  CHECK_FALSE(segments_cross({0, 0}, {1, 0}, {0, 1}, {1, 1}));
  CHECK_FALSE(segments_cross({0, 0}, {1, 1}, {1, 1}, {2, 0}));
  // Disjoint along the same direction.
  CHECK_FALSE(segments_cross({0, 0}, {1, 1}, {2, 0}, {3, -1}));
}

TEST_CASE("callout search: an empty area gives the nearest spot, upper right first", "[place][callout]") {
  CalloutSearch s{{0, 0, 400, 300}, 2, 5, 10};
  auto spot = find_callout_spot({200, 150}, 60, 20, s, {}, {}, {});
  REQUIRE(spot);
  CHECK(within(spot->box, s.area));
  // First ring, first direction: the box's lower-left corner sits on the
  // ring point up and to the right of the target.
  CHECK(spot->box.left() > 200);
  CHECK(spot->box.bottom() < 150);
  CHECK(distance_to(spot->box, {200, 150}) == Approx(7).margin(1e-9));
  CHECK(spot->leader.from.x == 200);
  CHECK(spot->leader.to.x == spot->box.left());
}

TEST_CASE("callout search: text is never covered, data only when nothing else is free", "[place][callout]") {
  CalloutSearch s{{0, 0, 400, 300}, 2, 5, 20};
  const Point target{200, 150};
  // Text boxes all around the target except below it.
  const std::vector<Rect> text = {{150, 60, 200, 80}, {120, 60, 40, 160}, {240, 60, 40, 150}};
  std::vector<Rect> marks;
  for (int i = 0; i < 40; ++i) marks.push_back({150.0 + i * 2.5, 175, 0, 0});  // a line of data below
  auto spot = find_callout_spot(target, 50, 18, s, text, marks, {});
  REQUIRE(spot);
  for (const Rect& t : text) {
    CHECK_FALSE(spot->box.overlaps(t));
    CHECK_FALSE(segment_enters(spot->leader.from, spot->leader.to, t));
  }
  int covered = 0;
  for (const Rect& m : marks) covered += spot->box.overlaps(m);
  CHECK(covered == spot->marks);
  CHECK(spot->marks == 0);  // the gap between the text and the line of data holds it
}

TEST_CASE("callout search: a leader crossing another is avoided when a free spot exists", "[place][callout]") {
  CalloutSearch s{{0, 0, 400, 300}, 2, 5, 20};
  // An earlier leader passes just right of the target, top to bottom.
  const std::vector<Leader> earlier = {{{205, 0}, {205, 300}}};
  auto spot = find_callout_spot({200, 150}, 40, 14, s, {}, {}, earlier);
  REQUIRE(spot);
  CHECK(spot->crossings == 0);
  CHECK_FALSE(segments_cross(spot->leader.from, spot->leader.to, earlier[0].from, earlier[0].to));
  CHECK(spot->box.right() <= 205);
}

TEST_CASE("callout search: no spot when the note is larger than the area", "[place][callout]") {
  CalloutSearch s{{0, 0, 100, 50}, 2, 5, 10};
  CHECK_FALSE(find_callout_spot({50, 25}, 120, 10, s, {}, {}, {}));
}
