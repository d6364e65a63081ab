// Polyline thinning. Every check measures the drawn result independently
// (ruler.h): the distance from each original point, and from every point
// of each original segment, to the drawn polyline is computed from
// scratch, never taken from the simplifier's own bookkeeping. The test
// series are invented, from fixed seeds.
#include "simplify/polyline.h"

#include "ruler.h"

#include <algorithm>
#include <catch2/catch.hpp>
#include <cmath>
#include <cstdint>
#include <limits>
#include <random>
#include <vector>

using forme::Point;
using forme::simplify_polyline;
using forme::test::Ruler;

namespace {

constexpr double kTol = 0.05;  // pt; the suggested print tolerance

/// Largest distance from any original point to the drawn polyline.
double worst_distance(const std::vector<Point>& original, const std::vector<Point>& drawn) {
  REQUIRE(!drawn.empty());
  const Ruler ruler(drawn, kTol);
  double worst = 0;
  for (const Point& p : original) worst = std::max(worst, ruler.distance(p));
  return worst;
}

/// How many original segments have some point farther than kTol from the
/// drawn polyline.
std::size_t segments_astray(const std::vector<Point>& original, const std::vector<Point>& drawn) {
  REQUIRE(!drawn.empty());
  const Ruler ruler(drawn, kTol);
  std::size_t astray = 0;
  for (std::size_t i = 0; i + 1 < original.size(); ++i)
    if (!ruler.covers(original[i], original[i + 1], kTol)) ++astray;
  return astray;
}

/// The drawn points are a subsequence of the original, in order.
bool is_subsequence(const std::vector<Point>& original, const std::vector<Point>& drawn) {
  std::size_t k = 0;
  for (const Point& p : original)
    if (k < drawn.size() && p.x == drawn[k].x && p.y == drawn[k].y) ++k;
  return k == drawn.size();
}

void check_extremes_kept(const std::vector<Point>& original, const std::vector<Point>& drawn) {
  auto by_x = [](Point a, Point b) { return a.x < b.x; };
  auto by_y = [](Point a, Point b) { return a.y < b.y; };
  CHECK(drawn.front().x == original.front().x);
  CHECK(drawn.front().y == original.front().y);
  CHECK(drawn.back().x == original.back().x);
  CHECK(drawn.back().y == original.back().y);
  CHECK(std::min_element(drawn.begin(), drawn.end(), by_x)->x == std::min_element(original.begin(), original.end(), by_x)->x);
  CHECK(std::max_element(drawn.begin(), drawn.end(), by_x)->x == std::max_element(original.begin(), original.end(), by_x)->x);
  CHECK(std::min_element(drawn.begin(), drawn.end(), by_y)->y == std::min_element(original.begin(), original.end(), by_y)->y);
  CHECK(std::max_element(drawn.begin(), drawn.end(), by_y)->y == std::max_element(original.begin(), original.end(), by_y)->y);
}

/// A time series across a panel: n points from x0 to x1, y from f.
template <class F>
std::vector<Point> series(std::size_t n, double x0, double x1, F f) {
  std::vector<Point> v(n);
  for (std::size_t i = 0; i < n; ++i) {
    const double x = x0 + (x1 - x0) * static_cast<double>(i) / static_cast<double>(n - 1);
    v[i] = {x, f(x, i)};
  }
  return v;
}

}  // namespace

TEST_CASE("every original point and segment stays within the tolerance of the drawn line", "[simplify]") {
  std::mt19937_64 rng(7);
  std::normal_distribution<double> noise(0, 2.0);
  double walk = 0;
  std::vector<std::pair<const char*, std::vector<Point>>> cases = {
      {"dense noisy wave", series(6000, 40, 560, [&](double x, std::size_t) { return 300 + 80 * std::sin(x / 30) + noise(rng); })},
      {"dense random walk", series(6000, 40, 560, [&](double, std::size_t) { return 300 + (walk += noise(rng) * 0.1); })},
      {"sparse smooth curve", series(3000, 40, 560, [](double x, std::size_t) { return 300 + 120 * std::sin(x / 45); })},
      {"steps with repeated points", series(6000, 40, 560, [](double, std::size_t i) { return 200.0 + 10.0 * static_cast<double>(i / 500); })},
  };
  // A path that doubles back in x: a spiral, drawn in page points.
  std::vector<Point> spiral;
  for (int i = 0; i < 4000; ++i) {
    const double t = i * 0.02;
    spiral.push_back({300 + 3 * t * std::cos(t), 300 + 3 * t * std::sin(t)});
  }
  cases.emplace_back("spiral", spiral);
  // Exact duplicates and collinear runs in one series.
  std::vector<Point> mixed;
  for (int i = 0; i < 3000; ++i) {
    mixed.push_back({100 + i * 0.02, 100 + i * 0.02});
    if (i % 7 == 0) mixed.push_back(mixed.back());
    if (i % 500 == 0) mixed.push_back({100 + i * 0.02, 150});
  }
  cases.emplace_back("duplicates and collinear runs", mixed);

  for (const auto& [name, pts] : cases) {
    INFO(name);
    const auto drawn = simplify_polyline(pts, kTol);
    CHECK(drawn.size() < pts.size());
    CHECK(worst_distance(pts, drawn) < kTol);
    CHECK(segments_astray(pts, drawn) == 0);
    CHECK(is_subsequence(pts, drawn));
    check_extremes_kept(pts, drawn);
  }
}

