#include "scale/banking.h"

#include <algorithm>
#include <cmath>
#include <limits>
#include <numbers>
#include <vector>

namespace forme {

namespace {

constexpr double kInf = std::numeric_limits<double>::infinity();

/// A segment's extent in the unit square the data's extent is drawn in:
/// |Δx| / Rx and |Δy| / Ry. Drawn in a panel of width 1 and height α it is
/// dx wide and dy·α tall.
struct Segment {
  double dx = 0, dy = 0;
};

std::optional<std::vector<Segment>> segments(std::span<const double> xs, std::span<const double> ys) {
  if (xs.size() != ys.size()) return std::nullopt;
  const auto finite = [&](std::size_t i) { return std::isfinite(xs[i]) && std::isfinite(ys[i]); };
  double x_min = kInf, x_max = -kInf, y_min = kInf, y_max = -kInf;
  for (std::size_t i = 0; i < xs.size(); ++i) {
    if (!finite(i)) continue;
    x_min = std::min(x_min, xs[i]);
    x_max = std::max(x_max, xs[i]);
    y_min = std::min(y_min, ys[i]);
    y_max = std::max(y_max, ys[i]);
  }
  const double rx = x_max - x_min, ry = y_max - y_min;
  if (!(rx > 0) || !(ry > 0) || !std::isfinite(rx) || !std::isfinite(ry)) return std::nullopt;
  std::vector<Segment> out;
  for (std::size_t i = 0; i + 1 < xs.size(); ++i) {
    if (!finite(i) || !finite(i + 1)) continue;
    const Segment s{std::abs(xs[i + 1] - xs[i]) / rx, std::abs(ys[i + 1] - ys[i]) / ry};
    if (s.dx == 0 && s.dy == 0) continue;
    out.push_back(s);
  }
  if (out.empty()) return std::nullopt;
  return out;
}

constexpr double kQuarterTurn = std::numbers::pi / 4;

/// Mean orientation of the segments in a panel of shape α, minus 45°, in
/// radians; weighted by physical length when `weighted`.
double excess_orientation(const std::vector<Segment>& segs, double alpha, bool weighted) {
  double sum = 0, total = 0;
  for (const Segment& s : segs) {
    const double tall = s.dy * alpha;
    const double w = weighted ? std::hypot(s.dx, tall) : 1.0;
    sum += w * std::atan2(tall, s.dx);
    total += w;
  }
  return sum / total - kQuarterTurn;
}

/// The α where the mean orientation crosses 45°, by bisection on ln α.
std::optional<double> solve_orientation(std::span<const double> xs, std::span<const double> ys, bool weighted) {
  const auto segs = segments(xs, ys);
  if (!segs) return std::nullopt;
  // ln α from the smallest positive double to the largest: exp() stays
  // finite and non-zero over this bracket.
  double lo = -745.0, hi = 709.0;
  const auto f = [&](double log_alpha) { return excess_orientation(*segs, std::exp(log_alpha), weighted); };
  // No crossing inside the bracket: too many horizontal or vertical segments.
  if (!(f(lo) < 0) || !(f(hi) > 0)) return std::nullopt;
  // Halving a bracket of width 1454 reaches 1e-13 in under 60 steps.
  for (int i = 0; i < 200 && hi - lo > 1e-13; ++i) {
    const double mid = (lo + hi) / 2;
    (f(mid) < 0 ? lo : hi) = mid;
  }
  return std::exp((lo + hi) / 2);
}

}  // namespace

std::optional<double> aspect_median_slope(std::span<const double> xs, std::span<const double> ys) {
  const auto segs = segments(xs, ys);
  if (!segs) return std::nullopt;
  // Physical slope at α = 1; vertical segments give +inf.
  std::vector<double> slopes;
  slopes.reserve(segs->size());
  for (const Segment& s : *segs) slopes.push_back(s.dx == 0 ? kInf : s.dy / s.dx);
  std::sort(slopes.begin(), slopes.end());
  const std::size_t n = slopes.size();
  const double median = n % 2 == 1 ? slopes[n / 2] : std::sqrt(slopes[n / 2 - 1]) * std::sqrt(slopes[n / 2]);
  if (!(median > 0) || !std::isfinite(median)) return std::nullopt;
  return 1.0 / median;
}

std::optional<double> aspect_average_orientation(std::span<const double> xs, std::span<const double> ys) {
  return solve_orientation(xs, ys, false);
}

std::optional<double> aspect_weighted_orientation(std::span<const double> xs, std::span<const double> ys) {
  return solve_orientation(xs, ys, true);
}

}  // namespace forme
