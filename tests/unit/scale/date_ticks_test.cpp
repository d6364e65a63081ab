// Date ticks: step choice, calendar alignment, labels and year marks.
// Expected ticks were worked out by hand from a calendar.
#include <catch2/catch.hpp>

#include <cmath>
#include <limits>
#include <string>
#include <vector>

#include "data/dates.h"
#include "scale/date_ticks.h"

using forme::date_ticks;
using forme::DateTicks;
using forme::DateUnit;
using forme::days_from_civil;

namespace {

double day(int y, int m, int d) { return static_cast<double>(days_from_civil(y, m, d)); }

struct Expected {
  double day;
  std::string label;
  bool major;
};

void check_ticks(const DateTicks& t, const std::vector<Expected>& expected) {
  REQUIRE(t.ticks.size() == expected.size());
  for (std::size_t i = 0; i < expected.size(); ++i) {
    INFO("tick " << i << ": " << expected[i].label);
    CHECK(t.ticks[i].day == expected[i].day);
    CHECK(t.ticks[i].label == expected[i].label);
    CHECK(t.ticks[i].major == expected[i].major);
  }
}

}  // namespace

TEST_CASE("three months get monthly ticks on the 1st", "[scale][dates]") {
  // Jan 1 .. Apr 1: monthly gives 4 ticks (nearest 5); fortnightly 7, quarterly 1.
  const DateTicks t = date_ticks(day(2024, 1, 1), day(2024, 4, 1), 5);
  CHECK(t.unit == DateUnit::month);
  CHECK(t.step == 1);
  check_ticks(t, {{day(2024, 1, 1), "Jan", true},
                  {day(2024, 2, 1), "Feb", false},
                  {day(2024, 3, 1), "Mar", false},
                  {day(2024, 4, 1), "Apr", false}});
}

TEST_CASE("two years get half-year ticks, the year marked at each January", "[scale][dates]") {
  // 2023-01-01 .. 2024-12-31: 6-monthly gives 4 (nearest 5); quarterly 8, yearly 2.
  const DateTicks t = date_ticks(day(2023, 1, 1), day(2024, 12, 31), 5);
  CHECK(t.unit == DateUnit::month);
  CHECK(t.step == 6);
  check_ticks(t, {{day(2023, 1, 1), "Jan", true},
                  {day(2023, 7, 1), "Jul", false},
                  {day(2024, 1, 1), "Jan", true},
                  {day(2024, 7, 1), "Jul", false}});
}

TEST_CASE("thirty years get decade ticks on 1 January", "[scale][dates]") {
  // 1990 .. 2020: every 10 years gives 4 (nearest 5); every 5 years 7.
  const DateTicks t = date_ticks(day(1990, 1, 1), day(2020, 1, 1), 5);
  CHECK(t.unit == DateUnit::year);
  CHECK(t.step == 10);
  check_ticks(t, {{day(1990, 1, 1), "1990", false},
                  {day(2000, 1, 1), "2000", false},
                  {day(2010, 1, 1), "2010", false},
                  {day(2020, 1, 1), "2020", false}});
  // Mid-year ends: only whole years inside the range.
  const DateTicks mid = date_ticks(day(1990, 6, 15), day(2020, 3, 1), 7);
  CHECK(mid.unit == DateUnit::year);
  CHECK(mid.step == 5);
  REQUIRE(mid.ticks.size() == 6);
  CHECK(mid.ticks.front().label == "1995");
  CHECK(mid.ticks.back().label == "2020");
}

TEST_CASE("quarters fall on January, April, July and October", "[scale][dates]") {
  // 2023-02-10 .. 2025-11-20: quarterly gives Apr 2023 .. Oct 2025 = 11 (nearest 10).
  const DateTicks t = date_ticks(day(2023, 2, 10), day(2025, 11, 20), 10);
  CHECK(t.unit == DateUnit::month);
  CHECK(t.step == 3);
  REQUIRE(t.ticks.size() == 11);
  CHECK(t.ticks.front().day == day(2023, 4, 1));
  CHECK(t.ticks.back().day == day(2025, 10, 1));
  const std::vector<std::string> labels = {"Apr", "Jul", "Oct", "Jan", "Apr", "Jul",
                                           "Oct", "Jan", "Apr", "Jul", "Oct"};
  for (std::size_t i = 0; i < labels.size(); ++i) {
    CHECK(t.ticks[i].label == labels[i]);
    CHECK(t.ticks[i].major == (i == 0 || labels[i] == "Jan"));
  }
}

