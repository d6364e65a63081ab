// Label spreading: the hand-solved cases work the least-squares answer out
// by hand in the comments; the property test compares with an independent
// brute-force solver.
#include "place/spread.h"

#include <algorithm>
#include <catch2/catch.hpp>
#include <cmath>
#include <limits>
#include <numeric>
#include <random>
#include <vector>

using forme::spread_labels;
using forme::SpreadOptions;
using forme::SpreadResult;
using forme::SpreadStatus;

namespace {

SpreadResult spread(std::vector<double> y, std::vector<double> h, SpreadOptions o = {}) {
  return spread_labels(y, h, o);
}

SpreadOptions bounded(double gap, double lo, double hi) {
  SpreadOptions o;
  o.gap = gap;
  o.lo = lo;
  o.hi = hi;
  return o;
}

/// Checks order, spacing and bounds, the constraints every answer keeps.
void require_feasible(const std::vector<double>& y, const std::vector<double>& h,
                      const SpreadOptions& o, const SpreadResult& r) {
  std::vector<std::size_t> order(y.size());
  std::iota(order.begin(), order.end(), std::size_t{0});
  std::stable_sort(order.begin(), order.end(), [&](auto a, auto b) { return y[a] < y[b]; });
  constexpr double eps = 1e-9;
  for (std::size_t k = 1; k < order.size(); ++k) {
    const auto a = order[k - 1], b = order[k];
    REQUIRE(r.centres[b] - r.centres[a] >= (h[a] + h[b]) / 2 + o.gap - eps);
  }
  for (std::size_t i = 0; i < y.size(); ++i) {
    REQUIRE(r.centres[i] - h[i] / 2 >= o.lo - eps);
    REQUIRE(r.centres[i] + h[i] / 2 <= o.hi + eps);
  }
}

/// Independent exact solver for small n. The optimum's level sets in
/// q = p − offset are contiguous runs, and each run sits at its own mean or
/// at a bound. So enumerate every split into runs and every choice of
/// {mean, lower bound, upper bound} per run, keep the feasible ones, and take
/// the cheapest. This is O(2^(n−1) · 3^n) and independent of PAVA.
double brute_force_cost(const std::vector<double>& y, const std::vector<double>& h,
                        const SpreadOptions& o) {
  const std::size_t n = y.size();
  std::vector<std::size_t> order(n);
  std::iota(order.begin(), order.end(), std::size_t{0});
  std::stable_sort(order.begin(), order.end(), [&](auto a, auto b) { return y[a] < y[b]; });
  std::vector<double> offset(n, 0.0), v(n);
  for (std::size_t k = 1; k < n; ++k)
    offset[k] = offset[k - 1] + (h[order[k - 1]] + h[order[k]]) / 2 + o.gap;
  for (std::size_t k = 0; k < n; ++k) v[k] = y[order[k]] - offset[k];
  double best = std::numeric_limits<double>::infinity();
  for (unsigned cuts = 0; cuts < (1u << (n - 1)); ++cuts) {
    std::vector<std::pair<std::size_t, std::size_t>> runs;  // [begin, end)
    std::size_t begin = 0;
    for (std::size_t k = 1; k <= n; ++k) {
      if (k == n || (cuts >> (k - 1) & 1u)) {
        runs.emplace_back(begin, k);
        begin = k;
      }
    }
    int choices = 1;
    for (std::size_t r = 0; r < runs.size(); ++r) choices *= 3;
    for (int c = 0; c < choices; ++c) {
      std::vector<double> q(n);
      int code = c;
      for (auto [b, e] : runs) {
        double level = 0;
        switch (code % 3) {
          case 0:
            level = std::accumulate(v.begin() + static_cast<long>(b),
                                    v.begin() + static_cast<long>(e), 0.0) /
                    static_cast<double>(e - b);
            break;
          case 1:
            level = o.lo + h[order[0]] / 2;
            break;
          default:
            level = o.hi - h[order[n - 1]] / 2 - offset[n - 1];
            break;
        }
        code /= 3;
        for (std::size_t k = b; k < e; ++k) q[k] = level;
      }
      bool ok = true;
      double cost = 0;
      for (std::size_t k = 0; k < n && ok; ++k) {
        const double p = q[k] + offset[k];
        ok = (k == 0 || q[k] >= q[k - 1] - 1e-12) && p - h[order[k]] / 2 >= o.lo - 1e-9 &&
             p + h[order[k]] / 2 <= o.hi + 1e-9;
        cost += (p - y[order[k]]) * (p - y[order[k]]);
      }
      if (ok) best = std::min(best, cost);
    }
  }
  return best;
}

}  // namespace

