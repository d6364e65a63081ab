#include "simplify/zigzag.h"

#include <algorithm>
#include <cmath>

namespace forme {

std::vector<std::size_t> zigzag_picks(std::span<const Point> pts, double w) {
  const std::size_t n = pts.size();
  std::vector<std::size_t> keep;
  if (n == 0) return keep;
  keep.push_back(0);
  double last_y = pts[0].y;
  std::size_t start = 0;
  while (start < n) {
    std::size_t lo = start, hi = start;
    double x_min = pts[start].x, x_max = x_min;
    std::size_t i = start + 1;
    for (; i < n; ++i) {
      const Point p = pts[i];
      x_min = std::min(x_min, p.x);
      x_max = std::max(x_max, p.x);
      if (x_max - x_min >= w) break;
      // Strict comparisons: the first of equal extremes is the one kept.
      if (p.y < pts[lo].y) lo = i;
      if (p.y > pts[hi].y) hi = i;
    }
    const std::size_t pick = std::abs(pts[hi].y - last_y) >= std::abs(pts[lo].y - last_y) ? hi : lo;
    if (pick != keep.back()) keep.push_back(pick);
    last_y = pts[pick].y;
    start = i;
  }
  if (keep.back() != n - 1) keep.push_back(n - 1);
  return keep;
}

}  // namespace forme
