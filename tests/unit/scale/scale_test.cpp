// Linear and logarithmic scales.
#include <catch2/catch.hpp>

#include <cmath>
#include <limits>
#include <vector>

#include "scale/scale.h"

using forme::LinearScale;
using forme::LogScale;
using V = std::vector<double>;

TEST_CASE("linear scale maps the domain ends exactly onto the range ends", "[scale][scale-map]") {
  const LinearScale s{0.1, 0.7, 72, 540};
  CHECK(s.map(0.1) == 72);
  CHECK(s.map(0.7) == 540);
  CHECK(s.map(0.4) == Approx(306));
  CHECK(s.map(1.0) == Approx(774));  // extrapolates
  CHECK(s.invert(72) == 0.1);
  CHECK(s.invert(540) == 0.7);
  for (double x : {-3.0, 0.1, 0.25, 0.5, 2.0}) CHECK(s.invert(s.map(x)) == Approx(x));
}

TEST_CASE("linear scale with a flipped range, as y axes need", "[scale][scale-map]") {
  const LinearScale y{0, 100, 500, 100};
  CHECK(y.map(0) == 500);
  CHECK(y.map(100) == 100);
  CHECK(y.map(25) == Approx(400));
  CHECK(y.invert(300) == Approx(50));
}

TEST_CASE("linear scale with an empty domain or range", "[scale][scale-map]") {
  const LinearScale flat{5, 5, 0, 200};
  CHECK(flat.map(5) == 100);
  CHECK(flat.map(-1e9) == 100);
  CHECK(flat.invert(17) == 5);
  const LinearScale point{0, 10, 50, 50};
  CHECK(point.map(3) == 50);
  CHECK(point.invert(50) == 5);
}

TEST_CASE("log scale: equal ratios at equal distances", "[scale][scale-map]") {
  const LogScale s{1, 1000, 0, 300};
  CHECK(s.valid());
  CHECK(s.map(1) == 0);
  CHECK(s.map(1000) == 300);
  CHECK(s.map(10) == Approx(100));
  CHECK(s.map(100) == Approx(200));
  CHECK(s.map(2) - s.map(1) == Approx(s.map(200) - s.map(100)));
  CHECK(s.invert(0) == 1);
  CHECK(s.invert(300) == 1000);
  CHECK(s.invert(150) == Approx(std::sqrt(1000.0)));
  for (double x : {0.5, 3.0, 42.0, 5000.0}) CHECK(s.invert(s.map(x)) == Approx(x));
}

TEST_CASE("log scale refuses non-positive values and domains", "[scale][scale-map]") {
  const LogScale s{1, 100, 0, 1};
  CHECK(std::isnan(s.map(0)));
  CHECK(std::isnan(s.map(-5)));
  const LogScale bad{0, 100, 0, 1};
  CHECK_FALSE(bad.valid());
  CHECK(std::isnan(bad.map(10)));
  CHECK(std::isnan(bad.invert(0.5)));
  CHECK(bad.ticks().empty());
  CHECK_FALSE((LogScale{-1, 10, 0, 1}.valid()));
  CHECK_FALSE((LogScale{1, std::numeric_limits<double>::infinity(), 0, 1}.valid()));
  const LogScale flat{10, 10, 0, 2};
  CHECK(flat.map(10) == 1);
  CHECK(flat.invert(0.3) == Approx(10));
}

TEST_CASE("log ticks at powers of ten", "[scale][scale-map]") {
  CHECK(LogScale{1, 1000, 0, 1}.ticks(5) == V{1, 10, 100, 1000});
  CHECK(LogScale{1000, 1, 0, 1}.ticks(5) == V{1, 10, 100, 1000});
  // Exact decimals: 0.001 is the literal, not 10^-3 from pow rounding.
  CHECK(LogScale{0.001, 1, 0, 1}.ticks(5) == V{0.001, 0.01, 0.1, 1});
  CHECK(LogScale{0.5, 2000, 0, 1}.ticks(5) == V{1, 10, 100, 1000});
  // Twenty decades and five ticks: every fifth power.
  CHECK(LogScale{1, 1e20, 0, 1}.ticks(5) == V{1, 1e5, 1e10, 1e15, 1e20});
  // Every other power when there are a few too many.
  CHECK(LogScale{1, 1e8, 0, 1}.ticks(5) == V{1, 100, 1e4, 1e6, 1e8});
}

TEST_CASE("log ticks at 1, 2, 5 (or every multiple) in short spans", "[scale][scale-map]") {
  CHECK(LogScale{1, 10, 0, 1}.ticks(5) == V{1, 2, 5, 10});
  CHECK(LogScale{0.1, 10, 0, 1}.ticks(7) == V{0.1, 0.2, 0.5, 1, 2, 5, 10});
  CHECK(LogScale{20, 80, 0, 1}.ticks(5) == V{20, 30, 40, 50, 60, 70, 80});
  CHECK(LogScale{3, 4, 0, 1}.ticks(5) == V{3, 4});
  // Between two whole multiples: linear ticks inside the domain.
  CHECK(LogScale{3.1, 3.9, 0, 1}.ticks(5) == V{3.1, 3.3, 3.5, 3.7, 3.9});
}

TEST_CASE("a linear domain wider than the largest double still maps in order", "[scale]") {
  // -1e308 .. 1.7e308 spans 2.7e308, beyond DBL_MAX ≈ 1.798e308 (IEEE 754 binary64).
  const forme::LinearScale s{-1e308, 1.7e308, 0, 270};
  CHECK(s.map(-1e308) == Approx(0));
  CHECK(s.map(0) == Approx(100));
  CHECK(s.map(1.7e308) == Approx(270));
}
