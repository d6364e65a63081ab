#pragma once
/// The shape of line panels chosen from their data: banking to 45°
/// (Cleveland, McGill & McGill 1988, median absolute slope; Cleveland 1993,
/// average absolute orientation). All panels of a grid share one inner box,
/// so one aspect ratio is found over the segments of every panel.
#include <optional>
#include <vector>

#include "axes/axis.h"
#include "series/panel_data.h"

namespace forme {

/// h/w of the plot area on the panels' axes, or nullopt when the rule is
/// `fill` or no ratio meets it.
std::optional<double> banked_aspect(const std::vector<PanelData>& panels, const std::vector<PanelAxes>& axes,
                                    AspectRule rule);

}  // namespace forme
