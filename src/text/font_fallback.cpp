#include "text/font_fallback.h"

#include <fontconfig/fontconfig.h>

#include <string_view>

namespace forme {

FontFallback::~FontFallback() {
  opened_.clear();
  chosen_.clear();
  if (config_) FcConfigDestroy(config_);
}

FontRef FontFallback::font_for(char32_t cp, FontStyle style) const {
  std::lock_guard lock(mutex_);
  const auto key = std::make_pair(cp, static_cast<int>(style));
  if (auto it = chosen_.find(key); it != chosen_.end()) return it->second;
  FontRef f = find(cp, style);
  chosen_[key] = f;
  return f;
}

// fontconfig sorts every installed font by how well it matches a sans-serif
// face of the wanted weight and slant that covers the character. The first
// Noto Sans face (drawn to match the bundled one) whose character set really
// holds it wins, else the first of any family: a sort ranks coverage but
// does not guarantee it, and ranks the system's default sans-serif first.
FontRef FontFallback::find(char32_t cp, FontStyle style) const {
  if (!config_) {
    config_ = FcInitLoadConfigAndFonts();
    if (!config_) return nullptr;
  }
  FcPattern* pattern = FcPatternCreate();
  FcPatternAddString(pattern, FC_FAMILY, reinterpret_cast<const FcChar8*>("Noto Sans"));
  FcPatternAddString(pattern, FC_FAMILY, reinterpret_cast<const FcChar8*>("sans-serif"));
  FcPatternAddInteger(pattern, FC_WEIGHT, style == FontStyle::bold ? FC_WEIGHT_BOLD : FC_WEIGHT_REGULAR);
  FcPatternAddInteger(pattern, FC_SLANT, style == FontStyle::italic ? FC_SLANT_ITALIC : FC_SLANT_ROMAN);
  FcPatternAddBool(pattern, FC_SCALABLE, FcTrue);
  FcCharSet* wanted = FcCharSetCreate();
  FcCharSetAddChar(wanted, static_cast<FcChar32>(cp));
  FcPatternAddCharSet(pattern, FC_CHARSET, wanted);
  FcCharSetDestroy(wanted);
  FcConfigSubstitute(config_, pattern, FcMatchPattern);
  FcDefaultSubstitute(pattern);
  FcResult result = FcResultNoMatch;
  FcFontSet* sorted = FcFontSort(config_, pattern, FcFalse, nullptr, &result);
  FcPatternDestroy(pattern);
  FontRef found;
  for (int pass = 0; pass < 2 && !found; ++pass)
    for (int i = 0; sorted && i < sorted->nfont && !found; ++i) {
      FcPattern* candidate = sorted->fonts[i];
      FcCharSet* has = nullptr;
      FcChar8* file = nullptr;
      FcChar8* family = nullptr;
      int index = 0;
      if (FcPatternGetCharSet(candidate, FC_CHARSET, 0, &has) != FcResultMatch || !FcCharSetHasChar(has, cp)) continue;
      if (FcPatternGetString(candidate, FC_FILE, 0, &file) != FcResultMatch) continue;
      const bool noto = FcPatternGetString(candidate, FC_FAMILY, 0, &family) == FcResultMatch &&
                        std::string_view(reinterpret_cast<const char*>(family)).starts_with("Noto Sans");
      if (pass == 0 && !noto) continue;
      FcPatternGetInteger(candidate, FC_INDEX, 0, &index);
      FcBool scalable = FcFalse;
      if (FcPatternGetBool(candidate, FC_SCALABLE, 0, &scalable) == FcResultMatch && !scalable) continue;
      found = open_once(reinterpret_cast<const char*>(file), index);
      if (found && !found->covers(cp)) found = nullptr;
    }
  if (sorted) FcFontSetDestroy(sorted);
  return found;
}

FontRef FontFallback::open_once(const std::string& file, int index) const {
  const auto key = std::make_pair(file, index);
  if (auto it = opened_.find(key); it != opened_.end()) return it->second;
  FontRef f;
  try {
    f = Font::open(file, static_cast<unsigned>(index));
  } catch (const std::exception&) {
    // Unreadable: remembered as missing so the next candidate is tried.
  }
  opened_[key] = f;
  return f;
}

}  // namespace forme
