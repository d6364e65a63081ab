#pragma once
/// A palette measured against its own promises (palette.h): for each
/// vision, the smallest CIEDE2000 distance that matters and the floor the
/// palette promises there.
///
/// What is measured depends on how a palette is read: a categorical one by
/// any pair (series are compared with each other), a graded one by
/// neighbouring stops (classes are read in order). Categorical palettes
/// promise greyscale separation for their first three colours only;
/// diverging palettes promise none in greyscale (their arms differ in hue).
#include <optional>
#include <string>
#include <vector>

#include "colour/audit.h"
#include "colour/palette.h"

namespace forme {

struct VisionReview {
  Vision vision = Vision::normal;
  double min_delta_e = 0;        ///< smallest distance measured
  std::optional<double> floor;   ///< what the palette promises; none: no promise
  std::string scope;             ///< "all pairs", "neighbours", "first 3"
  bool passes() const { return !floor || min_delta_e >= *floor; }
};

struct PaletteReview {
  const Palette* palette = nullptr;
  std::vector<VisionReview> visions;  ///< in `all_visions` order
  bool passes() const;
};

PaletteReview review_palette(const Palette& p);

}  // namespace forme
