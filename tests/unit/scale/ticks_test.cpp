// Numeric ticks: Heckbert's loose labelling and the extended method.
#include <catch2/catch.hpp>

#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <limits>
#include <vector>

#include "scale/ticks.h"

using forme::extended_ticks;
using forme::heckbert_ticks;
using forme::Ticks;
using V = std::vector<double>;

namespace {

// Ticks are built from integers (n·10^e), so they must equal the decimal
// literals exactly, not merely approximately.
void check_values(const Ticks& t, const V& expected) {
  INFO("step " << t.step);
  REQUIRE(t.values.size() == expected.size());
  for (std::size_t i = 0; i < expected.size(); ++i) {
    INFO("tick " << i);
    CHECK(t.values[i] == expected[i]);
  }
}

// Every tick is finite, ticks ascend strictly, and each is its neighbour
// plus the step.
void check_well_formed(const Ticks& t) {
  REQUIRE(t.step > 0);
  REQUIRE(std::isfinite(t.step));
  for (std::size_t i = 0; i < t.values.size(); ++i) {
    CHECK(std::isfinite(t.values[i]));
    CHECK_FALSE((t.values[i] == 0 && std::signbit(t.values[i])));  // never -0
    if (i > 0) {
      CHECK(t.values[i] > t.values[i - 1]);
      CHECK(t.values[i] - t.values[i - 1] == Approx(t.step).epsilon(1e-9));
    }
  }
}

// Printing each tick with `decimals` digits reads back the tick.
void check_decimals_suffice(const Ticks& t) {
  for (double v : t.values) {
    char buf[512];
    std::snprintf(buf, sizeof buf, "%.*f", t.decimals, v);
    INFO(buf << " for " << v << " with " << t.decimals << " decimals");
    CHECK(std::abs(std::strtod(buf, nullptr) - v) <= 1e-9 * t.step);
  }
}

}  // namespace

TEST_CASE("heckbert: published worked example 8.1..14.1 with 4 ticks gives 5 10 15", "[scale][ticks]") {
  // Published: J. Talbot's `labeling` R package (cran/labeling R/labeling.R),
  // roxygen example `heckbert(8.1, 14.1, 4)  # 5 10 15` (check-values §7a, V).
  const Ticks t = heckbert_ticks(8.1, 14.1, 4);
  check_values(t, {5, 10, 15});
  CHECK(t.step == 5);
  CHECK(t.decimals == 0);
  CHECK(t.score == 0);
}

TEST_CASE("heckbert: derived rows of check-values 7a (regression)", "[scale][ticks]") {
  // Regression values only: check-values §7a tags these D (a transcription
  // of Graphics Gems Label.c), not published outputs.
  struct Row {
    double min, max;
    int m;
    V ticks;
    double step;
    int decimals;
  };
  const Row rows[] = {
      {105, 543, 5, {100, 200, 300, 400, 500, 600}, 100, 0},
      {0, 1, 5, {0, 0.2, 0.4, 0.6, 0.8, 1.0}, 0.2, 1},
      {-0.5, 3.2, 5, {-1, 0, 1, 2, 3, 4}, 1, 0},
      {0.001, 0.0093, 5, {0, 0.002, 0.004, 0.006, 0.008, 0.010}, 0.002, 3},
      {-3.7, 12.4, 5, {-5, 0, 5, 10, 15}, 5, 0},
      {1, 9, 5, {0, 2, 4, 6, 8, 10}, 2, 0},
      {35, 85, 5, {30, 40, 50, 60, 70, 80, 90}, 10, 0},
  };
  for (const Row& r : rows) {
    INFO(r.min << " .. " << r.max << ", m = " << r.m);
    const Ticks t = heckbert_ticks(r.min, r.max, r.m);
    check_values(t, r.ticks);
    CHECK(t.step == r.step);
    CHECK(t.decimals == r.decimals);
  }
}

TEST_CASE("extended: published worked example 8.1..14.1 with 4 ticks gives 8 10 12 14", "[scale][ticks]") {
  // Published: `labeling` R package example `extended(8.1, 14.1, 4)  # 8 10 12 14`
  // (check-values §7b, V). The score 0.636111 is D (regression only).
  const Ticks t = extended_ticks(8.1, 14.1, 4);
  check_values(t, {8, 10, 12, 14});
  CHECK(t.step == 2);
  CHECK(t.score == Approx(0.636111).margin(1e-6));
}

