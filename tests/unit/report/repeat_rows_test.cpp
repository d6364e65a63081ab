// The rows behind repeated pages: distinct values in the order asked for,
// and the table split so each part holds exactly its value's rows.
#include <catch2/catch.hpp>

#include "report/repeat_rows.h"

using namespace forme;

namespace {

Table stations() {
  Table t;
  t.name = "hours";
  t.rows = 5;
  t.columns.push_back({"station", ColumnType::text, DatePrecision::day, {}, {"Wash", "Lode", "Wash", "", "Bittern"}, 1});
  t.columns.push_back({"hours", ColumnType::number, DatePrecision::day, {1, 2, 3, 4, 5}, {"1", "2", "3", "4", "5"}, 2});
  t.row_lines = {2, 3, 4, 5, 6};
  return t;
}

RepeatSpec by_station(RepeatSpec::Order order = RepeatSpec::Order::as_read) {
  RepeatSpec r;
  r.table = {"hours", {}};
  r.column = {"station", {"r.yaml", 4, 9}};
  r.order = order;
  return r;
}

}  // namespace

TEST_CASE("repeat values come in order of first appearance, without empty cells", "[report]") {
  CHECK(repeat_values(stations(), by_station()) == std::vector<std::string>{"Wash", "Lode", "Bittern"});
}

TEST_CASE("repeat values sorted", "[report]") {
  CHECK(repeat_values(stations(), by_station(RepeatSpec::Order::sorted)) ==
        std::vector<std::string>{"Bittern", "Lode", "Wash"});
}

TEST_CASE("listed repeat values must occur in the column", "[report]") {
  RepeatSpec r = by_station(RepeatSpec::Order::listed);
  r.listed = {{"Lode", {}}, {"Wash", {}}};
  CHECK(repeat_values(stations(), r) == std::vector<std::string>{"Lode", "Wash"});
  r.listed.push_back({"Marsh", {"r.yaml", 7, 5}});
  try {
    repeat_values(stations(), r);
    FAIL("no error");
  } catch (const InputError& e) {
    CHECK(e.diagnostic().loc.line == 7);
  }
}

TEST_CASE("a missing repeat column is an error at the report's column name", "[report]") {
  RepeatSpec r = by_station();
  r.column.value = "site";
  try {
    repeat_values(stations(), r);
    FAIL("no error");
  } catch (const InputError& e) {
    CHECK(e.diagnostic().loc.line == 4);
    CHECK(e.diagnostic().message == "table 'hours' has no column 'site'");
  }
}

TEST_CASE("split rows keep each value's rows, every column and the file lines", "[report]") {
  auto parts = split_rows(stations(), "station");
  REQUIRE(parts.count("Wash") == 1);
  const Table& wash = parts.at("Wash");
  CHECK(wash.rows == 2);
  CHECK(wash.columns[1].values == std::vector<double>{1, 3});
  CHECK(wash.columns[1].text == std::vector<std::string>{"1", "3"});
  CHECK(wash.row_lines == std::vector<int>{2, 4});
  CHECK(parts.at("Bittern").rows == 1);
  std::size_t total = 0;
  for (const auto& [v, t] : parts) total += t.rows;
  CHECK(total == 5);
}
