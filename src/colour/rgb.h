#pragma once
/// sRGB colour with components in [0, 1] (gamma-encoded, as written in hex).
#include <cstdint>
#include <string>

namespace forme {

struct Rgb {
  double r = 0, g = 0, b = 0;
  bool operator==(const Rgb&) const = default;
};

/// Builds a colour from 8-bit channel values.
inline constexpr Rgb rgb8(std::uint8_t r, std::uint8_t g, std::uint8_t b) {
  return {r / 255.0, g / 255.0, b / 255.0};
}

}  // namespace forme
