#pragma once
/// Number formatting for tick labels and values.
#include <string>

namespace forme {

struct NumberFormat {
  enum class Style {
    plain,    ///< 12,345.6
    percent,  ///< value already in percent units: 12.5 -> "12.5%"
    fraction_percent, ///< value is a fraction: 0.125 -> "12.5%"
    si,       ///< 12.3k, 4.5M, 1.2G (and m, µ for small values)
  };
  Style style = Style::plain;
  int decimals = -1;          ///< fixed digits after the point; -1 = shortest exact
  bool thousands = true;      ///< group thousands with `group_separator`
  std::string group_separator = ",";
  std::string decimal_separator = ".";
  std::string prefix;         ///< e.g. "£"
  std::string suffix;         ///< e.g. " t"
};

/// Formats `v`. Negative numbers use the Unicode minus sign (U+2212), as
/// typesetters do; -0 prints as 0.
std::string format_number(double v, const NumberFormat& f);

/// The number of decimals needed so every tick of `step` prints distinctly.
int decimals_for_step(double step);

}  // namespace forme
