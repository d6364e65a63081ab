// Values on bars: inside when the measured text fits with padding, beyond
// the bar's end otherwise, and always at a WCAG 2.x contrast of at least
// 4.5:1 against what is behind the text (SC 1.4.3; check-values.md §2b).
#include <catch2/catch.hpp>

#include "colour/contrast.h"
#include "colour/palette.h"
#include "layout/marks/value_labels.h"
#include "text/font.h"

using namespace forme;

namespace {

PageStyle style() {
  PageStyle st;
  st.fonts = open_bundled_fonts(find_font_dir(FORME_BINARY));
  st.base = 8;
  st.ink = Inks{ink::text, ink::muted, ink::rule, ink::grid, Rgb{1, 1, 1}};
  return st;
}

const TextItem& only_text(const DisplayPage& page) {
  REQUIRE(page.items.size() == 1);
  return std::get<TextItem>(page.items[0]);
}

}  // namespace

TEST_CASE("a value goes inside a bar exactly when its measured width fits with padding", "[layout][values]") {
  const PageStyle st = style();
  NumberFormat f;
  f.decimals = 0;
  const double text_w = shape_text("1,234", st.fonts.regular, st.label_size(), {false, true}).width;
  const double pad = st.base * 0.35;
  const Rgb fill = default_categorical().colours[0];
  // Just wide enough (text + padding on both sides) → inside; a hair narrower → outside.
  DisplayPage wide, narrow;
  CHECK(add_value_label({{0, 0, text_w + 2 * pad + 0.01, 20}, 1234, fill, true, 1}, f, st, wide) == ValuePlacement::inside);
  CHECK(add_value_label({{0, 0, text_w + 2 * pad - 0.01, 20}, 1234, fill, true, 1}, f, st, narrow) == ValuePlacement::outside);
  // Outside means beyond the bar's end, on paper, in text ink.
  const TextItem& out = only_text(narrow);
  CHECK(out.box().left() >= text_w + 2 * pad - 0.01);
  CHECK(out.colour == st.ink.text);
  // Inside means within the bar.
  const TextItem& in = only_text(wide);
  CHECK(in.box().right() <= text_w + 2 * pad + 0.01);
}

TEST_CASE("text inside a bar reads at 4.5:1 against every palette fill", "[layout][values]") {
  const PageStyle st = style();
  NumberFormat f;
  for (const Palette& p : all_palettes())
    for (const Rgb& fill : p.colours) {
      DisplayPage page;
      ValuePlacement where = add_value_label({{0, 0, 200, 40}, 42, fill, false, 1}, f, st, page);
      const TextItem& t = only_text(page);
      const Rgb behind = where == ValuePlacement::inside ? fill : st.ink.paper;
      INFO(p.name);
      CHECK(meets(contrast_ratio(t.colour, behind), 4.5));
    }
}
