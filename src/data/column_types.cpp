#include "data/column_types.h"

#include <charconv>
#include <cmath>
#include <limits>
#include <system_error>

#include "base/diagnostic.h"
#include "data/dates.h"

namespace forme {

namespace {

bool is_digit(char c) { return c >= '0' && c <= '9'; }

char lower(char c) { return c >= 'A' && c <= 'Z' ? static_cast<char>(c - 'A' + 'a') : c; }

bool equals_lower(std::string_view text, std::string_view lower_word) {
  if (text.size() != lower_word.size()) return false;
  for (std::size_t i = 0; i < text.size(); ++i)
    if (lower(text[i]) != lower_word[i]) return false;
  return true;
}

bool contains_year(std::string_view name) {
  for (std::size_t i = 0; i + 4 <= name.size(); ++i)
    if (equals_lower(name.substr(i, 4), "year")) return true;
  return false;
}

const char* precision_words(DatePrecision p) {
  switch (p) {
    case DatePrecision::year: return "year (YYYY)";
    case DatePrecision::month: return "month (YYYY-MM)";
    case DatePrecision::day: return "day (YYYY-MM-DD)";
  }
  return "day (YYYY-MM-DD)";
}

constexpr double kMissing = std::numeric_limits<double>::quiet_NaN();

}  // namespace

std::string_view trim_blanks(std::string_view text) {
  std::size_t b = 0;
  std::size_t e = text.size();
  while (b < e && (text[b] == ' ' || text[b] == '\t')) ++b;
  while (e > b && (text[e - 1] == ' ' || text[e - 1] == '\t')) --e;
  return text.substr(b, e - b);
}

std::string quote_cell(std::string_view text) {
  constexpr int kMaxChars = 40;
  std::string out;
  int chars = 0;
  for (std::size_t i = 0; i < text.size(); ++i) {
    const char c = text[i];
    const bool starts_char = (static_cast<unsigned char>(c) & 0xC0) != 0x80;
    if (starts_char && ++chars > kMaxChars) {
      out += "…";
      break;
    }
    if (c == '\n') out += "\\n";
    else if (c == '\r') out += "\\r";
    else if (c == '\t') out += "\\t";
    else out += c;
  }
  return out;
}

ParsedNumber parse_number(std::string_view t) {
  const std::size_t n = t.size();
  std::size_t i = 0;
  if (i < n && (t[i] == '+' || t[i] == '-')) ++i;
  const std::string_view body = t.substr(i);
  if (equals_lower(body, "nan") || equals_lower(body, "inf") || equals_lower(body, "infinity"))
    return {NumberStatus::non_finite, kMissing};

  // Grammar check, noting the decimal magnitude: the value is 0.DDD x 10^magnitude
  // where DDD are the significant digits.
  std::size_t digits = 0;
  long long significant_int = 0;    // integer digits after leading zeros
  long long zeros_after_point = 0;  // fraction zeros before the first non-zero digit
  bool nonzero = false;
  for (; i < n && is_digit(t[i]); ++i, ++digits) {
    if (t[i] != '0') nonzero = true;
    if (nonzero) ++significant_int;
  }
  if (i < n && t[i] == '.') {
    for (++i; i < n && is_digit(t[i]); ++i, ++digits) {
      if (!nonzero && t[i] == '0') ++zeros_after_point;
      if (t[i] != '0') nonzero = true;
    }
  }
  if (digits == 0) return {};
  long long exponent = 0;
  if (i < n && (t[i] == 'e' || t[i] == 'E')) {
    ++i;
    bool negative = false;
    if (i < n && (t[i] == '+' || t[i] == '-')) negative = t[i++] == '-';
    std::size_t exp_digits = 0;
    for (; i < n && is_digit(t[i]); ++i, ++exp_digits)
      if (exponent < 1'000'000'000'000LL) exponent = exponent * 10 + (t[i] - '0');
    if (exp_digits == 0) return {};
    if (negative) exponent = -exponent;
  }
  if (i != n) return {};
  if (!nonzero) return {NumberStatus::ok, 0.0};

  // std::from_chars is locale-independent and correctly rounded; it takes no '+'.
  const char* first = t.data() + (t[0] == '+' ? 1 : 0);
  const char* last = t.data() + n;
  double v = 0;
  const auto [end, ec] = std::from_chars(first, last, v, std::chars_format::general);
  if (ec == std::errc::result_out_of_range) {
    const long long magnitude = significant_int > 0 ? significant_int + exponent : exponent - zeros_after_point;
    if (magnitude > 0) return {NumberStatus::non_finite, kMissing};
    return {NumberStatus::ok, 0.0};  // too small for a double: underflows to zero
  }
  if (ec != std::errc() || end != last) return {};
  if (!std::isfinite(v)) return {NumberStatus::non_finite, kMissing};
  if (v == 0) v = 0.0;  // no negative zero
  return {NumberStatus::ok, v};
}

InferredType infer_column_type(const Column& column) {
  bool any = false;
  bool number_ok = true;
  bool any_decimal = false;
  bool date_ok = true;
  std::optional<DatePrecision> precision;
  for (const std::string& cell : column.text) {
    const std::string_view t = trim_blanks(cell);
    if (t.empty()) continue;
    any = true;
    if (number_ok) {
      const ParsedNumber p = parse_number(t);
      if (p.status == NumberStatus::invalid) number_ok = false;
      if (p.status == NumberStatus::ok) any_decimal = true;
    }
    if (date_ok) {
      const std::optional<ParsedDate> d = parse_date(t);
      if (!d || (precision && *precision != d->precision)) date_ok = false;
      else precision = d->precision;
    }
    if (!number_ok && !date_ok) break;
  }
  if (!any) return {ColumnType::text, DatePrecision::day};
  if (date_ok && precision && (*precision != DatePrecision::year || contains_year(column.name)))
    return {ColumnType::date, *precision};
  if (number_ok && any_decimal) return {ColumnType::number, DatePrecision::day};
  return {ColumnType::text, DatePrecision::day};
}

void assign_column_type(Column& column, std::optional<ColumnType> declared,
                        const std::vector<CellLoc>& locs, const std::string& path) {
  column.type = declared ? *declared : infer_column_type(column).type;
  column.date_precision = DatePrecision::day;
  column.values.clear();
  if (column.type == ColumnType::text) return;

  const auto fail = [&](std::size_t row, std::string message, std::string hint) {
    const CellLoc loc = row < locs.size() ? locs[row] : CellLoc{};
    throw InputError(SourceLoc{path, loc.line, loc.col}, std::move(message), std::move(hint));
  };
  const std::string in_column = " in column '" + quote_cell(column.name) + "'";
  column.values.reserve(column.text.size());

  if (column.type == ColumnType::number) {
    for (std::size_t r = 0; r < column.text.size(); ++r) {
      const std::string_view t = trim_blanks(column.text[r]);
      if (t.empty()) {
        column.values.push_back(kMissing);
        continue;
      }
      const ParsedNumber p = parse_number(t);
      if (p.status == NumberStatus::non_finite)
        fail(r, "non-finite number '" + quote_cell(t) + "'" + in_column,
             "forme draws finite numbers only; leave the cell empty for a missing value");
      if (p.status == NumberStatus::invalid) {
        std::string hint = "numbers are plain decimals such as 12, -3.5 or 1e6; leave the cell empty for a missing value";
        if (t.find(',') != std::string_view::npos) hint = "write numbers without thousands separators, e.g. 1234567";
        else if (t.back() == '%') hint = "write percentages without the % sign";
        fail(r, "cell '" + quote_cell(t) + "'" + in_column + " is not a number", std::move(hint));
      }
      column.values.push_back(p.value);
    }
    return;
  }

  // Dates: every cell at the precision of the column's first date.
  std::optional<DatePrecision> precision;
  std::size_t first_row = 0;
  for (std::size_t r = 0; r < column.text.size(); ++r) {
    const std::string_view t = trim_blanks(column.text[r]);
    if (t.empty()) {
      column.values.push_back(kMissing);
      continue;
    }
    const std::optional<ParsedDate> d = parse_date(t);
    if (!d)
      fail(r, "cell '" + quote_cell(t) + "'" + in_column + " is not a date",
           "dates are written YYYY, YYYY-MM or YYYY-MM-DD, e.g. 2024-03-31");
    if (!precision) {
      precision = d->precision;
      first_row = r;
    }
    if (d->precision != *precision)
      fail(r,
           "date '" + quote_cell(t) + "'" + in_column + " is by " + precision_words(d->precision) +
               " but the column is by " + precision_words(*precision),
           "the first date, '" + quote_cell(trim_blanks(column.text[first_row])) +
               "', sets the column's precision; write every date the same way");
    column.values.push_back(d->day);
  }
  if (precision) column.date_precision = *precision;
}

}  // namespace forme
