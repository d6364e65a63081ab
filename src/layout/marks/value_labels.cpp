#include "layout/marks/value_labels.h"

#include "colour/contrast.h"
#include "layout/text_items.h"

namespace forme {

Rgb ink_on(const Rgb& fill, const PageStyle& st) {
  return contrast_ratio(st.ink.text, fill) >= contrast_ratio(st.ink.paper, fill) ? st.ink.text : st.ink.paper;
}

ValuePlacement add_value_label(const BarValue& b, const NumberFormat& format, const PageStyle& st, DisplayPage& page) {
  ShapeOptions o;
  o.tabular_figures = true;
  ShapedText t = shape_text(format_value(b.value, format), st.fonts.regular, st.label_size(), o);
  const double pad = st.base * 0.35;
  const double lh = PageStyle::line_height(st.fonts.regular, st.label_size());
  const Rgb inside_ink = ink_on(b.fill, st);
  // Inside only where the text fits with padding and still reads at 4.5:1.
  const bool reads = !b.patterned && meets(contrast_ratio(inside_ink, b.fill), 4.5);
  if (b.horizontal) {
    const bool fits = reads && t.width + 2 * pad <= b.bar.w && lh <= b.bar.h;
    const double cy = b.bar.cy();
    if (fits) {
      const double x = b.grows > 0 ? b.bar.right() - pad : b.bar.left() + pad;
      page.add(text_mid(std::move(t), x, cy, b.grows > 0 ? Align::right : Align::left, inside_ink, TextRole::value_label));
      return ValuePlacement::inside;
    }
    const double x = b.grows > 0 ? b.bar.right() + pad : b.bar.left() - pad;
    page.add(text_mid(std::move(t), x, cy, b.grows > 0 ? Align::left : Align::right, st.ink.text, TextRole::value_label));
    return ValuePlacement::outside;
  }
  const bool fits = reads && t.width + pad <= b.bar.w && lh + 2 * pad <= b.bar.h;
  if (fits) {
    const double top = b.grows > 0 ? b.bar.top() + pad : b.bar.bottom() - pad - lh;
    page.add(text_at(std::move(t), b.bar.cx(), top + st.fonts.regular->ascent_em() * st.label_size(), Align::centre,
                     inside_ink, TextRole::value_label));
    return ValuePlacement::inside;
  }
  const double top = b.grows > 0 ? b.bar.top() - pad * 0.5 - lh : b.bar.bottom() + pad * 0.5;
  page.add(text_at(std::move(t), b.bar.cx(), top + st.fonts.regular->ascent_em() * st.label_size(), Align::centre,
                   st.ink.text, TextRole::value_label));
  return ValuePlacement::outside;
}

}  // namespace forme
