// Least-squares lines, checked on Anscombe's quartet (check-values §9).
#include <catch2/catch.hpp>

#include <cmath>
#include <cstdio>
#include <limits>
#include <string>
#include <vector>

#include "scale/fit.h"

using forme::fit_line;
using forme::LinearFit;
using V = std::vector<double>;

namespace {

// F. J. Anscombe, "Graphs in statistical analysis", The American
// Statistician 27(1), 1973; data as in check-values §9 (V2).
const V kX123 = {10, 8, 13, 9, 11, 14, 6, 4, 12, 7, 5};
const V kY1 = {8.04, 6.95, 7.58, 8.81, 8.33, 9.96, 7.24, 4.26, 10.84, 4.82, 5.68};
const V kY2 = {9.14, 8.14, 8.74, 8.77, 9.26, 8.10, 6.13, 3.10, 9.13, 7.26, 4.74};
const V kY3 = {7.46, 6.77, 12.74, 7.11, 7.81, 8.84, 6.08, 5.39, 8.15, 6.42, 5.73};
const V kX4 = {8, 8, 8, 8, 8, 8, 8, 19, 8, 8, 8};
const V kY4 = {6.58, 5.76, 7.71, 8.84, 8.47, 7.04, 5.25, 12.50, 5.56, 7.91, 6.89};

std::string fixed(double v, int decimals) {
  char buf[64];
  std::snprintf(buf, sizeof buf, "%.*f", decimals, v);
  return buf;
}

struct Set {
  const char* name;
  const V& x;
  const V& y;
  const char* r_printed;     // published r, 3 decimals
  const char* r2_percent;    // published R², percent with 1 decimal
  double r, b0, b1, r2;      // check-values D values (regression)
};

const Set kSets[] = {
    {"I", kX123, kY1, "0.816", "66.7", 0.816421, 3.000091, 0.500091, 0.666542},
    {"II", kX123, kY2, "0.816", "66.6", 0.816237, 3.000909, 0.500000, 0.666242},
    {"III", kX123, kY3, "0.816", "66.6", 0.816287, 3.002455, 0.499727, 0.666324},
    {"IV", kX4, kY4, "0.817", "66.7", 0.816521, 3.001727, 0.499909, 0.666707},
};

}  // namespace

TEST_CASE("Anscombe's quartet: every set fits y = 3.00 + 0.500x", "[scale][fit]") {
  // Published (V2): regression line y = 3.00 + 0.500x for all four sets
  // (Duke STA113 "Anscombe Data Sets"; Oxford Dictionary of Statistics).
  for (const Set& s : kSets) {
    INFO("set " << s.name);
    const auto fit = fit_line(s.x, s.y);
    REQUIRE(fit.has_value());
    CHECK(fit->n == 11);
    CHECK(fixed(fit->slope, 3) == "0.500");
    CHECK(fixed(fit->intercept, 2) == "3.00");
  }
}

TEST_CASE("Anscombe's quartet: r and R² as printed in published output", "[scale][fit]") {
  // Published (V): course handout regression output for all four sets —
  // r 0.816 (set IV prints 0.817), R² 66.7 % (sets II and III print 66.6 %).
  for (const Set& s : kSets) {
    INFO("set " << s.name);
    const auto fit = fit_line(s.x, s.y);
    REQUIRE(fit.has_value());
    CHECK(fixed(fit->r, 3) == s.r_printed);
    CHECK(fixed(100 * fit->r_squared, 1) == s.r2_percent);
  }
}

TEST_CASE("Anscombe's quartet: per-set values to 1e-6 (regression)", "[scale][fit]") {
  // Regression values only: check-values §9 computed these from the data (D).
  for (const Set& s : kSets) {
    INFO("set " << s.name);
    const auto fit = fit_line(s.x, s.y);
    REQUIRE(fit.has_value());
    CHECK(fit->r == Approx(s.r).margin(1e-6));
    CHECK(fit->intercept == Approx(s.b0).margin(1e-6));
    CHECK(fit->slope == Approx(s.b1).margin(1e-6));
    CHECK(fit->r_squared == Approx(s.r2).margin(1e-6));
  }
}

TEST_CASE("fit_line skips pairs with a NaN and refuses what it cannot fit", "[scale][fit]") {
  const double nan = std::numeric_limits<double>::quiet_NaN();
  // Set I with two extra pairs that each have a NaN: the same line.
  V x = kX123, y = kY1;
  x.push_back(nan);
  y.push_back(100);
  x.push_back(3);
  y.push_back(nan);
  const auto with_gaps = fit_line(x, y);
  const auto clean = fit_line(kX123, kY1);
  REQUIRE(with_gaps.has_value());
  CHECK(with_gaps->n == 11);
  CHECK(with_gaps->slope == clean->slope);
  CHECK(with_gaps->intercept == clean->intercept);

  CHECK_FALSE(fit_line(V{1}, V{2}).has_value());                    // one pair
  CHECK_FALSE(fit_line(V{1, nan}, V{2, 3}).has_value());            // one usable pair
  CHECK_FALSE(fit_line(V{4, 4, 4}, V{1, 2, 3}).has_value());        // no x variance
  CHECK_FALSE(fit_line(V{1, 2, 3}, V{1, 2}).has_value());           // lengths differ
  CHECK_FALSE(fit_line(V{}, V{}).has_value());
}

TEST_CASE("fit_line on exact lines", "[scale][fit]") {
  const auto up = fit_line(V{1, 2, 3, 4}, V{5, 7, 9, 11});
  REQUIRE(up.has_value());
  CHECK(up->slope == Approx(2));
  CHECK(up->intercept == Approx(3));
  CHECK(up->r == Approx(1));
  const auto down = fit_line(V{0, 1, 2}, V{4, 2, 0});
  CHECK(down->r == Approx(-1));
  CHECK(down->r_squared == Approx(1));
  // Constant y: the line is exact but correlation is undefined.
  const auto flat = fit_line(V{1, 2, 3}, V{7, 7, 7});
  REQUIRE(flat.has_value());
  CHECK(flat->slope == 0);
  CHECK(flat->intercept == 7);
  CHECK(std::isnan(flat->r));
  CHECK(std::isnan(flat->r_squared));
  // Large offsets: sums about the means keep the slope exact.
  const auto offset = fit_line(V{1e9 + 1, 1e9 + 2, 1e9 + 3}, V{1e9, 1e9 + 2, 1e9 + 4});
  CHECK(offset->slope == Approx(2).epsilon(1e-12));
}
