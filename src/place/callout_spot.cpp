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
  // Marks in a grid of cells about a note's height, so each candidate asks
  // about its own neighbourhood only.
  const double reach = search.gap + search.rings * search.step + w + h;
  const Rect region{target.x - reach, target.y - reach, 2 * reach, 2 * reach};
  GridIndex index(region, std::max(h, 4.0), std::max(h, 4.0), 1u << 16);
  index.reserve(marks.size());
  for (std::size_t i = 0; i < marks.size(); ++i)
    if (marks[i].overlaps(region)) index.insert(static_cast<int>(i), marks[i]);
  // Marks the leader passes within `tol` of, away from the target itself
  // (the dot, bar or line the note points at).
  const double tol = 0.75;
  auto leader_marks = [&](Point a, Point b) {
    const Rect span = Rect{std::min(a.x, b.x), std::min(a.y, b.y), std::abs(b.x - a.x), std::abs(b.y - a.y)}.inflate(tol);
    int n = 0;
    index.query(span, [&](int, const Rect& m) {
      if (m.contains(a) || std::hypot(m.cx() - a.x, m.cy() - a.y) < search.gap) return;
      if (m.w > 0 && m.h > 0) {
        n += segment_enters(a, b, m.inflate(tol)) ? 1 : 0;
      } else {
        n += distance_to_segment({m.x, m.y}, a, b) < tol ? 1 : 0;
      }
    });
    return n;
  };
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
      CalloutSpot spot{box, {target, end}, index.count_overlaps(box), 0, 0};
      if (search.max_marks >= 0 && spot.marks > search.max_marks) continue;
      spot.leader_marks = leader_marks(target, end);
      for (const Leader& l : leaders)
        spot.crossings += segments_cross(target, end, l.from, l.to) || segment_enters(l.from, l.to, box) ? 1 : 0;
      const double cost = d + 1000.0 * spot.marks + 100.0 * spot.leader_marks + 10000.0 * spot.crossings;
      if (!best || cost < best_cost) best = spot, best_cost = cost;
    }
  }
  return best;
}

double distance_to_segment(Point p, Point a, Point b) {
  const double dx = b.x - a.x, dy = b.y - a.y, len2 = dx * dx + dy * dy;
  const double t = len2 > 0 ? std::clamp(((p.x - a.x) * dx + (p.y - a.y) * dy) / len2, 0.0, 1.0) : 0.0;
  return std::hypot(p.x - (a.x + t * dx), p.y - (a.y + t * dy));
}

}  // namespace forme
