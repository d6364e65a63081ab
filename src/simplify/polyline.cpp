#include "simplify/polyline.h"

#include <algorithm>
#include <array>
#include <cstddef>
#include <utility>

namespace forme {

namespace {

constexpr double kRunShare = 0.7;       // of the tolerance, for pass 1
constexpr double kPeuckerShare = 0.25;  // of the tolerance, for pass 2
constexpr std::size_t kStretch = 1024;  // pass 2 works on at most this many points at once

/// Squared distance from p to the segment ab (to a itself when a == b).
double segment_distance2(Point p, Point a, Point b) {
  const double dx = b.x - a.x, dy = b.y - a.y;
  const double len2 = dx * dx + dy * dy;
  double t = 0;
  if (len2 > 0) t = std::clamp(((p.x - a.x) * dx + (p.y - a.y) * dy) / len2, 0.0, 1.0);
  const double ex = a.x + t * dx - p.x, ey = a.y + t * dy - p.y;
  return ex * ex + ey * ey;
}

/// Pass 1: indices kept from each run of x-spread below w.
std::vector<std::size_t> run_extremes(std::span<const Point> pts, double w) {
  std::vector<std::size_t> keep;
  const std::size_t n = pts.size();
  std::size_t start = 0;
  while (start < n) {
    std::size_t ix_min = start, ix_max = start, iy_min = start, iy_max = start;
    std::size_t i = start + 1;
    for (; i < n; ++i) {
      const Point p = pts[i];
      const double lo = std::min(pts[ix_min].x, p.x), hi = std::max(pts[ix_max].x, p.x);
      if (hi - lo >= w) break;
      // Strict comparisons: the first of equal extremes is the one kept.
      if (p.x < pts[ix_min].x) ix_min = i;
      if (p.x > pts[ix_max].x) ix_max = i;
      if (p.y < pts[iy_min].y) iy_min = i;
      if (p.y > pts[iy_max].y) iy_max = i;
    }
    std::array<std::size_t, 6> run = {start, ix_min, ix_max, iy_min, iy_max, i - 1};
    std::sort(run.begin(), run.end());
    for (std::size_t k = 0; k < run.size(); ++k)
      if (k == 0 || run[k] != run[k - 1]) keep.push_back(run[k]);
    start = i;
  }
  return keep;
}

/// The first index of least and greatest x and y over the whole series.
std::array<std::size_t, 4> global_extremes(std::span<const Point> pts) {
  std::array<std::size_t, 4> e = {0, 0, 0, 0};
  for (std::size_t i = 1; i < pts.size(); ++i) {
    if (pts[i].x < pts[e[0]].x) e[0] = i;
    if (pts[i].x > pts[e[1]].x) e[1] = i;
    if (pts[i].y < pts[e[2]].y) e[2] = i;
    if (pts[i].y > pts[e[3]].y) e[3] = i;
  }
  return e;
}

}  // namespace

std::vector<Point> simplify_polyline(std::span<const Point> pts, double tolerance_pt) {
  if (!(tolerance_pt > 0) || pts.size() < 3) return {pts.begin(), pts.end()};

  const std::vector<std::size_t> idx = run_extremes(pts, kRunShare * tolerance_pt);
  const std::size_t m = idx.size();

  // Positions in idx that pass 2 must keep: ends, global extremes (pass 1
  // keeps them; see run_extremes), and a cut every kStretch positions.
  std::vector<char> kept(m, 0);
  kept.front() = kept.back() = 1;
  for (std::size_t k = 0; k < m; k += kStretch) kept[k] = 1;
  for (std::size_t e : global_extremes(pts)) {
    auto at = std::lower_bound(idx.begin(), idx.end(), e);
    if (at != idx.end() && *at == e) kept[static_cast<std::size_t>(at - idx.begin())] = 1;
  }

  // Pass 2: Douglas–Peucker on each stretch between forced positions.
  const double limit2 = (kPeuckerShare * tolerance_pt) * (kPeuckerShare * tolerance_pt);
  std::vector<std::pair<std::size_t, std::size_t>> stack;
  std::size_t a = 0;
  for (std::size_t b = 1; b < m; ++b) {
    if (!kept[b]) continue;
    stack.emplace_back(a, b);
    while (!stack.empty()) {
      auto [lo, hi] = stack.back();
      stack.pop_back();
      double worst = -1;
      std::size_t at = lo;
      for (std::size_t k = lo + 1; k < hi; ++k) {
        const double d2 = segment_distance2(pts[idx[k]], pts[idx[lo]], pts[idx[hi]]);
        if (d2 > worst) worst = d2, at = k;
      }
      if (worst > limit2) {
        kept[at] = 1;
        stack.emplace_back(lo, at);
        stack.emplace_back(at, hi);
      }
    }
    a = b;
  }

  std::vector<Point> out;
  for (std::size_t k = 0; k < m; ++k)
    if (kept[k]) out.push_back(pts[idx[k]]);
  return out;
}

}  // namespace forme
