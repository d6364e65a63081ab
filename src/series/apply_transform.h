#pragma once
/// Restating values — index to a base, percent change, difference between
/// two series, share of total — computed from the data, never typed in by
/// the author, and described in words for the axis title and standfirst.
#include <string>

#include "describe/page_spec.h"
#include "series/panel_data.h"

namespace forme {


/// Applies `t` to the panel's series in place. Throws InputError at the
/// description's `base` or `minus` when they name nothing in the data.
TransformStatement apply_transform(const TransformSpec& t, PanelData& panel);

}  // namespace forme
