#pragma once
/// A sheet of every forme palette as each reader sees it: normal vision,
/// simulated protan, deutan and tritan vision (Machado 2009, severity 1.0)
/// and greyscale, each row with its smallest CIEDE2000 distance and the
/// floor the palette promises (colour/palette_review.h).
#include "layout/page_style.h"
#include "paint/display_list.h"

namespace forme {

DisplayPage palette_sheet(const PageStyle& style);

}  // namespace forme
