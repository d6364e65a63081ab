// How log axes write their ticks and where their minor ticks go. Every
// expected string and tick list is worked by hand from the rules in
// log_labels.h; superscripts are U+2070, U+00B9, U+00B2, U+00B3,
// U+2074…U+2079 and the superscript minus U+207B (Unicode Superscripts
// and Subscripts block).
#include <catch2/catch.hpp>

#include "scale/log_labels.h"
#include "scale/scale.h"

using forme::log_minor_ticks;
using forme::log_tick_labels;
using forme::NumberFormat;
using S = std::vector<std::string>;
using V = std::vector<double>;

TEST_CASE("wide log axes are labelled with the powers themselves", "[scale][log]") {
  CHECK(log_tick_labels({1e-4, 1e-2, 1, 1e2, 1e4, 1e6}, std::nullopt) == S{"10⁻⁴", "10⁻²", "10⁰", "10²", "10⁴", "10⁶"});
  // Twenty decades stay compact: 10⁻¹⁰ is five characters, not 43 digits.
  CHECK(log_tick_labels({1e-10, 1e-5, 1, 1e5, 1e10}, std::nullopt) == S{"10⁻¹⁰", "10⁻⁵", "10⁰", "10⁵", "10¹⁰"});
  CHECK(log_tick_labels({1e3, 2e3, 5e3, 1e4, 2e4, 5e4, 1e5}, std::nullopt) ==
        S{"10³", "2×10³", "5×10³", "10⁴", "2×10⁴", "5×10⁴", "10⁵"});
}

TEST_CASE("narrow log axes are labelled in plain decimals, each its own shortest", "[scale][log]") {
  // The old shared decimal count wrote these 0.001, 0.010, 0.100, 1.000.
  CHECK(log_tick_labels({0.001, 0.01, 0.1, 1}, std::nullopt) == S{"0.001", "0.01", "0.1", "1"});
  CHECK(log_tick_labels({1, 10, 100, 1000, 1e4}, std::nullopt) == S{"1", "10", "100", "1,000", "10,000"});
  CHECK(log_tick_labels({0.1, 0.2, 0.5, 1, 2, 5, 10}, std::nullopt) == S{"0.1", "0.2", "0.5", "1", "2", "5", "10"});
}

TEST_CASE("log axes keep the author's style, prefix and suffix", "[scale][log]") {
  NumberFormat si;
  si.style = NumberFormat::Style::si;
  si.decimals = 3;  // fixed decimals cannot show 0.001 and 1,000 both as they are: not used
  CHECK(log_tick_labels({1e-3, 1, 1e3, 1e6}, si) == S{"1m", "1", "1k", "1M"});
  NumberFormat powers;
  powers.style = NumberFormat::Style::power_of_ten;
  CHECK(log_tick_labels({1, 10, 100}, powers) == S{"10⁰", "10¹", "10²"});
  NumberFormat money;
  money.prefix = "£";
  CHECK(log_tick_labels({1, 1e6}, money) == S{"£10⁰", "£10⁶"});
}

TEST_CASE("minor ticks between labelled decades", "[scale][log]") {
  // Every decade labelled, two decades: 2…9 of each.
  CHECK(log_minor_ticks(1, 100, {1, 10, 100}) == V{2, 3, 4, 5, 6, 7, 8, 9, 20, 30, 40, 50, 60, 70, 80, 90});
  // Thinned to every fifth decade: the skipped decades are the minor ticks.
  CHECK(log_minor_ticks(1e-10, 1e10, {1e-10, 1e-5, 1, 1e5, 1e10}).size() == 16);
  CHECK(log_minor_ticks(1e-2, 1e2, {1e-2, 1, 1e2}) == V{0.1, 10});
  // 1, 2, 5 labelled: the other multiples.
  CHECK(log_minor_ticks(1, 10, {1, 2, 5, 10}) == V{3, 4, 6, 7, 8, 9});
  // Too many decades for 2…9 (they would fill the axis): none.
  CHECK(log_minor_ticks(1, 1e9, {1, 10, 100, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9}).empty());
  // Linear fallback ticks (3.1 … 3.9) have no decades to mark.
  CHECK(log_minor_ticks(3.1, 3.9, {3.1, 3.3, 3.5}).empty());
}

TEST_CASE("thinned decades fall on round powers", "[scale][log]") {
  using forme::LogScale;
  // 11 decades, at most 6: every second power (k = 2), both ends labelled.
  CHECK(LogScale{1e-4, 1e6, 0, 1}.ticks(6) == V{1e-4, 1e-2, 1, 1e2, 1e4, 1e6});
  // 21 decades, at most 5: every fifth (k = 2, 3 leave 11 and 7).
  CHECK(LogScale{1e-10, 1e10, 0, 1}.ticks(5) == V{1e-10, 1e-5, 1, 1e5, 1e10});
  // 61 decades, at most 5: k = 20, the first of 2, 3, 5, 10, 20 that is at least 61 / 5.
  CHECK(LogScale{1e-30, 1e30, 0, 1}.ticks(5) == V{1e-20, 1, 1e20});
}
