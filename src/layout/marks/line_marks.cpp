// Line panels: one polyline per series, named at its last point. Names are
// spread vertically by an exact least-squares solve so they never touch,
// and a short leader joins a name that had to move to its line's end.
#include <cmath>

#include "colour/text_ink.h"
#include "layout/marks/line_values.h"
#include "layout/marks/marks.h"
#include "layout/text_items.h"
#include "place/spread.h"
#include "simplify/polyline.h"

namespace forme {

namespace {

// Thin long series to what print can show: no data point, nor any point
// of the segments between them, ends up more than 0.05 pt from the line
// on paper, far below what an eye resolves. Cairo keeps each vertex in
// 1/256 pt and the PDF writes three decimals, which moves it by up to
// (1/512 + 1/2000) pt in x and in y, 0.0035 pt in all (0.0033 measured on
// the series bench page), so the thinning gets the rest.
constexpr double kThinning = 0.05 - 0.0035;

// A label just after a line's last point, if no line passes through it.
bool free_of_lines(const Rect& r, const std::vector<std::vector<Point>>& lines) {
  for (const auto& l : lines)
    for (std::size_t i = 1; i < l.size(); ++i)
      if (segment_meets_rect(l[i - 1], l[i], r)) return false;
  return true;
}

}  // namespace

void draw_line_marks(const MarkContext& ctx, DisplayPage& page) {
  const PlotFrame& f = ctx.frame;
  const PageStyle& st = ctx.style;
  struct End {
    Point at;
    Rgb colour;
    const std::string* name;
    std::string value;  ///< written right after the name, when the panel labels last values
  };
  std::vector<End> ends;
  std::vector<std::vector<Point>> drawn;
  for (const auto& s : ctx.data.series) {
    const Rgb colour = ctx.colours.at(s.name);
    // A gap in the data breaks the line: one path per piece between gaps,
    // a value standing alone drawn as a dot (series/gaps.h).
    std::size_t from = 0;
    for (std::size_t b = 0; b <= s.breaks.size(); ++b) {
      const std::size_t to = b < s.breaks.size() ? s.breaks[b] : s.x.size();
      if (to <= from) continue;
      PathItem path;
      path.role = ShapeRole::data;
      path.stroke = Stroke{colour, st.line_width(), dash_lengths(ctx.dash(s.name), st.line_width()), true};
      path.points.reserve(to - from);
      for (std::size_t i = from; i < to; ++i) path.points.push_back({f.px(s.x[i]), f.py(s.y[i])});
      from = to;
      path.points = simplify_polyline(path.points, kThinning);
      drawn.push_back(path.points);
      note_line_marks(path.points, page);
      if (path.points.size() == 1) {
        page.add(CircleItem{path.points[0], st.dot_radius(), colour, std::nullopt, ShapeRole::data, {}});
      } else if (!path.points.empty()) {
        page.add(std::move(path));
      }
    }
    if (!s.x.empty() && !s.name.empty())
      ends.push_back({{f.px(s.x.back()), f.py(s.y.back())}, colour, &s.name,
                      value_joins_name(ctx, s) ? format_number(s.y.back(), line_value_format(ctx)) : std::string()});
  }
  if (!ctx.label_series || ends.empty()) return;
  // A name, then its value a space after it in the same ink: one label the
  // eye reads as a pair.
  ShapeOptions figures;
  figures.tabular_figures = true;
  const double space = st.base * 0.4;
  auto label_width = [&](const End& e, const ShapedText& name) {
    return e.value.empty() ? name.width
                           : name.width + space + shape_text(e.value, st.fonts.regular, st.label_size(), figures).width;
  };
  auto add_label = [&](const End& e, ShapedText name, double x, double cy) {
    const Rgb ink = text_ink(e.colour, st.ink.paper);
    const double after = x + name.width + space;
    page.add(text_mid(std::move(name), x, cy, Align::left, ink, TextRole::series_label));
    if (!e.value.empty())
      page.add(text_mid(shape_text(e.value, st.fonts.regular, st.label_size(), figures), after, cy, Align::left, ink,
                        TextRole::value_label));
  };

  // A line that stops early (a year still running) is named where it
  // stops, when that spot is clear of every line; the rest are named in
  // the margin beside the plot.
  const double lh = PageStyle::line_height(st.fonts.regular, st.label_size());
  std::vector<End> margin;
  std::vector<Rect> placed_early;
  for (const auto& e : ends) {
    if (e.at.x < f.plot.right() - st.base * 0.5) {
      ShapedText t = shape_text(*e.name, st.fonts.regular, st.label_size());
      const double pad = st.base * 0.5, tw = label_width(e, t);
      // Right of the end, then above it, then below it.
      const Rect candidates[] = {{e.at.x + pad, e.at.y - lh / 2, tw, lh},
                                 {e.at.x - tw / 2, e.at.y - pad - lh, tw, lh},
                                 {e.at.x - tw / 2, e.at.y + pad, tw, lh}};
      bool done = false;
      for (const Rect& box : candidates) {
        bool clear = box.left() >= f.plot.left() && box.right() <= f.plot.right() && box.top() >= f.plot.top() &&
                     box.bottom() <= f.plot.bottom() && free_of_lines(box.inflate(st.base * 0.15), drawn);
        for (const Rect& other : placed_early) clear = clear && !other.overlaps(box);
        if (!clear) continue;
        placed_early.push_back(box);
        add_label(e, std::move(t), box.x, box.cy());
        done = true;
        break;
      }
      if (done) continue;
    }
    margin.push_back(e);
  }
  ends = std::move(margin);
  if (ends.empty()) return;
  std::vector<ShapedText> texts;
  std::vector<double> desired, heights;
  for (const auto& e : ends) {
    texts.push_back(shape_text(*e.name, st.fonts.regular, st.label_size()));
    desired.push_back(e.at.y);
    heights.push_back(lh);
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
    if (std::abs(y - ends[i].at.y) > st.base * 0.25) {
      PathItem leader;
      leader.role = ShapeRole::leader;
      leader.points = {{x0, ends[i].at.y}, {label_x - st.base * 0.2, y}};
      leader.stroke = Stroke{ends[i].colour, st.rule_width() * 1.5, {}, true};
      page.add(std::move(leader));
    }
    add_label(ends[i], std::move(texts[i]), label_x, y);
  }
}

}  // namespace forme
