#include <hb.h>

#include "text/shaped_text.h"

namespace forme {

namespace {

// Numbers are written with the true minus sign (U+2212). A font without one
// would draw an empty box, so fall back to the hyphen-minus it surely has.
std::string with_drawable_minus(const std::string& utf8, const Font& font) {
  static const std::string minus = "\u2212";
  if (utf8.find(minus) == std::string::npos || font.covers(0x2212)) return utf8;
  std::string out = utf8;
  for (std::size_t p = out.find(minus); p != std::string::npos; p = out.find(minus, p + 1)) out.replace(p, minus.size(), "-");
  return out;
}

}  // namespace

ShapedText shape_text(const std::string& text, const FontRef& font, double size, const ShapeOptions& options) {
  const std::string utf8 = with_drawable_minus(text, *font);
  ShapedText out;
  out.utf8 = utf8;
  out.font = font;
  out.size = size;
  out.ascent = font->ascent_em() * size;
  out.descent = font->descent_em() * size;
  out.cap_height = font->cap_height_em() * size;
  if (utf8.empty()) return out;

  hb_buffer_t* buf = hb_buffer_create();
  hb_buffer_add_utf8(buf, utf8.data(), static_cast<int>(utf8.size()), 0,
                     static_cast<int>(utf8.size()));
  hb_buffer_guess_segment_properties(buf);
  hb_buffer_set_cluster_level(buf, HB_BUFFER_CLUSTER_LEVEL_MONOTONE_CHARACTERS);
  out.rtl = hb_buffer_get_direction(buf) == HB_DIRECTION_RTL;

  hb_feature_t features[2];
  unsigned nfeat = 0;
  features[nfeat++] = {HB_TAG('k', 'e', 'r', 'n'), options.kerning ? 1u : 0u,
                       HB_FEATURE_GLOBAL_START, HB_FEATURE_GLOBAL_END};
  if (options.tabular_figures)
    features[nfeat++] = {HB_TAG('t', 'n', 'u', 'm'), 1u, HB_FEATURE_GLOBAL_START,
                         HB_FEATURE_GLOBAL_END};
  hb_shape(font->hb(), buf, features, nfeat);

  unsigned n = 0;
  const hb_glyph_info_t* info = hb_buffer_get_glyph_infos(buf, &n);
  const hb_glyph_position_t* pos = hb_buffer_get_glyph_positions(buf, &n);
  const double k = size / font->units_per_em();
  double pen = 0;
  out.glyphs.reserve(n);
  for (unsigned i = 0; i < n; ++i) {
    ShapedGlyph g;
    g.index = info[i].codepoint;
    g.cluster = info[i].cluster;
    g.x = pen + pos[i].x_offset * k;
    g.y = -pos[i].y_offset * k;  // HarfBuzz y is up; page y is down
    g.advance = pos[i].x_advance * k;
    pen += g.advance;
    out.glyphs.push_back(g);
  }
  out.width = pen;
  hb_buffer_destroy(buf);
  return out;
}

}  // namespace forme
