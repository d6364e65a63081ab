#include "scale/scale.h"

#include <algorithm>
#include <cmath>
#include <cstdlib>
#include <limits>

#include "scale/power_of_ten.h"
#include "scale/ticks.h"

namespace forme {

namespace {

constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();

double position(double t, double r0, double r1) { return std::lerp(r0, r1, t); }

}  // namespace

double LinearScale::map(double x) const {
  if (d0 == d1) return (r0 + r1) / 2;
  const double span = d1 - d0;
  // A domain wider than the largest double (−1e308 to 1.7e308) is mapped
  // at half scale, which is exact in binary floating point.
  if (!std::isfinite(span)) return position((x / 2 - d0 / 2) / (d1 / 2 - d0 / 2), r0, r1);
  return position((x - d0) / span, r0, r1);
}

double LinearScale::invert(double r) const {
  if (d0 == d1 || r0 == r1) return (d0 + d1) / 2;
  return std::lerp(d0, d1, (r - r0) / (r1 - r0));
}

bool LogScale::valid() const { return std::isfinite(d0) && std::isfinite(d1) && d0 > 0 && d1 > 0; }

double LogScale::map(double x) const {
  if (!valid() || !(x > 0)) return kNaN;
  if (d0 == d1) return (r0 + r1) / 2;
  const double l0 = std::log10(d0);
  return position((std::log10(x) - l0) / (std::log10(d1) - l0), r0, r1);
}

double LogScale::invert(double r) const {
  if (!valid()) return kNaN;
  if (d0 == d1 || r0 == r1) return std::sqrt(d0) * std::sqrt(d1);
  const double t = (r - r0) / (r1 - r0);
  // Exact at the ends, where the power would round.
  if (t == 0) return d0;
  if (t == 1) return d1;
  return std::pow(10.0, std::lerp(std::log10(d0), std::log10(d1), t));
}

namespace {

/// Ticks m·10^e inside [lo, hi] for each multiplier in `mults` and every
/// `stride`-th power of ten (powers divisible by the stride).
std::vector<double> decade_ticks(double lo, double hi, std::initializer_list<int> mults, int stride) {
  std::vector<double> out;
  const int e0 = static_cast<int>(std::floor(std::log10(lo))) - 1;
  const int e1 = static_cast<int>(std::ceil(std::log10(hi))) + 1;
  // A hair of tolerance so a domain end computed as 0.1 + 0.2 still counts as 0.3.
  const double lo_t = lo * (1 - 1e-12), hi_t = hi * (1 + 1e-12);
  for (int e = e0; e <= e1; ++e) {
    if (((e % stride) + stride) % stride != 0) continue;
    for (int mult : mults) {
      const double v = times_power_of_ten(mult, e);
      if (v >= lo_t && v <= hi_t) out.push_back(v);
    }
  }
  return out;
}

}  // namespace

std::vector<double> LogScale::ticks(int m) const {
  if (!valid()) return {};
  m = std::max(m, 2);
  const double lo = std::min(d0, d1), hi = std::max(d0, d1);

  std::vector<double> powers = decade_ticks(lo, hi, {1}, 1);
  if (static_cast<int>(powers.size()) > m) {
    // Every k-th power, k the first of 2, 3, 5, 10, 20, 30, 50, … that
    // leaves at most m: labels then fall on round powers (10⁻¹⁰, 10⁻⁵, 1, 10⁵).
    const std::size_t least = (powers.size() + static_cast<std::size_t>(m) - 1) / static_cast<std::size_t>(m);
    std::size_t stride = 1;
    for (std::size_t scale = 1; stride < least; scale *= 10)
      for (std::size_t k : {1, 2, 3, 5})
        if (stride < least) stride = k * scale;
    return decade_ticks(lo, hi, {1}, static_cast<int>(stride));
  }
  // Sparser sets first, so a tie keeps the sparser one.
  std::vector<double> best = std::move(powers);
  for (auto denser : {decade_ticks(lo, hi, {1, 2, 5}, 1), decade_ticks(lo, hi, {1, 2, 3, 4, 5, 6, 7, 8, 9}, 1)}) {
    const auto miss = [m](const std::vector<double>& t) { return std::abs(static_cast<int>(t.size()) - m); };
    if (best.size() < 2 || (denser.size() >= 2 && miss(denser) < miss(best))) best = std::move(denser);
  }
  if (best.size() >= 2) return best;

  std::vector<double> linear;
  for (double v : extended_ticks(lo, hi, m).values)
    if (v >= lo && v <= hi) linear.push_back(v);
  return linear;
}

}  // namespace forme
