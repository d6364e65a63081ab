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
/// Missing values: an empty or blank cell, or a cell whose text (blanks
/// trimmed) is one of the table's declared missing-value markers
/// (`missing: [NA, "-"]`). They are NaN in `values`; their text is kept.
///
/// Inference, for a column without a declared type. Missing values are left
/// out; so are cells that read like an undeclared missing-value word (NA,
/// N/A, n/a, null, none, "-", "--", "?", "."), which decide nothing but are
/// errors in a column that turns out typed. Of the n cells left, k of one
/// kind make the column that kind when k = n, or when n >= 4 and the other
/// cells are at most one, or at most one in ten: "nearly all". Tried in order:
/// - no cell left: text;
/// - nearly all written like dates ("YYYY-MM-DD" or "YYYY-MM", valid or not,
///   so "2024-02-30" and "2024-13" count; a "YYYY-YY" year span such as
///   "2017-18" does not): date, at the precision of the first one;
/// - nearly all plain four-digit years "YYYY", in a column whose name
///   contains "year" in any case ("Year", "fiscal_year"): date (years);
///   otherwise such cells are numbers;
/// - nearly all decimals or non-finite words, at least one a decimal: number;
/// - anything else: text (a column of names stays text, also with a few
///   number-like names among them).
/// Every cell of a typed column is then checked: a stray cell is an error at
/// that cell naming the column, never a silent change of the column's type.
/// A declared type is enforced cell by cell the same way.
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

/// True when trimmed cell `text` is a missing value: empty, or one of `markers`.
bool is_missing_cell(std::string_view text, const std::vector<std::string>& markers);

/// True for the words people write for "no value" (NA, n/a, null, "-", …).
bool looks_like_missing_word(std::string_view text);

/// The type the cells of `column.text` (named `column.name`) suggest.
InferredType infer_column_type(const Column& column, const std::vector<std::string>& markers = {});

struct CellLoc {
  int line = 0;
  int col = 0;
};

/// Sets `column.type`, `date_precision` and `values` from `column.text`,
/// with the declared type when given, else the inferred one. `locs[i]` is
/// where cell i stands in `path`; a cell that does not fit the type throws
/// `InputError` there. Cells equal to one of `markers` are missing values.
void assign_column_type(Column& column, std::optional<ColumnType> declared,
                        const std::vector<CellLoc>& locs, const std::string& path,
                        const std::vector<std::string>& markers = {});

}  // namespace forme
