#pragma once
/// Maps data values to page positions inside one panel's plot area.
#include "axes/axis.h"
#include "base/geometry.h"

namespace forme {

struct PlotFrame {
  Rect plot;  ///< the inner box data is drawn in
  Axis x, y;

  double px(double v) const { return plot.x + (v - x.lo) / (x.hi - x.lo) * plot.w; }
  /// y grows upwards in data, downwards on the page; category axes list
  /// their first category at the top.
  double py(double v) const {
    if (y.kind == AxisKind::category) return plot.y + (v - y.lo) / (y.hi - y.lo) * plot.h;
    return plot.bottom() - (v - y.lo) / (y.hi - y.lo) * plot.h;
  }
  /// Width of one category band along x (or height along y), in points.
  double band_x() const { return plot.w / (x.hi - x.lo); }
  double band_y() const { return plot.h / (y.hi - y.lo); }
};

}  // namespace forme
