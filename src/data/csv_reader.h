#pragma once
/// Reads CSV files per RFC 4180 into a typed `Table`.
///
/// Accepts quoted fields with embedded commas, doubled quotes and newlines,
/// CRLF or LF line ends, UTF-8 with or without a byte-order mark. A header
/// row is required. Column types are inferred (number, date, text) unless
/// declared. Every problem throws `InputError` naming file, line and column.
#include <map>
#include <string>
#include <string_view>

#include "data/table.h"

namespace forme {

struct CsvOptions {
  /// Declared column types; columns not named here are inferred.
  std::map<std::string, ColumnType, std::less<>> declared;
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
