#pragma once
/// Fewer points, same drawing: thins a long polyline in page coordinates so
/// that every original point stays within a stated distance of the line
/// that is drawn.
///
/// Two passes, both linear or near-linear, neither recursive:
///
/// 1. Runs. The points are cut, in order, into maximal runs whose x-spread
///    stays below `w = 0.7 × tolerance`. Of each run only the first, the
///    last, and the points of least and greatest x and y are kept, in their
///    original order. The kept points of a run include a connected path
///    from its lowest to its highest point inside the run's bounding box,
///    so every y in between is reached at some x within the run: each
///    dropped point lies within w of the new line. On a dense series (many
///    points per printed line width) this is where the bulk goes.
/// 2. Douglas–Peucker (Douglas & Peucker 1973, "Algorithms for the
///    reduction of the number of points required to represent a digitized
///    line or its caricature", The Canadian Cartographer 10(2)) on what
///    remains, with tolerance `0.25 × tolerance` measured to the segment
///    (not the infinite line), run with an explicit stack. It removes the
///    near-collinear points of a smooth, sparse series. Its worst case is
///    quadratic in the length of the stretch it works on, so stretches are
///    cut at least every 1024 points: at most one extra point per 1024 for
///    an O(n · 1024) bound.
///
/// Every point of pass 1's line lies within 0.25 × tolerance of the final
/// line (distance to a segment is convex, and each dropped stretch is
/// within that distance of the one segment that replaces it), so by the
/// triangle inequality every original point lies within 0.95 × tolerance
/// of the drawn polyline; the remaining 5 % absorbs rounding.
///
/// Always kept: the first and last points and the first point of least
/// and greatest x and of least and greatest y. Duplicate and collinear
/// points are fine; inputs must be finite. The result is a subsequence of
/// the input, in input order.
#include <span>
#include <vector>

#include "base/geometry.h"

namespace forme {

/// Returns the kept points of `pts` (see above). A tolerance that is not
/// positive, or fewer than three points, returns the input unchanged.
/// Typical tolerance for print: 0.05 pt, below a 1200 dpi device dot
/// (0.06 pt) — common practice, not a measured threshold.
std::vector<Point> simplify_polyline(std::span<const Point> pts, double tolerance_pt);

}  // namespace forme
