// Banking to 45°: aspect ratios from the slopes of a line.
#include <catch2/catch.hpp>

#include <cmath>
#include <limits>
#include <numbers>
#include <vector>

#include "scale/banking.h"

using forme::aspect_average_orientation;
using forme::aspect_median_slope;
using forme::aspect_weighted_orientation;
using V = std::vector<double>;

namespace {
const V kToyX = {0, 1, 2, 3};
const V kToyY = {0, 1, 3, 4};
constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();
}  // namespace

TEST_CASE("banking toy example of check-values 8 (regression)", "[scale][banking]") {
  // Points (0,0) (1,1) (2,3) (3,4): slopes 1, 2, 1; Rx = 3, Ry = 4.
  // Regression values only: check-values §8 tags these D, and the banking
  // formulas they come from are tagged M there (from memory, not re-read).
  CHECK(aspect_median_slope(kToyX, kToyY).value() == Approx(4.0 / 3.0).margin(1e-12));
  CHECK(aspect_average_orientation(kToyX, kToyY).value() == Approx(1.062569).margin(1e-6));
  CHECK(aspect_weighted_orientation(kToyX, kToyY).value() == Approx(0.999481).margin(1e-6));
}

TEST_CASE("banked shapes meet their own rule", "[scale][banking]") {
  // At the returned h/w, the physical slopes s·(Rx/Ry)·α have median 1 and
  // mean orientation 45°.
  const V xs = {0, 1, 2, 3, 4, 5, 6, 7};
  const V ys = {2, 5, 4, 9, 7, 7.5, 1, 3};
  const double rx = 7, ry = 8;
  const double alpha = aspect_average_orientation(xs, ys).value();
  double sum = 0;
  for (std::size_t i = 0; i + 1 < xs.size(); ++i) {
    const double sigma = (ys[i + 1] - ys[i]) / (xs[i + 1] - xs[i]) * (rx / ry) * alpha;
    sum += std::atan(std::abs(sigma));
  }
  CHECK(sum / 7 == Approx(std::numbers::pi / 4).epsilon(1e-12));

  const double median_alpha = aspect_median_slope(xs, ys).value();
  // |slopes| 3, 1, 5, 2, 0.5, 6.5, 2 → sorted median 2; α = (Ry/Rx)/2.
  CHECK(median_alpha == Approx((ry / rx) / 2));
}

TEST_CASE("banking is symmetric in x and y", "[scale][banking]") {
  const V xs = {0, 1, 2.5, 3, 4.2, 6};
  const V ys = {1, 4, 2, 8, 5, 6};
  CHECK(aspect_median_slope(ys, xs).value() == Approx(1 / aspect_median_slope(xs, ys).value()));
  CHECK(aspect_average_orientation(ys, xs).value() ==
        Approx(1 / aspect_average_orientation(xs, ys).value()).epsilon(1e-10));
  CHECK(aspect_weighted_orientation(ys, xs).value() ==
        Approx(1 / aspect_weighted_orientation(xs, ys).value()).epsilon(1e-10));
  // An even count of slopes: the geometric mean of the middle two keeps the
  // median rule symmetric too. Slopes here are 1 and 4 (Rx = 2, Ry = 5).
  const V ex = {0, 1, 2};
  const V ey = {0, 1, 5};
  CHECK(aspect_median_slope(ex, ey).value() == Approx((5.0 / 2.0) / 2.0));
}

TEST_CASE("banking: gaps, vertical and horizontal segments", "[scale][banking]") {
  // A NaN point removes the two segments that touch it, not the extent.
  const V gx = {0, 1, kNaN, 3, 4};
  const V gy = {0, 1, 7, 3, 4};
  CHECK(aspect_median_slope(gx, gy).value() == Approx(1.0));
  // A vertical segment counts as the steepest slope in the median.
  const V vx = {0, 1, 1, 2};
  const V vy = {0, 1, 2, 3};
  // Rx = 2, Ry = 3: slopes 1, ∞, 1 are 2/3, ∞, 2/3 at h/w = 1; median 2/3.
  CHECK(aspect_median_slope(vx, vy).value() == Approx(1.5));
  // A repeated point (zero-length segment) is ignored.
  const V rx = {0, 1, 1, 2, 3};
  const V ry = {0, 1, 1, 3, 4};
  CHECK(aspect_median_slope(rx, ry).value() == Approx(aspect_median_slope(kToyX, kToyY).value()));
  CHECK(aspect_average_orientation(rx, ry).value() == Approx(aspect_average_orientation(kToyX, kToyY).value()));
  // Mostly flat: no shape brings the median slope or the mean angle to 45°.
  const V fx = {0, 1, 2, 3, 4};
  const V fy = {0, 0, 0, 5, 5};
  CHECK_FALSE(aspect_median_slope(fx, fy).has_value());
  CHECK_FALSE(aspect_average_orientation(fx, fy).has_value());
  // Length weighting still finds one: one steep segment gains length with α.
  CHECK(aspect_weighted_orientation(fx, fy).has_value());
}

TEST_CASE("banking refuses lines it cannot shape", "[scale][banking]") {
  CHECK_FALSE(aspect_median_slope(V{0, 1, 2}, V{0, 1}).has_value());          // lengths differ
  CHECK_FALSE(aspect_median_slope(V{1}, V{1}).has_value());                    // no segment
  CHECK_FALSE(aspect_average_orientation(V{}, V{}).has_value());
  CHECK_FALSE(aspect_median_slope(V{0, 1, 2}, V{3, 3, 3}).has_value());        // Ry = 0
  CHECK_FALSE(aspect_weighted_orientation(V{2, 2, 2}, V{0, 1, 2}).has_value());  // Rx = 0
  CHECK_FALSE(aspect_weighted_orientation(V{kNaN, 1}, V{0, kNaN}).has_value());
}
