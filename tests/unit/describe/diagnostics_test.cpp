// Errors in page descriptions: exact text, with file:line:col, pinned here
// so a change to any message is a visible decision.
#include <catch2/catch.hpp>

#include "base/diagnostic.h"
#include "describe/read_page.h"
#include "describe/schema.h"
#include "describe/suggest.h"
#include "describe/validate.h"

using namespace forme;

namespace {

std::vector<std::string> errors_of(const std::string& yaml) {
  std::vector<std::string> out;
  try {
    YamlDocument doc = parse_yaml(yaml, "page.yaml");
    for (const auto& d : validate_document(doc, page_schema())) out.push_back(format_diagnostic(d));
    if (out.empty()) build_page_spec(doc);
  } catch (const InputError& e) {
    out.push_back(format_diagnostic(e.diagnostic()));
  }
  return out;
}

const char* kPanel = "tables: {t: t.csv}\npanel: {kind: line, table: t, x: a, y: b}\n";

}  // namespace

TEST_CASE("unknown keys name the nearest valid key", "[describe]") {
  auto e = errors_of(std::string("sheet: {size: A4, margns: 18mm}\n") + kPanel);
  REQUIRE(e.size() == 1);
  CHECK(e[0] == "page.yaml:1:19: error: unknown key 'margns' in 'sheet'\n  hint: did you mean 'margins'?");
}

TEST_CASE("an unknown key with no near neighbour lists the valid keys", "[describe]") {
  auto e = errors_of(std::string("heading: {colour: red}\n") + kPanel);
  REQUIRE(e.size() == 1);
  CHECK(e[0] == "page.yaml:1:11: error: unknown key 'colour' in 'heading'\n  hint: valid keys here: title, standfirst");
}

TEST_CASE("duplicate keys are errors, pointing at the second", "[describe]") {
  auto e = errors_of(std::string("source: one\nsource: two\n") + kPanel);
  REQUIRE(e.size() == 1);
  CHECK(e[0] == "page.yaml:2:1: error: duplicate key 'source'\n  hint: it was already given on line 1; each key may appear once");
}

TEST_CASE("a missing required key is reported at its parent", "[describe]") {
  auto e = errors_of("tables:\n  t: {types: {a: number}}\npanel: {kind: line, table: t, x: a, y: b}\n");
  REQUIRE(e.size() == 1);
  CHECK(e[0] == "page.yaml:2:6: error: missing required key 'file' in 'tables.t'\n  hint: CSV file, relative to the page description");
}

TEST_CASE("YAML syntax errors carry yaml-cpp's line and column", "[describe]") {
  auto e = errors_of("sheet: {size: A4\npanel: x\n");
  REQUIRE(e.size() == 1);
  CHECK(e[0].rfind("page.yaml:", 0) == 0);
  CHECK(e[0].find(": error: ") != std::string::npos);
}

TEST_CASE("tabs in indentation are refused at the tab", "[describe]") {
  auto e = errors_of("sheet:\n\tsize: A4\n");
  REQUIRE(e.size() == 1);
  CHECK(e[0] == "page.yaml:2:1: error: tab character in indentation\n  hint: YAML indents with spaces only");
}

TEST_CASE("an unterminated quoted string is refused at its opening quote", "[describe]") {
  auto e = errors_of(std::string("source: \"Kestrel Valley\n") + kPanel);
  REQUIRE(!e.empty());
  CHECK(e[0] == "page.yaml:1:9: error: quoted string is never closed\n  hint: add the closing \"");
}

TEST_CASE("wrong shapes and values say what was expected", "[describe]") {
  auto e = errors_of(std::string("sheet: {margins: 18}\n") + kPanel);
  REQUIRE(e.size() == 1);
  CHECK(e[0] == "page.yaml:1:18: error: margin '18' is not a length\n  hint: write lengths with units, e.g. 18mm");

  e = errors_of("tables: {t: t.csv}\npanel: {kind: lines, table: t, x: a, y: b}\n");
  REQUIRE(e.size() == 1);
  CHECK(e[0] == "page.yaml:2:15: error: 'panel.kind' should be a chart kind, not 'lines'\n  hint: did you mean 'line'?");

  e = errors_of("tables: [a, b]\npanel: {kind: line}\n");
  REQUIRE(e.size() == 1);
  CHECK(e[0] == "page.yaml:1:9: error: 'tables' should be named tables, not a list");
}

TEST_CASE("unknown sheet sizes and crowded margins are refused", "[describe]") {
  auto e = errors_of(std::string("sheet: {size: A7}\n") + kPanel);
  REQUIRE(e.size() == 1);
  CHECK(e[0] == "page.yaml:1:15: error: unknown sheet size 'A7'\n  hint: use A0-A6, B0-B6, letter, legal, tabloid, or WIDTH x HEIGHT such as \"120mm x 80mm\"");
  e = errors_of(std::string("sheet: {size: A6, margins: 60mm}\n") + kPanel);
  REQUIRE(e.size() == 1);
  CHECK(e[0] == "page.yaml:1:28: error: margins leave almost no room on the sheet\n  hint: margins may take at most 80% of the sheet's width or height");
}

TEST_CASE("a valid description builds the page it describes", "[describe]") {
  YamlDocument doc = parse_yaml(
      "sheet: {size: A5, orientation: landscape, margins: 10mm 20mm}\n"
      "heading: {title: T, standfirst: S}\n"
      "tables: {t: data/t.csv}\n"
      "grid: {columns: 2, one-panel-per: site}\n"
      "panel: {kind: vertical-bar, table: t, x: a, y: b, y-unit: t}\n"
      "notes: [n1, n2]\n",
      "dir/page.yaml");
  REQUIRE(validate_document(doc, page_schema()).empty());
  PageSpec p = build_page_spec(doc);
  // ISO 216 A5 = 148 × 210 mm; landscape swaps; 1 mm = 72/25.4 pt.
  CHECK(p.sheet.width == Approx(210 * 72 / 25.4));
  CHECK(p.sheet.height == Approx(148 * 72 / 25.4));
  CHECK(p.sheet.margins.top == Approx(10 * 72 / 25.4));
  CHECK(p.sheet.margins.left == Approx(20 * 72 / 25.4));
  CHECK(p.tables.at(0).path == "dir/data/t.csv");
  CHECK(p.grid.columns == 2);
  CHECK(p.grid.one_panel_per.value == "site");
  CHECK(p.grid.one_panel_per.loc.line == 4);
  CHECK(p.panels.at(0).kind == ChartKind::vertical_bar);
  CHECK(p.notes.size() == 2);
}

TEST_CASE("edit distance counts adjacent transpositions once", "[describe]") {
  // Optimal string alignment distance (Damerau 1964; Wagner & Lowrance 1975).
  CHECK(edit_distance("margins", "margnis") == 1);
  CHECK(edit_distance("kitten", "sitting") == 3);  // the classic Levenshtein example
  CHECK(edit_distance("", "abc") == 3);
  CHECK(nearest("colums", {"columns", "rows", "gap"}) == std::optional<std::string>("columns"));
  CHECK(!nearest("zzzzzz", {"columns", "rows"}).has_value());
}
