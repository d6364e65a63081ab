// parse_csv on arbitrary bytes: it returns a consistent table or throws
// InputError with a location, and nothing else; long lines and many fields
// stay linear.
#include <catch2/catch.hpp>

#include <chrono>
#include <random>

#include "data/csv_reader.h"
#include "unit/data/csv_test_support.h"

namespace {

/// Checks the invariants every parsed table keeps.
void check_table(const forme::Table& t) {
  REQUIRE(t.rows > 0);
  REQUIRE(t.row_lines.size() == t.rows);
  REQUIRE_FALSE(t.columns.empty());
  for (std::size_t i = 1; i < t.rows; ++i) REQUIRE(t.row_lines[i] > t.row_lines[i - 1]);
  for (const forme::Column& c : t.columns) {
    REQUIRE_FALSE(c.name.empty());
    REQUIRE(c.header_col >= 1);
    REQUIRE(c.text.size() == t.rows);
    if (c.type == forme::ColumnType::text) REQUIRE(c.values.empty());
    else REQUIRE(c.values.size() == t.rows);
    for (double v : c.values) REQUIRE((std::isnan(v) || std::isfinite(v)));
  }
}

}  // namespace

TEST_CASE("parse_csv on random bytes throws only located InputErrors", "[data][csv][robustness]") {
  // Bytes weighted towards what CSV parsing branches on, plus UTF-8 pieces.
  const std::string alphabet[] = {",",  "\"", "\n", "\r", "\r\n", "a",   "1",  "2024-01-05", " ", "e",
                                  ".",  "-",  "é",  "\xC3", "\xA9", "\xFF", std::string(1, '\0'), "\xEF\xBB\xBF",
                                  "x,y\n", "inf", "\"\""};
  std::mt19937 rng(20240521);  // fixed seed: the same inputs every run
  std::uniform_int_distribution<std::size_t> pick(0, std::size(alphabet) - 1);
  std::uniform_int_distribution<int> length(0, 60);
  std::uniform_int_distribution<int> any_byte(0, 255);
  // A valid table to mutate, so that many inputs get past the tokenizer.
  const std::string valid = "when,value,label\n2024-01-05,1.5,\"a, b\"\n2024-01-06,,c\n2024-01-07,-3,\"x\"\"y\"\n";
  std::uniform_int_distribution<std::size_t> position(0, valid.size());
  int parsed = 0;
  int refused = 0;
  for (int run = 0; run < 20000; ++run) {
    std::string input;
    if (run % 4 == 0) {  // random bytes
      const int n = length(rng);
      for (int i = 0; i < n; ++i) input += static_cast<char>(any_byte(rng));
    } else if (run % 4 == 1) {  // random tokens
      const int n = length(rng);
      for (int i = 0; i < n; ++i) input += alphabet[pick(rng)];
    } else {  // a valid table with one to three tokens inserted or bytes replaced
      input = valid;
      for (int m = 0; m <= run % 3; ++m) {
        const std::size_t at = std::min(position(rng), input.size());
        if (m % 2 == 0) input.insert(at, alphabet[pick(rng)]);
        else if (at < input.size()) input[at] = static_cast<char>(any_byte(rng));
      }
    }
    try {
      const forme::Table t = forme::parse_csv(input, "f.csv");
      check_table(t);
      ++parsed;
    } catch (const forme::InputError& e) {
      const forme::SourceLoc& loc = e.diagnostic().loc;
      REQUIRE(loc.file == "f.csv");
      REQUIRE(loc.line >= 0);
      REQUIRE(loc.col >= 0);
      if (loc.col > 0) REQUIRE(loc.line > 0);
      REQUIRE_FALSE(e.diagnostic().message.empty());
      ++refused;
    }
  }
  // Both outcomes are exercised.
  CHECK(parsed > 500);
  CHECK(refused > 500);
}

TEST_CASE("parse_csv stays linear on wide rows, long fields and many rows", "[data][csv][robustness]") {
  const auto began = std::chrono::steady_clock::now();
  // 300,000 columns in one header line and one row.
  std::string wide;
  for (int i = 0; i < 300000; ++i) wide += (i ? ",c" : "c") + std::to_string(i);
  const int header_length = static_cast<int>(wide.size());
  wide += '\n';
  for (int i = 0; i < 300000; ++i) wide += i ? ",1" : "1";
  const forme::Table t = forme::parse_csv(wide, "big.csv");
  CHECK(t.columns.size() == 300000);
  CHECK(t.columns.back().header_col == header_length - 6);  // "c299999" is 7 characters
  CHECK(t.columns.back().type == forme::ColumnType::number);

  // A 4 MB quoted field of line breaks and doubled quotes, then text after
  // its closing quote.
  std::string quotes = "a\n\"";
  for (int i = 0; i < 1'000'000; ++i) quotes += i % 2 ? "\"\"" : "\r\n";
  quotes += "\"x\n";
  CHECK(forme::test::csv_error(quotes) ==
        "t.csv:500002:4: error: text after the closing quote of a quoted field");

  // 200,000 rows and an unterminated quote at the very end.
  std::string rows = "k,v\n";
  for (int i = 0; i < 200000; ++i) rows += "k,1.5\n";
  rows += "k,\"";
  CHECK(forme::test::csv_error(rows) ==
        "t.csv:200002:3: error: quoted field is not closed: no closing quote before the end of the file");

  // These take about a second; a pass quadratic in the line length or the
  // field count would take many minutes. The bound is loose for slow,
  // sanitized or busy machines.
  const double seconds = std::chrono::duration<double>(std::chrono::steady_clock::now() - began).count();
  CHECK(seconds < 60.0);
}
