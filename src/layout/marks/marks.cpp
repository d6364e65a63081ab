#include "layout/marks/marks.h"

#include <algorithm>
#include <cmath>
#include <string>

#include "layout/marks/line_values.h"
#include "scale/number_format.h"
#include "text/shaped_text.h"

namespace forme {

double marks_right_inset(ChartKind kind, const std::vector<PanelData>& panels, const std::vector<PanelAxes>& axes,
                         const PageStyle& style) {
  if (kind != ChartKind::line && kind != ChartKind::stacked_bar && kind != ChartKind::stacked_area) return 0;
  ShapeOptions figures;  // as draw_line_marks sets the value after the name
  figures.tabular_figures = true;
  double widest = 0;
  for (std::size_t i = 0; i < panels.size(); ++i) {
    const PanelData& p = panels[i];
    if (p.series.size() <= 1 && (p.series.empty() || p.series[0].name.empty())) continue;
    // A line's last value follows its name (line_values.h), in the panel's
    // value format, so room is kept for that very text.
    const bool values_follow = kind == ChartKind::line && p.spec && p.spec->value_labels &&
                               p.spec->line_values == PanelSpec::LineValues::last && i < axes.size();
    const NumberFormat format = values_follow ? line_value_format(p, axes[i].y) : NumberFormat{};
    for (const auto& s : p.series) {
      double w = shape_text(s.name, style.fonts.regular, style.label_size()).width;
      if (values_follow && !s.y.empty() && std::isfinite(s.y.back()))
        w += style.base * 0.4 +
             shape_text(format_number(s.y.back(), format), style.fonts.regular, style.label_size(), figures).width;
      widest = std::max(widest, w);
    }
  }
  // Room for a short leader, then the label.
  return widest > 0 ? widest + style.base * 1.0 : 0;
}

void note_line_marks(const std::vector<Point>& line, DisplayPage& page) {
  double length = 0;
  for (std::size_t i = 1; i < line.size(); ++i) length += std::hypot(line[i].x - line[i - 1].x, line[i].y - line[i - 1].y);
  // 1.5 pt apart is less than any label is tall (6 pt text at least); very
  // long wiggly lines are sampled more coarsely so the list stays bounded.
  const double step = std::max(1.5, length / 20000);
  for (std::size_t i = 0; i < line.size(); ++i) {
    page.data_marks.push_back({line[i].x, line[i].y, 0, 0});
    if (i + 1 == line.size()) break;
    const double dx = line[i + 1].x - line[i].x, dy = line[i + 1].y - line[i].y;
    const int n = static_cast<int>(std::hypot(dx, dy) / step);
    for (int k = 1; k <= n; ++k) {
      const double t = static_cast<double>(k) / (n + 1);
      page.data_marks.push_back({line[i].x + dx * t, line[i].y + dy * t, 0, 0});
    }
  }
}

void draw_marks(const MarkContext& ctx, DisplayPage& page) {
  switch (ctx.data.kind) {
    case ChartKind::line: return draw_line_marks(ctx, page);
    case ChartKind::vertical_bar: return draw_vertical_bar_marks(ctx, page);
    case ChartKind::horizontal_bar: return draw_horizontal_bar_marks(ctx, page);
    case ChartKind::dot: return draw_dot_marks(ctx, page);
    case ChartKind::stacked_bar: return draw_stacked_bar_marks(ctx, page);
    case ChartKind::stacked_area: return draw_stacked_area_marks(ctx, page);
  }
}

}  // namespace forme