TEST_CASE("spread: two overlapping labels move apart symmetrically", "[place][spread]") {
  // h = 10, 10 at y = 0, 4, gap 0. Required spacing d = (10 + 10)/2 = 10.
  // offsets 0, 10 -> v = 0, 4 - 10 = -6. 0 > -6 violates, so pool: mean -3.
  // q = -3, -3 -> p = -3, 7: each moves 3 from the mean 2. Cost 9 + 9 = 18.
  const auto r = spread({0, 4}, {10, 10});
  REQUIRE(r.status == SpreadStatus::fits);
  CHECK(r.centres[0] == Approx(-3));
  CHECK(r.centres[1] == Approx(7));
  CHECK(r.cost == Approx(18));
}

TEST_CASE("spread: three labels at one spot spread around it", "[place][spread]") {
  // h = 10 each at y = 0, gap 2: d = 12, offsets 0, 12, 24, v = 0, -12, -24.
  // All pool into one block with mean -12 -> p = -12, 0, 12. Cost 144 + 0 + 144.
  const auto r = spread({0, 0, 0}, {10, 10, 10}, bounded(2, -1e9, 1e9));
  CHECK(r.centres[0] == Approx(-12));
  CHECK(r.centres[1] == Approx(0));
  CHECK(r.centres[2] == Approx(12));
  CHECK(r.cost == Approx(288));
}

TEST_CASE("spread: labels already far apart stay where they are", "[place][spread]") {
  const auto r = spread({0, 50, 100}, {10, 10, 10}, bounded(5, -1e9, 1e9));
  CHECK(r.centres == std::vector<double>{0, 50, 100});
  CHECK(r.cost == 0);
}

TEST_CASE("spread: unsorted input keeps the order of desired positions", "[place][spread]") {
  // y = 10, 0.5, 0 (input order), h = 2, gap 0. Sorted: #2 (0), #1 (0.5), #0 (10).
  // d = 2, offsets 0, 2, 4 -> v = 0, -1.5, 6. Pool the first two: -0.75; 6 stays.
  // p(#2) = -0.75, p(#1) = -0.75 + 2 = 1.25, p(#0) = 6 + 4 = 10.
  // Cost 0.75² + 0.75² + 0 = 1.125.
  const auto r = spread({10, 0.5, 0}, {2, 2, 2});
  CHECK(r.centres[2] == Approx(-0.75));
  CHECK(r.centres[1] == Approx(1.25));
  CHECK(r.centres[0] == Approx(10));
  CHECK(r.cost == Approx(1.125));
}

TEST_CASE("spread: equal desired positions keep input order", "[place][spread]") {
  // y = 5, 5, h = 4, gap 0: d = 4, v = 5, 1 -> mean 3 -> p = 3, 7; label 0 on top.
  const auto r = spread({5, 5}, {4, 4});
  CHECK(r.centres[0] == Approx(3));
  CHECK(r.centres[1] == Approx(7));
}

TEST_CASE("spread: mixed heights", "[place][spread]") {
  // h = 4, 8 at y = 10, 10, gap 1: d = (4 + 8)/2 + 1 = 7, v = 10, 3 -> mean 6.5.
  // p = 6.5, 13.5; displacements -3.5, +3.5, cost 24.5.
  const auto r = spread({10, 10}, {4, 8}, bounded(1, -1e9, 1e9));
  CHECK(r.centres[0] == Approx(6.5));
  CHECK(r.centres[1] == Approx(13.5));
  CHECK(r.cost == Approx(24.5));
}

TEST_CASE("spread: the lower bound pushes the whole block down", "[place][spread]") {
  // As the first case, but inside [0, 100]: q must be >= A = lo + h0/2 = 5
  // (and <= B = 100 - 5 - 10 = 85). Unbounded q = -3 clamps to 5 -> p = 5, 15.
  // Cost 5² + 11² = 146.
  const auto r = spread({0, 4}, {10, 10}, bounded(0, 0, 100));
  REQUIRE(r.status == SpreadStatus::fits);
  CHECK(r.centres[0] == Approx(5));
  CHECK(r.centres[1] == Approx(15));
  CHECK(r.cost == Approx(146));
}

TEST_CASE("spread: the upper bound pushes the whole block up", "[place][spread]") {
  // y = 96, 100, h = 10, [0, 100]: v = 96, 90 -> mean 93; B = 100 - 5 - 10 = 85.
  // q = 85 -> p = 85, 95. Cost 11² + 5² = 146.
  const auto r = spread({96, 100}, {10, 10}, bounded(0, 0, 100));
  CHECK(r.centres[0] == Approx(85));
  CHECK(r.centres[1] == Approx(95));
  CHECK(r.cost == Approx(146));
}

