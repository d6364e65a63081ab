#include "colour/contrast.h"

#include <algorithm>

#include "colour/convert.h"

namespace forme {

double relative_luminance(const Rgb& c) {
  LinearRgb lin = to_linear(c);
  return 0.2126 * lin.r + 0.7152 * lin.g + 0.0722 * lin.b;
}

double contrast_ratio(const Rgb& first, const Rgb& second) {
  double a = relative_luminance(first);
  double b = relative_luminance(second);
  return (std::max(a, b) + 0.05) / (std::min(a, b) + 0.05);
}

bool meets(double ratio, double threshold) { return ratio >= threshold; }

}  // namespace forme
