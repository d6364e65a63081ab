#include "layout/marks/value_labels.h"

#include <algorithm>
#include <optional>
#include <string>

#include "colour/contrast.h"
#include "layout/text_items.h"

namespace forme {

namespace {

// The two places a bar's value may go: inside its end (when it fits and
// reads) and just beyond it.
struct ValueSpots {
  std::optional<TextItem> inside;
  TextItem outside;
};

ValueSpots value_spots(const BarValue& b, const std::string& text, const PageStyle& st) {
  ShapeOptions o;
  o.tabular_figures = true;
  ShapedText t = shape_text(text, st.fonts.regular, st.label_size(), o);
  const double pad = st.base * 0.35;
  const double lh = PageStyle::line_height(st.fonts.regular, st.label_size());
  const Rgb inside_ink = ink_on(b.fill, st);
  // Inside only where the text fits with padding and still reads at 4.5:1.
  const bool reads = !b.patterned && meets(contrast_ratio(inside_ink, b.fill), 4.5);
  if (b.horizontal) {
    const bool fits = reads && t.width + 2 * pad <= b.bar.w && lh <= b.bar.h;
    const double cy = b.bar.cy();
    std::optional<TextItem> in;
    if (fits)
      in = text_mid(t, b.grows > 0 ? b.bar.right() - pad : b.bar.left() + pad, cy,
                    b.grows > 0 ? Align::right : Align::left, inside_ink, TextRole::value_label);
    const double x = b.grows > 0 ? b.bar.right() + pad : b.bar.left() - pad;
    return {std::move(in), text_mid(std::move(t), x, cy, b.grows > 0 ? Align::left : Align::right, st.ink.text,
                                    TextRole::value_label)};
  }
  const double asc = st.fonts.regular->ascent_em() * st.label_size();
  const bool fits = reads && t.width + pad <= b.bar.w && lh + 2 * pad <= b.bar.h;
  std::optional<TextItem> in;
  if (fits) {
    const double top = b.grows > 0 ? b.bar.top() + pad : b.bar.bottom() - pad - lh;
    in = text_at(t, b.bar.cx(), top + asc, Align::centre, inside_ink, TextRole::value_label);
  }
  const double top = b.grows > 0 ? b.bar.top() - pad * 0.5 - lh : b.bar.bottom() + pad * 0.5;
  return {std::move(in), text_at(std::move(t), b.bar.cx(), top + asc, Align::centre, st.ink.text, TextRole::value_label)};
}

// A value beyond its bar stays inside the plot along the bar (so it never
// reaches the tick labels) and clear of every value already written.
bool clear(const Rect& box, const BarValueRoom& room, const std::vector<Rect>& placed, double gap) {
  const Rect grown = box.inflate(gap);
  for (const Rect& p : placed)
    if (p.overlaps(grown)) return false;
  return box.top() >= room.plot.top() && box.bottom() <= room.plot.bottom() && box.left() >= room.plot.left() &&
         box.right() <= room.plot.right() + room.beyond_right;
}

}  // namespace

Rgb ink_on(const Rgb& fill, const PageStyle& st) {
  return contrast_ratio(st.ink.text, fill) >= contrast_ratio(st.ink.paper, fill) ? st.ink.text : st.ink.paper;
}

ValuePlacement add_value_label(const BarValue& b, const NumberFormat& format, const PageStyle& st, DisplayPage& page) {
  ValueSpots s = value_spots(b, format_value(b.value, format), st);
  if (s.inside) {
    page.add(std::move(*s.inside));
    return ValuePlacement::inside;
  }
  page.add(std::move(s.outside));
  return ValuePlacement::outside;
}

std::vector<ValuePlacement> add_value_labels(const std::vector<BarValue>& bars, const NumberFormat& format,
                                             const BarValueRoom& room, const PageStyle& st, DisplayPage& page,
                                             DiagnosticSink* warnings) {
  std::vector<ValuePlacement> out(bars.size(), ValuePlacement::left_out);
  if (bars.empty()) return out;
  // One format for the panel's values, so each shows as the data hold it
  // and no two different values print alike.
  std::vector<double> all;
  for (const BarValue& b : bars) all.push_back(b.value);
  const NumberFormat panel = value_format(all, format);
  std::vector<ValueSpots> spots;
  spots.reserve(bars.size());
  double across = 0;  // the widest value, measured across the bars
  const TextItem* widest = nullptr;
  for (const BarValue& b : bars) {
    spots.push_back(value_spots(b, format_number(b.value, panel), st));
    const Rect box = spots.back().outside.box();
    const double a = b.horizontal ? box.h : box.w;
    if (a > across) across = a, widest = &spots.back().outside;
  }
  const double gap = st.base * 0.15;
  // Upright values wider than the distance between neighbouring bars
  // collide wherever the bars are of like height: write none rather than
  // a heap of overlapping numbers.
  if (across + gap > room.pitch) {
    if (warnings)
      warnings->warn(room.loc,
                     "value labels left out: the bars are " + std::to_string(static_cast<int>(room.pitch)) +
                         " pt apart, but '" + widest->text.utf8 + "' needs " +
                         std::to_string(static_cast<int>(across + gap + 0.999)) + " pt",
                     "widen the panel, show fewer bars, or turn 'value-labels' off");
    return out;
  }
  std::vector<Rect> placed;
  for (std::size_t i = 0; i < bars.size(); ++i) {
    ValueSpots& s = spots[i];
    if (s.inside) {
      placed.push_back(s.inside->box());
      page.add(std::move(*s.inside));
      out[i] = ValuePlacement::inside;
    } else if (clear(s.outside.box(), room, placed, gap)) {
      placed.push_back(s.outside.box());
      page.add(std::move(s.outside));
      out[i] = ValuePlacement::outside;
    } else if (warnings) {
      warnings->warn(room.loc, "value label '" + s.outside.text.utf8 + "' left out: no room beyond its bar",
                     "leave more room above the bars (a larger axis range), or turn 'value-labels' off");
    }
  }
  return out;
}

}  // namespace forme
