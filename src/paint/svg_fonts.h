#pragma once
/// The fonts an SVG's text is set in, carried inside the file.
///
/// Each face a page's text uses becomes a CSS @font-face rule (CSS Fonts
/// Level 3 §4) in the SVG's <style>, its source a data: URL (RFC 2397) of
/// the face cut down by HarfBuzz's subsetter (hb-subset) to the characters
/// the page sets in it, with the face's layout tables kept so a reader
/// shapes them as forme did. The family keeps the face's own name, so a
/// reader that ignores @font-face finds the installed face of that name.
#include <string>
#include <vector>

#include "text/font.h"

namespace forme {

/// Collects, per face, the characters set in it, then writes the rules.
class SvgFonts {
 public:
  /// Records that `text` (UTF-8) is set in `font`.
  void use(const FontRef& font, std::string_view text);
  /// CSS @font-face rules, one per face used, in order of first use.
  /// Throws std::runtime_error if a face cannot be subset.
  std::string font_face_rules() const;

  /// The CSS font-family, font-weight and font-style of `font`, as SVG
  /// presentation attributes (a leading space, XML-escaped).
  static std::string attributes(const Font& font);

 private:
  struct Used {
    FontRef font;
    std::vector<char32_t> chars;
  };
  std::vector<Used> used_;
};

/// `bytes` in base64 (RFC 4648 §4), with padding and no line breaks.
std::string base64(std::string_view bytes);

}  // namespace forme
