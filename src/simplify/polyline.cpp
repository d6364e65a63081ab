#include "simplify/polyline.h"

#include <algorithm>
#include <array>
#include <cstddef>
#include <cstdint>
#include <limits>

#include "simplify/cover.h"
#include "simplify/peucker.h"
#include "simplify/zigzag.h"

namespace forme {

namespace {

constexpr double kRunShare = 2.0;  // of the tolerance: the width of pass 1's runs
// The check measures to 99.99 % of the tolerance: the rest absorbs the
// rounding of its own arithmetic, far below a millionth of a point.
constexpr double kCheckShare = 0.9999;

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
  // The check names points with 32-bit indices.
  if (!(tolerance_pt > 0) || pts.size() < 3 || pts.size() > std::numeric_limits<std::uint32_t>::max())
    return {pts.begin(), pts.end()};

  std::vector<std::size_t> idx = zigzag_picks(pts, kRunShare * tolerance_pt);
  const std::array<std::size_t, 4> extremes = global_extremes(pts);
  for (std::size_t e : extremes) {
    auto at = std::lower_bound(idx.begin(), idx.end(), e);
    if (at == idx.end() || *at != e) idx.insert(at, e);
  }
  std::vector<char> forced(idx.size(), 0);
  for (std::size_t e : extremes) forced[static_cast<std::size_t>(std::lower_bound(idx.begin(), idx.end(), e) - idx.begin())] = 1;

  const double r = kCheckShare * tolerance_pt;
  std::vector<std::size_t> kept = peucker(pts, idx, std::move(forced), r);
  kept = ensure_cover(pts, std::move(kept), r);

  std::vector<Point> out;
  out.reserve(kept.size());
  for (std::size_t k : kept) out.push_back(pts[k]);
  return out;
}

}  // namespace forme
