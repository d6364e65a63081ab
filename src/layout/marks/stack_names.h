#pragma once
/// Series names beside the right end of a stack (stacked bars and stacked
/// areas): each wants the middle of its last segment, the names are spread
/// apart exactly (place/spread) and tied to their segments by leaders.
#include <vector>

#include "layout/marks/marks.h"

namespace forme {

/// `name_y[k]`: where series k's name wants to sit (page y), NaN for a
/// series with nothing to name. Leaders run from `from_x` to the names at
/// `label_x`; with `leader_always` false, only for a name that moved or
/// sits well away from its segment.
void name_stacked_series(const MarkContext& ctx, DisplayPage& page, const std::vector<double>& name_y, double from_x,
                         double label_x, bool leader_always);

}  // namespace forme
