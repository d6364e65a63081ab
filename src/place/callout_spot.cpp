#include "place/callout_spot.h"

#include <algorithm>
#include <cmath>
#include <numbers>

#include "place/leader.h"
#include "place/spatial_index.h"

namespace forme {

namespace {
// Which side of line a–b the point c lies on: > 0 left, < 0 right, 0 on it.
double side(Point a, Point b, Point c) { return (b.x - a.x) * (c.y - a.y) - (b.y - a.y) * (c.x - a.x); }
}  // namespace

bool segments_cross(Point a, Point b, Point c, Point d) {
  const double d1 = side(a, b, c), d2 = side(a, b, d), d3 = side(c, d, a), d4 = side(c, d, b);
  return ((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0)) && ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0));
}

Point nearest_point_of(const Rect& r, Point p) {
  return {std::clamp(p.x, r.x, r.right()), std::clamp(p.y, r.y, r.bottom())};
}

std::optional<CalloutSpot> find_callout_spot(Point target, double w, double h, const CalloutSearch& search,
                                             std::span<const Rect> obstacles, std::span<const Rect> marks,
                                             std::span<const Leader> leaders) {
  std::optional<CalloutSpot> best;
  double best_cost = 0;
  constexpr int kDirections = 16;
  for (int ring = 1; ring <= search.rings; ++ring) {
    const double d = search.gap + ring * search.step;
    if (best && d >= best_cost) break;  // distance alone already costs more
    for (int k = 0; k < kDirections; ++k) {
      const double angle = -std::numbers::pi / 4 + 2 * std::numbers::pi * k / kDirections;
      const double ux = std::cos(angle), uy = std::sin(angle);
      const double m = std::max(std::abs(ux), std::abs(uy));
      const double cx = target.x + d * ux + w / 2 * ux / m;
      const double cy = target.y + d * uy + h / 2 * uy / m;
      const Rect box{cx - w / 2, cy - h / 2, w, h};
      if (!within(box, search.area)) continue;
      const Point end = nearest_point_of(box, target);
      bool blocked = false;
      for (const Rect& o : obstacles) {
        blocked = box.overlaps(o) || segment_enters(target, end, o);
        if (blocked) break;
      }
      if (blocked) continue;
      CalloutSpot spot{box, {target, end}, 0, 0};
      for (const Rect& mk : marks) spot.marks += mk.overlaps(box) ? 1 : 0;
      for (const Leader& l : leaders)
        spot.crossings += segments_cross(target, end, l.from, l.to) || segment_enters(l.from, l.to, box) ? 1 : 0;
      const double cost = d + 1000.0 * spot.marks + 10000.0 * spot.crossings;
      if (!best || cost < best_cost) best = spot, best_cost = cost;
    }
  }
  return best;
}

}  // namespace forme
