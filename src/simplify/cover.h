#pragma once
/// The check that makes simplify_polyline's promise hold by construction:
/// every original point, and every point of every original segment, lies
/// within r of the line drawn through the kept points.
///
/// Each original point is measured against the drawn segment it lies
/// under in the sequence (its "home": the segment between the kept points
/// before and after it) and the two drawn segments on either side. A point
/// within r of none of them is kept. An original segment is covered when
/// both its ends are within r of one same drawn segment (distance to a
/// segment is convex along a segment); otherwise the pieces of it within
/// r of each nearby drawn segment (one interval each: capsule.h) must
/// together reach from end to end, or both its ends are kept, which draws
/// it exactly.
///
/// Keeping a point splits a drawn segment, which can uncover points that
/// it covered, so every home whose nearby segments changed is checked
/// again, until a round keeps nothing new. Each round keeps at least one
/// more point, and a line through every point passes every check, so the
/// rounds end. The nearby segments are found by position in the sequence,
/// not by a search of the page: a point that only a far-off stretch of the
/// line passes near is kept although it need not be, never the reverse.
#include <cstddef>
#include <span>
#include <vector>

#include "base/geometry.h"

namespace forme {

/// `kept`: ascending indices into pts, holding the first and the last.
/// Returns `kept` with the indices added that the checks above call for.
std::vector<std::size_t> ensure_cover(std::span<const Point> pts, std::vector<std::size_t> kept, double r);

}  // namespace forme
