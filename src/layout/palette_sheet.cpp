#include "layout/palette_sheet.h"

#include <cstdio>

#include "base/fixed_decimals.h"
#include "colour/palette_review.h"
#include "layout/text_items.h"

namespace forme {

namespace {

const char* kind_name(PaletteKind k) {
  return k == PaletteKind::categorical ? "categorical: series colours, any two compared"
         : k == PaletteKind::sequential ? "sequential: light to dark, neighbouring classes compared"
                                        : "diverging: about a neutral middle, neighbouring classes compared";
}

}  // namespace

DisplayPage palette_sheet(const PageStyle& st) {
  DisplayPage page;
  page.width = 842;  // A4 landscape, points
  page.height = 595;
  page.title = "forme's palettes under simulated colour vision";
  const double margin = 36, label_w = 72, sw = 34, sh = 13, row = sh + 3;
  const double line = PageStyle::line_height(st.fonts.regular, st.label_size());
  double y = margin;
  auto add_text = [&](const std::string& s, const FontRef& font, double size, double x, double baseline, Rgb colour,
                      TextRole role, Align a = Align::left) {
    page.add(text_at(shape_text(s, font, size), x, baseline, a, colour, role));
  };
  add_text(page.title, st.fonts.bold, st.title_size(), margin, y + st.title_size(), st.ink.text, TextRole::title);
  y += PageStyle::line_height(st.fonts.bold, st.title_size()) + st.base * 0.3;
  add_text("Each palette as seen with normal colour vision, with simulated protan, deutan and tritan vision "
           "(Machado et al. 2009, severity 1.0) and in greyscale (CIE luminance kept).",
           st.fonts.regular, st.standfirst_size(), margin, y + st.standfirst_size(), st.ink.text, TextRole::standfirst);
  y += PageStyle::line_height(st.fonts.regular, st.standfirst_size()) + st.base * 1.2;

  for (const Palette& p : all_palettes()) {
    const PaletteReview review = review_palette(p);
    add_text(p.name, st.fonts.bold, st.panel_title_size(), margin, y + st.panel_title_size(), st.ink.text,
             TextRole::panel_title);
    const double name_w = shape_text(p.name, st.fonts.bold, st.panel_title_size()).width;
    add_text(std::string(kind_name(p.kind)) + (review.passes() ? "; meets every promise" : "; FAILS its promises"),
             st.fonts.regular, st.label_size(), margin + name_w + st.base * 0.8, y + st.panel_title_size(), st.ink.muted,
             TextRole::note);
    y += PageStyle::line_height(st.fonts.bold, st.panel_title_size()) + st.base * 0.3;
    for (const VisionReview& v : review.visions) {
      const double mid = y + sh / 2;
      page.add(text_mid(shape_text(std::string(to_string(v.vision)), st.fonts.regular, st.label_size()), margin, mid,
                        Align::left, st.ink.text, TextRole::tick_label));
      double x = margin + label_w;
      for (const Rgb& c : p.colours) {
        page.add(filled_rect({x, y, sw, sh}, as_seen(c, v.vision)));
        x += sw + 2;
      }
      std::string verdict = "closest " + v.scope + ": " + fixed(v.min_delta_e, 1) + " ΔE00";
      verdict += v.floor ? " (promised at least " + fixed(*v.floor, 0) + ")" : " (no promise: label the sign)";
      page.add(text_mid(shape_text(verdict, st.fonts.regular, st.label_size()), x + st.base, mid, Align::left,
                        v.passes() ? st.ink.text : Rgb{0.6, 0.05, 0.05}, TextRole::note));
      y += row;
    }
    y += line * 0.9;
  }
  add_text("Made by 'forme palette --sheet'. Distances are CIEDE2000 between 8-bit colours as simulated; "
           "the floors are forme's own design targets (common practice puts thin marks at about 10 or more).",
           st.fonts.regular, st.note_size(), margin, page.height - margin * 0.6, st.ink.muted, TextRole::source);
  return page;
}

}  // namespace forme
