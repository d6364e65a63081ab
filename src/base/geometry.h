#pragma once
/// Page geometry in PDF points (1/72 inch), origin at the top-left corner of
/// the sheet, y growing downwards (the convention Cairo uses).
#include <algorithm>

namespace forme {

struct Point {
  double x = 0, y = 0;
};

struct Rect {
  double x = 0, y = 0, w = 0, h = 0;

  double left() const { return x; }
  double right() const { return x + w; }
  double top() const { return y; }
  double bottom() const { return y + h; }
  double cx() const { return x + w / 2; }
  double cy() const { return y + h / 2; }
  bool empty() const { return w <= 0 || h <= 0; }

  /// True when the interiors overlap (touching edges do not count).
  bool overlaps(const Rect& o) const {
    return x < o.right() && o.x < right() && y < o.bottom() && o.y < bottom();
  }
  bool contains(const Point& p) const {
    return p.x >= x && p.x <= right() && p.y >= y && p.y <= bottom();
  }
  Rect inset(double d) const { return {x + d, y + d, w - 2 * d, h - 2 * d}; }
  Rect inflate(double d) const { return inset(-d); }
  Rect united(const Rect& o) const {
    if (empty()) return o;
    if (o.empty()) return *this;
    double l = std::min(x, o.x), t = std::min(y, o.y);
    return {l, t, std::max(right(), o.right()) - l, std::max(bottom(), o.bottom()) - t};
  }
};

/// True when the segment a–b passes through (or touches) the rectangle:
/// Liang–Barsky clipping of the segment against the four edges.
inline bool segment_meets_rect(Point a, Point b, const Rect& r) {
  double t0 = 0, t1 = 1;
  const double dx = b.x - a.x, dy = b.y - a.y;
  const double p[4] = {-dx, dx, -dy, dy};
  const double q[4] = {a.x - r.left(), r.right() - a.x, a.y - r.top(), r.bottom() - a.y};
  for (int i = 0; i < 4; ++i) {
    if (p[i] == 0) {
      if (q[i] < 0) return false;  // parallel to this edge and outside it
      continue;
    }
    const double t = q[i] / p[i];
    if (p[i] < 0) t0 = std::max(t0, t);
    else t1 = std::min(t1, t);
    if (t0 > t1) return false;
  }
  return true;
}

/// Points per unit: the PDF user unit is 1/72 inch (ISO 32000-1 §8.3.2.3).
inline constexpr double kPointsPerInch = 72.0;
inline constexpr double kMillimetresPerInch = 25.4;
inline constexpr double mm_to_pt(double mm) { return mm * kPointsPerInch / kMillimetresPerInch; }

}  // namespace forme
