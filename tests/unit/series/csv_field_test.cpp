// Quoting one CSV field. Expected forms follow RFC 4180 §2: rule 6 (fields
// holding line breaks, double quotes or commas are enclosed in double
// quotes) and rule 7 (a double quote inside is escaped by another).
#include "series/plotted_rows.h"

#include <catch2/catch.hpp>

TEST_CASE("csv_field leaves plain fields as they are", "[csv]") {
  CHECK(forme::csv_field("aaa") == "aaa");
  CHECK(forme::csv_field("12.5") == "12.5");
  CHECK(forme::csv_field("") == "");
}

TEST_CASE("csv_field quotes commas, line breaks and quotes (RFC 4180 rules 6 and 7)", "[csv]") {
  CHECK(forme::csv_field("North, upper") == "\"North, upper\"");
  CHECK(forme::csv_field("b\r\nbb") == "\"b\r\nbb\"");  // RFC 4180 §2 rule 6 example
  CHECK(forme::csv_field("b\"bb") == "\"b\"\"bb\"");    // RFC 4180 §2 rule 7 example
}

TEST_CASE("csv_field keeps leading and trailing spaces by quoting them", "[csv]") {
  // RFC 4180 §2 rule 4: spaces are part of a field; quoting keeps readers
  // that trim unquoted fields (common practice in spreadsheets) from losing them.
  CHECK(forme::csv_field(" 3") == "\" 3\"");
  CHECK(forme::csv_field("3 ") == "\"3 \"");
}
