#include <hb.h>

#include <algorithm>

#include "text/bidi.h"
#include "text/font_fallback.h"
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

// A character of the line with the bytes it came from.
struct Char {
  char32_t cp = 0;
  std::size_t byte = 0;
};

// UTF-8 (RFC 3629) to code points; each malformed byte becomes U+FFFD, as
// HarfBuzz would read it.
std::vector<Char> decode(const std::string& s) {
  std::vector<Char> out;
  std::size_t i = 0;
  while (i < s.size()) {
    const auto b = static_cast<unsigned char>(s[i]);
    const int len = b < 0x80 ? 1 : (b >> 5) == 0x6 ? 2 : (b >> 4) == 0xE ? 3 : (b >> 3) == 0x1E ? 4 : 0;
    char32_t cp = len == 1 ? b : len == 2 ? (b & 0x1F) : len == 3 ? (b & 0x0F) : (b & 0x07);
    bool ok = len > 0 && i + static_cast<std::size_t>(len) <= s.size();
    for (int k = 1; ok && k < len; ++k) {
      const auto c = static_cast<unsigned char>(s[i + static_cast<std::size_t>(k)]);
      ok = (c & 0xC0) == 0x80;
      cp = (cp << 6) | (c & 0x3F);
    }
    if (!ok) {
      out.push_back({0xFFFD, i});
      ++i;
      continue;
    }
    out.push_back({cp, i});
    i += static_cast<std::size_t>(len);
  }
  return out;
}

// Characters that draw nothing themselves: they go with their neighbour's
// font and are never reported missing.
bool follows_neighbour(char32_t cp, hb_unicode_funcs_t* u) {
  const auto cat = hb_unicode_general_category(u, cp);
  return cat == HB_UNICODE_GENERAL_CATEGORY_NON_SPACING_MARK || cat == HB_UNICODE_GENERAL_CATEGORY_FORMAT ||
         cat == HB_UNICODE_GENERAL_CATEGORY_CONTROL;
}

struct LogicalRun {
  std::size_t begin = 0, end = 0;  ///< characters
  int level = 0;
  FontRef font;
  hb_script_t script = HB_SCRIPT_COMMON;
};

// Splits the line where the bidi level, the font or the script changes.
// Common and inherited characters (spaces, digits, punctuation) take the
// script of the text around them so they do not break a run.
std::vector<LogicalRun> itemise(const std::vector<Char>& chars, const std::vector<int>& levels, const FontRef& font,
                                std::vector<char32_t>& missing) {
  hb_unicode_funcs_t* u = hb_unicode_funcs_get_default();
  const std::size_t n = chars.size();
  std::vector<FontRef> fonts(n, font);
  for (std::size_t i = 0; i < n; ++i) {
    const char32_t cp = chars[i].cp;
    if (follows_neighbour(cp, u)) {
      if (i > 0) fonts[i] = fonts[i - 1];
      continue;
    }
    if (cp == ' ' || font->covers(cp)) continue;
    FontRef other = font->fallback() ? font->fallback()->font_for(cp, font->style()) : nullptr;
    if (other) fonts[i] = other;
    else if (std::find(missing.begin(), missing.end(), cp) == missing.end()) missing.push_back(cp);
  }
  std::vector<hb_script_t> scripts(n, HB_SCRIPT_COMMON);
  hb_script_t last = HB_SCRIPT_COMMON;
  for (std::size_t i = 0; i < n; ++i) {
    const hb_script_t s = hb_unicode_script(u, chars[i].cp);
    if (s != HB_SCRIPT_COMMON && s != HB_SCRIPT_INHERITED && s != HB_SCRIPT_UNKNOWN) last = s;
    scripts[i] = last;
  }
  // Leading common characters take the first real script after them.
  for (std::size_t i = n; i-- > 0;)
    if (scripts[i] == HB_SCRIPT_COMMON && i + 1 < n) scripts[i] = scripts[i + 1];

  std::vector<LogicalRun> runs;
  for (std::size_t i = 0; i < n; ++i) {
    if (runs.empty() || runs.back().level != levels[i] || runs.back().font != fonts[i] || runs.back().script != scripts[i])
      runs.push_back({i, i, levels[i], fonts[i], scripts[i]});
    runs.back().end = i + 1;
  }
  return runs;
}

}  // namespace

ShapedText shape_text(const std::string& text, const FontRef& font, double size, const ShapeOptions& options) {
  const std::string utf8 = with_drawable_minus(text, *font);
  ShapedText out;
  out.utf8 = utf8;
  out.font = font;
  out.size = size;
  out.options = options;
  out.ascent = font->ascent_em() * size;
  out.descent = font->descent_em() * size;
  out.cap_height = font->cap_height_em() * size;
  if (utf8.empty()) return out;

  const std::vector<Char> chars = decode(utf8);
  std::u32string cps;
  cps.reserve(chars.size());
  for (const auto& c : chars) cps.push_back(c.cp);
  const std::vector<int> levels = bidi_levels(cps, options.direction);
  out.rtl = *std::min_element(levels.begin(), levels.end()) % 2 == 1;
  const std::vector<LogicalRun> runs = itemise(chars, levels, font, out.missing);
  std::vector<int> run_levels;
  for (const auto& r : runs) run_levels.push_back(r.level);

  hb_feature_t features[2];
  unsigned nfeat = 0;
  features[nfeat++] = {HB_TAG('k', 'e', 'r', 'n'), options.kerning ? 1u : 0u,
                       HB_FEATURE_GLOBAL_START, HB_FEATURE_GLOBAL_END};
  if (options.tabular_figures)
    features[nfeat++] = {HB_TAG('t', 'n', 'u', 'm'), 1u, HB_FEATURE_GLOBAL_START,
                         HB_FEATURE_GLOBAL_END};

  double pen = 0;
  hb_buffer_t* buf = hb_buffer_create();
  for (std::size_t v : visual_order(run_levels)) {
    const LogicalRun& r = runs[v];
    const std::size_t byte_begin = chars[r.begin].byte;
    const std::size_t byte_end = r.end < chars.size() ? chars[r.end].byte : utf8.size();
    hb_buffer_clear_contents(buf);
    // The whole line is context, so shaping sees across run edges.
    hb_buffer_add_utf8(buf, utf8.data(), static_cast<int>(utf8.size()), static_cast<unsigned>(byte_begin),
                       static_cast<int>(byte_end - byte_begin));
    hb_buffer_set_direction(buf, r.level % 2 == 1 ? HB_DIRECTION_RTL : HB_DIRECTION_LTR);
    hb_buffer_set_script(buf, r.script);
    hb_buffer_set_language(buf, hb_language_get_default());
    hb_buffer_set_cluster_level(buf, HB_BUFFER_CLUSTER_LEVEL_MONOTONE_CHARACTERS);
    hb_shape(r.font->hb(), buf, features, nfeat);

    unsigned n = 0;
    const hb_glyph_info_t* info = hb_buffer_get_glyph_infos(buf, &n);
    const hb_glyph_position_t* pos = hb_buffer_get_glyph_positions(buf, &n);
    const double k = size / r.font->units_per_em();
    GlyphRun run{r.font, r.level % 2 == 1, out.glyphs.size(), 0, byte_begin, byte_end};
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
    run.glyph_end = out.glyphs.size();
    if (run.glyph_end > run.glyph_begin) out.runs.push_back(run);
  }
  hb_buffer_destroy(buf);
  out.width = pen;
  return out;
}

}  // namespace forme