TEST_CASE("a dense band is drawn with about one point per tolerance of width", "[simplify]") {
  // A long sensor record squeezed into a panel, shaped like the one in
  // forme-bench series: a mean-reverting random walk, about 1,400 readings
  // per point of width, each step about 2.7 pt tall.
  std::mt19937_64 rng(11);
  std::normal_distribution<double> step(0, 2.7);
  double v = 0;
  const double x0 = 100, x1 = 245;
  const auto pts = series(200'000, x0, x1, [&](double, std::size_t) { return 300 + (v += step(rng) - 0.002 * v); });
  const auto drawn = simplify_polyline(pts, kTol);
  const double per_tolerance = static_cast<double>(drawn.size()) / ((x1 - x0) / kTol);
  INFO("kept " << drawn.size() << ", " << per_tolerance << " per tolerance of width");
  // A regression bound, not an outside value: the zigzag kept 0.99 points
  // per tolerance of width on the benchmark's band, the run-extremes pass
  // it replaced 2.4. By an estimate of our own, no line can do with much
  // fewer than one: the band's top and its bottom each need a visit about
  // every two tolerances.
  CHECK(per_tolerance < 1.2);
  CHECK(worst_distance(pts, drawn) < kTol);
  CHECK(segments_astray(pts, drawn) == 0);
  CHECK(is_subsequence(pts, drawn));
  check_extremes_kept(pts, drawn);
}

TEST_CASE("a straight line keeps only its ends, and a single repeated point keeps two copies", "[simplify]") {
  const auto line = series(1000, 10, 500, [](double x, std::size_t) { return 0.5 * x + 3; });
  const auto drawn = simplify_polyline(line, kTol);
  REQUIRE(drawn.size() == 2);
  CHECK(drawn.front().x == line.front().x);
  CHECK(drawn.back().x == line.back().x);

  const std::vector<Point> same(1000, Point{42, 17});
  const auto one = simplify_polyline(same, kTol);
  REQUIRE(one.size() == 2);
  CHECK(one[0].x == 42);
  CHECK(one[1].y == 17);
}

TEST_CASE("turns larger than the tolerance all stay", "[simplify]") {
  // A zig-zag 1 pt high with 1 pt steps: every corner is 20 tolerances off
  // the line through its neighbours.
  const auto zig = series(500, 0, 499, [](double, std::size_t i) { return i % 2 ? 1.0 : 0.0; });
  CHECK(simplify_polyline(zig, kTol).size() == zig.size());
}

TEST_CASE("no tolerance or too few points: the input comes back unchanged", "[simplify]") {
  const std::vector<Point> pts = {{0, 0}, {1, 0.001}, {2, 0}};
  CHECK(simplify_polyline(pts, 0).size() == 3);
  CHECK(simplify_polyline(pts, -1).size() == 3);
  CHECK(simplify_polyline(std::span<const Point>(pts.data(), 2), kTol).size() == 2);
  CHECK(simplify_polyline(std::span<const Point>(), kTol).empty());
}

TEST_CASE("a million-point noisy series shrinks to far fewer points within the tolerance", "[simplify][large]") {
  std::mt19937_64 rng(1000000);
  std::normal_distribution<double> noise(0, 3.0);
  const auto pts = series(1'000'000, 50, 750, [&](double x, std::size_t) { return 300 + 100 * std::sin(x / 60) + noise(rng); });
  const auto drawn = simplify_polyline(pts, kTol);
  INFO("kept " << drawn.size());
  CHECK(drawn.size() < pts.size() / 5);
  CHECK(is_subsequence(pts, drawn));
  check_extremes_kept(pts, drawn);

  CHECK(worst_distance(pts, drawn) < kTol);
  CHECK(segments_astray(pts, drawn) == 0);
}
