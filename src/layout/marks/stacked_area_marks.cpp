// Stacked areas: each series a band laid on the ones before it, from zero
// upwards, so the top edge is the total and each band's depth is its
// series' value. Bands need a value for every series at every x (a missing
// value would silently thin the stack); selection refuses pages without
// them. Series are named beside the right end of their band, spread so
// names never touch, like line ends.
#include <cmath>
#include <map>

#include "layout/marks/marks.h"
#include "layout/marks/stack_names.h"

namespace forme {

void draw_stacked_area_marks(const MarkContext& ctx, DisplayPage& page) {
  const PlotFrame& f = ctx.frame;
  const PageStyle& st = ctx.style;
  const auto& series = ctx.data.series;
  std::map<double, double> top;  // x → top of the stack so far
  for (const auto& s : series)
    for (double x : s.x) top[x] = 0;
  std::vector<double> name_y;
  for (const auto& s : series) {
    const Rgb colour = ctx.colours.at(s.name);
    std::vector<Point> lower, upper;
    for (std::size_t i = 0; i < s.x.size(); ++i) {
      double& t = top[s.x[i]];
      lower.push_back({f.px(s.x[i]), f.py(t)});
      t += s.y[i];
      upper.push_back({f.px(s.x[i]), f.py(t)});
    }
    if (upper.empty()) {
      name_y.push_back(NAN);
      continue;
    }
    PathItem band;
    band.role = ShapeRole::data;
    band.points = upper;
    band.points.insert(band.points.end(), lower.rbegin(), lower.rend());
    band.closed = true;
    band.fill = colour;
    band.stroke = Stroke{st.ink.paper, st.rule_width() * 1.5, {}, true};  // a paper edge parts the bands
    page.add(std::move(band));
    note_line_marks(upper, page);
    // The band's inside, for text placed later: sample its middle too.
    std::vector<Point> middle;
    for (std::size_t i = 0; i < upper.size(); ++i) middle.push_back({upper[i].x, (upper[i].y + lower[i].y) / 2});
    note_line_marks(middle, page);
    name_y.push_back((upper.back().y + lower.back().y) / 2);
  }
  if (series.size() < 2 || !ctx.label_series) return;
  name_stacked_series(ctx, page, name_y, f.plot.right() + st.base * 0.3, f.plot.right() + st.base * 0.9, true);
}

}  // namespace forme
