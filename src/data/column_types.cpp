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

bool is_missing_cell(std::string_view text, const std::vector<std::string>& markers) {
  if (text.empty()) return true;
  for (const std::string& m : markers)
    if (text == m) return true;
  return false;
}

bool looks_like_missing_word(std::string_view text) {
  static const char* const kWords[] = {"na", "n/a", "n.a.", "null", "none", "nil", "-", "--", "?", ".", "..", "missing"};
  for (const char* w : kWords)
    if (equals_lower(text, w)) return true;
  return false;
}

namespace {

// "Nearly all": k of n cells, with the others at most one, or one in ten,
// once there are four cells or more (see column_types.h).
bool nearly_all(std::size_t k, std::size_t n) {
  if (k == 0) return false;
  if (k == n) return true;
  const std::size_t others = n - k;
  return n >= 4 && (others <= 1 || others * 10 <= n);
}

// "2017-18": a span of two years, written like a month that does not exist.
bool is_year_span(std::string_view t) {
  if (t.size() != 7 || parse_date(t)) return false;
  const int year = (t[0] - '0') * 1000 + (t[1] - '0') * 100 + (t[2] - '0') * 10 + (t[3] - '0');
  const int next = (t[5] - '0') * 10 + (t[6] - '0');
  return next == (year + 1) % 100;
}

// The first cell of `column` that reads as a valid date, for hints.
std::string first_valid_date(const Column& column) {
  for (const std::string& cell : column.text)
    if (parse_date(trim_blanks(cell))) return std::string(trim_blanks(cell));
  return "2024-03-31";
}

std::string marker_hint(std::string_view t) {
  return "declare it as a missing-value marker of the table, e.g. 'missing: [" + quote_cell(t) +
         "]' beside its 'file:', or leave the cell empty";
}

}  // namespace

InferredType infer_column_type(const Column& column, const std::vector<std::string>& markers) {
  std::size_t n = 0, numbers = 0, decimals = 0, dated = 0, years = 0;
  std::optional<DatePrecision> precision;  // of the first cell written like a date
  const bool year_name = contains_year(column.name);
  for (const std::string& cell : column.text) {
    const std::string_view t = trim_blanks(cell);
    if (is_missing_cell(t, markers) || looks_like_missing_word(t)) continue;
    ++n;
    const ParsedNumber p = parse_number(t);
    if (p.status != NumberStatus::invalid) ++numbers;
    if (p.status == NumberStatus::ok) ++decimals;
    const std::optional<DatePrecision> shape = date_shape(t);
    if (shape == DatePrecision::year) {
      ++years;
    } else if (shape && !is_year_span(t)) {
      ++dated;
      if (!precision) precision = *shape;
    }
  }
  if (n == 0) return {ColumnType::text, DatePrecision::day};
  if (precision && nearly_all(dated, n)) return {ColumnType::date, *precision};
  if (year_name && nearly_all(years, n)) return {ColumnType::date, DatePrecision::year};
  if (decimals > 0 && nearly_all(numbers, n)) return {ColumnType::number, DatePrecision::day};
  return {ColumnType::text, DatePrecision::day};
}

void assign_column_type(Column& column, std::optional<ColumnType> declared,
                        const std::vector<CellLoc>& locs, const std::string& path,
                        const std::vector<std::string>& markers) {
  column.type = declared ? *declared : infer_column_type(column, markers).type;
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
      if (is_missing_cell(t, markers)) {
        column.values.push_back(kMissing);
        continue;
      }
      const ParsedNumber p = parse_number(t);
      if (p.status == NumberStatus::non_finite)
        fail(r, "non-finite number '" + quote_cell(t) + "'" + in_column,
             "forme draws finite numbers only; leave the cell empty for a missing value");
      if (p.status == NumberStatus::invalid) {
        std::string hint = "numbers are plain decimals such as 12, -3.5 or 1e6; leave the cell empty for a missing value";
        if (looks_like_missing_word(t)) hint = marker_hint(t);
        else if (t.find(',') != std::string_view::npos) hint = "write numbers without thousands separators, e.g. 1234567";
        else if (t.back() == '%') hint = "write percentages without the % sign";
        else if (!declared)
          hint = "the rest of the column holds numbers; if it is a column of names, declare it under the table's "
                 "'types' as text";
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
    if (is_missing_cell(t, markers)) {
      column.values.push_back(kMissing);
      continue;
    }
    const std::optional<ParsedDate> d = parse_date(t);
    if (!d) {
      const std::string why = why_not_a_date(t);
      std::string hint = "dates are written YYYY, YYYY-MM or YYYY-MM-DD, e.g. 2024-03-31";
      if (looks_like_missing_word(t)) hint = marker_hint(t);
      else if (!declared) hint = "the rest of the column holds dates, e.g. '" + first_valid_date(column) + "'";
      fail(r, "cell '" + quote_cell(t) + "'" + in_column + " is not a date" + (why.empty() ? "" : ": " + why),
           std::move(hint));
    }
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
