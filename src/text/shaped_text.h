#pragma once
/// Text shaped by HarfBuzz: the glyphs to draw, where they go, and which
/// bytes of the string each glyph cluster came from (so PDF text stays
/// searchable and copyable).
#include <string>
#include <vector>

#include "text/bidi.h"
#include "text/font.h"

namespace forme {

struct ShapedGlyph {
  unsigned index = 0;   ///< glyph id in the font
  double x = 0, y = 0;  ///< pen position relative to the run origin, points (y down)
  double advance = 0;   ///< horizontal advance, points
  unsigned cluster = 0; ///< byte offset into the UTF-8 string
};

/// OpenType features forme asks for, and the paragraph direction.
struct ShapeOptions {
  bool tabular_figures = false;  ///< 'tnum': equal-width digits for numbers in columns
  bool kerning = true;           ///< 'kern'
  BaseDirection direction = BaseDirection::from_text;  ///< the page's language may state it
};

/// Consecutive glyphs (in visual order) from one font and one direction,
/// made from one span of the string's bytes.
struct GlyphRun {
  FontRef font;
  bool rtl = false;
  std::size_t glyph_begin = 0, glyph_end = 0;  ///< into ShapedText::glyphs
  std::size_t byte_begin = 0, byte_end = 0;    ///< into ShapedText::utf8
};

/// One line of text in one font and size, shaped and measured. Characters
/// the font lacks come from installed fonts (`runs` says which), and
/// right-to-left runs are placed in visual order.
struct ShapedText {
  std::string utf8;
  FontRef font;     ///< the font asked for; metrics below are its
  double size = 0;  ///< em size in points
  std::vector<ShapedGlyph> glyphs;  ///< left to right as drawn
  std::vector<GlyphRun> runs;       ///< left to right as drawn; cover `glyphs`
  std::vector<char32_t> missing;    ///< characters no installed font can draw
  double width = 0;    ///< sum of advances, points
  double ascent = 0;   ///< font ascender at this size (positive, points)
  double descent = 0;  ///< font descender at this size (positive, points)
  double cap_height = 0;
  bool rtl = false;  ///< the line's paragraph direction is right to left
  ShapeOptions options;  ///< as shaped, so the line can be shaped again in another direction

  double height() const { return ascent + descent; }
};


/// Shapes one line of `utf8` with HarfBuzz: split into runs by bidi level
/// (UAX #9), script and font (the asked-for font, else an installed one
/// that has the character), each run shaped with its own direction and
/// script, runs set in visual order. Invalid UTF-8 becomes U+FFFD.
ShapedText shape_text(const std::string& utf8, const FontRef& font, double size,
                      const ShapeOptions& options = {});

}  // namespace forme
