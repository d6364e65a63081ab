#pragma once
/// The rows each panel plotted, as CSV text a reader can open: the data
/// behind the chart travel with the page.
///
/// One file per panel. Rows are those the panel drew after its filters,
/// and its rows with a gap (an x or y cell missing), in table order, exactly as the
/// table's file wrote them; columns are the ones the panel reads (its row
/// filters, the one-panel-per column, series-by, x and y), in table order.
/// Values are the data as read, before any stated transform.
#include <string>
#include <string_view>
#include <vector>

#include "data/table.h"
#include "describe/page_spec.h"
#include "series/panel_data.h"

namespace forme {

struct PlottedRows {
  std::string file_name;    ///< e.g. "storage-north.csv": unique within the page
  std::string description;  ///< e.g. "Rows of table 'storage' plotted in panel 'North'"
  std::string csv;          ///< RFC 4180: header row, CRLF line ends
  std::vector<std::string> columns;  ///< the header, for a table page
  std::vector<bool> numeric;         ///< per column: holds numbers (set right-aligned)
  std::vector<std::vector<std::string>> cells;  ///< the rows, for a table page
};

/// One entry per panel, in panel order.
std::vector<PlottedRows> plotted_rows(const PageSpec& page, const std::vector<PanelData>& panels,
                                      const std::vector<Table>& tables);

/// A field quoted as RFC 4180 §2 asks: in double quotes when it holds a
/// comma, a quote, CR or LF (or starts or ends with a space), inner quotes doubled.
std::string csv_field(std::string_view text);

}  // namespace forme