TEST_CASE("spread: a bound moves only the block that crosses it", "[place][spread]") {
  // h = 2 each at y = -5, 6, 7, gap 0, [0, 10]. offsets 0, 2, 4 -> v = -5, 4, 3.
  // Pool (4, 3) -> 3.5; blocks: -5 | 3.5 3.5. A = 0 + 1 = 1, B = 10 - 1 - 4 = 5.
  // Clamp: 1 | 3.5 3.5 -> p = 1, 5.5, 7.5. Cost 6² + 0.5² + 0.5² = 36.5.
  const auto r = spread({-5, 6, 7}, {2, 2, 2}, bounded(0, 0, 10));
  CHECK(r.centres[0] == Approx(1));
  CHECK(r.centres[1] == Approx(5.5));
  CHECK(r.centres[2] == Approx(7.5));
  CHECK(r.cost == Approx(36.5));
}

TEST_CASE("spread: a too-large gap is reduced evenly", "[place][spread]") {
  // Three h = 10 labels, gap 2, in [0, 32]: they need 30 + 2·2 = 34 > 32, but
  // 30 <= 32 fits. Even gap (32 - 30)/2 = 1 -> centres 5, 16, 27.
  const std::vector<double> y{0, 10, 20}, h{10, 10, 10};
  const auto r = spread(y, h, bounded(2, 0, 32));
  REQUIRE(r.status == SpreadStatus::gap_reduced);
  CHECK(r.gap == Approx(1));
  CHECK(r.centres[0] == Approx(5));
  CHECK(r.centres[1] == Approx(16));
  CHECK(r.centres[2] == Approx(27));
  require_feasible(y, h, bounded(1, 0, 32), r);
}

TEST_CASE("spread: labels taller than the range overlap evenly", "[place][spread]") {
  // Three h = 10 labels in [0, 25]: 30 > 25. Gap (25 - 30)/2 = -2.5:
  // centres 5, 5 + 10 - 2.5 = 12.5, 20; first top at 0, last bottom at 25.
  const auto r = spread({3, 2, 1}, {10, 10, 10}, bounded(0, 0, 25));
  REQUIRE(r.status == SpreadStatus::overlapping);
  CHECK(r.gap == Approx(-2.5));
  // Sorted order is #2, #1, #0.
  CHECK(r.centres[2] == Approx(5));
  CHECK(r.centres[1] == Approx(12.5));
  CHECK(r.centres[0] == Approx(20));
}

TEST_CASE("spread: one label taller than the range is centred", "[place][spread]") {
  const auto r = spread({100}, {10}, bounded(0, 0, 4));
  REQUIRE(r.status == SpreadStatus::overlapping);
  CHECK(r.centres[0] == Approx(2));
}

TEST_CASE("spread: empty input", "[place][spread]") {
  const auto r = spread({}, {});
  CHECK(r.centres.empty());
  CHECK(r.status == SpreadStatus::fits);
}

TEST_CASE("spread: malformed input throws", "[place][spread]") {
  CHECK_THROWS_AS(spread({0, 1}, {1}), std::invalid_argument);
  CHECK_THROWS_AS(spread({0}, {-1}), std::invalid_argument);
  CHECK_THROWS_AS(spread({std::nan("")}, {1}), std::invalid_argument);
  CHECK_THROWS_AS(spread({0}, {1}, bounded(-1, 0, 10)), std::invalid_argument);
  CHECK_THROWS_AS(spread({0}, {1}, bounded(0, 10, 0)), std::invalid_argument);
}

TEST_CASE("spread: matches a brute-force solver on random small cases", "[place][spread]") {
  std::mt19937_64 rng(7);
  std::uniform_real_distribution<double> pos(0, 60), height(1, 12), gap(0, 3);
  int compared = 0;
  for (int trial = 0; trial < 300; ++trial) {
    const std::size_t n = 1 + rng() % 6;
    std::vector<double> y(n), h(n);
    for (std::size_t i = 0; i < n; ++i) {
      y[i] = pos(rng);
      h[i] = height(rng);
    }
    if (trial % 5 == 0) y[n - 1] = y[0];  // ties
    const SpreadOptions o = trial % 3 == 0 ? bounded(gap(rng), -1e6, 1e6)
                                           : bounded(gap(rng), 5, 5 + 40 + 30 * (trial % 2));
    const auto r = spread_labels(y, h, o);
    if (r.status != SpreadStatus::fits) continue;
    INFO("trial " << trial);
    require_feasible(y, h, o, r);
    CHECK(r.cost == Approx(brute_force_cost(y, h, o)).margin(1e-9).epsilon(1e-9));
    ++compared;
  }
  CHECK(compared > 200);
}

TEST_CASE("spread: large input stays feasible", "[place][spread]") {
  std::mt19937_64 rng(3);
  std::uniform_real_distribution<double> pos(0, 1000);
  std::vector<double> y(20000), h(20000, 0.04);
  for (double& v : y) v = pos(rng);
  const SpreadOptions o = bounded(0.005, 0, 1000);
  const auto r = spread_labels(y, h, o);
  REQUIRE(r.status == SpreadStatus::fits);
  require_feasible(y, h, o, r);
}
