#include "simplify/peucker.h"

#include <utility>

#include "simplify/capsule.h"

namespace forme {

namespace {

constexpr std::size_t kStretch = 1024;  // positions worked on at once

}  // namespace

std::vector<std::size_t> peucker(std::span<const Point> pts, std::span<const std::size_t> idx,
                                 std::vector<char> forced, double limit) {
  const std::size_t m = idx.size();
  std::vector<char>& kept = forced;
  if (m == 0) return {};
  kept.front() = kept.back() = 1;
  for (std::size_t k = 0; k < m; k += kStretch) kept[k] = 1;

  const double limit2 = limit * limit;
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

  std::vector<std::size_t> out;
  for (std::size_t k = 0; k < m; ++k)
    if (kept[k]) out.push_back(idx[k]);
  return out;
}

}  // namespace forme
