// Point-label placement: every check on a result is made by brute force
// here, not through the placer's own grid.
#include "place/point_labels.h"

#include <catch2/catch.hpp>
#include <cmath>
#include <random>
#include <vector>

#include "place/leader.h"

using namespace forme;

namespace {

bool same(const Rect& a, const Rect& b) {
  return a.x == b.x && a.y == b.y && a.w == b.w && a.h == b.h;
}

/// All the hard constraints, plus the bookkeeping fields, by brute force.
void require_valid(const PlacementProblem& p, const PlacementResult& r) {
  REQUIRE(r.labels.size() == p.labels.size());
  std::vector<int> left_out;
  for (std::size_t i = 0; i < r.labels.size(); ++i) {
    const LabelPlacement& a = r.labels[i];
    if (!a.placed) {
      left_out.push_back(static_cast<int>(i));
      continue;
    }
    REQUIRE(a.box.w == p.labels[i].w);
    REQUIRE(a.box.h == p.labels[i].h);
    REQUIRE(within(a.box, p.area));
    for (const Rect& o : p.obstacles) REQUIRE_FALSE(a.box.overlaps(o));
    int marks = 0;
    for (const Rect& m : p.marks) marks += a.box.overlaps(m);
    REQUIRE(a.marks_overlapped == marks);
    for (std::size_t j = i + 1; j < r.labels.size(); ++j)
      if (r.labels[j].placed) REQUIRE_FALSE(a.box.overlaps(r.labels[j].box));
    REQUIRE((a.candidate >= 0) != a.leader.has_value());
  }
  REQUIRE(r.left_out == left_out);
}

int placed_count(const PlacementResult& r) {
  return static_cast<int>(r.labels.size() - r.left_out.size());
}

/// n uniform points in `area` with w × h labels.
PlacementProblem random_problem(int n, std::uint64_t seed, Rect area, double w, double h) {
  std::mt19937_64 rng(seed);
  std::uniform_real_distribution<double> ux(area.x, area.right()), uy(area.y, area.bottom());
  PlacementProblem p;
  p.area = area;
  for (int i = 0; i < n; ++i) p.labels.push_back({{ux(rng), uy(rng)}, w, h});
  return p;
}

/// Ten labels on one point: only the four corners can hold boxes at once
/// (each side position overlaps two corners and the other sides).
PlacementProblem crowd() {
  PlacementProblem p;
  p.area = {0, 0, 400, 300};
  for (int i = 0; i < 10; ++i) p.labels.push_back({{200, 150}, 20, 10, 1.0 + i});
  return p;
}

}  // namespace

TEST_CASE("point labels: candidate boxes around the anchor", "[place][labels]") {
  // Anchor (100, 100), 20 × 10 box, offset 2; y grows downwards.
  const Point a{100, 100};
  CHECK(same(label_box(a, 20, 10, LabelPosition::upper_right, 2), {102, 88, 20, 10}));
  CHECK(same(label_box(a, 20, 10, LabelPosition::upper_left, 2), {78, 88, 20, 10}));
  CHECK(same(label_box(a, 20, 10, LabelPosition::lower_right, 2), {102, 102, 20, 10}));
  CHECK(same(label_box(a, 20, 10, LabelPosition::lower_left, 2), {78, 102, 20, 10}));
  CHECK(same(label_box(a, 20, 10, LabelPosition::right, 2), {102, 95, 20, 10}));
  CHECK(same(label_box(a, 20, 10, LabelPosition::left, 2), {78, 95, 20, 10}));
  CHECK(same(label_box(a, 20, 10, LabelPosition::above, 2), {90, 88, 20, 10}));
  CHECK(same(label_box(a, 20, 10, LabelPosition::below, 2), {90, 102, 20, 10}));
}

TEST_CASE("point labels: a lone label takes the first preference", "[place][labels]") {
  PlacementProblem p;
  p.area = {0, 0, 400, 300};
  p.labels = {{{200, 150}, 30, 8}};
  for (auto place : {place_labels_greedy, place_labels_annealing}) {
    const auto r = place(p, {});
    require_valid(p, r);
    CHECK(r.labels[0].candidate == 0);
    CHECK(same(r.labels[0].box, {202, 140, 30, 8}));
  }
}

TEST_CASE("point labels: obstacles, area edges and marks steer the choice", "[place][labels]") {
  PlacementProblem p;
  p.area = {0, 0, 400, 300};
  p.labels = {{{200, 150}, 30, 8}};
  SECTION("an obstacle over the upper right sends the label upper left") {
    p.obstacles = {{210, 130, 40, 15}};
  }
  SECTION("the area's right edge sends the label upper left") { p.labels[0].anchor = {380, 150}; }
  SECTION("a data mark under the upper right sends the label upper left") {
    p.marks = {{215, 144, 2, 2}};
  }
  for (auto place : {place_labels_greedy, place_labels_annealing}) {
    const auto r = place(p, {});
    require_valid(p, r);
    CHECK(r.labels[0].candidate == 1);
    CHECK(r.labels[0].marks_overlapped == 0);
  }
}

