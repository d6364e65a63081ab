// The CSV format forme reads: RFC 4180 §2 (Y. Shafranovich, "Common Format
// and MIME Type for Comma-Separated Values (CSV) Files", October 2005).
// Rule numbers below are the numbered items of RFC 4180 §2; their examples
// are used with a header row added, since forme requires one (rule 3).
#include <catch2/catch.hpp>

#include "data/csv_reader.h"
#include "unit/data/csv_test_support.h"

using forme::ColumnType;
using forme::parse_csv;
using forme::Table;
using forme::test::same_table;

namespace {
const std::vector<std::string>& texts(const Table& t, std::size_t column) { return t.columns.at(column).text; }
}  // namespace

TEST_CASE("RFC 4180 rule 1: each record on its own line, delimited by CRLF", "[data][csv]") {
  const Table t = parse_csv("a,b,c\r\naaa,bbb,ccc\r\nzzz,yyy,xxx\r\n", "t.csv");
  REQUIRE(t.rows == 2);
  REQUIRE(t.columns.size() == 3);
  CHECK(texts(t, 0) == std::vector<std::string>{"aaa", "zzz"});
  CHECK(texts(t, 1) == std::vector<std::string>{"bbb", "yyy"});
  CHECK(texts(t, 2) == std::vector<std::string>{"ccc", "xxx"});
  CHECK(t.row_lines == std::vector<int>{2, 3});
  CHECK(t.path == "t.csv");
}

TEST_CASE("RFC 4180 rule 2: the last record may lack a line break", "[data][csv]") {
  const Table with = parse_csv("a,b,c\r\naaa,bbb,ccc\r\nzzz,yyy,xxx\r\n", "t.csv");
  const Table without = parse_csv("a,b,c\r\naaa,bbb,ccc\r\nzzz,yyy,xxx", "t.csv");
  CHECK(same_table(with, without));
  CHECK(without.rows == 2);
}

TEST_CASE("RFC 4180 rule 3: the header line names the fields", "[data][csv]") {
  const Table t = parse_csv("field_1,field_2,field_3\r\naaa,bbb,ccc\r\n", "t.csv");
  REQUIRE(t.columns.size() == 3);
  CHECK(t.columns[0].name == "field_1");
  CHECK(t.columns[2].name == "field_3");
  REQUIRE(t.find("field_2") != nullptr);
  CHECK(t.find("field_2")->text == std::vector<std::string>{"bbb"});
  CHECK(t.find("Field_2") == nullptr);  // exact names only
  CHECK(t.find("field") == nullptr);
  // header_col is the character column where each name starts.
  CHECK(t.columns[0].header_col == 1);
  CHECK(t.columns[1].header_col == 9);
  CHECK(t.columns[2].header_col == 17);
}

TEST_CASE("RFC 4180 rule 4: spaces are part of a field, but header names are trimmed", "[data][csv]") {
  // Rule 4 says spaces are part of the field: cell text keeps them. forme
  // deliberately trims header names so "a, b" names a column "b".
  const Table t = parse_csv("a, b\naaa, bbb \n", "t.csv");
  CHECK(t.columns[1].name == "b");
  CHECK(t.columns[1].header_col == 3);  // where the field starts, blank included
  CHECK(texts(t, 1) == std::vector<std::string>{" bbb "});
}

TEST_CASE("RFC 4180 rule 5: fields may be enclosed in double quotes", "[data][csv]") {
  const Table quoted = parse_csv("a,b,c\r\n\"aaa\",\"bbb\",\"ccc\"\r\nzzz,yyy,xxx", "t.csv");
  CHECK(texts(quoted, 0) == std::vector<std::string>{"aaa", "zzz"});
  CHECK(texts(quoted, 1) == std::vector<std::string>{"bbb", "yyy"});
  CHECK(texts(quoted, 2) == std::vector<std::string>{"ccc", "xxx"});
  // Quoted header names too, and an empty quoted field is an empty cell.
  const Table t = parse_csv("\"x\",\"y\"\n\"\",\"1\"\n", "t.csv");
  CHECK(t.columns[0].name == "x");
  CHECK(texts(t, 0) == std::vector<std::string>{""});
  CHECK(t.columns[1].type == ColumnType::number);
}

