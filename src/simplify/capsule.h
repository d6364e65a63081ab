#pragma once
/// Distances from points and segments to a segment, the geometry behind
/// the thinning's coverage check. The points within r of a segment form a
/// capsule (a rectangle with a half-disc on each end): convex, so a line
/// meets it in one interval, and the distance to it along any segment is a
/// convex function.
#include "base/geometry.h"

namespace forme {

/// Squared distance from p to the segment ab (to a itself when a == b).
double segment_distance2(Point p, Point a, Point b);

/// A closed interval of segment parameters; empty when lo > hi.
struct Span {
  double lo = 1, hi = 0;
};

/// The parameters u in [0, 1] for which p + u·(q − p) lies within r of the
/// segment ab.
Span span_within(Point p, Point q, Point a, Point b, double r);

}  // namespace forme
