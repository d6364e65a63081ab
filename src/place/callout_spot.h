#pragma once
/// Where a callout's note goes: a free spot near its target, joined to it
/// by a straight leader line.
///
/// Candidates lie on rings around the target, ring r at distance
/// gap + r·step, with 16 directions each starting upper right and running
/// clockwise (y down). As for point labels (leader.h), the box touches the
/// ring point on the side facing the target. A candidate is allowed when
/// the box lies inside the area, overlaps no obstacle (other text), covers
/// at most `max_marks` data marks (when set) and its leader enters no
/// obstacle. Among allowed candidates the cheapest wins:
///   cost = distance + 1000 · marks covered + 100 · marks the leader passes
///          + 10000 · leaders crossed,
/// where a leader passes a mark when it comes within 0.75 pt of it (a
/// point along a line, a reference line's too) or runs through it (a dot,
/// a bar), away from the target itself, and a leader counts as crossed
/// when the new leader crosses it or it runs through the new box,
/// so a leader bends away from lines it does not point to, a note goes
/// farther out before it covers data, and covers data before its leader
/// crosses another leader. Ties keep the earlier
/// candidate, so the search is deterministic.
#include <optional>
#include <span>

#include "base/geometry.h"
#include "place/point_labels.h"

namespace forme {

struct CalloutSearch {
  Rect area;          ///< the note stays inside
  double gap = 4;     ///< distance of ring 0 from the target
  double step = 8;    ///< distance between rings, > 0
  int rings = 10;     ///< rings tried
  int max_marks = -1; ///< spots covering more marks are not allowed; < 0: any
};

struct CalloutSpot {
  Rect box;
  Leader leader;
  int marks = 0;      ///< data marks under the box
  int crossings = 0;  ///< other leaders crossed by the leader or running through the box
  int leader_marks = 0;  ///< marks the leader passes, other than its target
};

/// The cheapest free spot for a w × h note pointing at `target`, if any.
std::optional<CalloutSpot> find_callout_spot(Point target, double w, double h, const CalloutSearch& search,
                                             std::span<const Rect> obstacles, std::span<const Rect> marks,
                                             std::span<const Leader> leaders);

/// True when segments a–b and c–d cross at a point inside both (sharing an
/// end point does not count).
bool segments_cross(Point a, Point b, Point c, Point d);

/// The distance from `p` to the segment a–b.
double distance_to_segment(Point p, Point a, Point b);

/// The point of `r` nearest to `p`.
Point nearest_point_of(const Rect& r, Point p);

}  // namespace forme
