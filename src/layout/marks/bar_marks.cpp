// Bar panels: bars grow from zero along the value axis, one band per
// category, series side by side within a band.
#include <algorithm>

#include "layout/marks/marks.h"

namespace forme {

namespace {
// Bars fill this share of their band; the rest is air between categories.
constexpr double kBandFill = 0.72;

PathItem box(double x0, double y0, double x1, double y1, Rgb fill) {
  PathItem p;
  p.points = {{x0, y0}, {x1, y0}, {x1, y1}, {x0, y1}};
  p.closed = true;
  p.fill = fill;
  return p;
}
}  // namespace

void draw_vertical_bar_marks(const MarkContext& ctx, DisplayPage& page) {
  const PlotFrame& f = ctx.frame;
  const auto& series = ctx.data.series;
  const double band = f.band_x() * kBandFill;
  const double each = band / static_cast<double>(std::max<std::size_t>(1, series.size()));
  const double zero = f.py(0);
  for (std::size_t k = 0; k < series.size(); ++k) {
    const Rgb colour = ctx.colours.at(series[k].name);
    for (std::size_t i = 0; i < series[k].x.size(); ++i) {
      double left = f.px(series[k].x[i]) - band / 2 + each * static_cast<double>(k);
      page.add(box(left, zero, left + each, f.py(series[k].y[i]), colour));
    }
  }
}

void draw_horizontal_bar_marks(const MarkContext& ctx, DisplayPage& page) {
  const PlotFrame& f = ctx.frame;
  const auto& series = ctx.data.series;
  const double band = f.band_y() * kBandFill;
  const double each = band / static_cast<double>(std::max<std::size_t>(1, series.size()));
  const double zero = f.px(0);
  for (std::size_t k = 0; k < series.size(); ++k) {
    const Rgb colour = ctx.colours.at(series[k].name);
    for (std::size_t i = 0; i < series[k].y.size(); ++i) {
      double top = f.py(series[k].y[i]) - band / 2 + each * static_cast<double>(k);
      page.add(box(zero, top, f.px(series[k].x[i]), top + each, colour));
    }
  }
}

}  // namespace forme
