// Stated transforms, computed from the data on a table small enough to
// check by hand (the arithmetic is in each comment).
#include <catch2/catch.hpp>

#include <cmath>

#include "data/dates.h"
#include "series/apply_transform.h"

using namespace forme;

namespace {

PanelData panel_with(std::vector<Series> series) {
  PanelData p;
  p.x_kind = AxisKind::number;
  p.series = std::move(series);
  return p;
}

TransformSpec spec(TransformSpec::Kind k) {
  TransformSpec t;
  t.kind = k;
  return t;
}

}  // namespace

TEST_CASE("index to a base period: the base becomes 100", "[series][transform]") {
  // North: 50, 80, 100 at 2019..2021, base 2020 -> 50/80*100 = 62.5, 100, 100/80*100 = 125.
  PanelData p = panel_with({{"North", {2019, 2020, 2021}, {50, 80, 100}}});
  TransformSpec t = spec(TransformSpec::Kind::index);
  t.base = {"2020", {}};
  TransformStatement said = apply_transform(t, p);
  REQUIRE(p.series[0].y.size() == 3);
  CHECK(p.series[0].y[0] == Approx(62.5));
  CHECK(p.series[0].y[1] == Approx(100));
  CHECK(p.series[0].y[2] == Approx(125));
  CHECK(said.axis_title == "Index, 2020 = 100");
  CHECK(said.sentence == "Values are indexed to 2020 = 100.");
}

TEST_CASE("an index base that is not in the data is refused where the page names it", "[series][transform]") {
  PanelData p = panel_with({{"North", {2019, 2020}, {50, 80}}});
  TransformSpec t = spec(TransformSpec::Kind::index);
  t.base = {"2018", {"page.yaml", 7, 12}};
  try {
    apply_transform(t, p);
    FAIL("expected an error");
  } catch (const InputError& e) {
    CHECK(format_diagnostic(e.diagnostic()) ==
          "page.yaml:7:12: error: series 'North' has no value at the base '2018'\n"
          "  hint: choose a base every series has");
  }
  // A base that is not even a number on a number axis.
  t.base = {"spring", {"page.yaml", 7, 12}};
  try {
    apply_transform(t, p);
    FAIL("expected an error");
  } catch (const InputError& e) {
    CHECK(format_diagnostic(e.diagnostic()) ==
          "page.yaml:7:12: error: the base 'spring' is not a value of the x column\n"
          "  hint: name an x value present in every series, e.g. the first year shown");
  }
}

TEST_CASE("percent change from the previous value drops the first point", "[series][transform]") {
  // 50 -> 80: +60 %; 80 -> 100: +25 %; 100 -> 90: -10 %.
  PanelData p = panel_with({{"North", {1, 2, 3, 4}, {50, 80, 100, 90}}});
  apply_transform(spec(TransformSpec::Kind::percent_change), p);
  REQUIRE(p.series[0].x == std::vector<double>{2, 3, 4});
  CHECK(p.series[0].y[0] == Approx(60));
  CHECK(p.series[0].y[1] == Approx(25));
  CHECK(p.series[0].y[2] == Approx(-10));
}

TEST_CASE("difference between two series: the gap itself becomes the series", "[series][transform]") {
  // A - B at x = 1, 2, 3: 10-4 = 6, 12-9 = 3, 11-11 = 0; B is the reference and is not drawn.
  PanelData p = panel_with({{"A", {1, 2, 3}, {10, 12, 11}}, {"B", {1, 2, 3}, {4, 9, 11}}});
  TransformSpec t = spec(TransformSpec::Kind::difference);
  t.minus = {"B", {}};
  TransformStatement said = apply_transform(t, p);
  REQUIRE(p.series.size() == 1);
  CHECK(p.series[0].name == "A \u2212 B");
  CHECK(p.series[0].y == std::vector<double>{6, 3, 0});
  CHECK(said.keeps_unit);
}

TEST_CASE("share of total: each x sums to 100", "[series][transform]") {
  // x=1: 1, 3 -> 25 %, 75 %; x=2: 2, 2 -> 50 %, 50 %.
  PanelData p = panel_with({{"A", {1, 2}, {1, 2}}, {"B", {1, 2}, {3, 2}}});
  apply_transform(spec(TransformSpec::Kind::share), p);
  CHECK(p.series[0].y[0] == Approx(25));
  CHECK(p.series[1].y[0] == Approx(75));
  CHECK(p.series[0].y[1] + p.series[1].y[1] == Approx(100));
}

TEST_CASE("percent change on a date axis compares with the period before, not the value before", "[series][transform]") {
  // Yearly 2014..2019 with 2017 missing: 100, 110, 121, -, 150, 165.
  // 2015: (110-100)/100 = +10 %; 2016: (121-110)/110 = +10 %;
  // 2018 has no 2017 to compare with, so it has no change (not +24 % over two years);
  // 2019: (165-150)/150 = +10 %.
  auto day = [](int y) { return static_cast<double>(days_from_civil(y, 1, 1)); };
  PanelData p = panel_with({{"North", {day(2014), day(2015), day(2016), day(2018), day(2019)}, {100, 110, 121, 150, 165}}});
  p.x_kind = AxisKind::date;
  p.x_dates = DatePrecision::year;
  TransformStatement said = apply_transform(spec(TransformSpec::Kind::percent_change), p);
  REQUIRE(p.series[0].x == std::vector<double>{day(2015), day(2016), day(2019)});
  CHECK(p.series[0].y[0] == Approx(10));
  CHECK(p.series[0].y[1] == Approx(10));
  CHECK(p.series[0].y[2] == Approx(10));
  CHECK(said.axis_title == "% change from the previous year");

  // Quarters (months 1, 4, 7, 10), four quarters back: 2021-Q1 vs 2020-Q1 = (120-100)/100 = +20 %.
  auto month = [](int y, int m) { return static_cast<double>(days_from_civil(y, m, 1)); };
  PanelData q = panel_with({{"South",
                             {month(2020, 1), month(2020, 4), month(2020, 7), month(2020, 10), month(2021, 1)},
                             {100, 90, 95, 105, 120}}});
  q.x_kind = AxisKind::date;
  q.x_dates = DatePrecision::month;
  TransformSpec t = spec(TransformSpec::Kind::percent_change);
  t.lag = 4;
  said = apply_transform(t, q);
  REQUIRE(q.series[0].x == std::vector<double>{month(2021, 1)});
  CHECK(q.series[0].y[0] == Approx(20));
  CHECK(said.axis_title == "% change from 4 quarters earlier");
}
