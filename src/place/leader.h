#pragma once
/// The leader-line fallback for a point label with no free position near
/// its point: search farther out, and join the box to the point by a line.
///
/// Ring r (1 … rings) lies offset + r·step from the anchor. On ring r, 8·r
/// directions are tried, evenly spaced and running clockwise on the page
/// (y down) from upper right. In direction u, the box touches the point
/// P = anchor + d·u on the side facing the anchor. Its centre is P plus
/// (w/2·u.x, h/2·u.y)/max(|u.x|, |u.y|). A diagonal u therefore puts a box
/// corner on P, and an axis u puts an edge midpoint on P. The leader runs
/// from the anchor to the nearest point of the box.
///
/// A spot is free when the box lies inside the area and overlaps neither an
/// obstacle nor a placed label, and the leader does not cross into either,
/// nor into any mark with an area (a dot, a bar) other than one holding
/// the anchor: a leader that runs through another dot points at it.
/// The first free spot that covers no data mark is returned. If every free
/// spot covers marks, the first with the fewest marks is returned. Leaders
/// may cross other leaders; callers that care must check this themselves.
#include <optional>

#include "base/geometry.h"
#include "place/point_labels.h"
#include "place/spatial_index.h"

namespace forme {

struct LeaderSearch {
  double offset = 2;  ///< the distance of ring 0, the ordinary candidates
  double step = 10;   ///< distance between rings, > 0
  int rings = 6;      ///< rings to try
};

struct LeaderSpot {
  Rect box;
  Leader leader;
  int marks = 0;  ///< data marks under the box
};

/// Searches the rings for a free spot for a w × h box labelling `anchor`.
std::optional<LeaderSpot> find_leader_spot(Point anchor, double w, double h, const Rect& area,
                                           const GridIndex& obstacles, const GridIndex& labels,
                                           const GridIndex& marks, const LeaderSearch& search);

/// True when the segment a–b passes through the interior of `r`; touching
/// an edge or a corner does not count.
bool segment_enters(Point a, Point b, const Rect& r);

}  // namespace forme
