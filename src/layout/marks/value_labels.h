#pragma once
/// Values written on bars. Inside the bar's end when the measured text fits
/// with padding and the bar has no fill pattern, in whichever of the page's inks reads best on the fill
/// (WCAG 2.x contrast ≥ 4.5:1); otherwise just beyond the bar's end, in
/// text ink on paper. Numbers use the value axis's style, to three
/// significant digits unless the axis fixes its decimals (format_value).
#include <vector>

#include "layout/marks/marks.h"

namespace forme {

/// One bar's label: `bar` is the bar's rectangle, `grows` the direction the
/// bar grows in (+1 right/up, −1 left/down) along its `horizontal` axis.
struct BarValue {
  Rect bar;
  double value = 0;
  Rgb fill;
  bool horizontal = false;
  int grows = 1;
  bool patterned = false;  ///< a fill pattern runs through the bar: text inside would not read
};

/// Where the label went: inside the bar, beyond it, or nowhere.
enum class ValuePlacement { inside, outside, left_out };

/// The room a panel's values have: the plot (a value beyond its bar stays
/// inside it along the bar, away from the tick labels; `beyond_right` more
/// on the right, where horizontal bars' values may run into the inset) and
/// the distance between neighbouring bars' centres across them.
struct BarValueRoom {
  Rect plot;
  double pitch = 0;
  double beyond_right = 0;
  SourceLoc loc;  ///< the value-labels key, for warnings
};

/// Chooses placement and ink and adds the text. Returns the choice.
ValuePlacement add_value_label(const BarValue& b, const NumberFormat& format, const PageStyle& style,
                               DisplayPage& page);

/// Writes the values of one panel's bars in one format (value_format of
/// them all on the axis's value style `format`), each inside its bar when it fits
/// and reads, else just beyond its end when that spot is inside the plot
/// and clear of every value written before. When the widest value is wider
/// than the distance between neighbouring bars, no value is written and one
/// warning says so; a value with no clear spot is left out with a warning
/// naming it.
std::vector<ValuePlacement> add_value_labels(const std::vector<BarValue>& bars, const NumberFormat& format,
                                             const BarValueRoom& room, const PageStyle& style, DisplayPage& page,
                                             DiagnosticSink* warnings);

/// The ink with the higher contrast against `fill`: text ink or paper.
Rgb ink_on(const Rgb& fill, const PageStyle& style);

}  // namespace forme
