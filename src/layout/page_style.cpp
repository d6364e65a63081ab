#include "layout/page_style.h"

#include <algorithm>
#include <cmath>

#include "base/geometry.h"

namespace forme {

double base_size_for_sheet(double width_pt, double height_pt) {
  const double a4_area = mm_to_pt(210) * mm_to_pt(297);
  const double k = std::sqrt(width_pt * height_pt / a4_area);
  return std::max(6.0, 8.0 * k);
}

}  // namespace forme
