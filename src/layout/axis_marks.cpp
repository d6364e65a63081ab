#include "layout/axis_marks.h"

#include <algorithm>
#include <cmath>

#include "data/dates.h"
#include "layout/minor_ticks.h"
#include "layout/text_items.h"
#include "text/wrap.h"

namespace forme {

namespace {

bool is_value_axis(const Axis& a) { return a.kind == AxisKind::number; }

PathItem segment(Point a, Point b, const Stroke& s, ShapeRole role = ShapeRole::furniture) {
  PathItem p;
  p.points = {a, b};
  p.stroke = s;
  p.role = role;
  return p;
}
}  // namespace

std::vector<ShapedText> shape_tick_labels(const Axis& axis, const PageStyle& st) {
  ShapeOptions o;
  o.tabular_figures = axis.kind != AxisKind::category;
  std::vector<ShapedText> out;
  for (const auto& t : axis.ticks) out.push_back(shape_text(t.label, st.fonts.regular, st.label_size(), o));
  return out;
}

double widest(const std::vector<ShapedText>& labels) {
  double w = 0;
  for (const auto& l : labels) w = std::max(w, l.width);
  return w;
}

double label_gap(const PageStyle& st) { return st.label_size() * 0.5; }

int label_stride(const Axis& axis, double extent, double length, double gap) {
  const std::size_t n = axis.ticks.size();
  if (n < 2 || length <= 0) return 1;
  std::vector<double> at;
  for (const auto& t : axis.ticks) at.push_back(PlotFrame::frac(axis, t.value) * length);
  const double need = extent + gap;
  for (std::size_t k = 1; k < n; ++k) {
    bool clear = true;
    for (std::size_t i = 0; i + k < n && clear; i += k) clear = std::abs(at[i + k] - at[i]) >= need - 1e-9;
    if (clear) return static_cast<int>(k);
  }
  return static_cast<int>(n);  // room for the first label only
}

double x_label_band(const Axis& x, const PageStyle& st, const NameFit* names) {
  double lines = 1;
  double line = PageStyle::line_height(st.fonts.regular, st.label_size());
  if (x.kind == AxisKind::date)
    for (const auto& t : x.ticks)
      if (t.major) lines = 2;
  if (x.kind == AxisKind::category && names) {
    lines = std::max(1, names->most_lines);
    line = names->line_height;
  }
  return st.tick_length() + st.base * 0.3 + line * lines;
}

void draw_axis_backdrop(const PlotFrame& f, const PageStyle& st, DisplayPage& page) {
  const Stroke grid{st.ink.grid, st.rule_width(), {}, false};
  const Stroke rule{st.ink.rule, st.rule_width() * 1.6, {}, false};
  if (is_value_axis(f.y)) {
    for (const auto& t : f.y.ticks)
      if (t.value != 0) page.add(segment({f.plot.left(), f.py(t.value)}, {f.plot.right(), f.py(t.value)}, grid, ShapeRole::grid));
    if (f.y.lo <= 0 && f.y.hi >= 0)
      page.add(segment({f.plot.left(), f.py(0)}, {f.plot.right(), f.py(0)}, rule));
    else  // no zero in view: a plain axis line marks the bottom of the plot
      page.add(segment({f.plot.left(), f.plot.bottom()}, {f.plot.right(), f.plot.bottom()}, rule));
  }
  if (is_value_axis(f.x) && f.y.kind == AxisKind::category) {
    for (const auto& t : f.x.ticks)
      if (t.value != 0) page.add(segment({f.px(t.value), f.plot.top()}, {f.px(t.value), f.plot.bottom()}, grid, ShapeRole::grid));
    if (f.x.lo <= 0 && f.x.hi >= 0) page.add(segment({f.px(0), f.plot.top()}, {f.px(0), f.plot.bottom()}, rule));
  }
  if (is_value_axis(f.x) && is_value_axis(f.y)) {
    for (const auto& t : f.x.ticks)
      page.add(segment({f.px(t.value), f.plot.top()}, {f.px(t.value), f.plot.bottom()}, grid, ShapeRole::grid));
  }
  draw_minor_ticks(f, st, page);
}

void draw_axis_labels(const PlotFrame& f, const PageStyle& st, const AxisLabelling& which, DisplayPage& page) {
  const Stroke tick{st.ink.rule, st.rule_width() * 1.6, {}, false};
  const double tl = st.tick_length();
  const double pad = st.base * 0.3;

  // x axis: ticks below the plot for dates and numbers; labels under them.
  if (which.x_labels) {
    auto labels = shape_tick_labels(f.x, st);
    const NameFit* names = f.x.kind == AxisKind::category ? which.x_names : nullptr;
    // Category names were fitted to their slots (and thinned) already.
    const int stride = names ? names->stride : label_stride(f.x, widest(labels), f.plot.w, st.base * 0.8);
    const double lead = names ? names->line_height : PageStyle::line_height(st.fonts.regular, st.label_size());
    const double baseline =
        f.plot.bottom() + tl + pad + st.fonts.regular->ascent_em() * (names ? names->size : st.label_size());
    for (std::size_t i = 0; i < f.x.ticks.size(); ++i) {
      const Tick& t = f.x.ticks[i];
      const double x = f.px(t.value);
      if (f.x.kind != AxisKind::category)
        page.add(segment({x, f.plot.bottom()}, {x, f.plot.bottom() + tl}, tick));
      if (i % static_cast<std::size_t>(stride) != 0) continue;
      if (f.x.kind == AxisKind::category) {
        double y = baseline;
        const auto lines = names && i < names->names.size()
                               ? names->names[i].lines
                               : wrap_text(t.label, st.fonts.regular, st.label_size(), f.band_x() * 0.95);
        for (auto line : lines) {
          page.add(text_at(line, x, y, Align::centre, st.ink.muted, TextRole::tick_label));
          y += lead;
        }
      } else {
        page.add(text_at(labels[i], x, baseline, Align::centre, st.ink.muted, TextRole::tick_label));
        if (t.major && f.x.kind == AxisKind::date) {
          const std::string year = std::to_string(civil_from_days(static_cast<long>(std::floor(t.value))).year);
          ShapeOptions o;
          o.tabular_figures = true;
          page.add(text_at(shape_text(year, st.fonts.regular, st.label_size(), o), x,
                           baseline + lead, Align::centre, st.ink.muted, TextRole::tick_label));
        }
      }
    }
  }
  if (which.y_labels && f.y.kind == AxisKind::category && which.y_names) {
    // Names in their column, each block of lines centred on its band.
    const NameFit& names = *which.y_names;
    for (std::size_t i = 0; i < f.y.ticks.size() && i < names.names.size(); ++i) {
      const auto& lines = names.names[i].lines;
      double cy = f.py(f.y.ticks[i].value) - names.line_height * static_cast<double>(lines.size() - 1) / 2;
      for (const auto& line : lines) {
        page.add(text_mid(line, f.plot.left() - pad, cy, Align::right, st.ink.text, TextRole::tick_label));
        cy += names.line_height;
      }
    }
  } else if (which.y_labels) {
    auto labels = shape_tick_labels(f.y, st);
    const double tall = labels.empty() ? 0 : labels.front().height();
    const int stride = f.y.kind == AxisKind::category ? 1 : label_stride(f.y, tall, f.plot.h, label_gap(st));
    for (std::size_t i = 0; i < f.y.ticks.size(); ++i) {
      if (i % static_cast<std::size_t>(stride) != 0) continue;
      page.add(text_mid(labels[i], f.plot.left() - pad, f.py(f.y.ticks[i].value), Align::right,
                        f.y.kind == AxisKind::category ? st.ink.text : st.ink.muted, TextRole::tick_label));
    }
  }
}

}  // namespace forme
