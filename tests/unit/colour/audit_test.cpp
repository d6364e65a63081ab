// Pairwise colour audit: closest pairs under each vision.
#include <catch2/catch.hpp>

#include "colour/audit.h"
#include "colour/cvd.h"
#include "colour/difference.h"

using Catch::Matchers::WithinAbs;
using namespace forme;

TEST_CASE("pairs_by_difference lists every pair, closest first", "[colour]") {
  std::vector<Rgb> colours = {rgb8(200, 30, 30), rgb8(30, 60, 200), rgb8(205, 35, 30),
                              rgb8(240, 220, 80)};
  auto pairs = pairs_by_difference(colours, Vision::normal);
  REQUIRE(pairs.size() == 6);
  for (std::size_t i = 1; i < pairs.size(); ++i) CHECK(pairs[i - 1].delta_e <= pairs[i].delta_e);
  // The two near-identical reds are the closest pair.
  CHECK(pairs.front().first == 0);
  CHECK(pairs.front().second == 2);
  CHECK_THAT(pairs.front().delta_e, WithinAbs(delta_e(colours[0], colours[2]), 1e-12));
  for (const PairFinding& p : pairs) CHECK(p.first < p.second);
}

TEST_CASE("a red-green pair that is far apart normally closes up for deutan", "[colour]") {
  // Red and green of equal lightness, a textbook deutan confusion.
  std::vector<Rgb> colours = {rgb8(190, 60, 50), rgb8(80, 130, 40)};
  double normal = closest_pair(colours, Vision::normal)->delta_e;
  double deutan = closest_pair(colours, Vision::deutan)->delta_e;
  CHECK(normal > 30);
  CHECK(deutan < normal / 2);
  // The audit's deutan view is Machado 2009 at severity 1.0.
  CHECK(as_seen(colours[0], Vision::deutan) == simulate_machado(colours[0], Deficiency::deutan, 1.0));
}

TEST_CASE("greyscale audit catches colours of equal luminance", "[colour]") {
  Rgb red = {0.8, 0.1, 0.1};
  Rgb grey = to_greyscale(red);
  std::vector<Rgb> colours = {red, grey};
  CHECK(closest_pair(colours, Vision::normal)->delta_e > 20);
  CHECK_THAT(closest_pair(colours, Vision::greyscale)->delta_e, WithinAbs(0.0, 1e-6));
}

TEST_CASE("worst_pairs gives one finding per vision, in order", "[colour]") {
  std::vector<Rgb> colours = {rgb8(20, 90, 160), rgb8(220, 120, 20), rgb8(40, 130, 60)};
  auto worst = worst_pairs(colours);
  REQUIRE(worst.size() == all_visions.size());
  for (std::size_t i = 0; i < worst.size(); ++i) {
    CHECK(worst[i].vision == all_visions[i]);
    CHECK(worst[i].delta_e == closest_pair(colours, all_visions[i])->delta_e);
  }
  CHECK(worst_pairs({rgb8(1, 2, 3)}).empty());
  CHECK_FALSE(closest_pair({}, Vision::normal).has_value());
}
