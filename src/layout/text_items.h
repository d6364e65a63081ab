#pragma once
/// Small helpers that turn shaped text into display items at a position.
#include "paint/display_list.h"

namespace forme {

enum class Align { left, centre, right };

/// A text item whose baseline starts at x (after alignment) and y.
inline TextItem text_at(ShapedText t, double x, double baseline, Align a, Rgb colour, TextRole role) {
  double ox = a == Align::left ? x : a == Align::centre ? x - t.width / 2 : x - t.width;
  return TextItem{std::move(t), {ox, baseline}, colour, role, {}};
}

/// A text item vertically centred on `cy` (centred on the capital height,
/// which is what the eye reads as the middle of a label).
inline TextItem text_mid(ShapedText t, double x, double cy, Align a, Rgb colour, TextRole role) {
  double baseline = cy + t.cap_height / 2;
  return text_at(std::move(t), x, baseline, a, colour, role);
}

}  // namespace forme
