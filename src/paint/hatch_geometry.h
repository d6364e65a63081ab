#pragma once
/// Where a fill pattern's lines and dots go, for every painter: parallel
/// lines at an angle, or a staggered field of dots, covering a box and
/// anchored to the page origin so neighbouring shapes' patterns line up.
/// Painters clip them to the shape.
#include <utility>
#include <vector>

#include "base/geometry.h"
#include "paint/display_list.h"

namespace forme {

/// Line segments covering the box (x0, y0)-(x1, y1): lines at `angle`
/// degrees (counter-clockwise on the page), `spacing` points apart, each
/// long enough to cross the whole box.
std::vector<std::pair<Point, Point>> hatch_segments(double x0, double y0, double x1, double y1, double angle,
                                                    double spacing);

/// Dot centres covering the box, `spacing` apart; alternate rows shift by
/// half a step.
std::vector<Point> hatch_dots(double x0, double y0, double x1, double y1, double spacing);

/// Every segment of the pattern `h` over the box (both directions when crossed).
std::vector<std::pair<Point, Point>> hatch_segments(double x0, double y0, double x1, double y1, const Hatch& h);

}  // namespace forme
