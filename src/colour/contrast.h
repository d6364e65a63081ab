#pragma once
/// WCAG 2.x relative luminance and contrast ratio.
///
/// Relative luminance L = 0.2126 R + 0.7152 G + 0.0722 B over sRGB-decoded
/// components (WCAG 2.2 uses the 0.04045 threshold; older texts' 0.03928
/// gives the same result for every 8-bit code). Contrast ratio
/// (L1 + 0.05) / (L2 + 0.05), lighter over darker, from 1 to 21.
#include "colour/rgb.h"

namespace forme {

/// Thresholds of WCAG 2.x success criteria.
namespace wcag {
inline constexpr double text_aa = 4.5;        ///< SC 1.4.3, body text
inline constexpr double large_text_aa = 3.0;  ///< SC 1.4.3, ≥ 18 pt or ≥ 14 pt bold
inline constexpr double text_aaa = 7.0;       ///< SC 1.4.6, body text
inline constexpr double large_text_aaa = 4.5; ///< SC 1.4.6, large text
inline constexpr double graphics = 3.0;       ///< SC 1.4.11, graphical objects
}  // namespace wcag

double relative_luminance(const Rgb& c);

/// Contrast ratio of two colours, in either order.
double contrast_ratio(const Rgb& first, const Rgb& second);

/// True when `ratio` reaches `threshold`. No rounding: WCAG states that
/// 2.999:1 does not meet 3:1, and likewise 4.499:1 does not meet 4.5:1.
bool meets(double ratio, double threshold);

}  // namespace forme
