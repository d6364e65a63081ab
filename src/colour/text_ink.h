#pragma once
/// Ink for text set in a series colour: the same hue, darkened in OKLCH
/// lightness until it meets a WCAG contrast ratio against the paper.
#include "colour/rgb.h"

namespace forme {

/// `colour` itself when it already reaches `ratio` against `background`;
/// otherwise the lightest darker shade (same OKLCH hue and chroma, lower L)
/// that does. WCAG 2.x SC 1.4.3 asks 4.5:1 for normal text.
Rgb text_ink(const Rgb& colour, const Rgb& background, double ratio = 4.5);

}  // namespace forme
