#include "layout/marks/line_values.h"

#include <algorithm>

#include "scale/number_format.h"

namespace forme {

std::vector<std::size_t> line_value_points(const std::vector<double>& y, PanelSpec::LineValues rule) {
  using V = PanelSpec::LineValues;
  if (y.empty()) return {};
  if (rule == V::last) return {y.size() - 1};
  std::size_t lo = 0, hi = 0;
  for (std::size_t i = 1; i < y.size(); ++i) {
    if (y[i] < y[lo]) lo = i;
    if (y[i] > y[hi]) hi = i;
  }
  if (rule == V::highest) return {hi};
  if (rule == V::lowest) return {lo};
  if (lo == hi) return {lo};
  return {std::min(lo, hi), std::max(lo, hi)};
}

bool value_joins_name(const MarkContext& ctx, const Series& s) {
  const PanelSpec& spec = *ctx.data.spec;
  return ctx.label_series && !s.name.empty() && !s.y.empty() && spec.value_labels &&
         spec.line_values == PanelSpec::LineValues::last;
}

NumberFormat line_value_format(const PanelData& p, const Axis& y) {
  // One format for the panel's labelled values, so each shows as the data
  // hold it and no two different values print alike.
  std::vector<double> labelled;
  for (const auto& s : p.series)
    for (std::size_t i : line_value_points(s.y, p.spec->line_values)) labelled.push_back(s.y[i]);
  return value_format(labelled, y.values);
}

std::vector<PointNameRequest> line_value_labels(const MarkContext& ctx, DisplayPage& page) {
  const PlotFrame& f = ctx.frame;
  const PageStyle& st = ctx.style;
  const PanelSpec& spec = *ctx.data.spec;
  std::vector<PointNameRequest> out;
  const NumberFormat values = line_value_format(ctx);
  for (const auto& s : ctx.data.series) {
    for (std::size_t i : line_value_points(s.y, spec.line_values)) {
      const Point at{f.px(s.x[i]), f.py(s.y[i])};
      page.add(CircleItem{at, st.dot_radius(), ctx.colours.at(s.name), std::nullopt, ShapeRole::data, {}});
      if (value_joins_name(ctx, s)) continue;  // written after the series' name by draw_line_marks
      PointNameRequest r;
      r.anchor = at;
      r.radius = st.dot_radius() * 1.2;
      r.text = format_number(s.y[i], values);
      r.loc = spec.value_labels_loc;
      r.is_value = true;
      out.push_back(std::move(r));
    }
  }
  return out;
}

}  // namespace forme
