// Bar panels: bars grow from zero along the value axis, one band per
// category (or per period on a time axis), series side by side within a
// band. With several series, each is named once, directly beside its bar in
// the first band, so no legend is needed.
#include <algorithm>
#include <cstdint>

#include "colour/text_ink.h"
#include "layout/marks/marks.h"
#include "layout/marks/value_labels.h"
#include "layout/text_items.h"
#include "place/spread.h"

namespace forme {

namespace {
// Bars fill this share of their band; the rest is air between categories.
constexpr double kBandFill = 0.72;

PathItem box(double x0, double y0, double x1, double y1, Rgb fill, std::optional<Hatch> hatch = std::nullopt) {
  PathItem p;
  p.hatch = hatch;
  p.points = {{x0, y0}, {x1, y0}, {x1, y1}, {x0, y1}};
  p.closed = true;
  p.fill = fill;
  p.role = ShapeRole::data;
  return p;
}

// Band width along x in points: one category, or the shortest period.
double x_band(const MarkContext& ctx) {
  if (ctx.frame.x.kind != AxisKind::date) return ctx.frame.band_x();
  std::vector<const PanelData*> one{&ctx.data};
  return smallest_step(one) * ctx.frame.plot.w / (ctx.frame.x.hi - ctx.frame.x.lo);
}

bool named(const std::vector<Series>& s) { return s.size() > 1; }
}  // namespace

void draw_vertical_bar_marks(const MarkContext& ctx, DisplayPage& page) {
  const PlotFrame& f = ctx.frame;
  const PageStyle& st = ctx.style;
  const auto& series = ctx.data.series;
  const double band = x_band(ctx) * kBandFill;
  const double each = band / static_cast<double>(std::max<std::size_t>(1, series.size()));
  const double zero = f.py(0);
  std::vector<BarValue> values;
  for (std::size_t k = 0; k < series.size(); ++k) {
    const Rgb colour = ctx.colours.at(series[k].name);
    for (std::size_t i = 0; i < series[k].x.size(); ++i) {
      double left = f.px(series[k].x[i]) - band / 2 + each * static_cast<double>(k);
      const double end = f.py(series[k].y[i]);
      page.add(box(left, zero, left + each, end, colour, hatch_for(ctx.pattern(series[k].name), colour, st.base)));
      page.data_marks.push_back({left, std::min(zero, end), each, std::abs(end - zero)});
      if (ctx.data.spec->value_labels)
        values.push_back({{left, std::min(zero, end), each, std::abs(end - zero)}, series[k].y[i], colour, false,
                          series[k].y[i] >= 0 ? 1 : -1, ctx.pattern(series[k].name) != FillPattern::plain});
    }
  }
  // Side by side, neighbouring bars' centres are one bar apart; one bar to a
  // band, one band apart.
  const BarValueRoom room{f.plot, series.size() > 1 ? each : x_band(ctx), 0, ctx.data.spec->value_labels_loc};
  add_value_labels(values, f.y.values, room, st, page, ctx.warnings);
  if (!named(series) || !ctx.label_series) return;
  // Upright bars are too narrow to carry names: name the series in a row
  // of coloured words along the top of the plot, in bar order.
  double x = f.plot.left();
  const double cy = f.plot.top() - PageStyle::line_height(st.fonts.regular, st.label_size()) * 0.1;
  for (const auto& s : series) {
    ShapedText t = shape_text(s.name, st.fonts.bold, st.label_size());
    const double w = t.width;
    const Rgb colour = ctx.colours.at(s.name);
    const double sq = st.label_size() * 0.7;
    page.add(box(x, cy - sq / 2, x + sq, cy + sq / 2, colour, hatch_for(ctx.pattern(s.name), colour, st.base)));
    page.add(text_mid(std::move(t), x + sq * 1.4, cy, Align::left, text_ink(colour, st.ink.paper), TextRole::series_label));
    x += sq * 1.4 + w + st.base * 1.2;
  }
}

void draw_horizontal_bar_marks(const MarkContext& ctx, DisplayPage& page) {
  const PlotFrame& f = ctx.frame;
  const PageStyle& st = ctx.style;
  const auto& series = ctx.data.series;
  const double band = f.band_y() * kBandFill;
  const double each = band / static_cast<double>(std::max<std::size_t>(1, series.size()));
  const double zero = f.px(0);
  // Where each series' bar in the first category ends: its name goes there.
  std::vector<double> name_x(series.size(), zero), name_y(series.size(), 0);
  std::vector<BarValue> values;
  std::vector<std::size_t> first_value(series.size(), SIZE_MAX);  // the value of each series' first-category bar
  for (std::size_t k = 0; k < series.size(); ++k) {
    const Rgb colour = ctx.colours.at(series[k].name);
    for (std::size_t i = 0; i < series[k].y.size(); ++i) {
      double top = f.py(series[k].y[i]) - band / 2 + each * static_cast<double>(k);
      const double end = f.px(series[k].x[i]);
      page.add(box(zero, top, end, top + each, colour, hatch_for(ctx.pattern(series[k].name), colour, st.base)));
      page.data_marks.push_back({std::min(zero, end), top, std::abs(end - zero), each});
      if (series[k].y[i] == 0) {
        name_x[k] = std::max(zero, f.px(series[k].x[i]));
        name_y[k] = top + each / 2;
        if (ctx.data.spec->value_labels) first_value[k] = values.size();
      }
      if (ctx.data.spec->value_labels)
        values.push_back({{std::min(zero, end), top, std::abs(end - zero), each}, series[k].x[i], colour, true,
                          series[k].x[i] >= 0 ? 1 : -1, ctx.pattern(series[k].name) != FillPattern::plain});
    }
  }
  // Values beyond long bars may run past the plot's right edge as before:
  // the page's audit sees any that leave the sheet.
  const BarValueRoom room{f.plot, series.size() > 1 ? each : f.band_y(), 1e9, ctx.data.spec->value_labels_loc};
  const std::vector<ValuePlacement> where = add_value_labels(values, f.x.values, room, st, page, ctx.warnings);
  for (std::size_t k = 0; k < series.size(); ++k)
    // A value written beyond this bar comes first; the name follows it.
    if (first_value[k] != SIZE_MAX && where[first_value[k]] == ValuePlacement::outside)
      name_x[k] += shape_text(format_value(values[first_value[k]].value, f.x.format), st.fonts.regular, st.label_size()).width +
                   st.base * 0.6;
  if (!named(series) || !ctx.label_series) return;
  std::vector<double> heights(series.size(), PageStyle::line_height(st.fonts.bold, st.label_size()));
  SpreadOptions opt;
  opt.gap = 0;
  SpreadResult placed = spread_labels(name_y, heights, opt);
  for (std::size_t k = 0; k < series.size(); ++k) {
    const Rgb colour = ctx.colours.at(series[k].name);
    page.add(text_mid(shape_text(series[k].name, st.fonts.bold, st.label_size()), name_x[k] + st.base * 0.4,
                      placed.centres[k], Align::left, text_ink(colour, st.ink.paper), TextRole::series_label));
  }
}

}  // namespace forme
