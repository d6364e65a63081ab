// Calendar dates: parse_date, the Gregorian leap rule, day numbers.
#include <catch2/catch.hpp>

#include <climits>

#include "data/dates.h"

using forme::civil_from_days;
using forme::DatePrecision;
using forme::days_from_civil;
using forme::parse_date;

namespace {
struct KnownDay {
  int y, m, d;
  long day;
};
// Day numbers computed independently with /usr/bin/python3 (3.11.2):
//   (datetime.date(y, m, d) - datetime.date(1970, 1, 1)).days
// Python's datetime uses the proleptic Gregorian calendar, as forme does.
constexpr KnownDay kKnownDays[] = {
    {1970, 1, 1, 0},        {2000, 3, 1, 11017},   {1969, 12, 31, -1},    {1900, 2, 28, -25509},
    {1900, 3, 1, -25508},   {2000, 2, 29, 11016},  {2024, 1, 1, 19723},   {2024, 2, 29, 19782},
    {2024, 3, 1, 19783},    {2023, 3, 1, 19417},   {1600, 2, 29, -135081}, {2100, 3, 1, 47541},
    {1, 1, 1, -719162},     {9999, 12, 31, 2932896}, {1582, 10, 15, -141427},
};
}  // namespace

TEST_CASE("days_from_civil matches day numbers computed with Python's datetime", "[data][dates]") {
  for (const KnownDay& k : kKnownDays) {
    INFO(k.y << "-" << k.m << "-" << k.d);
    CHECK(days_from_civil(k.y, k.m, k.d) == k.day);
    const forme::CivilDate c = civil_from_days(k.day);
    CHECK(c.year == k.y);
    CHECK(c.month == k.m);
    CHECK(c.day == k.d);
  }
  // Also from Python: date(1970,1,1) + 1000000 days = 4707-11-29, - 700000 days = 0053-06-19.
  CHECK(days_from_civil(4707, 11, 29) == 1000000);
  CHECK(days_from_civil(53, 6, 19) == -700000);
}

TEST_CASE("civil_from_days walks the calendar one day at a time", "[data][dates]") {
  // Every day from year -1 to 2401 (more than a full 400-year cycle around
  // both eras' seams): each day follows the previous by one calendar step.
  forme::CivilDate prev = civil_from_days(days_from_civil(-1, 1, 1));
  CHECK(prev.year == -1);
  for (long day = days_from_civil(-1, 1, 1) + 1; day <= days_from_civil(2401, 12, 31); ++day) {
    const forme::CivilDate c = civil_from_days(day);
    const bool next_day_same_month = c.year == prev.year && c.month == prev.month && c.day == prev.day + 1;
    const bool first_of_next_month = c.day == 1 && prev.day == forme::days_in_month(prev.year, prev.month) &&
                                     ((c.year == prev.year && c.month == prev.month + 1) ||
                                      (c.year == prev.year + 1 && c.month == 1 && prev.month == 12));
    if (!(next_day_same_month || first_of_next_month)) {
      FAIL("day " << day << " is " << c.year << "-" << c.month << "-" << c.day << " after " << prev.year << "-"
                  << prev.month << "-" << prev.day);
    }
    if (days_from_civil(c.year, c.month, c.day) != day) FAIL("round trip fails at day " << day);
    prev = c;
  }
}

TEST_CASE("days_from_civil and civil_from_days are defined at the extremes", "[data][dates]") {
  // Run under UBSan in CI's sanitizer build; here they just must not trap.
  CHECK(days_from_civil(INT_MAX, 12, 31) > 0);
  CHECK(days_from_civil(INT_MIN, 1, 1) < 0);
  CHECK(days_from_civil(2024, INT_MAX, INT_MAX) != 0);
  CHECK(days_from_civil(2024, INT_MIN, INT_MIN) != 0);
  const forme::CivilDate hi = civil_from_days(LONG_MAX);
  const forme::CivilDate lo = civil_from_days(LONG_MIN);
  CHECK(hi.year > 1'000'000'000);
  CHECK(lo.year < -1'000'000'000);
  CHECK(days_from_civil(hi.year, hi.month, hi.day) == 1L << 39);
  // A day past the month's end counts on into the next month.
  CHECK(days_from_civil(2023, 2, 29) == days_from_civil(2023, 3, 1));
}

TEST_CASE("Gregorian leap years: 1900 is not leap, 2000 is", "[data][dates]") {
  // The Gregorian rule (every 4th year, but not centuries unless divisible by 400).
  CHECK_FALSE(forme::is_leap_year(1900));
  CHECK(forme::is_leap_year(2000));
  CHECK(forme::is_leap_year(2024));
  CHECK_FALSE(forme::is_leap_year(2023));
  CHECK_FALSE(forme::is_leap_year(2100));
  CHECK(forme::is_leap_year(1600));
  CHECK(forme::days_in_month(1900, 2) == 28);
  CHECK(forme::days_in_month(2000, 2) == 29);
  CHECK(forme::days_in_month(2023, 4) == 30);
  CHECK(forme::days_in_month(2023, 13) == 0);

  CHECK_FALSE(parse_date("1900-02-29"));
  CHECK(parse_date("2000-02-29"));
  CHECK(parse_date("2024-02-29"));
  CHECK_FALSE(parse_date("2023-02-29"));
  CHECK_FALSE(parse_date("2100-02-29"));
}

TEST_CASE("parse_date reads the three precisions as the period's first day", "[data][dates]") {
  const auto year = parse_date("2024");
  REQUIRE(year);
  CHECK(year->precision == DatePrecision::year);
  CHECK(year->day == 19723.0);  // 2024-01-01 (Python, above)

  const auto month = parse_date("2024-03");
  REQUIRE(month);
  CHECK(month->precision == DatePrecision::month);
  CHECK(month->day == 19783.0);  // 2024-03-01 (Python, above)

  const auto day = parse_date("2000-03-01");
  REQUIRE(day);
  CHECK(day->precision == DatePrecision::day);
  CHECK(day->day == 11017.0);

  CHECK(parse_date("1970-01-01")->day == 0.0);
  CHECK(parse_date("0000")->day == static_cast<double>(days_from_civil(0, 1, 1)));
  CHECK(parse_date("9999-12-31")->day == 2932896.0);
}

TEST_CASE("parse_date refuses anything but strict YYYY, YYYY-MM, YYYY-MM-DD", "[data][dates]") {
  const char* bad[] = {"2024-2-3",   "2024-13",    "2023-02-29", "2024-00",     "2024-01-00", "2024-04-31",
                       "2024-1",     "2024-01-1",  "24-01-01",   "2024/01/01",  " 2024",      "2024 ",
                       "2024-01-01T00:00",         "",           "20245",       "202",        "+202",
                       "-2024",      "2024-",      "2024-01-",   "2024--1-01",  "2024-01-32", "2024-1a",
                       "\xEF\xBC\x92\xEF\xBC\x90\xEF\xBC\x92\xEF\xBC\x94" /* fullwidth digits */};
  for (const char* text : bad) {
    INFO("'" << text << "'");
    CHECK_FALSE(parse_date(text));
  }
}
