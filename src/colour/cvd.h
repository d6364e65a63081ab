#pragma once
/// Colour-vision-deficiency (CVD) simulation and greyscale conversion, used
/// to audit palettes for readers with protan, deutan or tritan vision and
/// for pages printed in black and white.
///
/// Two published models, both applied to linear-light sRGB and re-encoded
/// with clamping to [0, 1]:
///
/// - Machado, Oliveira & Fernandes (2009), "A Physiologically-based Model
///   for Simulation of Color Vision Deficiency", IEEE TVCG. The authors
///   publish one 3×3 matrix per deficiency at severities 0.0, 0.1, …, 1.0
///   (1.0 = dichromacy). Between grid points forme interpolates linearly
///   between the two neighbouring matrices (the lower and upper grid
///   severity), so the result is continuous in the severity and exact on
///   the grid.
/// - Brettel, Viénot & Mollon (1997), "Computerized simulation of color
///   appearance for dichromats", JOSA A: a projection onto two half-planes
///   through the neutral axis, chosen by the sign of dot(n, rgb). It models
///   dichromacy; a severity below 1 blends linearly with the original in
///   linear RGB.
///
/// Greyscale: the neutral grey with the same CIE luminance Y, hence the
/// same CIELAB L*, as the colour (Y from the pinned sRGB→XYZ matrix of
/// convert.h). This is what a black-and-white printer that keeps lightness
/// produces; colours that differ only in hue collapse to one grey.
#include <array>
#include <string_view>

#include "colour/convert.h"

namespace forme {

enum class Deficiency { protan, deutan, tritan };

std::string_view to_string(Deficiency d);

/// Row-major 3×3 matrix acting on column vectors of linear RGB.
using Matrix3 = std::array<std::array<double, 3>, 3>;

LinearRgb apply(const Matrix3& m, const LinearRgb& c);

/// Machado 2009 simulation matrix for `severity` in [0, 1]; interpolated
/// between the published 0.1-step grid. Throws std::invalid_argument for a
/// severity outside [0, 1].
Matrix3 machado_matrix(Deficiency d, double severity);

/// Simulated appearance under the Machado 2009 model.
Rgb simulate_machado(const Rgb& c, Deficiency d, double severity = 1.0);

/// Simulated appearance under the Brettel 1997 model (the recommended one
/// for tritan). Throws std::invalid_argument for a severity outside [0, 1].
Rgb simulate_brettel(const Rgb& c, Deficiency d, double severity = 1.0);

/// The grey with the same CIE luminance (and so the same L*) as `c`.
Rgb to_greyscale(const Rgb& c);

}  // namespace forme
