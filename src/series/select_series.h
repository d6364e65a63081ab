#pragma once
/// Turns the page's panels and loaded tables into `PanelData`: expands
/// one-panel-per grids, applies row filters, groups rows into series and
/// checks that every column the description names exists with a usable type.
#include <vector>

#include "base/diagnostic.h"
#include "base/limits.h"
#include "data/table.h"
#include "describe/page_spec.h"
#include "series/panel_data.h"

namespace forme {

/// Throws InputError located at the description value that is wrong
/// (a missing column at its `x:` / `y:` value, …), and refuses a series of
/// more than `limits.points_per_series` points at the panel's `y:`.
std::vector<PanelData> select_series(const PageSpec& page, const std::vector<Table>& tables,
                                     DiagnosticSink& warnings, const Limits& limits = {});

}  // namespace forme
