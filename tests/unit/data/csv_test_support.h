#pragma once
// Helpers for the data-stage tests: parse and report the first error as
// `file:line:col: error: message` (the hint left off), compare tables.
#include <cmath>
#include <string>
#include <string_view>

#include "base/diagnostic.h"
#include "data/csv_reader.h"

namespace forme::test {

/// The diagnostic parse_csv throws for `content` (as "t.csv"), without its hint;
/// "no error" when it parses.
inline std::string csv_error(std::string_view content, const CsvOptions& options = {}) {
  try {
    parse_csv(content, "t.csv", options);
  } catch (const InputError& e) {
    Diagnostic d = e.diagnostic();
    d.hint.clear();
    return format_diagnostic(d);
  }
  return "no error";
}

/// The hint of the diagnostic parse_csv throws, or "no error".
inline std::string csv_hint(std::string_view content, const CsvOptions& options = {}) {
  try {
    parse_csv(content, "t.csv", options);
  } catch (const InputError& e) {
    return e.diagnostic().hint;
  }
  return "no error";
}

inline bool same_value(double a, double b) { return (std::isnan(a) && std::isnan(b)) || a == b; }

/// Every field of two tables equal (NaN equal to NaN).
inline bool same_table(const Table& a, const Table& b) {
  if (a.rows != b.rows || a.row_lines != b.row_lines || a.columns.size() != b.columns.size()) return false;
  for (std::size_t j = 0; j < a.columns.size(); ++j) {
    const Column& x = a.columns[j];
    const Column& y = b.columns[j];
    if (x.name != y.name || x.type != y.type || x.date_precision != y.date_precision || x.text != y.text ||
        x.header_col != y.header_col || x.values.size() != y.values.size())
      return false;
    for (std::size_t i = 0; i < x.values.size(); ++i)
      if (!same_value(x.values[i], y.values[i])) return false;
  }
  return true;
}

}  // namespace forme::test
