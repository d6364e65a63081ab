#include "text/font.h"

#include <cairo-ft.h>
#include <ft2build.h>
#include FT_FREETYPE_H
#include FT_TRUETYPE_TABLES_H
#include <hb-ft.h>
#include <hb-ot.h>
#include <hb.h>

#include <cstdlib>
#include <filesystem>
#include <mutex>

#include "base/diagnostic.h"
#include "text/font_fallback.h"

namespace forme {

namespace {

// One FreeType library for the process. FreeType libraries are not thread
// safe for face creation, so creation is serialised; faces are then used
// read-only.
FT_Library ft_library() {
  static FT_Library lib = [] {
    FT_Library l = nullptr;
    if (FT_Init_FreeType(&l) != 0) throw std::runtime_error("cannot initialise FreeType");
    return l;
  }();
  return lib;
}
std::mutex& ft_mutex() {
  static std::mutex m;
  return m;
}

const cairo_user_data_key_t kFtFaceKey{};

}  // namespace

std::shared_ptr<const Font> Font::open(const std::string& path, unsigned index,
                                      std::shared_ptr<const FontFallback> fallback, FontStyle style) {
  std::shared_ptr<Font> f(new Font());
  f->path_ = path;
  f->fallback_ = std::move(fallback);
  f->style_ = style;
  {
    std::lock_guard lock(ft_mutex());
    FT_Face face = nullptr;
    if (FT_New_Face(ft_library(), path.c_str(), static_cast<FT_Long>(index), &face) != 0 || !face)
      throw InputError(SourceLoc{path}, "cannot open font file (missing, unreadable or not a font)",
                       "check the path, or remove it to use the bundled fonts");
    if (!FT_IS_SCALABLE(face)) {
      FT_Done_Face(face);
      throw InputError(SourceLoc{path}, "font is not scalable (bitmap fonts cannot be printed at any size)");
    }
    f->ft_face_ = face;
  }
  FT_Face face = f->ft_face_;
  f->family_ = face->family_name ? face->family_name : "";
  f->upem_ = face->units_per_EM ? face->units_per_EM : 1000;

  hb_blob_t* blob = hb_blob_create_from_file_or_fail(path.c_str());
  if (!blob) throw InputError(SourceLoc{path}, "cannot read font file");
  hb_face_t* hface = hb_face_create(blob, index);
  hb_blob_destroy(blob);
  f->hb_font_ = hb_font_create(hface);
  hb_face_destroy(hface);
  // Scale = units per em, so HarfBuzz positions come back in font units,
  // unhinted; we scale to points ourselves.
  hb_font_set_scale(f->hb_font_, static_cast<int>(f->upem_), static_cast<int>(f->upem_));

  hb_font_extents_t ext{};
  if (hb_font_get_h_extents(f->hb_font_, &ext)) {
    f->ascent_em_ = ext.ascender / static_cast<double>(f->upem_);
    f->descent_em_ = -ext.descender / static_cast<double>(f->upem_);
  }
  hb_position_t cap = 0;
  if (hb_ot_metrics_get_position(f->hb_font_, HB_OT_METRICS_TAG_CAP_HEIGHT, &cap) && cap > 0)
    f->cap_height_em_ = cap / static_cast<double>(f->upem_);

  f->cairo_face_ = cairo_ft_font_face_create_for_ft_face(face, 0);
  // Cairo may keep its font face (and so the FT_Face) in its caches after we
  // let go; the FT_Face is released only when cairo destroys its face.
  cairo_font_face_set_user_data(f->cairo_face_, &kFtFaceKey, face, [](void* p) {
    std::lock_guard lock(ft_mutex());
    FT_Done_Face(static_cast<FT_Face>(p));
  });
  return f;
}

Font::~Font() {
  if (hb_font_) hb_font_destroy(hb_font_);
  if (cairo_face_) cairo_font_face_destroy(cairo_face_);
}

bool Font::covers(char32_t cp) const {
  hb_codepoint_t g = 0;
  return hb_font_get_nominal_glyph(hb_font_, cp, &g);
}

std::string find_font_dir(const std::string& executable_path) {
  namespace fs = std::filesystem;
  auto has_fonts = [](const fs::path& d) {
    std::error_code ec;
    return fs::exists(d / "NotoSans-Regular.ttf", ec);
  };
  if (const char* env = std::getenv("FORME_FONT_DIR"); env && *env) return env;
  std::error_code ec;
  fs::path exe = fs::weakly_canonical(fs::path(executable_path), ec);
  if (!ec) {
    fs::path installed = exe.parent_path().parent_path() / "share" / "forme" / "fonts";
    if (has_fonts(installed)) return installed.string();
  }
  if (has_fonts(FORME_INSTALL_FONT_DIR)) return FORME_INSTALL_FONT_DIR;
  return FORME_SOURCE_FONT_DIR;
}

FontSet open_bundled_fonts(const std::string& dir) {
  FontSet set;
  auto fallback = std::make_shared<const FontFallback>();
  set.regular = Font::open(dir + "/NotoSans-Regular.ttf", 0, fallback, FontStyle::regular);
  set.bold = Font::open(dir + "/NotoSans-Bold.ttf", 0, fallback, FontStyle::bold);
  set.italic = Font::open(dir + "/NotoSans-Italic.ttf", 0, fallback, FontStyle::italic);
  return set;
}

}  // namespace forme
