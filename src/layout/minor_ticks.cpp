#include "layout/minor_ticks.h"

namespace forme {

namespace {

PathItem tick(Point a, Point b, const Stroke& s) {
  PathItem p;
  p.points = {a, b};
  p.stroke = s;
  return p;
}

}  // namespace

void draw_minor_ticks(const PlotFrame& f, const PageStyle& st, DisplayPage& page) {
  const Stroke s{st.ink.rule, st.rule_width(), {}, false};
  // Tick labels sit 0.3 × base beyond the plot (y) or beyond the major
  // ticks (x): a minor tick of 0.25 × base never reaches them.
  const double length = st.base * 0.25;
  for (double v : f.y.minor)
    if (v >= f.y.lo && v <= f.y.hi) page.add(tick({f.plot.left() - length, f.py(v)}, {f.plot.left(), f.py(v)}, s));
  for (double v : f.x.minor)
    if (v >= f.x.lo && v <= f.x.hi) page.add(tick({f.px(v), f.plot.bottom()}, {f.px(v), f.plot.bottom() + length}, s));
}

}  // namespace forme
