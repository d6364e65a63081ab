#pragma once
/// A page repainted for black-and-white printing: every colour becomes the
/// grey of the same CIE luminance (so the same CIELAB L* and the same WCAG
/// relative luminance), as a printer that keeps lightness would print it.
/// Text contrast is unchanged; colours that differ only in hue merge.
#include "paint/display_list.h"

namespace forme {

DisplayPage in_greyscale(DisplayPage page);

}  // namespace forme
