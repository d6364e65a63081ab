#pragma once
/// Stage 5, lay out boxes: page furniture (heading, footer), the panel grid
/// with one shared inner box size, axes, ticks, marks and direct labels,
/// all as a display list in page coordinates.
#include <vector>

#include "axes/axis.h"
#include "base/diagnostic.h"
#include "describe/page_spec.h"
#include "layout/movable_text.h"
#include "layout/page_style.h"
#include "layout/series_looks.h"
#include "paint/display_list.h"
#include "series/panel_data.h"

namespace forme {

/// Stage 5 alone: the page with every fixed piece in place, and what stage
/// 6 must still place (callouts, point names, value labels at points),
/// which is done last so it sees every other text and mark on the page.
struct LaidOutPage {
  DisplayPage page;
  std::vector<PanelMovables> movables;
  std::vector<PanelLooks> looks;  ///< each panel's series looks, as the marks were drawn
};
LaidOutPage lay_out_boxes(const PageSpec& spec, const std::vector<PanelData>& panels,
                          const std::vector<PanelAxes>& axes, const PageStyle& style, DiagnosticSink& warnings);

/// Stages 5 and 6: lays out one page and places its movable text
/// (place_movable_text). Problems that make the page unreadable (a grid too
/// small for its panels) throw InputError located in the description.
DisplayPage layout_page(const PageSpec& spec, const std::vector<PanelData>& panels,
                        const std::vector<PanelAxes>& axes, const PageStyle& style, DiagnosticSink& warnings);

}  // namespace forme
