#pragma once
/// How many columns and rows a grid of panels takes.
#include "base/diagnostic.h"
#include "describe/page_spec.h"

namespace forme {

struct GridShape {
  int columns = 1, rows = 1;
};

/// Uses the description's columns/rows where given; otherwise picks a
/// near-square arrangement, wider than tall (pages read across first).
GridShape grid_shape(const GridSpec& grid, int panel_count);

}  // namespace forme
