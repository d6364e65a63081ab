#pragma once
/// Number formatting for tick labels and values.
///
/// Digits come from the shortest decimal that reads back as the same double
/// (0.1 prints as "0.1", not 0.1000000000000000055…); scaling for percent
/// and SI prefixes moves the decimal point in that digit string, and
/// rounding to fixed decimals rounds that decimal half away from zero
/// (1.005 → "1.01", 2.5 → "3"), so what prints is what a reader expects
/// from the number as written.
#include <string>
#include <vector>

namespace forme {

struct NumberFormat {
  enum class Style {
    plain,    ///< 12,345.6
    percent,  ///< value already in percent units: 12.5 -> "12.5%"
    fraction_percent, ///< value is a fraction: 0.125 -> "12.5%"
    si,       ///< 12.3k, 4.5M, 1.2G (and m, µ for small values)
    power_of_ten,  ///< 1.5×10³⁰⁸: the mantissa of v / 10^`exponent`
  };
  Style style = Style::plain;
  int decimals = -1;          ///< fixed digits after the point; -1 = shortest exact
  bool thousands = true;      ///< group thousands with `group_separator`
  std::string group_separator = ",";
  std::string decimal_separator = ".";
  std::string prefix;         ///< e.g. "£"
  std::string suffix;         ///< e.g. " t"
  int exponent = 0;           ///< power_of_ten: the power every value is written against
  /// With `decimals` = -1: round to at most this many significant digits
  /// (0 = no limit), never dropping a digit left of the printed point
  /// (plain and percent: 1,234.5 at 3 → "1,235"), no trailing zeros.
  int significant = 0;
  /// power_of_ten: each value against its own power (mantissa in [1, 10)),
  /// as a value written beside its mark reads: 7.8×10⁸, not 0.78×10⁹.
  bool own_power = false;
};

/// Formats `v`. Negative numbers use the Unicode minus sign (U+2212), as
/// typesetters do; -0 prints as 0, and so does a negative number that
/// rounds to zero ("0.0", never "−0.0").
///
/// Layout: minus, `prefix`, digits, SI prefix or "%", `suffix`
/// ("−£1,234.5 t"). SI picks the prefix (µ m · k M G T) that puts the
/// mantissa in [1, 1000) — after rounding, so 999,960 with one decimal is
/// "1.0M" — and stays at T or µ beyond them (2,500T). Zero has no prefix.
/// NaN prints as "NaN" and infinities as "∞" / "−∞", with prefix and suffix.
/// Power of ten writes every value against one stated power so a column of
/// ticks lines up: 0, 0.5×10³⁰⁸, 1.0×10³⁰⁸ (zero stays "0").
std::string format_number(double v, const NumberFormat& f);

/// The format for data values written beside their marks (value labels) of
/// one panel, in the style of `axis` (the author's style and decimals, see
/// `Axis::values`). Fixed decimals are kept. Otherwise each value is shown
/// as the data hold it: with the significant digits of its shortest exact
/// decimal when that has at most six (a typed value: 1.48, 61.66, 3.4×10⁹),
/// else three (a computed one: 103.448275… → 103; common practice for
/// labels read at a glance; SI values always take three: 46.4k); all share
/// the largest such count, and more are
/// added until distinct values print distinctly. A value printed shorter
/// than the count keeps its own digits (61 stays "61" beside "61.66"). A
/// format whose `significant` is already set comes back as it is.
NumberFormat value_format(const std::vector<double>& values, const NumberFormat& axis);

/// One value label on its own: format_number(v, value_format({v}, f)).
std::string format_value(double v, const NumberFormat& f);

/// "10" and the power in superscript digits: 10⁶, 10⁻⁴, 10⁰.
std::string power_of_ten_text(int power);

/// The style an axis takes when its author chose none: plain, unless the
/// largest tick is so large (≥ 10^15) or so small (< 10^-5) that plain
/// digits would run to many characters; then power of ten, against the
/// largest tick's power, with enough mantissa decimals to tell ticks `step`
/// apart. `always` chooses power of ten whatever the size (for an author
/// who asked for it).
NumberFormat automatic_format(double largest_magnitude, double step, bool always = false);

/// The number of decimals needed so every tick of `step` prints distinctly:
/// the fewest (from the step's leading digit on) that show the step exactly
/// within three more digits (0.25 → 2, 2.5 → 1, 100 → 0, and 0.1 + 0.2
/// → 1); for a step with no short exact decimal, enough for two
/// significant digits of the step (1/3 → 2, 100/3 → 0). 0 for a step that
/// is not finite and positive.
int decimals_for_step(double step);

}  // namespace forme
