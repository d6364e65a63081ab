#pragma once
/// The page in words: a description of the chart for readers who cannot
/// see it (an SVG's <desc>; ISO 32000-1 §14.9.3 calls the same thing
/// alternate text). Built from the selected data and resolved axes only, so
/// it says what was drawn, not what the author meant.
///
/// Example: "Line chart of Stored (% of capacity) by month. 3 series: 2024,
/// 2025, 2026. 6 panels, one per reservoir, on one shared scale. Panel
/// 'North': 36 rows, Stored from 41 to 97." A category axis is named as
/// categories ("6 branch categories, from Alderbrook to Wyndle Cross"), and
/// panels are said to share a scale only when their resolved domains agree.
#include <span>
#include <string>

#include "axes/axis.h"
#include "describe/page_spec.h"
#include "series/panel_data.h"

namespace forme {

/// Takes spans so one panel can be described without copying its data.
std::string describe_chart(const PageSpec& page, std::span<const PanelData> panels,
                           std::span<const PanelAxes> axes);

}  // namespace forme