TEST_CASE("extended: derived rows of check-values 7b, flexible and only-loose (regression)", "[scale][ticks]") {
  // Regression values only: check-values §7b tags these D (a transcription
  // of the reference R code), not published outputs.
  struct Row {
    double min, max;
    int m;
    V flexible;
    double flexible_score;
    V loose;
    double loose_score;
  };
  const Row rows[] = {
      {8.1, 14.1, 4, {8, 10, 12, 14}, 0.636111, {7.5, 10, 12.5, 15}, 0.275},
      {105, 543, 5, {100, 200, 300, 400, 500}, 0.598566, {100, 200, 300, 400, 500, 600}, 0.454341},
      {0, 1, 5, {0, 0.25, 0.5, 0.75, 1}, 0.85, {0, 0.25, 0.5, 0.75, 1}, 0.85},
      {-0.5, 3.2, 5, {-1, 0, 1, 2, 3}, 0.763167, {-0.5, 0, 0.5, 1, 1.5, 2, 2.5, 3, 3.5}, 0.384259},
      {-3.7, 12.4, 5, {-4, 0, 4, 8, 12}, 0.777855, {-5, 0, 5, 10, 15}, 0.624009},
      {0, 100, 5, {0, 25, 50, 75, 100}, 0.85, {0, 25, 50, 75, 100}, 0.85},
      {35, 85, 5, {40, 50, 60, 70, 80}, 0.425, {35, 45, 55, 65, 75, 85}, 0.325},
  };
  for (const Row& r : rows) {
    INFO(r.min << " .. " << r.max << ", m = " << r.m);
    const Ticks flexible = extended_ticks(r.min, r.max, r.m);
    check_values(flexible, r.flexible);
    CHECK(flexible.score == Approx(r.flexible_score).margin(1e-6));
    const Ticks loose = extended_ticks(r.min, r.max, r.m, true);
    check_values(loose, r.loose);
    CHECK(loose.score == Approx(r.loose_score).margin(1e-6));
  }
}

TEST_CASE("ticks are exact decimals, not sums of a binary step", "[scale][ticks]") {
  // 3 × 0.1 = 0.30000000000000004 in binary; a tick must be the literal 0.3.
  const Ticks t = heckbert_ticks(0, 0.7, 8);
  check_values(t, {0, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7});
  CHECK(t.decimals == 1);
  const Ticks e = extended_ticks(0.1, 0.7, 7);
  for (double v : e.values) CHECK(v == std::round(v * 10) / 10);
}

TEST_CASE("zero is exactly +0 when it is a tick", "[scale][ticks]") {
  for (const Ticks& t : {heckbert_ticks(-0.3, 0.3, 5), extended_ticks(-0.3, 0.3, 5),
                         extended_ticks(-0.3, 0.3, 5, true), heckbert_ticks(-3e-7, 1e-7, 5)}) {
    bool has_zero = false;
    for (double v : t.values)
      if (v == 0) {
        has_zero = true;
        CHECK_FALSE(std::signbit(v));
      }
    CHECK(has_zero);
  }
}

TEST_CASE("decimals suffice to print every tick", "[scale][ticks]") {
  const double ranges[][2] = {{0, 1},      {0.001, 0.0093}, {8.1, 14.1}, {-0.5, 3.2}, {0.15, 0.85},
                              {1e-7, 9e-7}, {12345, 12346},  {2.2, 3.7},  {0, 0.03},   {-1e-3, 7e-3}};
  for (const auto& r : ranges)
    for (int m = 2; m <= 12; ++m) {
      INFO(r[0] << " .. " << r[1] << ", m = " << m);
      check_decimals_suffice(heckbert_ticks(r[0], r[1], m));
      check_decimals_suffice(extended_ticks(r[0], r[1], m));
      check_decimals_suffice(extended_ticks(r[0], r[1], m, true));
    }
}

TEST_CASE("heckbert and only-loose extended ticks cover the data", "[scale][ticks]") {
  // A fixed pseudo-random sweep of ranges and tick counts.
  unsigned state = 12345;
  auto next = [&] {
    state = state * 1103515245u + 12345u;
    return static_cast<double>((state >> 8) & 0xffff) / 65536.0;
  };
  for (int i = 0; i < 300; ++i) {
    const double scale = std::pow(10.0, std::floor(next() * 12) - 6);
    const double a = (next() * 2 - 1) * scale, b = (next() * 2 - 1) * scale;
    const int m = 2 + static_cast<int>(next() * 10);
    INFO(a << " .. " << b << ", m = " << m);
    const double lo = std::min(a, b), hi = std::max(a, b);
    const Ticks h = heckbert_ticks(a, b, m);
    check_well_formed(h);
    CHECK(h.values.front() <= lo);
    CHECK(h.values.back() >= hi);
    const Ticks l = extended_ticks(a, b, m, true);
    check_well_formed(l);
    CHECK(l.values.front() <= lo);
    CHECK(l.values.back() >= hi);
    const Ticks f = extended_ticks(a, b, m);
    check_well_formed(f);
    CHECK(f.values.size() >= 2);
  }
}

