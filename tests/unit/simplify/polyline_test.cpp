// Polyline thinning. Every check measures the drawn result independently:
// the distance from each original point to the nearest segment of the
// returned polyline is computed here by brute force (or, for a million
// points, through a grid that visits every segment that can come within
// the tolerance), never taken from the simplifier's own bookkeeping.
// The test series are invented, from fixed seeds.
#include "simplify/polyline.h"

#include <algorithm>
#include <catch2/catch.hpp>
#include <cmath>
#include <cstdint>
#include <limits>
#include <random>
#include <vector>

using forme::Point;
using forme::simplify_polyline;

namespace {

/// Distance from p to the segment ab: project onto the line, clamp to the
/// segment's ends.
double distance_to_segment(Point p, Point a, Point b) {
  const double vx = b.x - a.x, vy = b.y - a.y, wx = p.x - a.x, wy = p.y - a.y;
  const double len2 = vx * vx + vy * vy;
  if (len2 == 0) return std::hypot(wx, wy);
  const double t = std::max(0.0, std::min(1.0, (wx * vx + wy * vy) / len2));
  return std::hypot(p.x - (a.x + t * vx), p.y - (a.y + t * vy));
}

/// Largest distance from any original point to the drawn polyline, all pairs.
double worst_distance(const std::vector<Point>& original, const std::vector<Point>& drawn) {
  REQUIRE(!drawn.empty());
  double worst = 0;
  for (const Point& p : original) {
    double best = drawn.size() == 1 ? std::hypot(p.x - drawn[0].x, p.y - drawn[0].y) : std::numeric_limits<double>::infinity();
    for (std::size_t k = 0; k + 1 < drawn.size(); ++k) best = std::min(best, distance_to_segment(p, drawn[k], drawn[k + 1]));
    worst = std::max(worst, best);
  }
  return worst;
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

constexpr double kTol = 0.05;  // pt; the suggested print tolerance

}  // namespace

TEST_CASE("every original point stays within the tolerance of the drawn line", "[simplify]") {
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
    CHECK(is_subsequence(pts, drawn));
    check_extremes_kept(pts, drawn);
  }
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

  // Exact worst distance through columns kTol wide: a segment that comes
  // closer than kTol to a point reaches into the point's column or one of
  // its two neighbours, and every segment is listed in each column its
  // x-extent touches.
  const double x0 = std::min_element(pts.begin(), pts.end(), [](Point a, Point b) { return a.x < b.x; })->x;
  auto column = [&](double x) { return static_cast<std::size_t>(std::floor((x - x0) / kTol)) + 1; };
  std::vector<std::vector<std::uint32_t>> columns;
  for (std::size_t k = 0; k + 1 < drawn.size(); ++k) {
    const Point a = drawn[k], b = drawn[k + 1];
    const std::size_t hi = column(std::max(a.x, b.x));
    if (columns.size() <= hi + 1) columns.resize(hi + 2);
    for (std::size_t c = column(std::min(a.x, b.x)); c <= hi; ++c) columns[c].push_back(static_cast<std::uint32_t>(k));
  }
  double worst = 0;
  for (const Point& p : pts) {
    double best = std::numeric_limits<double>::infinity();
    const std::size_t c = column(p.x);
    for (std::size_t cc = c - 1; cc <= c + 1 && cc < columns.size(); ++cc)
      for (auto k : columns[cc]) best = std::min(best, distance_to_segment(p, drawn[k], drawn[k + 1]));
    worst = std::max(worst, best);
  }
  CHECK(worst < kTol);
}
