#include "place/leader.h"

#include <algorithm>
#include <cmath>
#include <numbers>

namespace forme {
namespace {

Point nearest_point(const Rect& r, Point p) {
  return {std::clamp(p.x, r.x, r.right()), std::clamp(p.y, r.y, r.bottom())};
}

bool segment_blocked(Point a, Point b, const GridIndex& index) {
  // A thin box around the segment, so vertical and horizontal leaders still
  // have an interior to query with.
  constexpr double kPad = 1e-6;
  const Rect span{std::min(a.x, b.x) - kPad, std::min(a.y, b.y) - kPad,
                  std::abs(b.x - a.x) + 2 * kPad, std::abs(b.y - a.y) + 2 * kPad};
  bool blocked = false;
  index.query(span, [&](int, const Rect& r) { blocked = blocked || segment_enters(a, b, r); });
  return blocked;
}

// A leader may leave its own point's dot, but no other mark's box.
bool crosses_other_marks(Point anchor, Point end, const GridIndex& marks) {
  constexpr double kPad = 1e-6;
  const Rect span{std::min(anchor.x, end.x) - kPad, std::min(anchor.y, end.y) - kPad,
                  std::abs(end.x - anchor.x) + 2 * kPad, std::abs(end.y - anchor.y) + 2 * kPad};
  bool crosses = false;
  marks.query(span, [&](int, const Rect& r) {
    crosses = crosses || (r.w > 0 && r.h > 0 && !r.contains(anchor) && segment_enters(anchor, end, r));
  });
  return crosses;
}

}  // namespace

bool segment_enters(Point a, Point b, const Rect& r) {
  // Liang–Barsky clipping against the open rectangle.
  const double dx = b.x - a.x, dy = b.y - a.y;
  const double p[4] = {-dx, dx, -dy, dy};
  const double q[4] = {a.x - r.x, r.right() - a.x, a.y - r.y, r.bottom() - a.y};
  double t0 = 0, t1 = 1;
  for (int k = 0; k < 4; ++k) {
    if (p[k] == 0) {
      if (q[k] <= 0) return false;  // parallel to this edge and not strictly inside it
    } else if (const double t = q[k] / p[k]; p[k] < 0) {
      t0 = std::max(t0, t);
    } else {
      t1 = std::min(t1, t);
    }
  }
  return t0 < t1;
}

std::optional<LeaderSpot> find_leader_spot(Point anchor, double w, double h, const Rect& area,
                                           const GridIndex& obstacles, const GridIndex& labels,
                                           const GridIndex& marks, const LeaderSearch& search) {
  std::optional<LeaderSpot> best;
  for (int ring = 1; ring <= search.rings; ++ring) {
    const double d = search.offset + ring * search.step;
    const int directions = 8 * ring;
    for (int k = 0; k < directions; ++k) {
      const double angle = -std::numbers::pi / 4 + 2 * std::numbers::pi * k / directions;
      const double ux = std::cos(angle), uy = std::sin(angle);
      const double m = std::max(std::abs(ux), std::abs(uy));
      const double cx = anchor.x + d * ux + w / 2 * ux / m;
      const double cy = anchor.y + d * uy + h / 2 * uy / m;
      const Rect box{cx - w / 2, cy - h / 2, w, h};
      if (!within(box, area) || obstacles.any_overlap(box) || labels.any_overlap(box)) continue;
      const Point end = nearest_point(box, anchor);
      if (segment_blocked(anchor, end, obstacles) || segment_blocked(anchor, end, labels) ||
          crosses_other_marks(anchor, end, marks))
        continue;
      const int covered = marks.count_overlaps(box);
      if (!best || covered < best->marks) best = LeaderSpot{box, {anchor, end}, covered};
      if (covered == 0) return best;
    }
  }
  return best;
}

}  // namespace forme
