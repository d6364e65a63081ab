#include "layout/grid_shape.h"

#include <cmath>

namespace forme {

GridShape grid_shape(const GridSpec& grid, int n) {
  GridShape g;
  if (grid.columns > 0) {
    g.columns = grid.columns;
  } else if (grid.rows > 0) {
    g.columns = (n + grid.rows - 1) / grid.rows;
  } else {
    g.columns = static_cast<int>(std::ceil(std::sqrt(static_cast<double>(n))));
  }
  if (g.columns > n) g.columns = n;
  if (g.columns < 1) g.columns = 1;
  const int needed = (n + g.columns - 1) / g.columns;
  g.rows = grid.rows > 0 ? grid.rows : needed;
  if (g.rows < needed)
    throw InputError(grid.loc,
                     "the grid has " + std::to_string(g.columns * g.rows) + " cells for " + std::to_string(n) + " panels",
                     "raise 'rows' or 'columns', or leave one of them out");
  return g;
}

}  // namespace forme
