#pragma once
/// Breaks a paragraph into lines that fit a width. Break opportunities come
/// from the Unicode line breaking algorithm (UAX #14, `line_breaks`);
/// lines are filled greedily, each measured with shaped advances.
#include <string>
#include <vector>

#include "text/shaped_text.h"

namespace forme {

/// Lines of `utf8` no wider than `width` points where possible. A single
/// word wider than the line is kept whole on its own line (and reported by
/// its width, so callers can see it overflows). Mandatory breaks ("\n") are
/// honoured.
std::vector<ShapedText> wrap_text(const std::string& utf8, const FontRef& font, double size, double width,
                                  const ShapeOptions& options = {});

/// The widest run of `utf8` that UAX #14 allows no break inside (a word
/// with its trailing punctuation), and its width at `size`: what no line
/// narrower than that can hold.
struct WidestWord {
  std::string text;
  double width = 0;
};
WidestWord widest_word(const std::string& utf8, const FontRef& font, double size, const ShapeOptions& options = {});

/// `utf8` shortened to fit `width`: the longest start ending at a break
/// opportunity, followed by "…" (U+2026); when not even the first word
/// fits, the longest start of whole characters with "…". Returns the text
/// unchanged when it already fits.
ShapedText shorten_text(const std::string& utf8, const FontRef& font, double size, double width,
                        const ShapeOptions& options = {});

}  // namespace forme
