#pragma once
/// Calendar dates as day numbers (days since 1970-01-01, proleptic Gregorian).
#include <optional>
#include <string>
#include <string_view>

#include "data/table.h"

namespace forme {

struct ParsedDate {
  double day = 0;  ///< days since 1970-01-01 of the period's first day
  DatePrecision precision = DatePrecision::day;
};

/// Parses "YYYY", "YYYY-MM" or "YYYY-MM-DD"; nullopt when the text is not a
/// valid date in one of these forms (e.g. "2024-02-30").
std::optional<ParsedDate> parse_date(std::string_view text);

/// Day number of a civil date (month 1-12, day 1-31).
long days_from_civil(int year, int month, int day);

struct CivilDate {
  int year = 1970, month = 1, day = 1;
};
CivilDate civil_from_days(long days);

}  // namespace forme
