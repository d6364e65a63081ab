#pragma once
/// Colour-space conversions: sRGB ↔ linear RGB ↔ CIE XYZ ↔ CIELAB, and
/// linear RGB ↔ OKLab ↔ OKLCH, with gamut mapping back into sRGB.
///
/// Pinned choices (every other module in src/colour relies on them):
/// - sRGB transfer: IEC 61966-2-1:1999, decode threshold 0.04045, encode
///   threshold 0.0031308, exponent 2.4, sign-mirrored for negative values
///   (the CSS Color 4 "extended" transfer), so out-of-gamut intermediates
///   survive a round trip.
/// - linear sRGB → XYZ: the CSS Color 4 matrix, whose exact rational entries
///   follow from the sRGB primaries and the D65 chromaticity x 0.3127,
///   y 0.3290 (row 2 = 0.2126390059, 0.7151686788, 0.0721923154). White maps
///   to `d65_white`, Y = 1.
/// - CIELAB: ε = 216/24389, κ = 24389/27 (exact CIE values, not the rounded
///   0.008856 / 903.3); the reference white is a parameter.
/// - OKLab: B. Ottosson, "A perceptual color space for image processing"
///   (2020, matrices as updated 2021-01-25). The linear-sRGB path uses the
///   post's sRGB→LMS matrices; the XYZ path uses its M1/M2. The two paths
///   agree within 2e-4 (M1 assumes a slightly different D65 white), below
///   what the post itself publishes (three decimals).
#include <string>

#include "colour/rgb.h"

namespace forme {

/// Linear-light sRGB (the transfer curve removed). Components may leave
/// [0, 1] for colours outside the sRGB gamut.
struct LinearRgb {
  double r = 0, g = 0, b = 0;
};

/// CIE 1931 XYZ tristimulus values, scaled so the white has Y = 1.
struct Xyz {
  double x = 0, y = 0, z = 0;
};

/// CIELAB: L* in [0, 100], a* and b* unbounded.
struct Lab {
  double l = 0, a = 0, b = 0;
};

/// OKLab: L in [0, 1] for colours between black and white.
struct OkLab {
  double l = 0, a = 0, b = 0;
};

/// OKLCH: the polar form of OKLab. h is in degrees, [0, 360); it is 0 when
/// the chroma is 0 (hue undefined).
struct OkLch {
  double l = 0, c = 0, h = 0;
};

// --- sRGB transfer -------------------------------------------------------

/// sRGB decode (EOTF) of one component, extended to negatives by symmetry.
double srgb_decode(double v);
/// sRGB encode (inverse EOTF) of one component, extended by symmetry.
double srgb_encode(double v);

LinearRgb to_linear(const Rgb& c);
/// Encodes without clamping; see `clamp_rgb` and `in_gamut`.
Rgb from_linear(const LinearRgb& c);

/// Clamps every component to [0, 1].
Rgb clamp_rgb(const Rgb& c);
/// True when every component lies in [−tol, 1 + tol].
bool in_gamut(const LinearRgb& c, double tol = 1e-9);

/// Clamps to [0, 1] and rounds every component to the nearest 8-bit code.
Rgb round_to_8bit(const Rgb& c);

/// "#rrggbb", lower case, of `round_to_8bit(c)`.
std::string to_hex(const Rgb& c);

// --- CIE XYZ and CIELAB --------------------------------------------------

/// XYZ of a white with chromaticity (x, y), scaled to Y = 1.
constexpr Xyz white_from_xy(double x, double y) { return {x / y, 1.0, (1.0 - x - y) / y}; }
/// D65 as used by sRGB: from x 0.3127, y 0.3290 (0.95046, 1, 1.08906).
inline constexpr Xyz d65_white = white_from_xy(0.3127, 0.3290);

Xyz to_xyz(const LinearRgb& c);
LinearRgb from_xyz(const Xyz& c);

Lab xyz_to_lab(const Xyz& c, const Xyz& white);
Xyz lab_to_xyz(const Lab& c, const Xyz& white);

/// sRGB → CIELAB relative to `d65_white`, the space CIEDE2000 is computed in.
Lab to_lab(const Rgb& c);

// --- OKLab and OKLCH -----------------------------------------------------

OkLab linear_to_oklab(const LinearRgb& c);
LinearRgb oklab_to_linear(const OkLab& c);
/// XYZ (D65, Y = 1) → OKLab with the post's M1 and M2.
OkLab xyz_to_oklab(const Xyz& c);

OkLab to_oklab(const Rgb& c);
OkLch to_oklch(const OkLab& c);
OkLab from_oklch_to_oklab(const OkLch& c);
OkLch to_oklch(const Rgb& c);

/// OKLCH → sRGB with gamut mapping. L is clamped to [0, 1] (below 0 gives
/// black, above 1 white). If the colour lies outside sRGB, the chroma is
/// reduced by bisection at fixed L and hue until it lies inside (to within
/// 1e-7 in chroma); L and hue are kept, as they matter most for telling
/// series apart and for lightness order. The result is clamped to [0, 1].
Rgb from_oklch(const OkLch& c);

}  // namespace forme
