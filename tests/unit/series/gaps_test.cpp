// Gaps: where a series has no value, its line breaks and the page says so.
// Periods are checked against the Gregorian calendar (days per month, and
// 1970-01-01 a Thursday, so 2024-03-02 and 2024-03-03 are a Saturday and a
// Sunday).
#include <catch2/catch.hpp>

#include <cmath>

#include "data/dates.h"
#include "series/gaps.h"

using namespace forme;

namespace {

double year(int y) { return static_cast<double>(days_from_civil(y, 1, 1)); }
double month(int y, int m) { return static_cast<double>(days_from_civil(y, m, 1)); }
double day(int y, int m, int d) { return static_cast<double>(days_from_civil(y, m, d)); }

PanelData yearly(std::vector<Series> series, ChartKind kind = ChartKind::line) {
  PanelData p;
  p.kind = kind;
  p.x_kind = AxisKind::date;
  p.x_dates = DatePrecision::year;
  p.series = std::move(series);
  return p;
}

}  // namespace

TEST_CASE("a missing cell and a missing year break a yearly line, and the note lists both", "[series][gaps]") {
  // Route 7: rows for 2014..2022; 2016 is an empty cell, 2020 has no row.
  PanelData p = yearly({{"Route 7",
                         {year(2014), year(2015), year(2017), year(2018), year(2019), year(2021), year(2022)},
                         {1, 2, 3, 4, 5, 6, 7}}});
  const std::string note = mark_gaps(p, {{"Route 7", year(2016), "2016"}}, "riders");
  CHECK(p.series[0].breaks == std::vector<std::size_t>{2, 5});  // before 2017 and before 2021
  CHECK(note == "No data for Route 7 in 2016 and 2020.");
}

TEST_CASE("three missing periods in a row are written as a range, more than five are counted", "[series][gaps]") {
  PanelData p = yearly({{"North", {year(2010), year(2011), year(2015), year(2016)}, {1, 2, 3, 4}}});
  CHECK(mark_gaps(p, {}, "") == "No data for North in 2012–2014.");
  CHECK(p.series[0].breaks == std::vector<std::size_t>{2});

  std::vector<double> xs, ys;
  for (int y = 2000; y <= 2020; ++y)
    if (y % 3 != 0) xs.push_back(year(y)), ys.push_back(y);  // 2001, 2004, ..., 2019 missing: 14 of 21 present
  PanelData q = yearly({{"", xs, ys}});
  // Missing between 2000 and 2020: the seven years divisible by 3, each between two present years.
  CHECK(mark_gaps(q, {}, "Riders") == "No data for Riders in 7 periods between 2001 and 2019.");
  CHECK(q.series[0].breaks.size() == 7);
}

TEST_CASE("quarters and months are named for a reader", "[series][gaps]") {
  PanelData p = yearly({{"Sales", {month(2017, 1), month(2017, 4), month(2017, 10), month(2018, 1)}, {1, 2, 3, 4}}});
  p.x_dates = DatePrecision::month;
  CHECK(mark_gaps(p, {}, "") == "No data for Sales in Q3 2017.");
  PanelData m = yearly({{"Sales", {month(2017, 1), month(2017, 2), month(2017, 4), month(2017, 5)}, {1, 2, 3, 4}}});
  m.x_dates = DatePrecision::month;
  CHECK(mark_gaps(m, {}, "") == "No data for Sales in March 2017.");
}

TEST_CASE("a series of working days has no gap at weekends, but a missing weekday is one", "[series][gaps]") {
  // Thursday 29 Feb 2024 to Tuesday 5 March 2024, without the weekend.
  PanelData p = yearly({{"Calls", {day(2024, 2, 29), day(2024, 3, 1), day(2024, 3, 4), day(2024, 3, 5)}, {1, 2, 3, 4}}});
  p.x_dates = DatePrecision::day;
  CHECK(mark_gaps(p, {}, "").empty());
  CHECK(p.series[0].breaks.empty());
  PanelData q = yearly({{"Calls", {day(2024, 2, 29), day(2024, 3, 1), day(2024, 3, 5), day(2024, 3, 6)}, {1, 2, 3, 4}}});
  q.x_dates = DatePrecision::day;
  CHECK(mark_gaps(q, {}, "") == "No data for Calls in 4 March 2024.");
}

TEST_CASE("irregular dates and number axes have no period gaps, bars are listed but not broken", "[series][gaps]") {
  // Three points over eight years cover less than half the periods: not a regular series.
  PanelData p = yearly({{"Survey", {year(2010), year(2014), year(2017)}, {1, 2, 3}}});
  CHECK(mark_gaps(p, {}, "").empty());

  PanelData n;
  n.kind = ChartKind::line;
  n.x_kind = AxisKind::number;
  n.series = {{"Load", {1, 2, 5, 6}, {1, 2, 3, 4}}};
  CHECK(mark_gaps(n, {{"Load", 3, "3"}, {"Load", std::nan(""), ""}}, "") == "No data for Load at 3, and in 1 row without x.");
  CHECK(n.series[0].breaks == std::vector<std::size_t>{2});

  PanelData b = yearly({{"", {year(2014), year(2015), year(2017)}, {1, 2, 3}}}, ChartKind::vertical_bar);
  CHECK(mark_gaps(b, {}, "Riders") == "No data for Riders in 2016.");
  CHECK(b.series[0].breaks.empty());  // a bar's slot is simply left empty
}

TEST_CASE("many series with gaps: three listed, the rest counted", "[series][gaps]") {
  std::vector<Series> series;
  for (const char* name : {"A", "B", "C", "D", "E"})
    series.push_back({name, {year(2014), year(2015), year(2017), year(2018)}, {1, 2, 3, 4}});
  PanelData p = yearly(series);
  CHECK(mark_gaps(p, {}, "") ==
        "No data for A in 2016; for B in 2016; for C in 2016; and for 2 more series (5 gaps in all).");
}
