#pragma once
/// Findings about a page that could mislead or leave its reader short:
/// the checks `forme check` lists and `forme render` prints as warnings.
/// Each finding is located at the description value it concerns.
#include <vector>

#include "audit/layout_audit.h"
#include "axes/axis.h"
#include "base/diagnostic.h"
#include "base/limits.h"
#include "describe/page_spec.h"
#include "paint/display_list.h"
#include "series/panel_data.h"

namespace forme {

/// More series than this in one panel are hard to follow (common practice:
/// readers tell apart about five to seven lines or colours at once).
inline constexpr std::size_t kMaxSeriesPerPanel = 6;

/// Checks the description against its data and resolved scales.
void audit_page(const PageSpec& spec, const std::vector<PanelData>& panels, const std::vector<PanelAxes>& axes,
                DiagnosticSink& findings);

}  // namespace forme
