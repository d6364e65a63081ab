// The uniform grid must agree with a brute-force scan, including for
// rectangles that span many cells or lie partly outside the grid's region.
#include "place/spatial_index.h"

#include <algorithm>
#include <catch2/catch.hpp>
#include <random>
#include <vector>

#include "place/leader.h"

using namespace forme;

TEST_CASE("grid index: queries match a brute-force scan", "[place][grid]") {
  std::mt19937_64 rng(9);
  std::uniform_real_distribution<double> pos(-50, 450), size(0, 60);
  const Rect region{0, 0, 400, 300};
  GridIndex grid(region, 25, 10);
  std::vector<Rect> rects;
  std::vector<bool> stored;
  for (int i = 0; i < 400; ++i) {
    // Some zero-size rectangles (points) and some large ones.
    const double w = i % 10 == 0 ? 0 : size(rng) * (i % 17 == 0 ? 5 : 1);
    const double h = i % 10 == 0 ? 0 : size(rng) / 2;
    rects.push_back({pos(rng), pos(rng), w, h});
    grid.insert(i, rects.back());
    stored.push_back(true);
  }
  for (int i = 0; i < 400; i += 3) {
    grid.remove(i);
    stored[static_cast<std::size_t>(i)] = false;
  }
  grid.remove(0);  // removing twice is harmless
  for (int q = 0; q < 300; ++q) {
    const Rect query{pos(rng), pos(rng), size(rng) * 2, size(rng)};
    std::vector<int> expected, found;
    for (std::size_t i = 0; i < rects.size(); ++i)
      if (stored[i] && rects[i].overlaps(query)) expected.push_back(static_cast<int>(i));
    grid.query(query, [&](int id, const Rect& r) {
      CHECK(r.x == rects[static_cast<std::size_t>(id)].x);
      found.push_back(id);
    });
    std::sort(found.begin(), found.end());
    REQUIRE(found == expected);  // each overlapping item exactly once
    CHECK(grid.count_overlaps(query) == static_cast<int>(expected.size()));
    CHECK(grid.any_overlap(query) == !expected.empty());
    if (!expected.empty()) {
      CHECK(grid.count_overlaps(query, expected.front()) == static_cast<int>(expected.size()) - 1);
      CHECK(grid.count_overlaps(query, -1, 0) == 1);  // stops after exceeding the limit
    }
  }
}

TEST_CASE("grid index: touching edges do not overlap", "[place][grid]") {
  GridIndex grid({0, 0, 100, 100}, 10, 10);
  grid.insert(0, {10, 10, 10, 10});
  CHECK_FALSE(grid.any_overlap({20, 10, 5, 5}));
  CHECK_FALSE(grid.any_overlap({0, 0, 10, 10}));
  CHECK(grid.any_overlap({19, 19, 5, 5}));
  CHECK(grid.contains(0));
  grid.clear();
  CHECK_FALSE(grid.contains(0));
  CHECK_FALSE(grid.any_overlap({19, 19, 5, 5}));
}

TEST_CASE("segment_enters: interior crossings only", "[place][grid]") {
  const Rect r{10, 10, 10, 10};
  CHECK(segment_enters({0, 15}, {30, 15}, r));        // straight through
  CHECK(segment_enters({15, 15}, {15, 15.5}, r));     // wholly inside
  CHECK_FALSE(segment_enters({0, 10}, {30, 10}, r));  // along the top edge
  CHECK_FALSE(segment_enters({0, 0}, {10, 10}, r));   // ends on a corner
  CHECK_FALSE(segment_enters({0, 0}, {9, 30}, r));    // passes by
  CHECK(segment_enters({0, 0}, {30, 30}, r));         // the diagonal
}
