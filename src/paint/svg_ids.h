#pragma once
/// Stable element ids in Cairo's SVG output.
///
/// Cairo 1.16 names a drawing group `surfaceN` and an embedded raster
/// `imageN` after the surface's serial number, which comes from a counter
/// shared by the whole process: the second page painted in one run gets
/// different ids from the first, though nothing on it differs. Renumbering
/// those ids by first appearance makes the bytes depend on the page alone.
#include <string>
#include <string_view>

namespace forme {

/// Rewrites every `surfaceN` and `imageN` id, and each reference to one
/// (`#surfaceN`, `url(#imageN)`), to 1, 2, … in order of first appearance.
/// Ids of other families (glyphs, clips, gradients) are counted per
/// document by Cairo already and are left as they are.
std::string renumber_svg_ids(std::string_view svg);

}  // namespace forme
