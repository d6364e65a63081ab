// Stacked bars: one upright bar per category (or period), each series a
// segment stacked on the ones before it, positive values upwards from zero
// and negative values downwards. A segment carries its value inside when
// the measured text fits with padding and its ink reads at 4.5:1 (WCAG 2.x
// SC 1.4.3); otherwise the value is left out and the page says so. Series
// are named beside the last bar's segments, spread so names never touch.
#include <algorithm>
#include <cmath>
#include <map>

#include "colour/contrast.h"
#include "colour/text_ink.h"
#include "layout/marks/marks.h"
#include "layout/marks/stack_names.h"
#include "layout/marks/value_labels.h"
#include "layout/text_items.h"

namespace forme {

namespace {

constexpr double kBandFill = 0.72;  // as for side-by-side bars

PathItem segment(const Rect& r, Rgb fill, const PageStyle& st) {
  PathItem p = filled_rect(r, fill);
  p.role = ShapeRole::data;
  p.stroke = Stroke{st.ink.paper, st.rule_width() * 1.5, {}, false};  // a paper rim parts the segments
  return p;
}

double band_width(const MarkContext& ctx) {
  if (ctx.frame.x.kind != AxisKind::date) return ctx.frame.band_x();
  std::vector<const PanelData*> one{&ctx.data};
  return smallest_step(one) * ctx.frame.plot.w / (ctx.frame.x.hi - ctx.frame.x.lo);
}

std::string place_name(const MarkContext& ctx, double x) {
  if (ctx.frame.x.kind == AxisKind::category) return ctx.frame.x.categories[static_cast<std::size_t>(x)];
  return format_number(x, ctx.frame.x.format);
}

}  // namespace

void draw_stacked_bar_marks(const MarkContext& ctx, DisplayPage& page) {
  const PlotFrame& f = ctx.frame;
  const PageStyle& st = ctx.style;
  const auto& series = ctx.data.series;
  const double band = band_width(ctx) * kBandFill;
  const double pad = st.base * 0.3;
  const double lh = PageStyle::line_height(st.fonts.regular, st.label_size());
  std::map<double, std::pair<double, double>> stacks;  // x → (top of positives, bottom of negatives)
  double last_x = -INFINITY;
  for (const auto& s : series)
    for (double x : s.x) last_x = std::max(last_x, x);
  std::vector<double> name_y(series.size(), NAN);
  // One format for all segments' values: each as the data hold it, no two alike.
  const NumberFormat values = panel_value_format(ctx.data, false, f.y);
  for (std::size_t k = 0; k < series.size(); ++k) {
    const Rgb colour = ctx.colours.at(series[k].name);
    for (std::size_t i = 0; i < series[k].x.size(); ++i) {
      const double x = series[k].x[i], v = series[k].y[i];
      auto& [up, down] = stacks[x];
      double& base = v >= 0 ? up : down;
      const double y0 = f.py(base), y1 = f.py(base + v);
      base += v;
      const Rect r{f.px(x) - band / 2, std::min(y0, y1), band, std::abs(y1 - y0)};
      page.add(segment(r, colour, st));
      page.data_marks.push_back(r);
      if (x == last_x && v != 0) name_y[k] = r.cy();
      if (!ctx.data.spec->value_labels || v == 0) continue;
      ShapeOptions o;
      o.tabular_figures = true;
      ShapedText t = shape_text(format_number(v, values), st.fonts.regular, st.label_size(), o);
      const Rgb ink = ink_on(colour, st);
      const bool fits = t.width + 2 * pad <= r.w && lh + pad <= r.h && meets(contrast_ratio(ink, colour), 4.5);
      if (fits) {
        page.add(text_mid(std::move(t), r.cx(), r.cy(), Align::centre, ink, TextRole::value_label));
      } else if (ctx.warnings) {
        ctx.warnings->warn(ctx.data.spec->loc,
                           "the value " + t.utf8 + " of '" + series[k].name + "' at " + place_name(ctx, x) +
                               " does not fit inside its segment and is left out",
                           "give the panel more room, use fewer decimals, or read it from the axis");
      }
    }
  }
  if (series.size() < 2 || !ctx.label_series) return;
  // Names beside the last bar, centred on their segments where there is room.
  const double x0 = f.px(last_x) + band / 2 + st.base * 0.3;
  name_stacked_series(ctx, page, name_y, x0, std::max(f.plot.right(), x0) + st.base * 0.6, false);
}

}  // namespace forme
