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

/// Points per unit: the PDF user unit is 1/72 inch (ISO 32000-1 §8.3.2.3).
inline constexpr double kPointsPerInch = 72.0;
inline constexpr double kMillimetresPerInch = 25.4;
inline constexpr double mm_to_pt(double mm) { return mm * kPointsPerInch / kMillimetresPerInch; }

}  // namespace forme
