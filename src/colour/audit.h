#pragma once
/// Pairwise audit of a set of colours: how close do the two least
/// distinguishable colours come, for a reader with normal vision, with each
/// simulated colour-vision deficiency, and on a black-and-white print?
///
/// Differences are CIEDE2000 (difference.h). Deficiencies are simulated
/// with Machado 2009 at severity 1.0 (dichromacy, the hardest case);
/// greyscale keeps CIE luminance (cvd.h). All functions are pure.
#include <array>
#include <cstddef>
#include <optional>
#include <string_view>
#include <vector>

#include "colour/rgb.h"

namespace forme {

enum class Vision { normal, protan, deutan, tritan, greyscale };

inline constexpr std::array<Vision, 5> all_visions = {
    Vision::normal, Vision::protan, Vision::deutan, Vision::tritan, Vision::greyscale};

std::string_view to_string(Vision v);

/// How `c` appears under `v`.
Rgb as_seen(const Rgb& c, Vision v);

/// One pair of colours (indices into the audited list, first < second)
/// and their ΔE00 as seen under `vision`.
struct PairFinding {
  Vision vision = Vision::normal;
  std::size_t first = 0, second = 0;
  double delta_e = 0;
};

/// Every pair under `v`, closest first (ties keep index order).
std::vector<PairFinding> pairs_by_difference(const std::vector<Rgb>& colours, Vision v);

/// The closest pair under `v`; empty for fewer than two colours.
std::optional<PairFinding> closest_pair(const std::vector<Rgb>& colours, Vision v);

/// The closest pair under each vision, in `all_visions` order; empty for
/// fewer than two colours.
std::vector<PairFinding> worst_pairs(const std::vector<Rgb>& colours);

}  // namespace forme
