#include "paint/hatch_geometry.h"

#include <algorithm>
#include <cmath>

namespace forme {

std::vector<std::pair<Point, Point>> hatch_segments(double x0, double y0, double x1, double y1, double angle,
                                                    double spacing) {
  std::vector<std::pair<Point, Point>> out;
  const double a = angle * 3.141592653589793 / 180;
  const double dx = std::cos(a), dy = -std::sin(a);  // along the line (page y runs down)
  const double nx = -dy, ny = dx;                    // across the lines
  double lo = 1e300, hi = -1e300;
  for (double x : {x0, x1})
    for (double y : {y0, y1}) lo = std::min(lo, x * nx + y * ny), hi = std::max(hi, x * nx + y * ny);
  const double reach = std::hypot(x1 - x0, y1 - y0) + spacing;
  for (double d = std::floor(lo / spacing) * spacing; d <= hi + spacing; d += spacing) {
    const double cx = nx * d + dx * (x0 * dx + y0 * dy), cy = ny * d + dy * (x0 * dx + y0 * dy);
    const double span = reach + std::abs(x1 - x0) + std::abs(y1 - y0);
    out.push_back({{cx - dx * span, cy - dy * span}, {cx + dx * span, cy + dy * span}});
  }
  return out;
}

std::vector<Point> hatch_dots(double x0, double y0, double x1, double y1, double spacing) {
  std::vector<Point> out;
  const double s = spacing;
  for (double y = std::floor(y0 / s) * s; y <= y1 + s; y += s) {
    // Alternate rows shift by half a step: an even, staggered field.
    const bool odd = static_cast<long>(std::lround(y / s)) % 2 != 0;
    for (double x = std::floor(x0 / s) * s + (odd ? s / 2 : 0); x <= x1 + s; x += s) out.push_back({x, y});
  }
  return out;
}

std::vector<std::pair<Point, Point>> hatch_segments(double x0, double y0, double x1, double y1, const Hatch& h) {
  auto out = hatch_segments(x0, y0, x1, y1, h.angle, h.spacing);
  if (h.kind == Hatch::Kind::crossed) {
    auto across = hatch_segments(x0, y0, x1, y1, h.angle + 90, h.spacing);
    out.insert(out.end(), across.begin(), across.end());
  }
  return out;
}

}  // namespace forme
