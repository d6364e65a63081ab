// Stacked areas: each series a band laid on the ones before it, from zero
// upwards, so the top edge is the total and each band's depth is its
// series' value. Bands need a value for every series at every x (a missing
// value would silently thin the stack); selection refuses pages without
// them. Series are named beside the right end of their band, spread so
// names never touch, like line ends.
#include <cmath>
#include <map>

#include "colour/text_ink.h"
#include "layout/marks/marks.h"
#include "layout/text_items.h"
#include "place/spread.h"

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
  const double lh = PageStyle::line_height(st.fonts.regular, st.label_size());
  std::vector<double> desired, heights;
  std::vector<std::size_t> which;
  for (std::size_t k = 0; k < series.size(); ++k)
    if (!std::isnan(name_y[k])) desired.push_back(name_y[k]), heights.push_back(lh), which.push_back(k);
  SpreadOptions opt;
  opt.gap = st.base * 0.15;
  opt.lo = f.plot.top() - st.base * 0.5;
  opt.hi = f.plot.bottom() + st.base * 0.5;
  const SpreadResult placed = spread_labels(desired, heights, opt);
  const double x0 = f.plot.right() + st.base * 0.3;
  const double label_x = f.plot.right() + st.base * 0.9;
  for (std::size_t j = 0; j < which.size(); ++j) {
    const Rgb colour = ctx.colours.at(series[which[j]].name);
    PathItem leader;
    leader.points = {{x0, desired[j]}, {label_x - st.base * 0.2, placed.centres[j]}};
    leader.stroke = Stroke{colour, st.rule_width() * 1.5, {}, true};
    page.add(std::move(leader));
    page.add(text_mid(shape_text(series[which[j]].name, st.fonts.regular, st.label_size()), label_x, placed.centres[j],
                      Align::left, text_ink(colour, st.ink.paper), TextRole::series_label));
  }
}

}  // namespace forme
