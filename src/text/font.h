#pragma once
/// A font file opened once for both shaping (HarfBuzz) and drawing (Cairo
/// through FreeType). The same file backs both, so the advances we lay out
/// with are the advances the painter draws.
#include <memory>
#include <string>

struct hb_font_t;
struct FT_FaceRec_;
struct _cairo_font_face;

namespace forme {

/// Weights and styles forme draws with.
enum class FontStyle { regular, bold, italic };

class FontFallback;

class Font {
 public:
  /// Opens face `index` of `path` (collections hold several); throws
  /// InputError naming the file if it cannot be read or is not a font.
  /// Characters the face lacks are drawn from `fallback`'s fonts, in the
  /// nearest `style`, when one is given.
  static std::shared_ptr<const Font> open(const std::string& path, unsigned index = 0,
                                          std::shared_ptr<const FontFallback> fallback = {},
                                          FontStyle style = FontStyle::regular);
  ~Font();
  Font(const Font&) = delete;
  Font& operator=(const Font&) = delete;

  const std::string& path() const { return path_; }
  const std::string& family() const { return family_; }
  hb_font_t* hb() const { return hb_font_; }
  _cairo_font_face* cairo_face() const { return cairo_face_; }
  unsigned units_per_em() const { return upem_; }
  /// Typographic ascender and descender (positive) as fractions of the em.
  double ascent_em() const { return ascent_em_; }
  double descent_em() const { return descent_em_; }
  /// Height of capital letters as a fraction of the em (OS/2 sCapHeight).
  double cap_height_em() const { return cap_height_em_; }
  /// True when the font maps this code point to a glyph.
  bool covers(char32_t cp) const;
  /// Where characters this face lacks are looked for (may be null).
  const FontFallback* fallback() const { return fallback_.get(); }
  FontStyle style() const { return style_; }

 private:
  Font() = default;
  std::string path_, family_;
  hb_font_t* hb_font_ = nullptr;
  FT_FaceRec_* ft_face_ = nullptr;
  _cairo_font_face* cairo_face_ = nullptr;
  unsigned upem_ = 1000;
  double ascent_em_ = 0.8, descent_em_ = 0.2, cap_height_em_ = 0.7;
  std::shared_ptr<const FontFallback> fallback_;
  FontStyle style_ = FontStyle::regular;
};

using FontRef = std::shared_ptr<const Font>;

/// The faces of one family that a page uses.
struct FontSet {
  FontRef regular, bold, italic;
  const FontRef& get(FontStyle s) const {
    return s == FontStyle::bold ? bold : s == FontStyle::italic ? italic : regular;
  }
};

/// Finds the bundled fonts: $FORME_FONT_DIR, then ../share/forme/fonts next
/// to the executable, then the source tree's fonts/ folder.
std::string find_font_dir(const std::string& executable_path);

/// Opens the bundled family (Noto Sans regular, bold, italic) from `dir`,
/// with installed fonts (fontconfig) for the characters it lacks.
FontSet open_bundled_fonts(const std::string& dir);

}  // namespace forme
