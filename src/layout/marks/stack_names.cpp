#include "layout/marks/stack_names.h"

#include <cmath>

#include "colour/text_ink.h"
#include "layout/text_items.h"
#include "place/spread.h"

namespace forme {

void name_stacked_series(const MarkContext& ctx, DisplayPage& page, const std::vector<double>& name_y, double from_x,
                         double label_x, bool leader_always) {
  const PageStyle& st = ctx.style;
  const PlotFrame& f = ctx.frame;
  const auto& series = ctx.data.series;
  const double lh = PageStyle::line_height(st.fonts.regular, st.label_size());
  std::vector<double> desired, heights;
  std::vector<std::size_t> which;
  for (std::size_t k = 0; k < series.size() && k < name_y.size(); ++k)
    if (!std::isnan(name_y[k])) desired.push_back(name_y[k]), heights.push_back(lh), which.push_back(k);
  if (which.empty()) return;
  SpreadOptions opt;
  opt.gap = st.base * 0.15;
  opt.lo = f.plot.top() - st.base * 0.5;
  opt.hi = f.plot.bottom() + st.base * 0.5;
  const SpreadResult placed = spread_labels(desired, heights, opt);
  for (std::size_t j = 0; j < which.size(); ++j) {
    const Rgb colour = ctx.colours.at(series[which[j]].name);
    const bool moved = std::abs(placed.centres[j] - desired[j]) > st.base * 0.25 || label_x - from_x > st.base * 0.5;
    if (leader_always || moved) {
      PathItem leader;
      leader.role = ShapeRole::leader;
      leader.points = {{from_x, desired[j]}, {label_x - st.base * 0.2, placed.centres[j]}};
      leader.stroke = Stroke{colour, st.rule_width() * 1.5, {}, true};
      page.add(std::move(leader));
    }
    page.add(text_mid(shape_text(series[which[j]].name, st.fonts.regular, st.label_size()), label_x, placed.centres[j],
                      Align::left, text_ink(colour, st.ink.paper), TextRole::series_label));
  }
}

}  // namespace forme
