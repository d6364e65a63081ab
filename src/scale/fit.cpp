#include "scale/fit.h"

#include <cmath>
#include <limits>

namespace forme {

std::optional<LinearFit> fit_line(std::span<const double> xs, std::span<const double> ys) {
  if (xs.size() != ys.size()) return std::nullopt;
  const auto usable = [&](std::size_t i) { return std::isfinite(xs[i]) && std::isfinite(ys[i]); };

  std::size_t n = 0;
  double sum_x = 0, sum_y = 0;
  for (std::size_t i = 0; i < xs.size(); ++i) {
    if (!usable(i)) continue;
    ++n;
    sum_x += xs[i];
    sum_y += ys[i];
  }
  if (n < 2) return std::nullopt;
  const double mean_x = sum_x / static_cast<double>(n), mean_y = sum_y / static_cast<double>(n);

  double sxx = 0, syy = 0, sxy = 0;
  for (std::size_t i = 0; i < xs.size(); ++i) {
    if (!usable(i)) continue;
    const double dx = xs[i] - mean_x, dy = ys[i] - mean_y;
    sxx += dx * dx;
    syy += dy * dy;
    sxy += dx * dy;
  }
  if (!(sxx > 0)) return std::nullopt;

  LinearFit fit;
  fit.n = n;
  fit.slope = sxy / sxx;
  fit.intercept = mean_y - fit.slope * mean_x;
  fit.r = syy > 0 ? sxy / (std::sqrt(sxx) * std::sqrt(syy)) : std::numeric_limits<double>::quiet_NaN();
  fit.r_squared = fit.r * fit.r;
  return fit;
}

}  // namespace forme
