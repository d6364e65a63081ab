#include "scale/log_labels.h"

#include <algorithm>
#include <cmath>

#include "scale/power_of_ten.h"

namespace forme {

bool decade_multiple(double v, int& multiple, int& power) {
  if (!(v > 0) || !std::isfinite(v)) return false;
  const int p = static_cast<int>(std::floor(std::log10(v) + 1e-12));
  for (int e : {p, p - 1, p + 1})
    for (int m = 1; m <= 9; ++m)
      if (times_power_of_ten(m, e) == v) {
        multiple = m;
        power = e;
        return true;
      }
  return false;
}

namespace {

/// 10ⁿ, or m×10ⁿ for a multiple; other values with their own power.
std::string power_label(double v, const NumberFormat& asked) {
  int m = 0, e = 0;
  std::string body;
  if (decade_multiple(v, m, e)) {
    body = (m == 1 ? "" : std::to_string(m) + "×") + power_of_ten_text(e);
  } else {
    NumberFormat f;
    f.style = NumberFormat::Style::power_of_ten;
    f.own_power = true;
    body = format_number(v, f);
  }
  return asked.prefix + body + asked.suffix;
}

}  // namespace

bool log_labels_in_powers(const std::vector<double>& ticks, const std::optional<NumberFormat>& asked) {
  const NumberFormat::Style style = asked ? asked->style : NumberFormat::Style::plain;
  if (style == NumberFormat::Style::power_of_ten) return true;
  if (style != NumberFormat::Style::plain) return false;
  return std::any_of(ticks.begin(), ticks.end(), [](double v) { return v < 1e-3 * (1 - 1e-12) || v > 1e4 * (1 + 1e-12); });
}

std::vector<std::string> log_tick_labels(const std::vector<double>& ticks, const std::optional<NumberFormat>& asked) {
  NumberFormat f = asked.value_or(NumberFormat{});
  f.decimals = -1;
  f.significant = 0;
  f.own_power = false;
  const bool powers = log_labels_in_powers(ticks, asked);
  std::vector<std::string> out;
  for (double v : ticks) out.push_back(powers ? power_label(v, f) : format_number(v, f));
  return out;
}

std::vector<double> log_minor_ticks(double lo, double hi, const std::vector<double>& major, int most_decades) {
  if (major.size() < 2 || !(lo > 0) || !(hi > lo) || !std::isfinite(hi)) return {};
  std::vector<int> multiples, powers;
  for (double v : major) {
    int m = 0, e = 0;
    if (!decade_multiple(v, m, e)) return {};  // linear fallback ticks
    multiples.push_back(m);
    powers.push_back(e);
  }
  const bool only_powers = std::all_of(multiples.begin(), multiples.end(), [](int m) { return m == 1; });
  int stride = 0;
  if (only_powers) {
    stride = powers[1] - powers[0];
    for (std::size_t i = 1; i < powers.size(); ++i)
      if (powers[i] - powers[i - 1] != stride) return {};
  }
  const int e0 = static_cast<int>(std::floor(std::log10(lo))) - 1;
  const int e1 = static_cast<int>(std::ceil(std::log10(hi))) + 1;
  const double lo_t = lo * (1 - 1e-12), hi_t = hi * (1 + 1e-12);
  std::vector<double> out;
  auto add = [&](double v) {
    if (v >= lo_t && v <= hi_t && !std::binary_search(major.begin(), major.end(), v)) out.push_back(v);
  };
  if (only_powers && stride > 1) {
    for (int e = e0; e <= e1; ++e) add(times_power_of_ten(1, e));
  } else if (only_powers) {
    if (std::log10(hi / lo) > most_decades) return {};
    for (int e = e0; e <= e1; ++e)
      for (int m = 2; m <= 9; ++m) add(times_power_of_ten(m, e));
  } else {
    for (int e = e0; e <= e1; ++e)
      for (int m = 1; m <= 9; ++m) add(times_power_of_ten(m, e));
  }
  return out;
}

}  // namespace forme
