#pragma once
/// Douglas–Peucker thinning (Douglas & Peucker 1973, "Algorithms for the
/// reduction of the number of points required to represent a digitized
/// line or its caricature", The Canadian Cartographer 10(2)) of a chosen
/// subsequence of a polyline, with the distance measured to the segment
/// (not the infinite line) and an explicit stack instead of recursion.
///
/// Its worst case is quadratic in the length of the stretch it works on,
/// so stretches are cut at least every 1024 points: at most one extra
/// point per 1024 for an O(n · 1024) bound.
#include <cstddef>
#include <span>
#include <vector>

#include "base/geometry.h"

namespace forme {

/// Of the points pts[idx[k]] (idx ascending), returns the indices kept:
/// every k with forced[k] set, and enough others that each dropped point
/// lies within `limit` of the segment joining the kept points around it.
/// `forced` has one entry per entry of idx.
std::vector<std::size_t> peucker(std::span<const Point> pts, std::span<const std::size_t> idx,
                                 std::vector<char> forced, double limit);

}  // namespace forme
