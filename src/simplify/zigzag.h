#pragma once
/// The first, coarse pass of simplify_polyline: one point per narrow run.
///
/// The points are cut, in order, into maximal runs whose x-spread stays
/// below w. Of each run one point is kept: its point of least or of
/// greatest y, whichever lies farther in y from the point kept before it.
/// Where a series is dense (many points per w of x, each run spanning a
/// tall band) the kept points alternate between the bottom and the top of
/// the band, and the drawn line becomes a zigzag of near-vertical strokes.
/// Where a run is one point, that point is kept. Nothing here is promised:
/// ensure_cover (cover.h) checks the result and keeps more points wherever
/// it falls short, so w can be bolder than any bound would allow.
#include <cstddef>
#include <span>
#include <vector>

#include "base/geometry.h"

namespace forme {

/// Indices of the points kept, ascending; always the first and the last.
std::vector<std::size_t> zigzag_picks(std::span<const Point> pts, double w);

}  // namespace forme
