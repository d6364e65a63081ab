#pragma once
/// Text shaped by HarfBuzz: the glyphs to draw, where they go, and which
/// bytes of the string each glyph cluster came from (so PDF text stays
/// searchable and copyable).
#include <string>
#include <vector>

#include "text/font.h"

namespace forme {

struct ShapedGlyph {
  unsigned index = 0;   ///< glyph id in the font
  double x = 0, y = 0;  ///< pen position relative to the run origin, points (y down)
  double advance = 0;   ///< horizontal advance, points
  unsigned cluster = 0; ///< byte offset into the UTF-8 string
};

/// One line of text in one font and size, shaped and measured.
struct ShapedText {
  std::string utf8;
  FontRef font;
  double size = 0;  ///< em size in points
  std::vector<ShapedGlyph> glyphs;
  double width = 0;    ///< sum of advances, points
  double ascent = 0;   ///< font ascender at this size (positive, points)
  double descent = 0;  ///< font descender at this size (positive, points)
  double cap_height = 0;
  bool rtl = false;

  double height() const { return ascent + descent; }
};

/// OpenType features forme asks for.
struct ShapeOptions {
  bool tabular_figures = false;  ///< 'tnum': equal-width digits for numbers in columns
  bool kerning = true;           ///< 'kern'
};

/// Shapes `utf8` with HarfBuzz. Invalid UTF-8 is replaced by U+FFFD by
/// HarfBuzz; the run's direction and script are guessed from the text.
ShapedText shape_text(const std::string& utf8, const FontRef& font, double size,
                      const ShapeOptions& options = {});

}  // namespace forme
