// Reading numbers and inferring column types.
#include <catch2/catch.hpp>

#include <cmath>

#include "unit/data/csv_test_support.h"
#include "data/column_types.h"
#include "data/csv_reader.h"
#include "data/dates.h"

using forme::ColumnType;
using forme::DatePrecision;
using forme::NumberStatus;
using forme::parse_csv;
using forme::parse_number;
using forme::Table;

namespace {
const forme::Column& col(const Table& t, std::string_view name) {
  const forme::Column* c = t.find(name);
  REQUIRE(c != nullptr);
  return *c;
}
}  // namespace

TEST_CASE("parse_number reads plain decimals", "[data][types]") {
  struct Case {
    const char* text;
    double value;
  };
  const Case ok[] = {{"0", 0},       {"12", 12},       {"-2.5", -2.5}, {"+3", 3},        {".5", 0.5},
                     {"5.", 5},      {"1e3", 1000},    {"1E-3", 0.001}, {"-1.5e+2", -150}, {"007", 7},
                     {"0.1", 0.1},   {"123456789012345678901234567890", 1.2345678901234568e29},
                     {"1.7976931348623157e308", 1.7976931348623157e308}};
  for (const Case& c : ok) {
    INFO(c.text);
    const auto p = parse_number(c.text);
    CHECK(p.status == NumberStatus::ok);
    CHECK(p.value == c.value);
  }
  const char* invalid[] = {"",    "-",   "+",    ".",    "e5",  "1e",   "1e+",  "1,234", "12%",  "0x10",
                           "--1", "1 2", " 1",   "1 ",   "1.2.3", "£5", "1_000", "one",   "1e5x", "+-1",
                           "١", "infinityx", "nanx", "in"};
  for (const char* text : invalid) {
    INFO("'" << text << "'");
    CHECK(parse_number(text).status == NumberStatus::invalid);
  }
  const char* non_finite[] = {"nan", "NaN", "-nan", "inf", "+INF", "-Infinity", "1e999", "-1e309", "1.8e308",
                              "1000000000000000000000000e300"};
  for (const char* text : non_finite) {
    INFO(text);
    CHECK(parse_number(text).status == NumberStatus::non_finite);
  }
}

TEST_CASE("parse_number: -0 and underflow read as +0", "[data][types]") {
  for (const char* text : {"-0", "-0.0", "-0e5", "1e-400", "-1e-400", "0.000000000000000000001e-330"}) {
    INFO(text);
    const auto p = parse_number(text);
    CHECK(p.status == NumberStatus::ok);
    CHECK(p.value == 0.0);
    CHECK_FALSE(std::signbit(p.value));
  }
  // The smallest subnormal still reads as itself.
  CHECK(parse_number("5e-324").value > 0);
  // A huge exponent string does not overflow the exponent counter.
  CHECK(parse_number("1e99999999999999999999999999").status == NumberStatus::non_finite);
  CHECK(parse_number("1e-99999999999999999999999999").value == 0.0);
}

TEST_CASE("inference: numbers, with blanks trimmed and empty cells missing", "[data][types]") {
  const Table t = parse_csv("label,v\na, 1.5 \nb,\nc,\"-0\"\nd,\t2e1\ne,  \n", "t.csv");
  const forme::Column& v = col(t, "v");
  CHECK(v.type == ColumnType::number);
  REQUIRE(v.values.size() == 5);
  CHECK(v.values[0] == 1.5);
  CHECK(std::isnan(v.values[1]));
  CHECK(v.values[2] == 0.0);
  CHECK_FALSE(std::signbit(v.values[2]));
  CHECK(v.values[3] == 20.0);
  CHECK(std::isnan(v.values[4]));  // blanks only: missing
  CHECK(v.text == std::vector<std::string>{" 1.5 ", "", "-0", "\t2e1", "  "});  // text as read
  CHECK(col(t, "label").type == ColumnType::text);
  CHECK(col(t, "label").values.empty());
}

TEST_CASE("inference: anything not a plain decimal makes a text column", "[data][types]") {
  const Table t = parse_csv(
      "thousands,percent,words,mixed,names\n"
      "\"1,234\",12%,Nan,1,Nan\n"
      "5,3%,NaN,x,Bob\n",
      "t.csv");
  CHECK(col(t, "thousands").type == ColumnType::text);
  CHECK(col(t, "percent").type == ColumnType::text);
  CHECK(col(t, "words").type == ColumnType::text);  // non-finite words without any decimal
  CHECK(col(t, "mixed").type == ColumnType::text);
  CHECK(col(t, "names").type == ColumnType::text);
}