TEST_CASE("point labels: a mark is covered rather than the label left out", "[place][labels]") {
  // Every candidate covers the mark (a large shaded band): 10 per mark is
  // cheaper than leaving the label out (100), so it is placed, first choice.
  PlacementProblem p;
  p.area = {0, 0, 400, 300};
  p.labels = {{{200, 150}, 30, 8}};
  p.marks = {{100, 100, 200, 100}};
  const auto r = place_labels_annealing(p);
  require_valid(p, r);
  CHECK(r.labels[0].candidate == 0);
  CHECK(r.labels[0].marks_overlapped == 1);
}

TEST_CASE("point labels: labels that do not fit are left out by priority", "[place][labels]") {
  // Ten labels on one point with priorities 1 … 10: only four fit (the
  // corners), so the six lowest priorities (indices 0-5) are left out.
  const PlacementProblem p = crowd();
  for (auto place : {place_labels_greedy, place_labels_annealing}) {
    const auto r = place(p, {});
    require_valid(p, r);
    CHECK(r.left_out == std::vector<int>{0, 1, 2, 3, 4, 5});
    for (int i = 6; i < 10; ++i) CHECK(r.labels[static_cast<std::size_t>(i)].candidate < 4);
  }
}

TEST_CASE("point labels: a leader-line label goes farther out", "[place][labels]") {
  PlacementProblem p = crowd();
  p.labels[5].if_unplaced = IfUnplaced::leader;
  for (auto place : {place_labels_greedy, place_labels_annealing}) {
    const auto r = place(p, {});
    require_valid(p, r);
    CHECK(r.left_out == std::vector<int>{0, 1, 2, 3, 4});
    const LabelPlacement& l = r.labels[5];
    REQUIRE(l.placed);
    REQUIRE(l.leader.has_value());
    CHECK(l.candidate == -1);
    const Point a = p.labels[5].anchor;
    CHECK(l.leader->from.x == a.x);
    CHECK(l.leader->from.y == a.y);
    // The leader ends on the box, at the point nearest the anchor.
    const Point end = l.leader->to;
    CHECK(end.x == Approx(std::clamp(a.x, l.box.x, l.box.right())));
    CHECK(end.y == Approx(std::clamp(a.y, l.box.y, l.box.bottom())));
    // Farther out than the ordinary candidates, by at least one ring (the label height).
    CHECK(std::hypot(end.x - a.x, end.y - a.y) >= PlacementOptions{}.offset + 10 - 1e-9);
    // The leader does not run through any other placed box.
    for (std::size_t j = 0; j < r.labels.size(); ++j)
      if (j != 5 && r.labels[j].placed) CHECK_FALSE(segment_enters(end, a, r.labels[j].box));
  }
}

TEST_CASE("point labels: a leader label with no room anywhere is left out", "[place][labels]") {
  // The area holds exactly the four corner boxes around the point.
  PlacementProblem p = crowd();
  p.area = {200 - 2 - 20, 150 - 2 - 10, 44, 24};
  p.labels[5].if_unplaced = IfUnplaced::leader;
  const auto r = place_labels_annealing(p);
  require_valid(p, r);
  CHECK(r.left_out == std::vector<int>{0, 1, 2, 3, 4, 5});
}

TEST_CASE("point labels: no overlaps on dense random maps", "[place][labels]") {
  // 792 × 612 with 30 × 7 labels and n = 1000: far more labels than fit.
  for (std::uint64_t seed : {1, 2, 3}) {
    PlacementProblem p = random_problem(1000, seed, {0, 0, 792, 612}, 30, 7);
    p.obstacles = {{300, 250, 200, 40}, {0, 0, 792, 20}};
    std::mt19937_64 rng(seed);
    for (int k = 0; k < 200; ++k)
      p.marks.push_back({static_cast<double>(rng() % 792), static_cast<double>(rng() % 612), 3, 3});
    for (std::size_t i = 0; i < p.labels.size(); i += 7)
      p.labels[i].if_unplaced = IfUnplaced::leader;
    require_valid(p, place_labels_greedy(p));
    require_valid(p, place_labels_annealing(p));
  }
}

