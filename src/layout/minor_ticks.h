#pragma once
/// Minor ticks: short unlabelled marks between the labelled ticks of an
/// axis that has them (`Axis::minor`; log axes at 2…9 × 10ⁿ, or at the
/// decades a thinned axis leaves unlabelled), so a reader can place a
/// value between two labelled powers.
#include "layout/page_style.h"
#include "layout/plot_frame.h"
#include "paint/display_list.h"

namespace forme {

/// Draws the minor ticks of both axes just outside the plot (left of it
/// for y, below it for x), shorter than the major ticks and clear of the
/// tick labels, which start farther out.
void draw_minor_ticks(const PlotFrame& f, const PageStyle& style, DisplayPage& page);

}  // namespace forme