TEST_CASE("ends in either order give the same ticks", "[scale][ticks]") {
  CHECK(heckbert_ticks(14.1, 8.1, 4).values == heckbert_ticks(8.1, 14.1, 4).values);
  CHECK(extended_ticks(14.1, 8.1, 4).values == extended_ticks(8.1, 14.1, 4).values);
  CHECK(extended_ticks(-2, -10, 5, true).values == extended_ticks(-10, -2, 5, true).values);
}

TEST_CASE("negative ranges", "[scale][ticks]") {
  check_values(heckbert_ticks(-14.1, -8.1, 4), {-15, -10, -5});
  check_values(extended_ticks(-14.1, -8.1, 4), {-14, -12, -10, -8});
}

TEST_CASE("an empty or vanishing range is widened around its value", "[scale][ticks]") {
  // 5 is widened to 4 .. 6 (5 ± 10^0); 0 to -1 .. 1; -300 to -400 .. -200.
  check_values(heckbert_ticks(5, 5, 5), {4, 4.5, 5, 5.5, 6});
  check_values(heckbert_ticks(0, 0, 5), {-1, -0.5, 0, 0.5, 1});
  check_values(heckbert_ticks(-300, -300, 5), {-400, -350, -300, -250, -200});
  for (auto [a, b] : {std::pair{5.0, 5.0}, {0.0, 0.0}, {-300.0, -300.0}, {1.0, 1.0 + 1e-15},
                      {1e-300, 1e-300}, {7e300, 7e300}}) {
    INFO(a << " .. " << b);
    for (const Ticks& t : {heckbert_ticks(a, b, 5), extended_ticks(a, b, 5), extended_ticks(a, b, 5, true)}) {
      check_well_formed(t);
      CHECK(t.values.size() >= 2);
      CHECK(t.values.size() <= 12);
      CHECK(t.values.front() <= a);
      CHECK(t.values.back() >= b);
    }
  }
}

TEST_CASE("huge and tiny magnitudes give finite, sensible ticks", "[scale][ticks]") {
  check_values(heckbert_ticks(0, 1e300, 5), {0, 2e299, 4e299, 6e299, 8e299, 1e300});
  const double max = std::numeric_limits<double>::max();
  for (auto [a, b] : {std::pair{-max, max}, {0.0, max}, {1e305, 1.7e308}, {-1e-300, 1e-300},
                      {1e-310, 3e-310}, {1e15, 1e15 + 3}, {-1e20, 1e-20}}) {
    INFO(a << " .. " << b);
    for (const Ticks& t : {heckbert_ticks(a, b, 5), extended_ticks(a, b, 5), extended_ticks(a, b, 5, true)}) {
      check_well_formed(t);
      CHECK(t.values.size() >= 2);
      CHECK(t.values.size() <= 12);
    }
  }
  // Subnormal numbers hold only a few digits, so ticks there are coarse
  // approximations; they must still be finite, ascending and cover the value.
  for (const Ticks& t : {heckbert_ticks(1e-320, 1e-320, 5), extended_ticks(0, 1e-321, 5)}) {
    REQUIRE(t.values.size() >= 2);
    for (std::size_t i = 1; i < t.values.size(); ++i) CHECK(t.values[i] > t.values[i - 1]);
  }
  CHECK(heckbert_ticks(1e-320, 1e-320, 5).values.front() <= 1e-320);
  CHECK(heckbert_ticks(1e-320, 1e-320, 5).values.back() >= 1e-320);
  // Near the top of the double range the covering ticks would overflow;
  // only the representable ones are kept, and they stay inside it.
  const Ticks top = heckbert_ticks(-max, max, 5);
  CHECK(top.values.front() >= -max);
  CHECK(top.values.back() <= max);
}

TEST_CASE("tick counts are clamped and the search stays bounded", "[scale][ticks]") {
  for (int m : {-5, 0, 1, 2, 100, 1000, std::numeric_limits<int>::max()}) {
    INFO("m = " << m);
    for (const Ticks& t : {heckbert_ticks(0, 1, m), extended_ticks(0, 1, m), extended_ticks(0, 1, m, true)}) {
      check_well_formed(t);
      CHECK(t.values.size() >= 2);
      CHECK(t.values.size() <= 300);
    }
  }
}

TEST_CASE("non-finite ends give no ticks", "[scale][ticks]") {
  const double nan = std::numeric_limits<double>::quiet_NaN();
  const double inf = std::numeric_limits<double>::infinity();
  for (auto [a, b] : {std::pair{nan, 1.0}, {0.0, nan}, {0.0, inf}, {-inf, inf}}) {
    CHECK(heckbert_ticks(a, b, 5).values.empty());
    CHECK(extended_ticks(a, b, 5).values.empty());
    CHECK(extended_ticks(a, b, 5).step == 0);
  }
}
