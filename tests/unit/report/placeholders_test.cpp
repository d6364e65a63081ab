// Placeholders: $(name) replaced by a value, $$ a literal dollar sign, and
// every mistake located at the byte where it is.
#include <catch2/catch.hpp>

#include "report/placeholders.h"

using namespace forme;

TEST_CASE("placeholders are found with their names and offsets", "[report]") {
  auto found = find_placeholders("The $(station) station, $(section)", SourceLoc{"p.yaml", 3, 10});
  REQUIRE(found.size() == 2);
  CHECK(found[0].name == "station");
  CHECK(found[0].offset == 4);
  CHECK(found[1].name == "section");
}

TEST_CASE("a doubled dollar sign is a literal dollar sign, not a placeholder", "[report]") {
  CHECK(find_placeholders("costs $$(station)", SourceLoc{}).empty());
  CHECK(fill_placeholders("costs $$5 at $(station)", {{"station", "Lode End"}}) == "costs $5 at Lode End");
  // A lone dollar sign stays as written.
  CHECK(fill_placeholders("$5", {}) == "$5");
}

TEST_CASE("an unclosed placeholder is an error at its dollar sign", "[report]") {
  try {
    find_placeholders("Station $(station", SourceLoc{"p.yaml", 5, 20});
    FAIL("no error");
  } catch (const InputError& e) {
    CHECK(e.diagnostic().loc.line == 5);
    CHECK(e.diagnostic().loc.col == 28);
    CHECK(e.diagnostic().message == "placeholder '$(' is never closed");
  }
}

TEST_CASE("a placeholder name with a space is refused", "[report]") {
  CHECK_THROWS_AS(find_placeholders("$(pump station)", SourceLoc{}), InputError);
  CHECK_THROWS_AS(find_placeholders("$()", SourceLoc{}), InputError);
}

TEST_CASE("filling a YAML tree replaces scalar values, keeps their line and column, then restores them", "[report]") {
  YamlDocument doc = parse_yaml("heading:\n  title: The $(station) station\nnotes: [\"$(station)\", plain]\n", "p.yaml");
  {
    FilledTree filled(doc.root, {{"station", "Wash Dyke"}});
    CHECK(doc.root["heading"]["title"].Scalar() == "The Wash Dyke station");
    CHECK(doc.root["notes"][0].Scalar() == "Wash Dyke");
    CHECK(doc.root["notes"][1].Scalar() == "plain");
    CHECK(doc.loc(doc.root["heading"]["title"]).line == 2);
    CHECK(doc.loc(doc.root["heading"]["title"]).col == 10);
  }
  // Out of scope, the tree reads as written.
  CHECK(doc.root["heading"]["title"].Scalar() == "The $(station) station");
  CHECK(doc.root["notes"][0].Scalar() == "$(station)");
}

TEST_CASE("unknown placeholder names are located at the placeholder, quoted or not", "[report]") {
  YamlDocument doc = parse_yaml("a: x $(stattion)\nb: \"$(site)\"\nc: $(station)\n", "p.yaml");
  std::vector<Diagnostic> errors;
  check_placeholders(doc, doc.root, {"station"}, errors);
  REQUIRE(errors.size() == 2);
  CHECK(errors[0].loc.line == 1);
  CHECK(errors[0].loc.col == 6);
  CHECK(errors[0].message == "unknown placeholder '$(stattion)'");
  CHECK(errors[1].loc.line == 2);
  CHECK(errors[1].loc.col == 5);
}
