#include "data/transform.h"

#include <algorithm>
#include <cmath>
#include <limits>

namespace forme {

namespace {

constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();

/// Finite results pass, -0 becomes 0, anything else becomes NaN.
double tidy(double v) {
  if (!std::isfinite(v)) return kNaN;
  return v == 0 ? 0.0 : v;
}

double ratio_percent(double numerator, double denominator) {
  if (std::isnan(numerator) || std::isnan(denominator) || denominator == 0) return kNaN;
  return tidy(numerator / denominator * 100.0);
}

}  // namespace

std::vector<double> index_to_base(const std::vector<double>& values, std::size_t base_position) {
  const double base = base_position < values.size() ? values[base_position] : kNaN;
  std::vector<double> out(values.size());
  for (std::size_t i = 0; i < values.size(); ++i) out[i] = ratio_percent(values[i], base);
  return out;
}

std::vector<double> percent_change(const std::vector<double>& values, std::size_t lag) {
  std::vector<double> out(values.size(), kNaN);
  for (std::size_t i = lag; i < values.size(); ++i) {
    const double before = values[i - lag];
    out[i] = ratio_percent(values[i] - before, before);
  }
  return out;
}

std::vector<double> percent_change_from(const std::vector<double>& values, const std::vector<std::size_t>& earlier) {
  std::vector<double> out(values.size(), kNaN);
  for (std::size_t i = 0; i < values.size() && i < earlier.size(); ++i)
    if (earlier[i] < values.size()) out[i] = ratio_percent(values[i] - values[earlier[i]], values[earlier[i]]);
  return out;
}

std::vector<double> difference(const std::vector<double>& a, const std::vector<double>& b) {
  std::vector<double> out(std::max(a.size(), b.size()), kNaN);
  const std::size_t both = std::min(a.size(), b.size());
  for (std::size_t i = 0; i < both; ++i) out[i] = tidy(a[i] - b[i]);
  return out;
}

std::vector<std::vector<double>> share_of_total(const std::vector<std::vector<double>>& values_per_series) {
  std::vector<std::vector<double>> out;
  out.reserve(values_per_series.size());
  std::size_t longest = 0;
  for (const auto& series : values_per_series) {
    out.emplace_back(series.size(), kNaN);
    longest = std::max(longest, series.size());
  }
  for (std::size_t i = 0; i < longest; ++i) {
    double total = 0;
    bool defined = true;
    for (const auto& series : values_per_series) {
      const double v = i < series.size() ? series[i] : kNaN;
      if (!(v >= 0) || !std::isfinite(v)) {  // missing, negative or infinite
        defined = false;
        break;
      }
      total += v;
    }
    if (!defined || !(total > 0) || !std::isfinite(total)) continue;
    for (std::size_t s = 0; s < values_per_series.size(); ++s)
      out[s][i] = tidy(values_per_series[s][i] / total * 100.0);
  }
  return out;
}

}  // namespace forme
