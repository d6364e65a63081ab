#pragma once
/// Reads CSV files per RFC 4180 into a typed `Table`.
///
/// Accepts quoted fields with embedded commas, doubled quotes and newlines,
/// CRLF, LF or lone CR line ends, UTF-8 with or without a byte-order mark. A header
/// row is required. Column types are inferred (number, date, text) unless
/// declared. Every problem throws `InputError` naming file, line and column.
///
/// Details (the tokenizer is `csv_tokenizer.h`, typing `column_types.h`):
/// - Lines and columns are 1-based; a column counts characters (code points)
///   from the line start, and a field is located at its first character.
///   `Table::row_lines` holds the line each data row starts on,
///   `Column::header_col` the column of each header name.
/// - Header names are trimmed of spaces and tabs; empty or duplicate names
///   are refused. Cell text is kept as written (after unquoting), with each
///   line break inside quotes stored as "\n". Entirely empty lines are skipped.
/// - Types: empty (or blank) cells, and cells equal to a declared marker
///   (`CsvOptions::missing`), are missing values, NaN in `values`. A column
///   is a number column when nearly all other cells are plain decimals
///   ("-3.5", "1e6"; no thousands separators or "%"), a date column when
///   nearly all are written as dates, "YYYY-MM-DD" or "YYYY-MM"; the rule
///   and "nearly all" are in column_types.h. The few other cells are then
///   errors at their cell. Plain four-digit years ("2024") make a date
///   column only when the column's name contains "year" in any case;
///   otherwise they are numbers. Anything else, and an all-empty column, is
///   text. "NaN", "inf" or a
///   decimal too large for a double in a number column is an error: forme
///   draws finite numbers only. "-0" reads as 0.
/// - Refused, each with its location: no header row; no data rows; a row
///   whose field count differs from the header's; an unclosed quoted field
///   (at its opening quote); a quote inside an unquoted field, or text after
///   a closing quote; invalid UTF-8 or a NUL byte (with the byte offset); a
///   cell that does not fit its column's declared type; a declared type for
///   a column the table lacks; content over `max_bytes`. read_csv also
///   refuses a file it cannot open ("cannot open data file: <reason>") and,
///   from its size alone before reading, a file over `max_bytes`.
/// - One pass over the text, linear in its size; no input makes it crash.
#include <map>
#include <string>
#include <string_view>
#include <vector>

#include "data/table.h"

namespace forme {

struct CsvOptions {
  /// Declared column types; columns not named here are inferred.
  std::map<std::string, ColumnType, std::less<>> declared;
  /// Missing-value markers: cells whose text (blanks trimmed) is one of
  /// these are missing values, like empty cells (see column_types.h).
  std::vector<std::string> missing;
  /// Refuse files larger than this many bytes before reading them.
  std::size_t max_bytes = 256u * 1024u * 1024u;
};

/// Parses CSV text. `display_path` is used in messages only.
Table parse_csv(std::string_view content, const std::string& display_path,
                const CsvOptions& options = {});

/// Reads and parses a CSV file from disk.
Table read_csv(const std::string& path, const std::string& display_path,
               const CsvOptions& options = {});

}  // namespace forme
