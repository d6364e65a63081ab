#pragma once
/// Values written at chosen points of each line: its last, highest or
/// lowest point, or both extremes. Each chosen point gets a dot in its
/// series' colour, and its value, in the value axis's number format, goes
/// to the page's label placer like a point name: set clear of all other
/// text, joined by a leader when it has to stand off, and reported when
/// there is no room at all.
#include <vector>

#include "layout/marks/marks.h"
#include "layout/movable_text.h"

namespace forme {

/// Which points of `y` the rule picks, in index order: the first of equal
/// extremes, and one point when the highest and lowest coincide.
std::vector<std::size_t> line_value_points(const std::vector<double>& y, PanelSpec::LineValues rule);

/// True when the value at `s`'s last point is written right after its
/// line-end name instead of beside the point: the panel labels last values
/// and names its series at their ends, so a reader finds name and value
/// together, and no second label crowds the line's end.
bool value_joins_name(const MarkContext& ctx, const Series& s);

/// The one number format for every value panel `p` labels, on value axis `y`.
NumberFormat line_value_format(const PanelData& p, const Axis& y);
inline NumberFormat line_value_format(const MarkContext& ctx) { return line_value_format(ctx.data, ctx.frame.y); }

/// Draws the dots and returns the labels to place (none for values that
/// join their series' names).
std::vector<PointNameRequest> line_value_labels(const MarkContext& ctx, DisplayPage& page);

}  // namespace forme
