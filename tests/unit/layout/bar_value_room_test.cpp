// A panel's bar values: all or none by the distance between neighbouring
// bars, each beyond its bar only inside the plot, and a warning for what is
// left out. Widths come from the bundled font's measured text; the rules
// are the ones value_labels.h states, worked by hand here.
#include <catch2/catch.hpp>

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

int texts(const DisplayPage& page) {
  int n = 0;
  for (const auto& item : page.items) n += std::holds_alternative<TextItem>(item) ? 1 : 0;
  return n;
}

}  // namespace

TEST_CASE("bar values are written only when the widest fits between neighbouring bars", "[layout][values]") {
  const PageStyle st = style();
  NumberFormat f;
  f.decimals = 0;
  const Rgb fill = default_categorical().colours[0];
  // Two narrow bars of like height, each 6 pt wide: the values go beyond them.
  ShapeOptions o;
  o.tabular_figures = true;
  const double widest = shape_text("654,321", st.fonts.regular, st.label_size(), o).width;
  const double gap = st.base * 0.15;
  // Centres one pitch apart, the pitch the room states below.
  const double apart = widest + gap + 0.01;
  const std::vector<BarValue> bars{{{0, 100, 6, 100}, 12345, fill}, {{apart, 100, 6, 100}, 654321, fill}};
  const Rect plot{-50, 0, 200, 200};
  {
    DisplayPage page;
    DiagnosticSink w;
    const auto where = add_value_labels(bars, f, {plot, apart, 0, {}}, st, page, &w);
    CHECK(where[0] == ValuePlacement::outside);
    CHECK(where[1] == ValuePlacement::outside);
    CHECK(texts(page) == 2);
    CHECK(w.items().empty());
  }
  {
    DisplayPage page;
    DiagnosticSink w;
    const auto where = add_value_labels(bars, f, {plot, widest + gap - 0.01, 0, {}}, st, page, &w);
    CHECK(where[0] == ValuePlacement::left_out);
    CHECK(where[1] == ValuePlacement::left_out);
    CHECK(texts(page) == 0);
    REQUIRE(w.items().size() == 1);  // one warning for the panel, naming the widest value
    INFO(w.items()[0].message);
    CHECK(w.items()[0].message.find("'654,321'") != std::string::npos);
  }
}

TEST_CASE("a value that would rise out of the plot into the tick labels is left out and named", "[layout][values]") {
  const PageStyle st = style();
  NumberFormat f;
  f.decimals = 0;
  const Rgb fill = default_categorical().colours[0];
  // The first bar reaches the plot's top (y 0), so a value above it would
  // leave the plot; the second stops 50 pt lower, with room above it.
  const std::vector<BarValue> bars{{{0, 0, 6, 200}, 900, fill}, {{40, 50, 6, 150}, 700, fill}};
  DisplayPage page;
  DiagnosticSink w;
  const auto where = add_value_labels(bars, f, {{-20, 0, 100, 200}, 40, 0, {}}, st, page, &w);
  CHECK(where[0] == ValuePlacement::left_out);
  CHECK(where[1] == ValuePlacement::outside);
  REQUIRE(w.items().size() == 1);
  CHECK(w.items()[0].message.find("'900'") != std::string::npos);
  // The value written stays inside the plot and above its bar.
  const TextItem& t = std::get<TextItem>(page.items.at(0));
  CHECK(t.box().top() >= 0);
  CHECK(t.box().bottom() <= 50);
}