TEST_CASE("point labels: annealing places at least as many as greedy", "[place][labels]") {
  // Four corner positions touching the point, as in the classic four-position
  // model. At equal density annealing should leave no more labels out than
  // greedy does.
  PlacementOptions o;
  o.positions.assign(kCornerPositions.begin(), kCornerPositions.end());
  o.offset = 0;
  int greedy_total = 0, anneal_total = 0;
  for (std::uint64_t seed : {11, 12, 13}) {
    const PlacementProblem p = random_problem(750, seed, {0, 0, 792, 612}, 30, 7);
    const auto g = place_labels_greedy(p, o);
    const auto a = place_labels_annealing(p, o);
    require_valid(p, a);
    CHECK(placed_count(a) >= placed_count(g));
    greedy_total += placed_count(g);
    anneal_total += placed_count(a);
  }
  // At this density the gain is large: about 100 more labels per map with
  // the default settings. Require a clear gain, so that an annealer that
  // does nothing cannot pass as greedy.
  INFO("greedy " << greedy_total << ", annealing " << anneal_total);
  CHECK(anneal_total >= greedy_total + 3 * 40);
}

TEST_CASE("point labels: same input and seed give identical output", "[place][labels]") {
  PlacementProblem p = random_problem(600, 5, {0, 0, 500, 400}, 28, 8);
  p.marks = {{100, 100, 50, 50}, {300, 200, 4, 4}};
  for (std::size_t i = 0; i < p.labels.size(); i += 5) p.labels[i].if_unplaced = IfUnplaced::leader;
  for (std::size_t i = 0; i < p.labels.size(); i += 3) p.labels[i].priority = 2;
  PlacementOptions o;
  o.seed = 42;
  const auto a = place_labels_annealing(p, o);
  const PlacementProblem copy = p;
  const auto b = place_labels_annealing(copy, o);
  REQUIRE(a.left_out == b.left_out);
  for (std::size_t i = 0; i < a.labels.size(); ++i) {
    REQUIRE(a.labels[i].placed == b.labels[i].placed);
    REQUIRE(a.labels[i].candidate == b.labels[i].candidate);
    REQUIRE(same(a.labels[i].box, b.labels[i].box));
    REQUIRE(a.labels[i].leader.has_value() == b.labels[i].leader.has_value());
  }
}

TEST_CASE("point labels: higher priority wins the only free spot", "[place][labels]") {
  // Two labels on one point in an area that holds a single box.
  PlacementProblem p;
  p.area = {100, 70, 32, 30};  // only the upper-right box of (100, 100) fits
  p.labels = {{{100, 100}, 30, 8, 1}, {{100, 100}, 30, 8, 5}};
  for (auto place : {place_labels_greedy, place_labels_annealing}) {
    const auto r = place(p, {});
    require_valid(p, r);
    CHECK(r.left_out == std::vector<int>{0});
  }
}

TEST_CASE("point labels: malformed input throws", "[place][labels]") {
  PlacementProblem p;
  p.area = {0, 0, 100, 100};
  p.labels = {{{50, 50}, 10, 5}};
  SECTION("empty area") { p.area = {0, 0, 0, 100}; }
  SECTION("zero width") { p.labels[0].w = 0; }
  SECTION("zero priority") { p.labels[0].priority = 0; }
  SECTION("non-finite anchor") { p.labels[0].anchor.x = std::nan(""); }
  CHECK_THROWS_AS(place_labels_greedy(p), std::invalid_argument);
  CHECK_THROWS_AS(place_labels_annealing(p), std::invalid_argument);
}

TEST_CASE("point labels: no labels, no work", "[place][labels]") {
  PlacementProblem p;
  p.area = {0, 0, 100, 100};
  const auto r = place_labels_annealing(p);
  CHECK(r.labels.empty());
  CHECK(r.left_out.empty());
}

TEST_CASE("point labels: overlap removal drops the lowest priority first", "[place][labels]") {
  // A overlaps B, B overlaps C, A and C are apart.
  const std::vector<Rect> chain{{0, 0, 10, 10}, {8, 0, 10, 10}, {16, 0, 10, 10}};
  SECTION("by priority: A goes, then B still overlaps C and goes") {
    CHECK(drop_overlapping(chain, std::vector<double>{1, 2, 3}) == std::vector<int>{0, 1});
  }
  SECTION("by priority: C goes first, then A (lower than B) goes") {
    CHECK(drop_overlapping(chain, std::vector<double>{2, 3, 1}) == std::vector<int>{0, 2});
  }
  SECTION("equal priorities: the box with most overlaps goes") {
    CHECK(drop_overlapping(chain, std::vector<double>{1, 1, 1}) == std::vector<int>{1});
  }
  SECTION("full tie: the later index goes") {
    const std::vector<Rect> pair{{0, 0, 10, 10}, {5, 5, 10, 10}};
    CHECK(drop_overlapping(pair, std::vector<double>{1, 1}) == std::vector<int>{1});
  }
  SECTION("nothing overlaps: nothing goes") {
    const std::vector<Rect> apart{{0, 0, 10, 10}, {10, 0, 10, 10}};
    CHECK(drop_overlapping(apart, std::vector<double>{1, 1}).empty());
  }
}
