// Stated transforms on a small table whose results are worked by hand:
//
//   x         1     2     3     4     5
//   v        50    40    60     0    30
//   index    100   80   120     0    60     (v / 50 * 100)
//   change    —   -20    50  -100     —     ((v - prev) / prev * 100; prev 0 is undefined)
//   change2   —     —    20  -100   -50     (against two positions back)
#include <catch2/catch.hpp>

#include <cmath>
#include <limits>

#include "data/transform.h"

using Catch::Matchers::WithinAbs;

namespace {
constexpr double NaN = std::numeric_limits<double>::quiet_NaN();
const std::vector<double> v = {50, 40, 60, 0, 30};

bool same(const std::vector<double>& a, const std::vector<double>& b) {
  if (a.size() != b.size()) return false;
  for (std::size_t i = 0; i < a.size(); ++i) {
    if (std::isnan(a[i]) != std::isnan(b[i])) return false;
    if (!std::isnan(a[i]) && std::abs(a[i] - b[i]) > 1e-12) return false;
  }
  return true;
}
}  // namespace

TEST_CASE("index_to_base: 100 at the base", "[data][transform]") {
  CHECK(same(forme::index_to_base(v, 0), {100, 80, 120, 0, 60}));
  CHECK(same(forme::index_to_base(v, 4), {50.0 / 30 * 100, 40.0 / 30 * 100, 200, 0, 100}));
  // Undefined bases: zero, missing, outside the series.
  CHECK(same(forme::index_to_base(v, 3), {NaN, NaN, NaN, NaN, NaN}));
  CHECK(same(forme::index_to_base({1, NaN, 3}, 1), {NaN, NaN, NaN}));
  CHECK(same(forme::index_to_base(v, 5), {NaN, NaN, NaN, NaN, NaN}));
  CHECK(forme::index_to_base({}, 0).empty());
  // Missing values stay missing.
  CHECK(same(forme::index_to_base({2, NaN, 4}, 0), {100, NaN, 200}));
  // A result too large for a double is undefined too.
  CHECK(same(forme::index_to_base({1e-300, 1e300}, 0), {100, NaN}));
}

TEST_CASE("percent_change: first lag values missing, zero before is undefined", "[data][transform]") {
  CHECK(same(forme::percent_change(v), {NaN, -20, 50, -100, NaN}));
  CHECK(same(forme::percent_change(v, 2), {NaN, NaN, 20, -100, -50}));
  CHECK(same(forme::percent_change(v, 5), {NaN, NaN, NaN, NaN, NaN}));
  CHECK(same(forme::percent_change(v, 99), {NaN, NaN, NaN, NaN, NaN}));
  CHECK(same(forme::percent_change({4, NaN, 5}), {NaN, NaN, NaN}));
  // Unchanged negative value: (-2 - -2) / -2 is -0, returned as +0.
  const auto flat = forme::percent_change({-2, -2});
  CHECK(flat[1] == 0.0);
  CHECK_FALSE(std::signbit(flat[1]));
}

TEST_CASE("difference: elementwise, missing where either is missing", "[data][transform]") {
  CHECK(same(forme::difference({5, 7, NaN, 1}, {2, 9, 1}), {3, -2, NaN, NaN}));
  CHECK(same(forme::difference({1}, {1, 2}), {0, NaN}));
  CHECK_FALSE(std::signbit(forme::difference({-0.0}, {0.0})[0]));
  CHECK(same(forme::difference({1e308}, {-1e308}), {NaN}));  // overflows: undefined
}

TEST_CASE("share_of_total: percent of the per-x total, summing to 100", "[data][transform]") {
  //   x          1    2    3    4
  //   a          1    2    0    —
  //   b          3    2    0    1
  //   share a   25   50    —    —   (x3: total 0; x4: a missing)
  //   share b   75   50    —    —
  const auto s = forme::share_of_total({{1, 2, 0, NaN}, {3, 2, 0, 1}});
  REQUIRE(s.size() == 2);
  CHECK(same(s[0], {25, 50, NaN, NaN}));
  CHECK(same(s[1], {75, 50, NaN, NaN}));

  const auto thirds = forme::share_of_total({{1, 2}, {1, 3}, {1, 5}});
  for (std::size_t i = 0; i < 2; ++i) {
    const double sum = thirds[0][i] + thirds[1][i] + thirds[2][i];
    CHECK_THAT(sum, WithinAbs(100.0, 1e-12));
  }
  CHECK_THAT(thirds[0][0], WithinAbs(100.0 / 3, 1e-12));
  CHECK_THAT(thirds[2][1], WithinAbs(50.0, 1e-12));

  // Negative values and ragged series leave that x undefined; shapes are kept.
  const auto odd = forme::share_of_total({{1, -1, 2}, {1, 3}});
  REQUIRE(odd.size() == 2);
  CHECK(same(odd[0], {50, NaN, NaN}));
  CHECK(same(odd[1], {50, NaN}));
  CHECK(forme::share_of_total({}).empty());
  CHECK(same(forme::share_of_total({{4, 0}})[0], {100, NaN}));
}
