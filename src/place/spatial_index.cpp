#include "place/spatial_index.h"

#include <cmath>

namespace forme {

GridIndex::GridIndex(const Rect& region, double cell_w, double cell_h, std::size_t max_cells)
    : region_(region) {
  const double w = std::max(region.w, 1e-9), h = std::max(region.h, 1e-9);
  cell_w = std::max(cell_w, 1e-9);
  cell_h = std::max(cell_h, 1e-9);
  max_cells = std::max<std::size_t>(max_cells, 1);
  // Grow both cell sides by one factor until the grid fits the cap.
  double cols = std::ceil(w / cell_w), rows = std::ceil(h / cell_h);
  if (cols * rows > static_cast<double>(max_cells)) {
    const double scale = std::sqrt(cols * rows / static_cast<double>(max_cells));
    cols = std::max(1.0, std::floor(cols / scale));
    rows = std::max(1.0, std::floor(rows / scale));
  }
  cols_ = static_cast<int>(cols);
  rows_ = static_cast<int>(rows);
  inv_cell_w_ = cols / w;
  inv_cell_h_ = rows / h;
  cells_.resize(static_cast<std::size_t>(cols_) * static_cast<std::size_t>(rows_));
}

// Truncation is floor for the non-negative values it sees here.
int GridIndex::col_of(double x) const {
  const double c = (x - region_.x) * inv_cell_w_;
  return c <= 0 ? 0 : c >= cols_ ? cols_ - 1 : static_cast<int>(c);
}

int GridIndex::row_of(double y) const {
  const double r = (y - region_.y) * inv_cell_h_;
  return r <= 0 ? 0 : r >= rows_ ? rows_ - 1 : static_cast<int>(r);
}

GridIndex::CellRange GridIndex::range_of(const Rect& r) const {
  return {col_of(r.x), row_of(r.y), col_of(r.right()), row_of(r.bottom())};
}

void GridIndex::insert(int id, const Rect& r) {
  const auto i = static_cast<std::size_t>(id);
  if (i >= items_.size()) items_.resize(i + 1);
  if (items_[i].present) remove(id);
  const CellRange c = range_of(r);
  items_[i] = {r, c, true};
  for (int cy = c.y0; cy <= c.y1; ++cy)
    for (int cx = c.x0; cx <= c.x1; ++cx) cells_[cell_at(cx, cy)].push_back({r, id, c.x0, c.y0});
}

void GridIndex::remove(int id) {
  if (!contains(id)) return;
  Item& item = items_[static_cast<std::size_t>(id)];
  const CellRange c = item.cells;
  for (int cy = c.y0; cy <= c.y1; ++cy) {
    for (int cx = c.x0; cx <= c.x1; ++cx) {
      std::vector<Entry>& cell = cells_[cell_at(cx, cy)];
      auto it = std::find_if(cell.begin(), cell.end(), [id](const Entry& e) { return e.id == id; });
      if (it != cell.end()) {
        *it = cell.back();
        cell.pop_back();
      }
    }
  }
  item.present = false;
}

void GridIndex::clear() {
  for (auto& cell : cells_) cell.clear();
  for (Item& item : items_) item.present = false;
}

bool GridIndex::contains(int id) const {
  return id >= 0 && static_cast<std::size_t>(id) < items_.size() &&
         items_[static_cast<std::size_t>(id)].present;
}

int GridIndex::count_overlaps(const Rect& r, int skip_id, int limit) const {
  const CellRange q = range_of(r);
  int n = 0;
  for (int cy = q.y0; cy <= q.y1; ++cy) {
    for (int cx = q.x0; cx <= q.x1; ++cx) {
      for (const Entry& e : cells_[cell_at(cx, cy)])
        if (e.id != skip_id && reported_here(e, q, cx, cy) && e.rect.overlaps(r) && ++n > limit)
          return n;
    }
  }
  return n;
}

bool GridIndex::any_overlap(const Rect& r, int skip_id) const {
  const CellRange q = range_of(r);
  for (int cy = q.y0; cy <= q.y1; ++cy)
    for (int cx = q.x0; cx <= q.x1; ++cx)
      for (const Entry& e : cells_[cell_at(cx, cy)])
        if (e.id != skip_id && e.rect.overlaps(r)) return true;
  return false;
}

}  // namespace forme
