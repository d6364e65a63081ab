// The YAML guard refuses hostile descriptions cheaply and at the right place.
// The "billion laughs" shape (entities that each refer nine or ten times to
// the one before) is the well-known XML entity-expansion attack, recalled
// from memory; the YAML form uses anchors and aliases the same way.
#include <catch2/catch.hpp>

#include <chrono>
#include <string>

#include "base/diagnostic.h"
#include "base/limits.h"
#include "describe/yaml_document.h"

using namespace forme;

namespace {

std::string error_of(const std::string& yaml, const Limits& limits = {}) {
  try {
    parse_yaml(yaml, "page.yaml", limits);
  } catch (const InputError& e) {
    return format_diagnostic(e.diagnostic());
  }
  return "";
}

std::string first_line(const std::string& s) { return s.substr(0, s.find('\n')); }

// Nine levels, nine aliases each: 9^9 (about 387 million) scalars once expanded.
std::string laughs() {
  std::string y = "a0: &a0 [lol, lol, lol, lol, lol, lol, lol, lol, lol]\n";
  for (int i = 1; i < 10; ++i) {
    y += "a" + std::to_string(i) + ": &a" + std::to_string(i) + " [";
    for (int k = 0; k < 9; ++k) y += std::string(k ? ", " : "") + "*a" + std::to_string(i - 1);
    y += "]\n";
  }
  return y;
}

}  // namespace

TEST_CASE("an alias bomb is refused at the alias that crosses the limit, quickly", "[describe][guard]") {
  const std::string y = laughs();
  CHECK(y.size() < 600);  // a few hundred bytes
  auto t0 = std::chrono::steady_clock::now();
  std::string e = error_of(y);
  auto ms = std::chrono::duration_cast<std::chrono::milliseconds>(std::chrono::steady_clock::now() - t0).count();
  // Levels 0-4 hold 1+9+81+729+6561 lists and 9^5 = 59049 scalars at level 4;
  // the 100,000th node is reached inside line 6 (level 5), at its first alias
  // that pushes the total over: worked by hand from the weights above.
  CHECK(first_line(e) == "page.yaml:6:10: error: aliases expand to more than 100000 values");
  CHECK(ms < 1000);  // milliseconds, not the hours an expansion would take
}

TEST_CASE("alias and anchor counts are limited", "[describe][guard]") {
  Limits l;
  l.yaml_aliases = 2;
  CHECK(first_line(error_of("a: &x 1\nb: [*x, *x, *x]\n", l)) ==
        "page.yaml:2:13: error: more than 2 aliases");
  l = Limits{};
  l.yaml_anchors = 1;
  CHECK(first_line(error_of("a: &x 1\nb: &y 2\n", l)) == "page.yaml:2:4: error: more than 1 anchors");
  CHECK(error_of("a: &x 1\nb: *x\n", l).empty());
}

TEST_CASE("nesting deeper than the limit is refused where it crosses the limit", "[describe][guard]") {
  // A mapping at the root is level 1; each '[' one more: the 64th '[' (column
  // 7 + 64 = 71) opens level 65.
  std::string deep = "notes: " + std::string(100, '[') + std::string(100, ']') + "\n";
  CHECK(first_line(error_of(deep)) == "page.yaml:1:71: error: nesting deeper than 64 levels");
  // Unclosed brackets are found at the same place.
  CHECK(first_line(error_of("notes: " + std::string(100, '[') + "\n")) ==
        "page.yaml:1:71: error: nesting deeper than 64 levels");
  // Block nesting by indentation counts too.
  Limits l;
  l.nesting_depth = 3;
  CHECK(first_line(error_of("a:\n  b:\n    c:\n      d: 1\n", l)) ==
        "page.yaml:4:7: error: nesting deeper than 3 levels");
  CHECK(error_of("a:\n  b:\n    c: 1\n", l).empty());
  // Brackets inside quotes, comments and block scalars are not structure.
  CHECK(error_of("a: \"[[[[[[\"\nb: '{{{{{{'  # [[[[[[\nc: |\n  [[[[[[\n      [[[[\n", l).empty());
}

TEST_CASE("ten thousand open brackets are refused without exhausting the stack", "[describe][guard]") {
  std::string e = error_of("notes: " + std::string(10000, '[') + "\n");
  CHECK(first_line(e) == "page.yaml:1:71: error: nesting deeper than 64 levels");
  // The same with no mapping around it, in flow and in block form.
  CHECK(first_line(error_of(std::string(10000, '['))) == "page.yaml:1:65: error: nesting deeper than 64 levels");
  std::string block;
  for (int i = 0; i < 10000; ++i) block += std::string(static_cast<std::size_t>(i), ' ') + "- x:\n";
  Limits big;
  big.description_bytes = 100u * 1024 * 1024;
  CHECK(first_line(error_of(block, big)).find("error: nesting deeper than 64 levels") != std::string::npos);
}

TEST_CASE("descriptions over the size limit are refused at the first byte beyond it", "[describe][guard]") {
  Limits l;
  l.description_bytes = 10;
  CHECK(first_line(error_of("source: abc\nnotes: []\n", l)) ==
        "page.yaml:1:11: error: page description is larger than 10 bytes");
}

TEST_CASE("a second YAML document is refused rather than ignored", "[describe][guard]") {
  CHECK(first_line(error_of("source: a\n---\nsource: b\n")) ==
        "page.yaml:2:1: error: a second YAML document ('---') in the page description");
  CHECK(error_of("---\nsource: a\n...\n").empty());
}
