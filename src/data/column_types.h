#pragma once
/// Column types: reading numbers, inferring a column's type from its cells,
/// and converting the cells to values.
///
/// Numbers are plain decimals: an optional sign, digits with an optional
/// decimal point (".5" and "5." too), an optional exponent ("1e-3").
/// No thousands separators, percent signs, currency or hex. Blanks (spaces,
/// tabs) around a cell are ignored when reading numbers and dates; the cell
/// text keeps them. "-0" reads as 0. "NaN", "inf", "infinity" (any case,
/// any sign) and decimals too large for a double ("1e999") are non-finite:
/// forme refuses them. Decimals too small for a double read as 0.
///
/// Inference, for a column without a declared type (empty and blank cells
/// are missing values and are ignored):
/// - every cell empty: text;
/// - every cell a date of one precision, "YYYY-MM-DD" or "YYYY-MM": date;
/// - every cell a plain four-digit year "YYYY": date (year precision) only
///   when the column name contains "year" in any case ("Year", "fiscal_year");
///   otherwise these are numbers;
/// - every cell a decimal or a non-finite word, at least one a decimal:
///   number (a non-finite cell is then an error at that cell);
/// - anything else: text (also dates of mixed precision).
/// A declared type is enforced cell by cell instead.
#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "data/table.h"

namespace forme {

enum class NumberStatus { ok, non_finite, invalid };

struct ParsedNumber {
  NumberStatus status = NumberStatus::invalid;
  double value = 0;  ///< when ok: finite, never -0
};

/// Reads a plain decimal (no surrounding blanks allowed; see `trim_blanks`).
ParsedNumber parse_number(std::string_view text);

/// `text` without leading and trailing spaces and tabs.
std::string_view trim_blanks(std::string_view text);

/// Cell text fit for a one-line message: line breaks and tabs escaped, cut
/// to 40 characters with "…" after.
std::string quote_cell(std::string_view text);

struct InferredType {
  ColumnType type = ColumnType::text;
  DatePrecision precision = DatePrecision::day;  ///< for dates
};

/// The type the cells of `column.text` (named `column.name`) suggest.
InferredType infer_column_type(const Column& column);

struct CellLoc {
  int line = 0;
  int col = 0;
};

/// Sets `column.type`, `date_precision` and `values` from `column.text`,
/// with the declared type when given, else the inferred one. `locs[i]` is
/// where cell i stands in `path`; a cell that does not fit the type throws
/// `InputError` there.
void assign_column_type(Column& column, std::optional<ColumnType> declared,
                        const std::vector<CellLoc>& locs, const std::string& path);

}  // namespace forme
