#include "scale/number_format.h"

#include <algorithm>
#include <charconv>
#include <cmath>
#include <string_view>

#include "scale/power_of_ten.h"

namespace forme {

namespace {

constexpr const char* kMinus = "\u2212";

/// A non-negative decimal: digits × 10^exponent. `digits` has no leading or
/// trailing zeros, and is empty for zero.
struct Decimal {
  std::string digits;
  int exponent = 0;

  bool zero() const { return digits.empty(); }
  /// ⌊log10 value⌋, for a non-zero value.
  int order() const { return static_cast<int>(digits.size()) - 1 + exponent; }
};

void normalize(Decimal& d) {
  const auto first = d.digits.find_first_not_of('0');
  if (first == std::string::npos) {
    d = {};
    return;
  }
  d.digits.erase(0, first);
  const auto last = d.digits.find_last_not_of('0');
  d.exponent += static_cast<int>(d.digits.size() - 1 - last);
  d.digits.erase(last + 1);
}

/// The shortest decimal that reads back as `magnitude` (finite, ≥ 0).
Decimal shortest_decimal(double magnitude) {
  char buf[64];
  const auto res = std::to_chars(buf, buf + sizeof buf, magnitude, std::chars_format::scientific);
  const std::string_view s(buf, static_cast<std::size_t>(res.ptr - buf));
  const auto e = s.find('e');
  Decimal d;
  for (char c : s.substr(0, e))
    if (c != '.') d.digits += c;
  std::string_view exp = s.substr(e + 1);
  if (!exp.empty() && exp.front() == '+') exp.remove_prefix(1);
  int power = 0;
  std::from_chars(exp.data(), exp.data() + exp.size(), power);
  d.exponent = power - (static_cast<int>(d.digits.size()) - 1);
  normalize(d);
  return d;
}

/// Rounds to `decimals` digits after the point, half away from zero.
void round_to(Decimal& d, int decimals) {
  if (d.zero() || d.exponent >= -decimals) return;
  const long long drop = static_cast<long long>(-decimals) - d.exponent;
  const long long keep = static_cast<long long>(d.digits.size()) - drop;
  if (keep < 0) {
    d = {};
    return;
  }
  const bool up = d.digits[static_cast<std::size_t>(keep)] >= '5';
  d.digits.resize(static_cast<std::size_t>(keep));
  d.exponent = -decimals;
  if (up) {
    auto i = d.digits.size();
    while (i > 0 && d.digits[i - 1] == '9') d.digits[--i] = '0';
    if (i == 0) d.digits.insert(d.digits.begin(), '1');
    else ++d.digits[i - 1];
  }
  normalize(d);
}

std::string group_thousands(const std::string& integer, const std::string& separator) {
  std::string out;
  const std::size_t n = integer.size();
  for (std::size_t i = 0; i < n; ++i) {
    if (i > 0 && (n - i) % 3 == 0) out += separator;
    out += integer[i];
  }
  return out;
}

std::string render(const Decimal& d, int min_decimals, const NumberFormat& f) {
  std::string integer, fraction;
  if (d.zero()) {
    integer = "0";
  } else if (d.exponent >= 0) {
    integer = d.digits + std::string(static_cast<std::size_t>(d.exponent), '0');
  } else {
    const long long point = static_cast<long long>(d.digits.size()) + d.exponent;
    if (point > 0) {
      integer = d.digits.substr(0, static_cast<std::size_t>(point));
      fraction = d.digits.substr(static_cast<std::size_t>(point));
    } else {
      integer = "0";
      fraction = std::string(static_cast<std::size_t>(-point), '0') + d.digits;
    }
  }
  if (static_cast<int>(fraction.size()) < min_decimals)
    fraction.append(static_cast<std::size_t>(min_decimals) - fraction.size(), '0');
  if (f.thousands) integer = group_thousands(integer, f.group_separator);
  return fraction.empty() ? integer : integer + f.decimal_separator + fraction;
}

// SI prefixes from 10^-6 to 10^12, by power of a thousand.
constexpr int kLowestSiPower = -2;
constexpr int kHighestSiPower = 4;
constexpr const char* kSiPrefixes[] = {"µ", "m", "", "k", "M", "G", "T"};

/// Rounds `d` as `f` asks: to fixed decimals, or to at most `f.significant`
/// significant digits without dropping a digit left of the point.
void round_as_asked(Decimal& d, const NumberFormat& f) {
  if (f.decimals >= 0) round_to(d, f.decimals);
  else if (f.significant > 0 && !d.zero()) round_to(d, std::max(0, f.significant - 1 - d.order()));
}

/// Scales `d` by the SI prefix that keeps the rounded mantissa below 1000;
/// returns the prefix.
std::string apply_si(Decimal& d, const NumberFormat& f) {
  if (d.zero()) return "";
  int power = std::clamp(static_cast<int>(std::floor(d.order() / 3.0)), kLowestSiPower, kHighestSiPower);
  for (;;) {
    Decimal scaled = d;
    scaled.exponent -= 3 * power;
    round_as_asked(scaled, f);
    // Rounding can carry into the next thousand (999.96k → 1000.0k).
    if (!scaled.zero() && scaled.order() >= 3 && power < kHighestSiPower) {
      ++power;
      continue;
    }
    d = scaled;
    return d.zero() ? "" : kSiPrefixes[power - kLowestSiPower];
  }
}

/// Writes `d` against its own power of ten, the mantissa in [1, 10) after
/// rounding (9.996×10⁸ to three digits is 1.00×10⁹); returns the power.
int apply_own_power(Decimal& d, const NumberFormat& f) {
  if (d.zero()) return 0;
  if (f.decimals < 0 && f.significant > 0) round_to(d, f.significant - 1 - d.order());
  for (int power = d.order();;) {
    Decimal scaled = d;
    scaled.exponent -= power;
    if (f.decimals >= 0) round_to(scaled, f.decimals);
    if (!scaled.zero() && scaled.order() >= 1) {
      ++power;
      continue;
    }
    d = scaled;
    return power;
  }
}

/// "×10" and the power in superscript digits: ×10³⁰⁸, ×10⁻⁶.
std::string times_power_of_ten_text(int power) { return "×" + power_of_ten_text(power); }

}  // namespace

std::string format_number(double v, const NumberFormat& f) {
  if (std::isnan(v)) return f.prefix + "NaN" + f.suffix;
  bool negative = std::signbit(v);
  if (std::isinf(v)) return (negative ? kMinus : "") + f.prefix + "∞" + f.suffix;

  Decimal d = shortest_decimal(std::abs(v));
  std::string unit;
  switch (f.style) {
    case NumberFormat::Style::plain:
      break;
    case NumberFormat::Style::percent:
      unit = "%";
      break;
    case NumberFormat::Style::fraction_percent:
      if (!d.zero()) d.exponent += 2;
      unit = "%";
      break;
    case NumberFormat::Style::si:
      unit = apply_si(d, f);
      break;
    case NumberFormat::Style::power_of_ten:
      if (f.own_power) {
        const int power = apply_own_power(d, f);
        unit = times_power_of_ten_text(power);
      } else {
        if (!d.zero()) d.exponent -= f.exponent;
        unit = times_power_of_ten_text(f.exponent);
      }
      break;
  }
  if (f.style != NumberFormat::Style::si && !(f.style == NumberFormat::Style::power_of_ten && f.own_power))
    round_as_asked(d, f);
  if (d.zero()) {
    negative = false;
    if (f.style == NumberFormat::Style::power_of_ten) unit.clear();  // "0", not "0×10³⁰⁸"
  }
  return (negative ? kMinus : "") + f.prefix + render(d, f.decimals, f) + unit + f.suffix;
}

NumberFormat automatic_format(double largest_magnitude, double step, bool always) {
  NumberFormat f;
  if (!std::isfinite(largest_magnitude) || largest_magnitude <= 0) return f;
  const int order = shortest_decimal(largest_magnitude).order();
  if (!always && order < 15 && order >= -5) return f;
  f.style = NumberFormat::Style::power_of_ten;
  f.exponent = order;
  f.decimals = decimals_for_step(times_power_of_ten(step, -order));
  return f;
}

int decimals_for_step(double step) {
  if (!std::isfinite(step) || !(step > 0)) return 0;
  const int order = shortest_decimal(step).order();
  const double mantissa = times_power_of_ten(step, -order);  // in [1, 10)
  double scaled = mantissa;
  for (int extra = 0; extra <= 3; ++extra, scaled *= 10) {
    if (std::abs(scaled - std::round(scaled)) <= 1e-9 * scaled) return std::max(0, extra - order);
  }
  return std::max(0, 1 - order);
}

std::string power_of_ten_text(int power) {
  static constexpr const char* kSuperscript[] = {"⁰", "¹", "²", "³", "⁴", "⁵", "⁶", "⁷", "⁸", "⁹"};
  std::string digits;
  for (char c : std::to_string(std::abs(power))) digits += kSuperscript[c - '0'];
  return std::string("10") + (power < 0 ? "⁻" : "") + digits;
}

NumberFormat value_format(const std::vector<double>& values, const NumberFormat& axis) {
  NumberFormat f = axis;
  if (f.decimals >= 0 || f.significant > 0) return f;  // fixed, or already decided for the panel
  if (f.style == NumberFormat::Style::power_of_ten) f.own_power = true;
  // A typed value has few digits; more than this means arithmetic made it.
  constexpr int kMostTyped = 6, kComputed = 3, kMostDigits = 17;
  int digits = 1;
  for (double v : values) {
    if (!std::isfinite(v) || v == 0) continue;
    const int held = static_cast<int>(shortest_decimal(std::abs(v)).digits.size());
    digits = std::max(digits, held <= kMostTyped ? held : kComputed);
  }
  // An SI prefix is the author asking for a compact number: "46.4k", not the
  // CSV's "46.449k" (three significant digits, common practice). Values
  // that would then print alike still get the digits that tell them apart.
  if (f.style == NumberFormat::Style::si) digits = std::min(digits, kComputed);
  std::vector<double> distinct;
  for (double v : values)
    if (std::isfinite(v)) distinct.push_back(v);
  std::sort(distinct.begin(), distinct.end());
  distinct.erase(std::unique(distinct.begin(), distinct.end()), distinct.end());
  for (f.significant = digits; f.significant < kMostDigits; ++f.significant) {
    bool apart = true;
    for (std::size_t i = 1; i < distinct.size() && apart; ++i)
      apart = format_number(distinct[i - 1], f) != format_number(distinct[i], f);
    if (apart) break;
  }
  return f;
}

std::string format_value(double v, const NumberFormat& f) { return format_number(v, value_format({v}, f)); }

}  // namespace forme
