#include "data/dates.h"

#include <algorithm>

namespace forme {

static_assert(sizeof(long) >= 8, "day numbers and era arithmetic assume a 64-bit long");

namespace {

bool is_digit(char c) { return c >= '0' && c <= '9'; }

/// Value of exactly `n` ASCII digits at `text[pos]`, or -1.
int digits_at(std::string_view text, std::size_t pos, std::size_t n) {
  if (pos + n > text.size()) return -1;
  int v = 0;
  for (std::size_t i = pos; i < pos + n; ++i) {
    if (!is_digit(text[i])) return -1;
    v = v * 10 + (text[i] - '0');
  }
  return v;
}

const char* const kMonthNames[] = {"January", "February", "March",     "April",   "May",      "June",
                                  "July",    "August",   "September", "October", "November", "December"};

}  // namespace

std::optional<DatePrecision> date_shape(std::string_view text) {
  if (digits_at(text, 0, 4) < 0) return std::nullopt;
  if (text.size() == 4) return DatePrecision::year;
  if (text.size() < 7 || text[4] != '-' || digits_at(text, 5, 2) < 0) return std::nullopt;
  if (text.size() == 7) return DatePrecision::month;
  if (text.size() == 10 && text[7] == '-' && digits_at(text, 8, 2) >= 0) return DatePrecision::day;
  return std::nullopt;
}

std::string why_not_a_date(std::string_view text) {
  const std::optional<DatePrecision> shape = date_shape(text);
  if (!shape || *shape == DatePrecision::year || parse_date(text)) return {};
  const int year = digits_at(text, 0, 4);
  const int month = digits_at(text, 5, 2);
  if (month < 1 || month > 12) return "there is no month " + std::to_string(month);
  const int day = digits_at(text, 8, 2);
  if (day == 0) return "there is no day 0";
  return std::string(kMonthNames[month - 1]) + " " + std::to_string(year) + " has " +
         std::to_string(days_in_month(year, month)) + " days";
}

bool is_leap_year(int year) {
  return year % 4 == 0 && (year % 100 != 0 || year % 400 == 0);
}

int days_in_month(int year, int month) {
  switch (month) {
    case 1: case 3: case 5: case 7: case 8: case 10: case 12: return 31;
    case 4: case 6: case 9: case 11: return 30;
    case 2: return is_leap_year(year) ? 29 : 28;
    default: return 0;
  }
}

std::optional<ParsedDate> parse_date(std::string_view text) {
  // Lengths 4, 7 and 10 are the only shapes: YYYY, YYYY-MM, YYYY-MM-DD.
  if (text.size() != 4 && text.size() != 7 && text.size() != 10) return std::nullopt;
  const int year = digits_at(text, 0, 4);
  if (year < 0) return std::nullopt;
  int month = 1;
  int day = 1;
  DatePrecision precision = DatePrecision::year;
  if (text.size() >= 7) {
    if (text[4] != '-') return std::nullopt;
    month = digits_at(text, 5, 2);
    if (month < 1 || month > 12) return std::nullopt;
    precision = DatePrecision::month;
  }
  if (text.size() == 10) {
    if (text[7] != '-') return std::nullopt;
    day = digits_at(text, 8, 2);
    if (day < 1 || day > days_in_month(year, month)) return std::nullopt;
    precision = DatePrecision::day;
  }
  return ParsedDate{static_cast<double>(days_from_civil(year, month, day)), precision};
}

// Howard Hinnant's days_from_civil, in 64-bit arithmetic so that no int
// input can overflow.
long days_from_civil(int year, int month, int day) {
  const long long m = month;
  const long long y = static_cast<long long>(year) - (m <= 2 ? 1 : 0);
  const long long era = (y >= 0 ? y : y - 399) / 400;
  const long long yoe = y - era * 400;                                  // [0, 399]
  const long long doy = (153 * (m > 2 ? m - 3 : m + 9) + 2) / 5 + static_cast<long long>(day) - 1;
  const long long doe = yoe * 365 + yoe / 4 - yoe / 100 + doy;          // [0, 146096] for valid dates
  return static_cast<long>(era * 146097 + doe - 719468);
}

// Howard Hinnant's civil_from_days.
CivilDate civil_from_days(long days) {
  constexpr long long limit = 1LL << 39;
  const long long z = std::clamp<long long>(days, -limit, limit) + 719468;
  const long long era = (z >= 0 ? z : z - 146096) / 146097;
  const long long doe = z - era * 146097;                                     // [0, 146096]
  const long long yoe = (doe - doe / 1460 + doe / 36524 - doe / 146096) / 365;  // [0, 399]
  const long long doy = doe - (365 * yoe + yoe / 4 - yoe / 100);              // [0, 365]
  const long long mp = (5 * doy + 2) / 153;                                   // [0, 11]
  const long long d = doy - (153 * mp + 2) / 5 + 1;                           // [1, 31]
  const long long m = mp < 10 ? mp + 3 : mp - 9;                              // [1, 12]
  const long long y = yoe + era * 400 + (m <= 2 ? 1 : 0);
  return CivilDate{static_cast<int>(y), static_cast<int>(m), static_cast<int>(d)};
}

}  // namespace forme
