#include "layout/guides.h"

#include <algorithm>
#include <cmath>
#include <cstdio>

#include "colour/text_ink.h"
#include "data/dates.h"
#include "layout/text_items.h"
#include "scale/fit.h"

namespace forme {

namespace {

// Significant figures as fixed decimals: 3.0009 -> "3.00", 0.50009 -> "0.500".
std::string sig3(double v) {
  if (v == 0) return "0";
  int decimals = std::max(0, 2 - static_cast<int>(std::floor(std::log10(std::abs(v)))));
  char buf[64];
  std::snprintf(buf, sizeof buf, "%.*f", decimals, std::abs(v));
  return buf;
}

double reference_x(const ReferenceLine& r, const Axis& x) {
  if (x.kind == AxisKind::date) {
    if (auto d = parse_date(r.x.value)) return d->day;
    throw InputError(r.x.loc, "'" + r.x.value + "' is not a date", "write YYYY, YYYY-MM or YYYY-MM-DD");
  }
  if (x.kind == AxisKind::category) {
    for (std::size_t i = 0; i < x.categories.size(); ++i)
      if (x.categories[i] == r.x.value) return static_cast<double>(i);
    throw InputError(r.x.loc, "'" + r.x.value + "' is not one of the categories on this axis");
  }
  try {
    std::size_t used = 0;
    double v = std::stod(r.x.value, &used);
    if (used == r.x.value.size()) return v;
  } catch (const std::exception&) {
  }
  throw InputError(r.x.loc, "'" + r.x.value + "' is not a number");
}

// The equation's spots: the corners of the plot, those off the line's
// diagonal first. The page pass takes the first clear of dots, lines and text.
std::vector<Rect> equation_spots(const PlotFrame& f, const PageStyle& st, const ShapedText& t, const LinearFit& fit) {
  const double pad = st.base * 0.4;
  const double w = t.width, h = t.height();
  const Rect tl{f.plot.left() + pad, f.plot.top() + pad, w, h};
  const Rect tr{f.plot.right() - pad - w, f.plot.top() + pad, w, h};
  const Rect bl{f.plot.left() + pad, f.plot.bottom() - pad - h, w, h};
  const Rect br{f.plot.right() - pad - w, f.plot.bottom() - pad - h, w, h};
  return fit.slope >= 0 ? std::vector<Rect>{tl, br, tr, bl} : std::vector<Rect>{tr, bl, tl, br};
}

}  // namespace

std::string trend_equation(double intercept, double slope) {
  const char* minus = "\u2212";
  std::string s = "y = ";
  s += (intercept < 0 ? std::string(minus) : std::string()) + sig3(intercept);
  s += slope < 0 ? std::string(" ") + minus + " " : std::string(" + ");
  s += sig3(slope) + "x";
  return s;
}

void draw_reference_lines(const MarkContext& ctx, DisplayPage& page, std::vector<SpotChoiceRequest>& labels) {
  const PlotFrame& f = ctx.frame;
  const PageStyle& st = ctx.style;
  const Stroke dashed{st.ink.rule, st.rule_width() * 1.8, {st.base * 0.5, st.base * 0.3}, false};
  for (const auto& r : ctx.data.spec->references) {
    PathItem line;
    line.stroke = dashed;
    line.role = ShapeRole::reference;
    line.loc = r.loc;
    ShapedText t;
    if (!r.label.empty()) t = shape_text(r.label, st.fonts.regular, st.label_size());
    const double w = t.width, h = t.height();
    std::vector<Rect> spots;
    if (r.y) {
      const double y = f.py(*r.y);
      line.points = {{f.plot.left(), y}, {f.plot.right(), y}};
      const double gap = st.base * 0.25;
      const double right = f.plot.right() - gap - w, left = f.plot.left() + gap;
      spots = {{right, y - gap - h, w, h}, {right, y + gap, w, h}, {left, y - gap - h, w, h}, {left, y + gap, w, h}};
      // Then along the line, right to left, above and below: a gap between
      // bars or lines is better than a label on the data.
      const double step = std::max(st.base, w / 4);
      for (double x = right - step; x > left; x -= step) spots.push_back({x, y - gap - h, w, h}), spots.push_back({x, y + gap, w, h});
      // Last, outside the plot beside the line's right end.
      spots.push_back({f.plot.right() + gap * 2, y - h / 2, w, h});
    } else {
      const double x = f.px(reference_x(r, f.x));
      line.points = {{x, f.plot.top()}, {x, f.plot.bottom()}};
      const double gap = st.base * 0.3;
      const double top = f.plot.top(), bottom = f.plot.bottom() - h;
      spots = {{x + gap, top, w, h}, {x - gap - w, top, w, h}, {x + gap, bottom, w, h}, {x - gap - w, bottom, w, h}};
      const double step = std::max(st.base, h);
      for (double y = top + step; y < bottom; y += step) spots.push_back({x + gap, y, w, h}), spots.push_back({x - gap - w, y, w, h});
      // Last, above the plot over the line.
      spots.push_back({x - w / 2, f.plot.top() - gap - h, w, h});
    }
    // Text placed later keeps off the line too.
    note_line_marks(line.points, page);
    page.add(std::move(line));
    if (!r.label.empty()) labels.push_back({std::move(t), std::move(spots), st.ink.text, TextRole::value_label, r.loc});
  }
}

void draw_trend_lines(const MarkContext& ctx, DisplayPage& page, std::vector<SpotChoiceRequest>& labels) {
  const PanelSpec& spec = *ctx.data.spec;
  if (spec.trend == Trend::none || ctx.data.kind != ChartKind::dot) return;
  if (ctx.data.x_kind != AxisKind::number || ctx.data.y_kind != AxisKind::number)
    throw InputError(spec.loc, "a trend line needs numbers on both axes", "use 'trend' on a dot panel of two number columns");
  const PlotFrame& f = ctx.frame;
  const PageStyle& st = ctx.style;
  for (const auto& s : ctx.data.series) {
    auto fit = fit_line(s.x, s.y);
    if (!fit) continue;
    double x0 = s.x.front(), x1 = s.x.front();
    for (double v : s.x) x0 = std::min(x0, v), x1 = std::max(x1, v);
    const Rgb colour = ctx.colours.at(s.name);
    PathItem line;
    line.role = ShapeRole::reference;
    line.points = {{f.px(x0), f.py(fit->intercept + fit->slope * x0)}, {f.px(x1), f.py(fit->intercept + fit->slope * x1)}};
    line.stroke = Stroke{text_ink(colour, st.ink.paper, 3.0), st.line_width() * 0.8, {}, true};
    line.loc = spec.loc;
    note_line_marks(line.points, page);  // text placed later keeps off the trend line too
    page.add(std::move(line));
    if (spec.trend == Trend::line_with_equation) {
      ShapedText t = shape_text(trend_equation(fit->intercept, fit->slope), st.fonts.regular, st.label_size());
      std::vector<Rect> spots = equation_spots(f, st, t, *fit);
      labels.push_back({std::move(t), std::move(spots), text_ink(colour, st.ink.paper), TextRole::value_label, spec.loc});
    }
  }
}

}  // namespace forme
