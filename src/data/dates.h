#pragma once
/// Calendar dates as day numbers (days since 1970-01-01, proleptic Gregorian).
///
/// Conversions use Howard Hinnant's public-domain civil-date algorithms
/// (`days_from_civil`, `civil_from_days`): shift the year to start on
/// 1 March so the leap day falls last, then count whole 400-year eras
/// (146097 days each) and the day within the era. Exact for every date.
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
///
/// Strict: exactly four year digits (0000-9999), two month digits (01-12)
/// and two day digits that exist in that month of that year (Gregorian leap
/// rule), no surrounding blanks. "2024-2-3", "2024-13" and "2023-02-29" are
/// refused. For "YYYY" and "YYYY-MM" the day is the period's first day.
std::optional<ParsedDate> parse_date(std::string_view text);

/// Why `text` is not a date although it is written like one ("YYYY-MM" or
/// "YYYY-MM-DD" in digits): "there is no month 13", "February 2023 has 28
/// days". Empty when `text` is a valid date or not written like one.
std::string why_not_a_date(std::string_view text);

/// The precision `text` is written in when it has the shape of a date,
/// valid or not: four digits, then "-" and two digits, then optionally "-"
/// and two digits. A plain "YYYY" is a year. nullopt for any other shape.
std::optional<DatePrecision> date_shape(std::string_view text);

/// Gregorian rule: every fourth year, except centuries not divisible by 400
/// (1900 is not a leap year, 2000 is).
bool is_leap_year(int year);

/// Days in `month` (1-12) of `year`; 0 for a month outside 1-12.
int days_in_month(int year, int month);

/// Day number of a civil date (month 1-12, day 1-31). Not validated: a day
/// past the month's end counts on into the next month; a month outside 1-12
/// gives an unspecified day number. Never overflows, for any int input.
long days_from_civil(int year, int month, int day);

struct CivilDate {
  int year = 1970, month = 1, day = 1;
};

/// The civil date of a day number; inverse of `days_from_civil`. Day
/// numbers beyond +-2^39 (about +-1.5 billion years) are clamped to that
/// range so the year always fits an int.
CivilDate civil_from_days(long days);

}  // namespace forme
