#include "layout/marks/marks.h"

#include <algorithm>

#include "text/shaped_text.h"

namespace forme {

double marks_right_inset(ChartKind kind, const std::vector<PanelData>& panels, const PageStyle& style) {
  if (kind != ChartKind::line) return 0;
  double widest = 0;
  for (const auto& p : panels)
    if (p.series.size() > 1 || (p.series.size() == 1 && !p.series[0].name.empty()))
      for (const auto& s : p.series)
        widest = std::max(widest, shape_text(s.name, style.fonts.regular, style.label_size()).width);
  // Room for a short leader, then the label.
  return widest > 0 ? widest + style.base * 1.0 : 0;
}

void draw_marks(const MarkContext& ctx, DisplayPage& page) {
  switch (ctx.data.kind) {
    case ChartKind::line: return draw_line_marks(ctx, page);
    case ChartKind::vertical_bar: return draw_vertical_bar_marks(ctx, page);
    case ChartKind::horizontal_bar: return draw_horizontal_bar_marks(ctx, page);
    case ChartKind::dot: return draw_dot_marks(ctx, page);
  }
}

}  // namespace forme
