#pragma once
/// The height a sheet needs for its content: used for figures whose height
/// the page does not state.
#include <vector>

#include "axes/axis.h"
#include "describe/page_spec.h"
#include "layout/page_style.h"
#include "series/panel_data.h"

namespace forme {

/// Height of the sheet (points) at which every plot area is 0.618 times as
/// tall as it is wide (the reciprocal of the golden ratio; a common default
/// proportion for a chart), with the heading, footer and labels the page
/// already has. `spec.sheet.height` must be a generous trial height.
double content_height(const PageSpec& spec, const std::vector<PanelData>& panels,
                      const std::vector<PanelAxes>& axes, const PageStyle& style);

}  // namespace forme
