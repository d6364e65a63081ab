// Dot panels: a strip of dots per category (values along x), or a plain
// scatter when both axes hold numbers. Dots have a paper-coloured rim so
// overlapping dots stay countable. In strips with several series, a faint
// line joins each category's dots (the gap is what the reader compares) and
// each series is named once, above its dot in the first row.
#include <algorithm>

#include "colour/text_ink.h"
#include "layout/marks/marks.h"
#include "layout/text_items.h"
#include "place/spread.h"

namespace forme {

void draw_dot_marks(const MarkContext& ctx, DisplayPage& page) {
  const PlotFrame& f = ctx.frame;
  const PageStyle& st = ctx.style;
  const auto& series = ctx.data.series;
  const bool strip = f.y.kind == AxisKind::category;
  if (strip && series.size() > 1) {
    for (std::size_t c = 0; c < f.y.categories.size(); ++c) {
      double lo = 1e300, hi = -1e300;
      for (const auto& s : series)
        for (std::size_t i = 0; i < s.y.size(); ++i)
          if (s.y[i] == static_cast<double>(c)) lo = std::min(lo, s.x[i]), hi = std::max(hi, s.x[i]);
      if (lo < hi) {
        PathItem join;
        join.points = {{f.px(lo), f.py(static_cast<double>(c))}, {f.px(hi), f.py(static_cast<double>(c))}};
        join.stroke = Stroke{st.ink.grid, st.line_width() * 1.2, {}, true};
        page.add(std::move(join));
      }
    }
  }
  std::vector<double> name_x, widths;
  for (const auto& s : series) {
    const Rgb colour = ctx.colours.at(s.name);
    double first_row_x = f.plot.left();
    for (std::size_t i = 0; i < s.x.size(); ++i) {
      const double r = st.dot_radius() * 1.2;
      page.add(CircleItem{{f.px(s.x[i]), f.py(s.y[i])}, r, colour, Stroke{st.ink.paper, st.rule_width() * 1.5, {}, false}, ShapeRole::data, {}});
      page.data_marks.push_back({f.px(s.x[i]) - r, f.py(s.y[i]) - r, 2 * r, 2 * r});
      if (strip && s.y[i] == 0) first_row_x = f.px(s.x[i]);
    }
    name_x.push_back(first_row_x);
  }
  if (!strip || series.size() < 2 || !ctx.label_series) return;
  // Names above the first row's dots, spread along x so they never touch.
  std::vector<ShapedText> names;
  for (const auto& s : series) {
    names.push_back(shape_text(s.name, st.fonts.bold, st.label_size()));
    widths.push_back(names.back().width);
  }
  SpreadOptions opt;
  opt.gap = st.base * 0.6;
  opt.lo = f.plot.left();
  opt.hi = f.plot.right();
  SpreadResult placed = spread_labels(name_x, widths, opt);
  const double cy = f.py(0) - st.dot_radius() * 1.2 - PageStyle::line_height(st.fonts.bold, st.label_size()) * 0.55;
  for (std::size_t k = 0; k < series.size(); ++k)
    page.add(text_mid(std::move(names[k]), placed.centres[k], cy, Align::centre,
                      text_ink(ctx.colours.at(series[k].name), st.ink.paper), TextRole::series_label));
}

}  // namespace forme
