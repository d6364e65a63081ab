#pragma once
// An independent measure of how far a drawn polyline strays from the
// series it stands for, for the simplification tests. Nothing here comes
// from the code under test: distances are computed from scratch, and the
// drawn segments are found through columns `cell` wide — a segment that
// comes closer than `cell` to a point reaches into the point's column or
// one of its two neighbours, and every segment is listed in each column
// its x-extent touches, so every distance below `cell` is exact.
#include <algorithm>
#include <cmath>
#include <cstdint>
#include <limits>
#include <utility>
#include <vector>

#include "base/geometry.h"

namespace forme::test {

/// Distance from p to the segment ab: project onto the line, clamp to the
/// segment's ends.
inline double distance_to_segment(Point p, Point a, Point b) {
  const double vx = b.x - a.x, vy = b.y - a.y, wx = p.x - a.x, wy = p.y - a.y;
  const double len2 = vx * vx + vy * vy;
  if (len2 == 0) return std::hypot(wx, wy);
  const double t = std::max(0.0, std::min(1.0, (wx * vx + wy * vy) / len2));
  return std::hypot(p.x - (a.x + t * vx), p.y - (a.y + t * vy));
}

class Ruler {
 public:
  Ruler(std::vector<Point> drawn, double cell) : drawn_(std::move(drawn)), cell_(cell) {
    x0_ = std::numeric_limits<double>::infinity();
    for (const Point& p : drawn_) x0_ = std::min(x0_, p.x);
    if (drawn_.size() == 1) {
      columns_.resize(3);
      columns_[column(drawn_[0].x)].push_back(0);
    }
    for (std::size_t k = 0; k + 1 < drawn_.size(); ++k) {
      const std::size_t hi = column(std::max(drawn_[k].x, drawn_[k + 1].x));
      if (columns_.size() <= hi + 1) columns_.resize(hi + 2);
      for (std::size_t c = column(std::min(drawn_[k].x, drawn_[k + 1].x)); c <= hi; ++c)
        columns_[c].push_back(static_cast<std::uint32_t>(k));
    }
  }

  /// Distance from p to the drawn line; exact below `cell`, otherwise at
  /// least `cell` (possibly infinity).
  double distance(Point p) const {
    double best = std::numeric_limits<double>::infinity();
    visit(p.x, p.x, [&](std::uint32_t k) { best = std::min(best, to(k, p)); });
    return best;
  }

  /// Whether every point of the segment pq lies within `limit` (< cell) of
  /// the drawn line. Branch and bound: a piece of pq is settled when one
  /// drawn segment lies within `limit` of both its ends (the distance to a
  /// segment is convex along a line), otherwise it is halved; a piece
  /// shorter than 1e-7 pt still unsettled fails.
  bool covers(Point p, Point q, double limit) const {
    std::vector<std::pair<double, double>> pieces = {{0.0, 1.0}};
    while (!pieces.empty()) {
      const auto [u0, u1] = pieces.back();
      pieces.pop_back();
      const Point a{p.x + u0 * (q.x - p.x), p.y + u0 * (q.y - p.y)};
      const Point b{p.x + u1 * (q.x - p.x), p.y + u1 * (q.y - p.y)};
      bool settled = false;
      visit(std::min(a.x, b.x), std::max(a.x, b.x), [&](std::uint32_t k) {
        settled = settled || (to(k, a) < limit && to(k, b) < limit);
      });
      if (settled) continue;
      if (std::hypot(b.x - a.x, b.y - a.y) < 1e-7) return false;
      const double mid = (u0 + u1) / 2;
      pieces.emplace_back(u0, mid);
      pieces.emplace_back(mid, u1);
    }
    return true;
  }

 private:
  std::size_t column(double x) const { return static_cast<std::size_t>(std::floor((x - x0_) / cell_)) + 1; }

  double to(std::uint32_t k, Point p) const {
    if (drawn_.size() == 1) return std::hypot(p.x - drawn_[0].x, p.y - drawn_[0].y);
    return distance_to_segment(p, drawn_[k], drawn_[k + 1]);
  }

  template <class F>
  void visit(double x_lo, double x_hi, F f) const {
    if (!(x_hi >= x0_ - cell_)) return;
    const std::size_t lo = x_lo < x0_ ? 0 : column(x_lo) - 1, hi = std::min(column(x_hi) + 1, columns_.size() - 1);
    for (std::size_t c = lo; c <= hi && c < columns_.size(); ++c)
      for (std::uint32_t k : columns_[c]) f(k);
  }

  std::vector<Point> drawn_;
  double cell_;
  double x0_;
  std::vector<std::vector<std::uint32_t>> columns_;
};

}  // namespace forme::test
