// Dot panels: a strip of dots per category (values along x), or a plain
// scatter when both axes hold numbers. Dots have a paper-coloured rim so
// overlapping dots stay countable.
#include "layout/marks/marks.h"

namespace forme {

void draw_dot_marks(const MarkContext& ctx, DisplayPage& page) {
  const PlotFrame& f = ctx.frame;
  const PageStyle& st = ctx.style;
  for (const auto& s : ctx.data.series) {
    const Rgb colour = ctx.colours.at(s.name);
    for (std::size_t i = 0; i < s.x.size(); ++i)
      page.add(CircleItem{{f.px(s.x[i]), f.py(s.y[i])}, st.dot_radius() * 1.2, colour,
                          Stroke{st.ink.paper, st.rule_width() * 1.5, {}, false}});
  }
}

}  // namespace forme
