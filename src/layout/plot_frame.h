#pragma once
/// Maps data values to page positions inside one panel's plot area.
#include <cmath>

#include "axes/axis.h"
#include "base/geometry.h"
#include "scale/scale.h"

namespace forme {

struct PlotFrame {
  Rect plot;  ///< the inner box data is drawn in
  Axis x, y;

  /// Position of `v` along an axis as a fraction 0..1 of its length.
  static double frac(const Axis& a, double v) {
    if (a.log) return (std::log10(v) - std::log10(a.lo)) / (std::log10(a.hi) - std::log10(a.lo));
    return LinearScale{a.lo, a.hi, 0, 1}.map(v);  // safe for spans beyond the largest double
  }
  double px(double v) const { return plot.x + frac(x, v) * plot.w; }
  /// y grows upwards in data, downwards on the page; category axes list
  /// their first category at the top.
  double py(double v) const {
    if (y.kind == AxisKind::category) return plot.y + frac(y, v) * plot.h;
    return plot.bottom() - frac(y, v) * plot.h;
  }
  /// Width of one category band along x (or height along y), in points.
  double band_x() const { return plot.w / (x.hi - x.lo); }
  double band_y() const { return plot.h / (y.hi - y.lo); }
};

}  // namespace forme
