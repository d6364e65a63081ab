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

std::vector<PointNameRequest> line_value_labels(const MarkContext& ctx, DisplayPage& page) {
  const PlotFrame& f = ctx.frame;
  const PageStyle& st = ctx.style;
  const PanelSpec& spec = *ctx.data.spec;
  std::vector<PointNameRequest> out;
  for (const auto& s : ctx.data.series) {
    for (std::size_t i : line_value_points(s.y, spec.line_values)) {
      const Point at{f.px(s.x[i]), f.py(s.y[i])};
      page.add(CircleItem{at, st.dot_radius(), ctx.colours.at(s.name), std::nullopt, ShapeRole::data, {}});
      PointNameRequest r;
      r.anchor = at;
      r.radius = st.dot_radius() * 1.2;
      r.text = format_value(s.y[i], f.y.format);
      r.loc = spec.value_labels_loc;
      r.is_value = true;
      out.push_back(std::move(r));
    }
  }
  return out;
}

}  // namespace forme
