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

/// Formats one data value written beside its mark (a value label), in the
/// axis's style. With fixed decimals, exactly as format_number. Otherwise
/// to three significant digits of the number as printed (common practice
/// for labels read at a glance), never dropping digits left of the point
/// in plain and percent styles: 46.449 → "46.4", 1,234.5 → "1,235",
/// 0.04567 → "0.0457", 47 → "47", and in SI 46,449 → "46.4k".
std::string format_value(double v, const NumberFormat& f);

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
