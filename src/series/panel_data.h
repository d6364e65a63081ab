#pragma once
/// Stage 2b: the rows each panel shows, grouped into series. Positions are
/// still in data units; categories are indices into `categories`.
#include <map>
#include <string>
#include <vector>

#include "data/table.h"
#include "describe/page_spec.h"

namespace forme {

/// What kind of values run along an axis.
enum class AxisKind { number, date, category };

struct Series {
  std::string name;       ///< empty for a panel with one unnamed series
  std::vector<double> x;  ///< data value, day number, or category index
  std::vector<double> y;
  /// Gaps in the data: the line breaks before each of these point indices
  /// (ascending, each in 1..size-1). See series/gaps.h.
  std::vector<std::size_t> breaks = {};
};

/// What a transform did, for the page to say.
struct TransformStatement {
  std::string axis_title;  ///< e.g. "Index, 2020 = 100"
  std::string sentence;    ///< e.g. "Values are indexed to 2020 = 100."
  bool keeps_unit = false; ///< the values keep the data's unit (a difference does)
};

/// A name to write beside one drawn point (dot panels with label-points-by).
struct PointName {
  std::size_t series = 0, point = 0;  ///< which point: series index, index within it
  std::string text;
  double priority = 1;  ///< > 0; higher is named first
  SourceLoc loc;        ///< the table row it came from
};

struct PanelData {
  const PanelSpec* spec = nullptr;
  std::string title;
  ChartKind kind = ChartKind::line;
  AxisKind x_kind = AxisKind::number, y_kind = AxisKind::number;
  DatePrecision x_dates = DatePrecision::day;  ///< when x_kind is date
  /// Category names in order of first appearance, for the category axis.
  std::vector<std::string> categories;
  /// The first table row of each category name, for messages about it.
  std::map<std::string, SourceLoc, std::less<>> category_rows;
  std::vector<Series> series;
  std::size_t rows_used = 0;
  /// The table the panel reads, and the indices of the rows it plotted (in
  /// table order; rows with a missing cell are not among them).
  std::string table;
  std::vector<std::size_t> rows;
  TransformStatement transform;  ///< what was done to the values, if anything
  std::vector<PointName> point_names;  ///< with label-points-by, in table order
  /// Where the data have no value, in words for the page's notes ("No data
  /// for Route 7 in 2017 and 2020."); empty when nothing is missing.
  std::string gap_note;
  /// The panel's rows with a missing x or y cell (gaps), in table order:
  /// not plotted, but listed with the plotted rows wherever rows travel.
  std::vector<std::size_t> gap_rows;
};

}  // namespace forme