TEST_CASE("RFC 4180 rule 6: quoted fields hold line breaks, quotes and commas", "[data][csv]") {
  const Table t = parse_csv("a,b,c\r\n\"aaa\",\"b\r\nbb\",\"ccc\"\r\nzzz,yyy,xxx", "t.csv");
  REQUIRE(t.rows == 2);
  CHECK(texts(t, 1) == std::vector<std::string>{"b\nbb", "yyy"});  // CRLF inside is kept as "\n"
  CHECK(t.row_lines == std::vector<int>{2, 4});                   // the first record spans lines 2-3

  const Table commas = parse_csv("name,note\n\"Smith, J.\",\"a, b, c\"\n", "t.csv");
  CHECK(texts(commas, 0) == std::vector<std::string>{"Smith, J."});
  CHECK(texts(commas, 1) == std::vector<std::string>{"a, b, c"});
}

TEST_CASE("RFC 4180 rule 7: a quote inside a quoted field is doubled", "[data][csv]") {
  const Table t = parse_csv("a,b,c\r\n\"aaa\",\"b\"\"bb\",\"ccc\"\r\n", "t.csv");
  CHECK(texts(t, 1) == std::vector<std::string>{"b\"bb"});
  const Table edges = parse_csv("q\n\"\"\"\"\n\"\"\"x\"\"\"\n", "t.csv");
  CHECK(texts(edges, 0) == std::vector<std::string>{"\"", "\"x\""});
}

TEST_CASE("CRLF, LF and CR line ends give identical tables", "[data][csv]") {
  const std::string lf =
      "region,year,value,note\n"
      "North,2021,12.5,\"two\nlines\"\n"
      "South,2022,,\"say \"\"hi\"\"\"\n"
      "East,2023,-3,plain";
  std::string crlf;
  std::string cr;
  for (char c : lf) {
    crlf += c == '\n' ? std::string("\r\n") : std::string(1, c);
    cr += c == '\n' ? '\r' : c;
  }
  const Table a = parse_csv(lf, "t.csv");
  const Table b = parse_csv(crlf, "t.csv");
  const Table c = parse_csv(cr, "t.csv");
  CHECK(same_table(a, b));
  CHECK(same_table(a, c));
  CHECK(a.row_lines == std::vector<int>{2, 4, 5});
  CHECK(texts(a, 3) == std::vector<std::string>{"two\nlines", "say \"hi\"", "plain"});
  CHECK(a.find("value")->type == ColumnType::number);
  CHECK(a.find("year")->type == ColumnType::date);
}

TEST_CASE("a UTF-8 byte-order mark is stripped", "[data][csv]") {
  const Table with = parse_csv("\xEF\xBB\xBFname,value\nx,1\n", "t.csv");
  const Table without = parse_csv("name,value\nx,1\n", "t.csv");
  CHECK(with.columns[0].name == "name");
  CHECK(with.columns[0].header_col == 1);
  CHECK(same_table(with, without));
  // A BOM-only file has no header.
  CHECK(forme::test::csv_error("\xEF\xBB\xBF") == "t.csv: error: table has no header row");
}

TEST_CASE("blank lines are skipped, and empty fields are empty cells", "[data][csv]") {
  const Table t = parse_csv("\n\na,b,c\n\n1,,3\n\r\n,2,\n\n\n", "t.csv");
  REQUIRE(t.rows == 2);
  CHECK(t.row_lines == std::vector<int>{5, 7});
  CHECK(texts(t, 0) == std::vector<std::string>{"1", ""});
  CHECK(texts(t, 1) == std::vector<std::string>{"", "2"});
  CHECK(texts(t, 2) == std::vector<std::string>{"3", ""});
  CHECK(t.columns[0].header_col == 1);
}

TEST_CASE("columns are counted in characters, not bytes", "[data][csv]") {
  // "é" is two bytes and "€" three; each counts as one column.
  const Table t = parse_csv("é,x\n€,1\n", "t.csv");
  CHECK(t.columns[0].name == "é");
  CHECK(t.columns[1].header_col == 3);
  CHECK(forme::test::csv_error("é,x\n€,oo\"ps\n") ==
        "t.csv:2:5: error: quote character inside an unquoted field");
}
