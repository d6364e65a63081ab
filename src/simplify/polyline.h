#pragma once
/// Fewer points, same drawing: thins a long polyline in page coordinates so
/// that every original point, and every point of every original segment,
/// stays within a stated distance of the line that is drawn.
///
/// Three passes, none recursive:
///
/// 1. Zigzag (zigzag.h). The points are cut, in order, into maximal runs
///    whose x-spread stays below 2 × tolerance, and each run keeps one
///    point, its lowest or highest, whichever is farther in y from the
///    point kept before. A dense series (many points per printed line
///    width) becomes a zigzag between the bottom and top of its band; this
///    is where the bulk goes. Nothing is promised yet.
/// 2. Douglas–Peucker (peucker.h) on what pass 1 kept, at the tolerance,
///    forced to keep the ends and the first points of least and greatest x
///    and y. It removes the near-collinear points of a smooth, sparse
///    series.
/// 3. Cover (cover.h). Every original point and segment is measured
///    against the drawn segments around it in the sequence; where one
///    falls short a point is kept, and the check repeats wherever that
///    changed the line, until nothing falls short. The promise rests on
///    this pass alone, checked by construction rather than argued from
///    the first two, so they are free to be greedy.
///
/// Every original point and segment then lies within 0.9999 × tolerance
/// of the drawn polyline; the rest absorbs the check's own rounding. By an
/// estimate of our own, no line does much better on a dense band than one
/// point per tolerance of x (the band's top and its bottom each need a
/// visit about every two tolerances); on the series benchmark's band this
/// keeps 0.99 per tolerance, where run extremes and Douglas–Peucker alone
/// kept 2.4.
///
/// Always kept: the first and last points and the first point of least
/// and greatest x and of least and greatest y. Duplicate and collinear
/// points are fine; inputs must be finite. The result is a subsequence of
/// the input, in input order, and the same input always gives the same
/// result.
#include <span>
#include <vector>

#include "base/geometry.h"

namespace forme {

/// Returns the kept points of `pts` (see above). A tolerance that is not
/// positive, fewer than three points, or more than 2^32 − 1 returns the
/// input unchanged. Typical tolerance for print: 0.05 pt, below a 1200 dpi
/// device dot (0.06 pt) — common practice, not a measured threshold.
std::vector<Point> simplify_polyline(std::span<const Point> pts, double tolerance_pt);

}  // namespace forme
