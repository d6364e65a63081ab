#include "simplify/polyline.h"

#include <algorithm>
#include <array>
#include <cstddef>
#include <utility>

#include "simplify/peucker.h"

namespace forme {

namespace {

constexpr double kRunShare = 0.7;       // of the tolerance, for pass 1
constexpr double kPeuckerShare = 0.25;  // of the tolerance, for pass 2

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

  // Positions in idx that pass 2 must keep: the global extremes (pass 1
  // keeps them; see run_extremes).
  std::vector<char> forced(m, 0);
  for (std::size_t e : global_extremes(pts)) {
    auto at = std::lower_bound(idx.begin(), idx.end(), e);
    if (at != idx.end() && *at == e) forced[static_cast<std::size_t>(at - idx.begin())] = 1;
  }
  const std::vector<std::size_t> kept = peucker(pts, idx, std::move(forced), kPeuckerShare * tolerance_pt);

  std::vector<Point> out;
  out.reserve(kept.size());
  for (std::size_t k : kept) out.push_back(pts[k]);
  return out;
}

}  // namespace forme