TEST_CASE("weekly ticks restart each month and cross a year", "[scale][dates]") {
  // 2023-12-20 .. 2024-01-20: days 1, 8, 15, 22 of each month give 4 (nearest 5).
  const DateTicks t = date_ticks(day(2023, 12, 20), day(2024, 1, 20), 5);
  CHECK(t.unit == DateUnit::day);
  CHECK(t.step == 7);
  check_ticks(t, {{day(2023, 12, 22), "22 Dec", true},
                  {day(2024, 1, 1), "1 Jan", true},
                  {day(2024, 1, 8), "8 Jan", false},
                  {day(2024, 1, 15), "15 Jan", false}});
}

TEST_CASE("two-day ticks skip the day before the next month's 1st", "[scale][dates]") {
  // February 2023 has 28 days: 1, 3, …, 27, then 1 March (27 → 1 Mar is 2 days).
  const DateTicks t = date_ticks(day(2023, 2, 20), day(2023, 3, 4), 6);
  CHECK(t.unit == DateUnit::day);
  CHECK(t.step == 2);
  check_ticks(t, {{day(2023, 2, 21), "21 Feb", true},
                  {day(2023, 2, 23), "23 Feb", false},
                  {day(2023, 2, 25), "25 Feb", false},
                  {day(2023, 2, 27), "27 Feb", false},
                  {day(2023, 3, 1), "1 Mar", false},
                  {day(2023, 3, 3), "3 Mar", false}});
}

TEST_CASE("every tick lies in the range, and counts stay near m", "[scale][dates]") {
  const double starts[] = {day(2024, 2, 29), day(1969, 12, 31), day(1900, 3, 1), day(2099, 11, 30)};
  const double spans[] = {0, 1, 6, 20, 45, 100, 400, 1000, 3650, 20000, 200000};
  for (double s : starts)
    for (double span : spans)
      for (int m : {3, 5, 8}) {
        INFO("start " << s << " span " << span << " m " << m);
        const DateTicks t = date_ticks(s, s + span, m);
        for (std::size_t i = 0; i < t.ticks.size(); ++i) {
          CHECK(t.ticks[i].day >= s);
          CHECK(t.ticks[i].day <= s + span);
          CHECK(t.ticks[i].day == std::floor(t.ticks[i].day));
          if (i > 0) CHECK(t.ticks[i].day > t.ticks[i - 1].day);
        }
        if (span >= 20) {
          CHECK(t.ticks.size() >= 2);
          CHECK(t.ticks.size() <= static_cast<std::size_t>(2 * m + 2));
        }
      }
}

TEST_CASE("date ranges: one day, reversed ends, bad input", "[scale][dates]") {
  const DateTicks one = date_ticks(day(2024, 3, 15), day(2024, 3, 15), 5);
  REQUIRE(one.ticks.size() == 1);
  CHECK(one.ticks[0].label == "15 Mar");
  CHECK(one.ticks[0].major);

  const DateTicks forward = date_ticks(day(1990, 1, 1), day(2020, 1, 1), 5);
  const DateTicks backward = date_ticks(day(2020, 1, 1), day(1990, 1, 1), 5);
  REQUIRE(forward.ticks.size() == backward.ticks.size());
  for (std::size_t i = 0; i < forward.ticks.size(); ++i) CHECK(forward.ticks[i].day == backward.ticks[i].day);

  // Less than a whole day: no tick can fall inside.
  CHECK(date_ticks(10.2, 10.7, 5).ticks.empty());
  const double nan = std::numeric_limits<double>::quiet_NaN();
  CHECK(date_ticks(nan, 100, 5).ticks.empty());
  CHECK(date_ticks(0, std::numeric_limits<double>::infinity(), 5).ticks.empty());
  CHECK(date_ticks(0, 1e300, 5).ticks.empty());
}

TEST_CASE("very long spans pick coarse year steps, BC years print with a minus", "[scale][dates]") {
  // Day −4,400,000 falls in year −10076 and day 2,900,000 in 9909
  // (about 12,046 and 7,940 years of 365.2425 days from 1970).
  const DateTicks t = date_ticks(-4'400'000, 2'900'000, 5);
  CHECK(t.unit == DateUnit::year);
  CHECK(t.step == 5000);
  REQUIRE(t.ticks.size() == 4);
  CHECK(t.ticks[0].label == "\u221210000");
  CHECK(t.ticks[1].label == "\u22125000");
  CHECK(t.ticks[2].label == "0");
  CHECK(t.ticks[3].label == "5000");
  const DateTicks huge = date_ticks(-9e10, 9e10, 5);
  CHECK(huge.unit == DateUnit::year);
  CHECK(huge.ticks.size() >= 2);
  CHECK(huge.ticks.size() <= 12);
}
