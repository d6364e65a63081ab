#pragma once
/// A number with a fixed count of decimals, as printf's "%.*f" writes it
/// (ASCII minus), for figures in messages and reports rather than on charts
/// (charts use scale/number_format).
#include <cstdio>
#include <string>

namespace forme {

inline std::string fixed(double v, int decimals) {
  char buf[32];
  std::snprintf(buf, sizeof buf, "%.*f", decimals, v);
  return buf;
}

}  // namespace forme
