#pragma once
/// What a callout points at, in page coordinates: the target the
/// description names, looked up in the panel's data and mapped through its
/// scales. Targets that do not exist are errors at the value that names them.
#include <optional>

#include "describe/page_spec.h"
#include "layout/plot_frame.h"
#include "series/panel_data.h"

namespace forme {

struct CalloutTarget {
  Point anchor;             ///< where the leader line starts
  std::optional<Rect> band; ///< the stretch of x to highlight, for span targets
};

/// Throws InputError for an unknown category, an x (or y) outside the data,
/// or a value that cannot be read on the axis.
CalloutTarget resolve_callout_target(const CalloutSpec& c, const PanelData& data, const PlotFrame& frame);

}  // namespace forme
