// `forme schema` and the validator are made from one vocabulary table; an
// independent implementation, python3-jsonschema, checks that the JSON
// Schema says what the validator does: every good page passes it, the bad
// descriptions the validator refuses it refuses too, and the schema itself
// is valid per the JSON Schema draft 2020-12 metaschema.
#include <catch2/catch.hpp>

#include <filesystem>
#include <fstream>
#include <sstream>

#include "describe/json_schema.h"
#include "describe/schema.h"
#include "support/outside_tools.h"

using namespace forme::test;
namespace fs = std::filesystem;

namespace {

const std::string kChecker = std::string("/usr/bin/python3 ") + FORME_TEST_DIR + "/outside/jsonschema_check.py";

std::string quote(const std::string& s) { return "'" + s + "'"; }

// Writes `forme schema` to a file in `dir` and returns its path.
std::string write_schema(const TempDir& dir) {
  auto r = run_forme("schema");
  REQUIRE(r.exit_code == 0);
  write_file(dir.file("page.schema.json"), r.out);
  return dir.file("page.schema.json");
}

// Runs the checker on `pages` and returns its verdict line for each.
std::vector<std::string> verdicts(const std::string& schema, const std::vector<std::string>& pages) {
  std::string cmd = kChecker + " " + quote(schema);
  for (const auto& p : pages) cmd += " " + quote(p);
  auto r = run(cmd);
  INFO(r.err);
  REQUIRE(r.exit_code == 0);
  std::vector<std::string> lines;
  std::istringstream in(r.out);
  for (std::string line; std::getline(in, line);) lines.push_back(line);
  REQUIRE(lines.size() == pages.size());
  return lines;
}

std::vector<std::string> pages_under(const std::string& folder) {
  std::vector<std::string> out;
  for (const auto& e : fs::recursive_directory_iterator(folder))
    if (e.path().filename() == "page.yaml") out.push_back(e.path().string());
  std::sort(out.begin(), out.end());
  return out;
}

}  // namespace

TEST_CASE("the JSON Schema is valid per its metaschema (JSON Schema draft 2020-12)", "[outside][schema]") {
  TempDir dir;
  auto r = run(kChecker + " " + quote(write_schema(dir)));
  INFO(r.err);
  REQUIRE(r.exit_code == 0);
  CHECK(r.out.rfind("ok ", 0) == 0);
  // The checker picks the validator from "$schema"; this one must be 2020-12.
  CHECK(r.out.find("Draft202012Validator") != std::string::npos);
}

TEST_CASE("every layout, starter and test page validates against the JSON Schema (python3-jsonschema)",
          "[outside][schema]") {
  TempDir dir;
  const std::string schema = write_schema(dir);
  std::vector<std::string> pages = layout_pages();
  for (const auto& p : pages_under(std::string(FORME_TEST_DIR) + "/pages")) pages.push_back(p);
  for (const auto& p : pages_under(std::string(FORME_SOURCE_DIR) + "/starters")) pages.push_back(p);
  REQUIRE(pages.size() >= 9);
  auto lines = verdicts(schema, pages);
  for (std::size_t i = 0; i < pages.size(); ++i) CHECK(lines[i] == "ok " + pages[i]);
}

