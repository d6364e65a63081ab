// Line panels: one polyline per series, named at its last point. Names are
// spread vertically by an exact least-squares solve so they never touch,
// and a short leader joins a name that had to move to its line's end.
#include <cmath>

#include "layout/marks/marks.h"
#include "layout/text_items.h"
#include "place/spread.h"

namespace forme {

void draw_line_marks(const MarkContext& ctx, DisplayPage& page) {
  const PlotFrame& f = ctx.frame;
  const PageStyle& st = ctx.style;
  struct End {
    double y;
    Rgb colour;
    const std::string* name;
  };
  std::vector<End> ends;
  for (const auto& s : ctx.data.series) {
    const Rgb colour = ctx.colours.at(s.name);
    PathItem path;
    path.stroke = Stroke{colour, st.line_width(), {}, true};
    for (std::size_t i = 0; i < s.x.size(); ++i) path.points.push_back({f.px(s.x[i]), f.py(s.y[i])});
    if (path.points.size() == 1) {
      page.add(CircleItem{path.points[0], st.dot_radius(), colour, std::nullopt});
    } else if (!path.points.empty()) {
      page.add(std::move(path));
    }
    if (!s.x.empty() && !s.name.empty()) ends.push_back({f.py(s.y.back()), colour, &s.name});
  }
  if (!ctx.label_series || ends.empty()) return;

  std::vector<ShapedText> texts;
  std::vector<double> desired, heights;
  for (const auto& e : ends) {
    texts.push_back(shape_text(*e.name, st.fonts.regular, st.label_size()));
    desired.push_back(e.y);
    heights.push_back(PageStyle::line_height(st.fonts.regular, st.label_size()));
  }
  SpreadOptions opt;
  opt.gap = st.base * 0.15;
  opt.lo = f.plot.top() - st.base * 0.5;
  opt.hi = f.plot.bottom() + st.base * 0.5;
  SpreadResult placed = spread_labels(desired, heights, opt);
  const double x0 = f.plot.right() + st.base * 0.3;
  const double label_x = f.plot.right() + st.base * 0.9;
  for (std::size_t i = 0; i < ends.size(); ++i) {
    const double y = placed.centres[i];
    if (std::abs(y - ends[i].y) > st.base * 0.25) {
      PathItem leader;
      leader.points = {{x0, ends[i].y}, {label_x - st.base * 0.2, y}};
      leader.stroke = Stroke{ends[i].colour, st.rule_width() * 1.5, {}, true};
      page.add(std::move(leader));
    }
    page.add(text_mid(std::move(texts[i]), label_x, y, Align::left, ends[i].colour, TextRole::series_label));
  }
}

}  // namespace forme
