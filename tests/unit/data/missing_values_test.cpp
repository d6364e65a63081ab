// Missing values and the "nearly all" inference rule: a stray cell in a
// typed column is an error at that cell naming its column, never a silent
// change of the column's type (rule in data/column_types.h).
#include <catch2/catch.hpp>

#include <cmath>

#include "data/column_types.h"
#include "data/csv_reader.h"
#include "data/dates.h"
#include "unit/data/csv_test_support.h"

using forme::ColumnType;
using forme::CsvOptions;
using forme::parse_csv;
using forme::test::csv_error;
using forme::test::csv_hint;

namespace {
const forme::Column& col(const forme::Table& t, std::string_view name) {
  const forme::Column* c = t.find(name);
  REQUIRE(c != nullptr);
  return *c;
}
}  // namespace

TEST_CASE("declared missing-value markers are gaps, like empty cells", "[data][missing]") {
  CsvOptions o;
  o.missing = {"NA", "n/a", "-"};
  const forme::Table t = parse_csv("year,v\n2019,1\n2020,NA\n2021, n/a \n2022,-\n2023,5\n", "t.csv", o);
  const forme::Column& v = col(t, "v");
  CHECK(v.type == ColumnType::number);
  REQUIRE(v.values.size() == 5);
  CHECK(v.values[0] == 1);
  CHECK(std::isnan(v.values[1]));
  CHECK(std::isnan(v.values[2]));  // blanks around a marker are trimmed, as for numbers
  CHECK(std::isnan(v.values[3]));
  CHECK(v.values[4] == 5);
  CHECK(v.text[1] == "NA");  // the text as written stays
  CHECK(col(t, "year").type == ColumnType::date);
  // Markers match whole cells, case as written: "na" is not "NA".
  CHECK(csv_error("v\n1\nna\n3\n4\n", o) == "t.csv:3:1: error: cell 'na' in column 'v' is not a number");
}

TEST_CASE("an undeclared missing-value word in a number column is an error at its cell", "[data][missing]") {
  // Two cells only: the word decides nothing, the column is numbers.
  CHECK(csv_error("v\n5\nNA\n") == "t.csv:3:1: error: cell 'NA' in column 'v' is not a number");
  CHECK(csv_hint("v\n5\nNA\n") ==
        "declare it as a missing-value marker of the table, e.g. 'missing: [NA]' beside its 'file:', or leave the cell empty");
  CHECK(csv_error("id,riders\n1,10\n2,12\n3,n/a\n") == "t.csv:4:3: error: cell 'n/a' in column 'riders' is not a number");
  // A year column with an NA: still years, and the error names the year column.
  CHECK(csv_error("year,v\n2017,1\nNA,2\n2019,3\n") == "t.csv:3:1: error: cell 'NA' in column 'year' is not a date");
}

TEST_CASE("nearly all: one stray text among numbers is an error, a few numbers among names are names", "[data][missing]") {
  // 9 numbers and one word: numbers, and the word is refused where it is.
  CHECK(csv_error("v\n1\n2\n3\n4\nlots\n6\n7\n8\n9\n10\n") == "t.csv:6:1: error: cell 'lots' in column 'v' is not a number");
  CHECK(csv_hint("v\n1\n2\n3\n4\nlots\n6\n7\n8\n9\n10\n") ==
        "the rest of the column holds numbers; if it is a column of names, declare it under the table's 'types' as text");
  // Names with one number-like name: text, drawn as categories.
  const forme::Table t = parse_csv("place,v\nAshford,1\nKelby,2\n2020,3\nBrill,4\n", "t.csv");
  CHECK(col(t, "place").type == ColumnType::text);
  // Two of three cells numbers is not nearly all: text (a small table of periods).
  const forme::Table u = parse_csv("period,v\n2019,1\n2020,2\nLater,3\n", "t.csv");
  CHECK(col(u, "period").type == ColumnType::text);
  // 20 cells, two strays: one in ten is still nearly all, so both are errors; the first is reported.
  std::string many = "v\n";
  for (int i = 0; i < 18; ++i) many += std::to_string(i) + "\n";
  CHECK(csv_error(many + "x\ny\n") == "t.csv:20:1: error: cell 'x' in column 'v' is not a number");
  // Three strays in 20: text.
  CHECK(csv_error(many.substr(0, many.size() - 3) + "x\ny\nz\n") == "no error");
  // Declared as text, a stray-looking column is names.
  CsvOptions o;
  o.declared["v"] = ColumnType::text;
  CHECK(csv_error("v\n1\n2\n3\n4\nlots\n", o) == "no error");
}

TEST_CASE("a date that does not exist is an error saying why", "[data][missing]") {
  // Days per month by the Gregorian calendar: 2024 is a leap year, 2023 and 1900 are not.
  CHECK(csv_error("day,v\n2024-02-28,1\n2024-02-30,2\n2024-03-01,3\n") ==
        "t.csv:3:1: error: cell '2024-02-30' in column 'day' is not a date: February 2024 has 29 days");
  CHECK(csv_hint("day,v\n2024-02-28,1\n2024-02-30,2\n2024-03-01,3\n") == "the rest of the column holds dates, e.g. '2024-02-28'");
  CHECK(csv_error("day\n2023-02-28\n2023-02-29\n") ==
        "t.csv:3:1: error: cell '2023-02-29' in column 'day' is not a date: February 2023 has 28 days");
  CHECK(csv_error("day\n1900-02-28\n1900-02-29\n") ==
        "t.csv:3:1: error: cell '1900-02-29' in column 'day' is not a date: February 1900 has 28 days");
  CHECK(csv_error("day\n2024-04-30\n2024-04-31\n") ==
        "t.csv:3:1: error: cell '2024-04-31' in column 'day' is not a date: April 2024 has 30 days");
  CHECK(csv_error("month,v\n2024-11,1\n2024-12,2\n2024-13,3\n") ==
        "t.csv:4:1: error: cell '2024-13' in column 'month' is not a date: there is no month 13");
  CHECK(csv_error("day\n2024-01-01\n2024-01-00\n") == "t.csv:3:1: error: cell '2024-01-00' in column 'day' is not a date: there is no day 0");
  // Years spanning two calendar years ("2017-18") are names, not months.
  const forme::Table t = parse_csv("season,v\n2016-17,1\n2017-18,2\n2018-19,3\n2019-20,4\n", "t.csv");
  CHECK(col(t, "season").type == ColumnType::text);
}

TEST_CASE("why_not_a_date and date_shape", "[data][missing]") {
  CHECK(forme::why_not_a_date("2024-02-29").empty());
  CHECK(forme::why_not_a_date("Tuesday").empty());
  CHECK(forme::why_not_a_date("2024-00") == "there is no month 0");
  CHECK(forme::date_shape("2024") == forme::DatePrecision::year);
  CHECK(forme::date_shape("2024-99") == forme::DatePrecision::month);
  CHECK(forme::date_shape("2024-02-30") == forme::DatePrecision::day);
  CHECK_FALSE(forme::date_shape("2024-2-3"));
  CHECK_FALSE(forme::date_shape("24-02-03"));
}
