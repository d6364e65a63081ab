// Limits set by name from the command line (`--limit NAME=N`).
#include <catch2/catch.hpp>

#include "base/limits.h"

using forme::Limits;
using forme::set_limit;

TEST_CASE("every limit can be set by its name, and only to a positive whole number", "[base][limits]") {
  for (const auto& l : forme::limit_names()) {
    Limits limits;
    CHECK(set_limit(limits, std::string(l.name) + "=7").empty());
    CHECK_FALSE(set_limit(limits, std::string(l.name) + "=0").empty());
    CHECK_FALSE(set_limit(limits, std::string(l.name) + "=-3").empty());
    CHECK_FALSE(set_limit(limits, std::string(l.name) + "=7x").empty());
    CHECK_FALSE(set_limit(limits, std::string(l.name)).empty());
  }
  Limits limits;
  REQUIRE(set_limit(limits, "points-per-series=5000000").empty());
  CHECK(limits.points_per_series == 5'000'000);
  REQUIRE(set_limit(limits, "nesting-depth=12").empty());
  CHECK(limits.nesting_depth == 12);
  CHECK(limits.labels == Limits{}.labels);  // the others untouched
  // int-valued limits refuse what an int cannot hold.
  CHECK_FALSE(set_limit(limits, "yaml-aliases=3000000000").empty());
  CHECK(set_limit(limits, "points=3").find("unknown limit 'points'") == 0);
}
