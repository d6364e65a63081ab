#pragma once
/// Colour values written in a page description.
///
/// Accepted forms:
/// - "#rgb" and "#rrggbb" (hex digits in either case): sRGB;
/// - "oklch(L C H)": L as 0–1 or a percentage 0%–100%, chroma C ≥ 0, hue H
///   in degrees (an optional "deg" suffix); the colour is gamut-mapped into
///   sRGB by reducing chroma (`from_oklch`);
/// - "<palette>.<k>": the k-th colour (from 1) of a forme palette, e.g.
///   "estuary.2" or "fjord.9";
/// - "ink.text", "ink.muted", "ink.rule", "ink.grid": the neutral inks.
///
/// Example: parse_colour("oklch(52% 0.12 255)").colour → slate blue.
#include <optional>
#include <string>
#include <string_view>

#include "colour/rgb.h"

namespace forme {

/// Either a colour, or an error message saying what is wrong with the text
/// (the caller adds file:line:col) and, where one applies, a hint such as
/// "did you mean 'estuary'?".
struct ParsedColour {
  std::optional<Rgb> colour;
  std::string error;
  std::string hint;
};

ParsedColour parse_colour(std::string_view text);

}  // namespace forme
