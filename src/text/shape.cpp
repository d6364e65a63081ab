#include <hb.h>

#include "text/shaped_text.h"

namespace forme {

ShapedText shape_text(const std::string& utf8, const FontRef& font, double size,
                      const ShapeOptions& options) {
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
