#include "paint/svg_fonts.h"

#include <hb-subset.h>
#include <hb-ot.h>
#include <hb.h>

#include <algorithm>
#include <cmath>
#include <memory>
#include <stdexcept>

#include "paint/svg_description.h"

namespace forme {

namespace {

std::vector<char32_t> code_points(std::string_view s) {
  std::vector<char32_t> out;
  hb_buffer_t* b = hb_buffer_create();
  hb_buffer_add_utf8(b, s.data(), static_cast<int>(s.size()), 0, static_cast<int>(s.size()));
  unsigned n = 0;
  const hb_glyph_info_t* info = hb_buffer_get_glyph_infos(b, &n);  // before shaping: code points
  for (unsigned i = 0; i < n; ++i) out.push_back(info[i].codepoint);
  hb_buffer_destroy(b);
  return out;
}

// From the face itself (OpenType 'OS/2' weight class and italic flag), not
// the style asked for: a fallback face may be the nearest one installed.
std::string weight(const Font& f) {
  return std::to_string(static_cast<int>(std::lround(hb_style_get_value(f.hb(), HB_STYLE_TAG_WEIGHT))));
}
const char* style(const Font& f) { return hb_style_get_value(f.hb(), HB_STYLE_TAG_ITALIC) > 0.5f ? "italic" : "normal"; }

std::string quoted_family(const Font& f) {
  std::string name;
  for (char c : f.family())
    if (c != '\'' && c != '"' && c != '\\' && c != '<' && c != '&') name += c;  // cannot break out of the quotes
  return "'" + name + "'";
}

}  // namespace

void SvgFonts::use(const FontRef& font, std::string_view text) {
  auto it = std::find_if(used_.begin(), used_.end(), [&](const Used& u) { return u.font == font; });
  if (it == used_.end()) {
    used_.push_back({font, {}});
    it = used_.end() - 1;
  }
  for (char32_t c : code_points(text))
    if (std::find(it->chars.begin(), it->chars.end(), c) == it->chars.end()) it->chars.push_back(c);
}

std::string SvgFonts::attributes(const Font& font) {
  return " font-family=\"" + quoted_family(font) + "\" font-weight=\"" + weight(font) + "\" font-style=\"" +
         style(font) + "\"";
}

std::string SvgFonts::font_face_rules() const {
  std::string css;
  for (const Used& u : used_) {
    hb_face_t* face = hb_font_get_face(u.font->hb());
    hb_subset_input_t* input = hb_subset_input_create_or_fail();
    if (!input) throw std::runtime_error("SVG fonts: out of memory");
    hb_set_t* unicodes = hb_subset_input_unicode_set(input);
    for (char32_t c : u.chars) hb_set_add(unicodes, c);
    hb_face_t* subset = hb_subset_or_fail(face, input);
    hb_subset_input_destroy(input);
    if (!subset) throw std::runtime_error("SVG fonts: could not subset " + u.font->path());
    hb_blob_t* blob = hb_face_reference_blob(subset);
    unsigned len = 0;
    const char* data = hb_blob_get_data(blob, &len);
    const std::string encoded = base64(std::string_view(data, len));
    hb_blob_destroy(blob);
    hb_face_destroy(subset);
    css += "@font-face { font-family: " + quoted_family(*u.font) + "; font-weight: " + weight(*u.font) +
           "; font-style: " + style(*u.font) + "; src: url(data:font/ttf;base64," + encoded + ") format('truetype'); }\n";
  }
  return css;
}

std::string base64(std::string_view bytes) {
  static const char* kAlphabet = "ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789+/";
  std::string out;
  out.reserve((bytes.size() + 2) / 3 * 4);
  std::size_t i = 0;
  for (; i + 2 < bytes.size(); i += 3) {
    const unsigned v = static_cast<unsigned char>(bytes[i]) << 16 | static_cast<unsigned char>(bytes[i + 1]) << 8 |
                       static_cast<unsigned char>(bytes[i + 2]);
    for (int k = 18; k >= 0; k -= 6) out += kAlphabet[(v >> k) & 63];
  }
  if (i + 1 == bytes.size()) {
    const unsigned v = static_cast<unsigned char>(bytes[i]) << 16;
    out += kAlphabet[(v >> 18) & 63];
    out += kAlphabet[(v >> 12) & 63];
    out += "==";
  } else if (i + 2 == bytes.size()) {
    const unsigned v = static_cast<unsigned char>(bytes[i]) << 16 | static_cast<unsigned char>(bytes[i + 1]) << 8;
    out += kAlphabet[(v >> 18) & 63];
    out += kAlphabet[(v >> 12) & 63];
    out += kAlphabet[(v >> 6) & 63];
    out += '=';
  }
  return out;
}

}  // namespace forme