TEST_CASE("descriptions forme's validator refuses, python3-jsonschema refuses too", "[outside][schema]") {
  TempDir dir;
  const std::string schema = write_schema(dir);
  write_file(dir.file("t.csv"), "day,value\n1,2\n2,3\n");
  const std::string good_rest =
      "tables: {t: t.csv}\npanel: {kind: line, table: t, x: day, y: value, y-unit: t}\nsource: invented\n";
  struct Case {
    const char* name;
    std::string yaml;
    const char* forme_says;  // the start of forme's message for it
  };
  const std::vector<Case> cases = {
      {"unknown top-level key", "colour: red\n" + good_rest, "unknown key 'colour'"},
      {"unknown nested key", "sheet: {size: A4, margin: 12mm}\n" + good_rest, "unknown key 'margin' in 'sheet'"},
      {"wrong enum", "sheet: {orientation: sideways}\n" + good_rest, "'sheet.orientation' should be portrait or landscape"},
      {"wrong chart kind", "tables: {t: t.csv}\npanel: {kind: pie, table: t, x: day, y: value}\n",
       "'panel.kind' should be a chart kind"},
      {"text where a number is wanted", "grid: {columns: three}\n" + good_rest, "'grid.columns' should be a whole number"},
      {"length without unit", "type: {size: 9}\n" + good_rest, "'type.size' should be a length"},
      {"length with unknown unit", "grid: {gap: 4px}\n" + good_rest, "'grid.gap' should be a length"},
      {"list where text is wanted", "source: [a, b]\n" + good_rest.substr(0, good_rest.find("source")),
       "'source' should be a string"},
      {"mapping where a list is wanted", "notes: {a: b}\n" + good_rest, "'notes' should be a list of strings"},
      {"bad column type", "tables: {t: {file: t.csv, types: {day: when}}}\npanel: {kind: line, table: t, x: day, y: value}\n",
       "'tables.t.types.day' should be number, date or text"},
      {"table without file", "tables: {t: {types: {day: number}}}\npanel: {kind: line, table: t, x: day, y: value}\n",
       "missing required key 'file' in 'tables.t'"},
      {"no tables", "panel: {kind: line, table: t, x: day, y: value}\n", "missing required key 'tables'"},
      {"refused key", "tables: {t: t.csv}\npanel: {kind: line, table: t, x: day, y: value, y-right: value}\n",
       "'panel.y-right' is not available"},
      {"wrong number style", "tables: {t: t.csv}\npanel: {kind: line, table: t, x: day, y: value, y-format: money}\n",
       "'panel.y-format' should be a number style"},
      {"boolean written as a word", "tables: {t: t.csv}\npanel: {kind: line, table: t, x: day, y: value, y-format: {thousands: maybe}}\n",
       "'panel.y-format.thousands' should be true or false"},
  };
  std::vector<std::string> paths;
  for (std::size_t i = 0; i < cases.size(); ++i) {
    paths.push_back(dir.file("bad" + std::to_string(i) + ".yaml"));
    write_file(paths.back(), cases[i].yaml);
    // forme refuses it first, with the validator's message.
    auto r = run_forme("check " + quote(paths.back()));
    INFO(cases[i].name << "\n" << r.err);
    CHECK(r.exit_code == 1);
    CHECK(r.err.find(std::string("error: ") + cases[i].forme_says) != std::string::npos);
  }
  auto lines = verdicts(schema, paths);
  for (std::size_t i = 0; i < cases.size(); ++i) {
    INFO(cases[i].name << ": " << lines[i]);
    CHECK(lines[i].rfind("refused " + paths[i] + ":", 0) == 0);
  }
}

TEST_CASE("catalogue cases refused by the validator are refused by the JSON Schema", "[outside][schema]") {
  // tests/bad cases whose first error comes from the vocabulary walk. YAML
  // syntax errors are outside a schema's reach, and so is a duplicate key
  // (a JSON object model keeps only one of them).
  TempDir dir;
  const std::string schema = write_schema(dir);
  const char* validator_messages[] = {"should be", "unknown key", "missing required key", "is not available"};
  std::vector<std::string> pages;
  for (const auto& page : pages_under(std::string(FORME_TEST_DIR) + "/bad")) {
    const std::string expected = read_file((fs::path(page).parent_path() / "expected.txt").string());
    for (const char* m : validator_messages)
      if (expected.find(": error: ") != std::string::npos && expected.find(m) != std::string::npos) {
        pages.push_back(page);
        break;
      }
  }
  REQUIRE(pages.size() >= 5);
  auto lines = verdicts(schema, pages);
  for (std::size_t i = 0; i < pages.size(); ++i) CHECK(lines[i].rfind("refused " + pages[i] + ":", 0) == 0);
}

TEST_CASE("json schema text escapes quotes, backslashes and control characters (RFC 8259 section 7)", "[schema]") {
  forme::NodeSpec leaf;
  leaf.what = "a \"quoted\" \\ word\twith\x01 controls";
  leaf.scalar_ok = true;
  forme::NodeSpec root;
  root.what = "root";
  root.map_ok = true;
  root.keys = {{"k", &leaf, true, {}}};
  const std::string text = forme::json_schema_text(root);
  CHECK(text.find(R"(a \"quoted\" \\ word\twith\u0001 controls)") != std::string::npos);
  CHECK(text.find("\"required\": [\"k\"]") != std::string::npos);
  CHECK(text.find("\"additionalProperties\": false") != std::string::npos);
}
