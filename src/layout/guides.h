#pragma once
/// Reading aids drawn over a panel: reference lines (targets, thresholds,
/// averages) and least-squares trend lines on dot panels.
#include "layout/marks/marks.h"
#include "layout/movable_text.h"

namespace forme {

/// Dashed lines at the author's values. Each label is handed to the page
/// pass with its spots, best first: above the line at its right end, then
/// below it, then the same at the left end (for a vertical line: right of
/// it at the top, left of it, then the same at the bottom).
void draw_reference_lines(const MarkContext& ctx, DisplayPage& page, std::vector<SpotChoiceRequest>& labels);

/// One ordinary least-squares line per series of a numeric dot panel, across
/// the series' own x range, optionally labelled with its equation.
/// The equation goes to the page pass with the plot's corners as its spots.
void draw_trend_lines(const MarkContext& ctx, DisplayPage& page, std::vector<SpotChoiceRequest>& labels);

/// "y = 3.00 + 0.500x": the intercept to 3 significant figures, the slope
/// to 3 significant figures, Unicode minus for negatives.
std::string trend_equation(double intercept, double slope);

}  // namespace forme
