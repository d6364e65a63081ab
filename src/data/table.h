#pragma once
/// A loaded data table: named, typed columns of equal length.
///
/// Cells are kept both as parsed values (numbers, or dates as days since
/// 1970-01-01) and as the text that was in the file, so labels can show
/// what the author wrote and errors can quote it.
#include <cstddef>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace forme {

enum class ColumnType { number, date, text };

/// How finely a date column was written: "2024", "2024-03", "2024-03-31".
enum class DatePrecision { year, month, day };

struct Column {
  std::string name;
  ColumnType type = ColumnType::text;
  DatePrecision date_precision = DatePrecision::day;  ///< for date columns
  /// number: the value (NaN where the cell is empty);
  /// date: days since 1970-01-01, the first day of the period for year/month
  /// precision (NaN where empty); text: unused (empty vector).
  std::vector<double> values;
  /// The cell text as read (after CSV unquoting), for every type.
  std::vector<std::string> text;
  int header_col = 0;  ///< 1-based column in the file, for messages
};

struct Table {
  std::string name;  ///< key the page description gave it
  std::string path;  ///< file path as the user wrote it (for messages)
  std::vector<Column> columns;
  std::size_t rows = 0;
  /// 1-based file line of each data row's first character (CSV rows may span lines).
  std::vector<int> row_lines;

  const Column* find(std::string_view name) const;
};

}  // namespace forme
