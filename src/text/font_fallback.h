#pragma once
/// Installed fonts for the characters the bundled family cannot draw
/// (Hebrew, Arabic, CJK and the rest), found through fontconfig and opened
/// once each. fontconfig is asked only when such a character turns up, so a
/// page in Latin, Greek or Cyrillic never touches it.
#include <map>
#include <memory>
#include <mutex>
#include <string>
#include <utility>

#include "text/font.h"

struct _FcConfig;

namespace forme {

class FontFallback {
 public:
  FontFallback() = default;
  ~FontFallback();
  FontFallback(const FontFallback&) = delete;
  FontFallback& operator=(const FontFallback&) = delete;

  /// An installed font that maps `cp` to a glyph, as near to `style` as
  /// fontconfig finds (sans serif first); nullptr when no font has it.
  FontRef font_for(char32_t cp, FontStyle style) const;

 private:
  FontRef find(char32_t cp, FontStyle style) const;
  FontRef open_once(const std::string& file, int index) const;
  mutable std::mutex mutex_;
  mutable _FcConfig* config_ = nullptr;  ///< loaded at the first request
  mutable std::map<std::pair<std::string, int>, FontRef> opened_;  ///< by file and face index
  mutable std::map<std::pair<char32_t, int>, FontRef> chosen_;     ///< by character and style
};

}  // namespace forme
