#pragma once
/// Colour difference: CIEDE2000 (CIE 142-2001), with the parametric factors
/// kL = kC = kH = 1, implemented after G. Sharma, W. Wu, E. N. Dalal, "The
/// CIEDE2000 color-difference formula: Implementation notes, supplementary
/// test data, and mathematical observations", Color Res. Appl. 30(1), 2005.
///
/// Roughly: ΔE00 ≈ 1 is a just-noticeable difference between patches side
/// by side; thin lines and small marks need much larger differences to be
/// told apart (forme's palettes aim for 10 or more, see palette.h).
#include "colour/convert.h"

namespace forme {

/// ΔE00 between two CIELAB colours (same white). Symmetric in its arguments.
double ciede2000(const Lab& first, const Lab& second);

/// ΔE00 between two sRGB colours, through `to_lab` (D65).
double delta_e(const Rgb& first, const Rgb& second);

}  // namespace forme
