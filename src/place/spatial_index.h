#pragma once
/// A uniform grid of buckets for "which stored rectangles overlap this one?"
///
/// The grid covers a fixed region and splits it into cells of one size.
/// A stored rectangle is listed in every cell it touches. Items that reach
/// outside the region are listed in the edge cells, so every query stays
/// correct, but crowding outside the region makes those cells slow. Label
/// placement stores rectangles of similar size. With cells about one label
/// in size, a query reads a handful of cells and a few items in each.
///
/// Each overlapping item is reported exactly once, without a "seen" set: a
/// pair is reported only in the cell that holds the top-left corner of the
/// two rectangles' intersection. That corner lies in both rectangles, so
/// exactly one visited cell holds it.
///
/// Overlap is Rect::overlaps: interiors must meet, and touching edges do not
/// count. A zero-size rectangle works as a point, and it overlaps a
/// rectangle that holds it strictly inside. All coordinates must be finite.
#include <algorithm>
#include <cstddef>
#include <limits>
#include <vector>

#include "base/geometry.h"

namespace forme {

/// True when `inner` lies inside `outer`; shared edges count as inside.
inline bool within(const Rect& inner, const Rect& outer) {
  return inner.x >= outer.x && inner.y >= outer.y && inner.right() <= outer.right() &&
         inner.bottom() <= outer.bottom();
}

class GridIndex {
 public:
  /// A grid over `region` with cells of about `cell_w` × `cell_h`. The cell
  /// count is capped at `max_cells`, and the cells grow to stay under it.
  GridIndex(const Rect& region, double cell_w, double cell_h, std::size_t max_cells = 1u << 20);

  /// Stores `r` under `id`. Ids are small non-negative integers, and one id
  /// is stored at most once at a time.
  void insert(int id, const Rect& r);
  /// Makes room for ids below `n` without regrowing.
  void reserve(std::size_t n) { items_.reserve(n); }
  /// Removes the item stored under `id`; a no-op if it is not stored.
  void remove(int id);
  void clear();
  bool contains(int id) const;
  /// The rectangle stored under `id`; only valid while contains(id).
  const Rect& rect(int id) const { return items_[static_cast<std::size_t>(id)].rect; }

  /// Calls visit(id, rect) once for each stored item whose rectangle overlaps `r`.
  template <class Visit>
  void query(const Rect& r, Visit&& visit) const {
    const CellRange q = range_of(r);
    for (int cy = q.y0; cy <= q.y1; ++cy)
      for (int cx = q.x0; cx <= q.x1; ++cx)
        for (const Entry& e : cells_[cell_at(cx, cy)])
          if (reported_here(e, q, cx, cy) && e.rect.overlaps(r)) visit(e.id, e.rect);
  }

  /// Number of stored items overlapping `r`, not counting `skip_id`. Stops
  /// once the count exceeds `limit`, so the answer is at most limit + 1.
  int count_overlaps(const Rect& r, int skip_id = -1,
                     int limit = std::numeric_limits<int>::max() - 1) const;
  /// True if any stored item other than `skip_id` overlaps `r`.
  bool any_overlap(const Rect& r, int skip_id = -1) const;

 private:
  struct CellRange {
    int x0, y0, x1, y1;
  };
  // A cell lists copies of its items' rectangles, so a query reads memory in order.
  struct Entry {
    Rect rect;
    int id;
    int x0, y0;  // the item's first column and row
  };
  struct Item {
    Rect rect;
    CellRange cells{};
    bool present = false;
  };

  int col_of(double x) const;
  int row_of(double y) const;
  CellRange range_of(const Rect& r) const;
  std::size_t cell_at(int cx, int cy) const {
    return static_cast<std::size_t>(cy) * static_cast<std::size_t>(cols_) +
           static_cast<std::size_t>(cx);
  }
  // A pair is reported only in the cell holding the top-left corner of the
  // intersection. That cell's column is max(column of r.x, column of s.x),
  // because col_of is monotone, and likewise for the row.
  static bool reported_here(const Entry& e, const CellRange& q, int cx, int cy) {
    return std::max(q.x0, e.x0) == cx && std::max(q.y0, e.y0) == cy;
  }

  Rect region_;
  int cols_ = 1, rows_ = 1;
  double inv_cell_w_ = 1, inv_cell_h_ = 1;
  std::vector<std::vector<Entry>> cells_;
  std::vector<Item> items_;  // by id
};

}  // namespace forme
