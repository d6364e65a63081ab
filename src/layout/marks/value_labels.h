#pragma once
/// Values written on bars. Inside the bar's end when the measured text fits
/// with padding and the bar has no fill pattern, in whichever of the page's inks reads best on the fill
/// (WCAG 2.x contrast ≥ 4.5:1); otherwise just beyond the bar's end, in
/// text ink on paper. Numbers use the value axis's style, to three
/// significant digits unless the axis fixes its decimals (format_value).
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

/// Where the label went, for tests: inside the bar or beyond it.
enum class ValuePlacement { inside, outside };

/// Chooses placement and ink and adds the text. Returns the choice.
ValuePlacement add_value_label(const BarValue& b, const NumberFormat& format, const PageStyle& style,
                               DisplayPage& page);

/// The ink with the higher contrast against `fill`: text ink or paper.
Rgb ink_on(const Rgb& fill, const PageStyle& style);

}  // namespace forme