TEST_CASE("inference: an all-empty column is text", "[data][types]") {
  const Table t = parse_csv("a,b\n1,\n2,\"\"\n", "t.csv");
  CHECK(col(t, "b").type == ColumnType::text);
  CHECK(col(t, "a").type == ColumnType::number);
}

TEST_CASE("inference: dates by day or by month", "[data][types]") {
  const Table t = parse_csv(
      "day,month\n"
      "2024-01-31,2024-01\n"
      ",2024-02\n"
      " 2024-02-29 ,2023-12\n",
      "t.csv");
  const forme::Column& day = col(t, "day");
  CHECK(day.type == ColumnType::date);
  CHECK(day.date_precision == DatePrecision::day);
  REQUIRE(day.values.size() == 3);
  CHECK(day.values[0] == static_cast<double>(forme::days_from_civil(2024, 1, 31)));
  CHECK(std::isnan(day.values[1]));
  CHECK(day.values[2] == 19782.0);  // 2024-02-29, day number from Python's datetime

  const forme::Column& month = col(t, "month");
  CHECK(month.type == ColumnType::date);
  CHECK(month.date_precision == DatePrecision::month);
  CHECK(month.values[1] == static_cast<double>(forme::days_from_civil(2024, 2, 1)));
}

TEST_CASE("inference: a date of another precision or one that does not exist is an error, not text", "[data][types]") {
  // Each column is written as dates, so it is a date column and the odd
  // cell is refused where it stands (2024 is a leap year: Gregorian rule).
  CHECK(forme::test::csv_error("mixed\n2024-01-31\n2024-02\n2024-03-01\n") ==
        "t.csv:3:1: error: date '2024-02' in column 'mixed' is by month (YYYY-MM) but the column is by day (YYYY-MM-DD)");
  CHECK(forme::test::csv_error("bad\n2024-01-31\n2024-02-30\n2024-03-01\n") ==
        "t.csv:3:1: error: cell '2024-02-30' in column 'bad' is not a date: February 2024 has 29 days");
}

TEST_CASE("inference: four-digit years are dates only in a column named for years", "[data][types]") {
  const Table t = parse_csv(
      "Year,fiscal_YEAR,count,years_since\n"
      "2021,2021,2021,1999\n"
      "2022,,1999,2000\n",
      "t.csv");
  const forme::Column& year = col(t, "Year");
  CHECK(year.type == ColumnType::date);
  CHECK(year.date_precision == DatePrecision::year);
  CHECK(year.values[1] == static_cast<double>(forme::days_from_civil(2022, 1, 1)));
  CHECK(col(t, "fiscal_YEAR").type == ColumnType::date);
  CHECK(std::isnan(col(t, "fiscal_YEAR").values[1]));
  const forme::Column& count = col(t, "count");
  CHECK(count.type == ColumnType::number);
  CHECK(count.values == std::vector<double>{2021, 1999});
  CHECK(col(t, "years_since").type == ColumnType::date);  // the rule is by name only

  // A year column with a non-year cell falls back to numbers, or text.
  const Table u = parse_csv("year,year2\n2021,2021\n2021.5,x\n", "t.csv");
  CHECK(col(u, "year").type == ColumnType::number);
  CHECK(col(u, "year2").type == ColumnType::text);
}

TEST_CASE("declared types override inference", "[data][types]") {
  forme::CsvOptions o;
  o.declared["code"] = ColumnType::text;
  o.declared["y"] = ColumnType::date;
  o.declared["n"] = ColumnType::number;
  const Table t = parse_csv("code,y,n\n007,2021,\n010,2022,\n", "t.csv", o);
  CHECK(col(t, "code").type == ColumnType::text);
  CHECK(col(t, "code").values.empty());
  CHECK(col(t, "y").type == ColumnType::date);
  CHECK(col(t, "y").date_precision == DatePrecision::year);
  CHECK(col(t, "y").values[0] == static_cast<double>(forme::days_from_civil(2021, 1, 1)));
  CHECK(col(t, "n").type == ColumnType::number);  // all empty, still numbers
  CHECK(col(t, "n").values.size() == 2);
  CHECK(std::isnan(col(t, "n").values[0]));
}

TEST_CASE("quote_cell keeps messages on one line and short", "[data][types]") {
  CHECK(forme::quote_cell("a\r\nb\tc") == "a\\r\\nb\\tc");
  CHECK(forme::quote_cell(std::string(40, 'x')) == std::string(40, 'x'));
  // 41 characters of two bytes each: cut after the 40th whole character.
  std::string long_text;
  for (int i = 0; i < 41; ++i) long_text += "é";
  std::string expected;
  for (int i = 0; i < 40; ++i) expected += "é";
  CHECK(forme::quote_cell(long_text) == expected + "…");
}
