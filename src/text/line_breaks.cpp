#include "text/line_breaks.h"

#include <linebreak.h>

#include <algorithm>
#include <cstdint>
#include <mutex>

namespace forme {

namespace {

struct Range {
  char32_t first, last;
};

bool in(const Range* begin, const Range* end, char32_t c) {
  const Range* r = std::upper_bound(begin, end, c, [](char32_t v, const Range& x) { return v < x.first; });
  return r != begin && c <= (r - 1)->last;
}

// Code points at U+1F000 and above whose class is ID, EB or EM in
// LineBreak-15.0.0.txt (/usr/share/unicode/LineBreak.txt), ranges merged.
// libunibreak 1.1's data predates most of them and reads them as letters,
// so a row of newer emoji would never break.
constexpr Range kEmojiIdeographs[] = {
    {0x1F000, 0x1F0FF}, {0x1F10D, 0x1F10F}, {0x1F16D, 0x1F16F}, {0x1F1AD, 0x1F1E5}, {0x1F200, 0x1F39B},
    {0x1F39E, 0x1F3B4}, {0x1F3B7, 0x1F3BB}, {0x1F3BD, 0x1F49F}, {0x1F4A1, 0x1F4A1}, {0x1F4A3, 0x1F4A3},
    {0x1F4A5, 0x1F4AE}, {0x1F4B0, 0x1F4B0}, {0x1F4B3, 0x1F4FF}, {0x1F507, 0x1F516}, {0x1F525, 0x1F531},
    {0x1F54A, 0x1F5D3}, {0x1F5DC, 0x1F5F3}, {0x1F5FA, 0x1F64F}, {0x1F680, 0x1F6FF}, {0x1F774, 0x1F77F},
    {0x1F7D5, 0x1F7FF}, {0x1F80C, 0x1F80F}, {0x1F848, 0x1F84F}, {0x1F85A, 0x1F85F}, {0x1F888, 0x1F88F},
    {0x1F8AE, 0x1F8FF}, {0x1F90C, 0x1F9FF}, {0x1FA54, 0x1FAFF}, {0x1FC00, 0x1FFFD},
};

// Class EB (emoji modifier base) in LineBreak-15.0.0.txt, ranges merged.
constexpr Range kModifierBases[] = {
    {0x261D, 0x261D},   {0x26F9, 0x26F9},   {0x270A, 0x270D},   {0x1F385, 0x1F385}, {0x1F3C2, 0x1F3C4},
    {0x1F3C7, 0x1F3C7}, {0x1F3CA, 0x1F3CC}, {0x1F442, 0x1F443}, {0x1F446, 0x1F450}, {0x1F466, 0x1F478},
    {0x1F47C, 0x1F47C}, {0x1F481, 0x1F483}, {0x1F485, 0x1F487}, {0x1F48F, 0x1F48F}, {0x1F491, 0x1F491},
    {0x1F4AA, 0x1F4AA}, {0x1F574, 0x1F575}, {0x1F57A, 0x1F57A}, {0x1F590, 0x1F590}, {0x1F595, 0x1F596},
    {0x1F645, 0x1F647}, {0x1F64B, 0x1F64F}, {0x1F6A3, 0x1F6A3}, {0x1F6B4, 0x1F6B6}, {0x1F6C0, 0x1F6C0},
    {0x1F6CC, 0x1F6CC}, {0x1F90C, 0x1F90C}, {0x1F90F, 0x1F90F}, {0x1F918, 0x1F91F}, {0x1F926, 0x1F926},
    {0x1F930, 0x1F939}, {0x1F93C, 0x1F93E}, {0x1F977, 0x1F977}, {0x1F9B5, 0x1F9B6}, {0x1F9B8, 0x1F9B9},
    {0x1F9BB, 0x1F9BB}, {0x1F9CD, 0x1F9CF}, {0x1F9D1, 0x1F9DD}, {0x1FAC3, 0x1FAC5}, {0x1FAF0, 0x1FAF8},
};

constexpr char32_t kZeroWidthJoiner = 0x200D;
constexpr char32_t kReplacement = 0xFFFD;
constexpr char32_t kIdeograph = 0x4E00;  // CJK UNIFIED IDEOGRAPH-4E00, class ID in every version

bool regional_indicator(char32_t c) { return c >= 0x1F1E6 && c <= 0x1F1FF; }
bool emoji_modifier(char32_t c) { return c >= 0x1F3FB && c <= 0x1F3FF; }
bool modifier_base(char32_t c) { return in(std::begin(kModifierBases), std::end(kModifierBases), c); }

// Combining marks and joiners that LB9 attaches to the character before
// them, so "base + variation selector + modifier" still counts as a pair.
bool attaches(char32_t c) {
  return (c >= 0x0300 && c <= 0x036F) || (c >= 0xFE00 && c <= 0xFE0F) || (c >= 0xE0020 && c <= 0xE007F) ||
         (c >= 0xE0100 && c <= 0xE01EF) || c == 0x20E3;
}

// Characters after which a mark is read as a letter (UAX #14 LB10).
bool opens_mark_as_letter(char32_t c) {
  return c == 0x20 || c == 0x0A || c == 0x0B || c == 0x0C || c == 0x0D || c == 0x85 || c == 0x2028 ||
         c == 0x2029 || c == 0x200B;
}

// The character libunibreak is given in place of `c`.
char32_t stand_in(char32_t c) {
  if (regional_indicator(c)) return kIdeograph;                         // the library asserts on class RI
  if (c == 0xFFFF) return kReplacement;                                 // the library's end-of-text value
  if (c >= 0xD800 && c <= 0xDFFF) return kReplacement;                  // never valid in UTF-8
  if (c >= 0x1F000 && in(std::begin(kEmojiIdeographs), std::end(kEmojiIdeographs), c)) return kIdeograph;
  return c;
}

struct Decoded {
  std::vector<char32_t> chars;
  std::vector<std::size_t> last_byte;  // index of each character's last byte
};

// Strict UTF-8 (RFC 3629): a byte that starts no valid sequence is one
// U+FFFD of its own.
Decoded decode(std::string_view s) {
  Decoded out;
  out.chars.reserve(s.size());
  out.last_byte.reserve(s.size());
  std::size_t i = 0;
  while (i < s.size()) {
    const auto b0 = static_cast<unsigned char>(s[i]);
    std::size_t n = 0;
    char32_t c = 0, min = 0;
    if (b0 < 0x80) n = 1, c = b0;
    else if (b0 >= 0xC2 && b0 <= 0xDF) n = 2, c = b0 & 0x1F, min = 0x80;
    else if (b0 >= 0xE0 && b0 <= 0xEF) n = 3, c = b0 & 0x0F, min = 0x800;
    else if (b0 >= 0xF0 && b0 <= 0xF4) n = 4, c = b0 & 0x07, min = 0x10000;
    bool ok = n > 0 && i + n <= s.size();
    for (std::size_t k = 1; ok && k < n; ++k) {
      const auto b = static_cast<unsigned char>(s[i + k]);
      if ((b & 0xC0) != 0x80) ok = false;
      c = (c << 6) | (b & 0x3F);
    }
    if (ok && (c < min || c > 0x10FFFF || (c >= 0xD800 && c <= 0xDFFF))) ok = false;
    if (!ok) n = 1, c = kReplacement;
    out.chars.push_back(c);
    out.last_byte.push_back(i + n - 1);
    i += n;
  }
  return out;
}

void init_unibreak_once() {
  static std::once_flag once;
  std::call_once(once, [] { init_linebreak(); });
}

LineBreak from_library(char b) {
  switch (b) {
    case LINEBREAK_MUSTBREAK: return LineBreak::must;
    case LINEBREAK_ALLOWBREAK: return LineBreak::allow;
    case LINEBREAK_NOBREAK: return LineBreak::none;
    default: return LineBreak::inside;
  }
}

}  // namespace

std::vector<LineBreak> line_breaks(std::string_view utf8) {
  std::vector<LineBreak> out(utf8.size(), LineBreak::inside);
  if (utf8.empty()) return out;
  init_unibreak_once();
  const Decoded d = decode(utf8);
  const std::size_t n = d.chars.size();
  std::vector<utf32_t> given(n);
  for (std::size_t i = 0; i < n; ++i) given[i] = static_cast<utf32_t>(stand_in(d.chars[i]));
  std::vector<char> brks(n);
  set_linebreaks_utf32(given.data(), n, "en", brks.data());
  std::vector<LineBreak> after(n);
  for (std::size_t i = 0; i < n; ++i) after[i] = from_library(brks[i]);

  // The rules the library predates, on the real characters. Only an
  // "allow" is ever taken away: a mandatory break stays.
  std::size_t ri_run = 0;  // regional indicators in a row, up to this one (LB30a)
  char32_t base = 0;       // the character marks attach to (LB9), for LB30b
  for (std::size_t i = 0; i < n; ++i) {
    const char32_t c = d.chars[i];
    if (!(attaches(c) || c == kZeroWidthJoiner) || base == 0) {
      base = c;
      ri_run = regional_indicator(c) ? ri_run + 1 : 0;
    }
    if (i + 1 == n || after[i] == LineBreak::must) continue;
    const char32_t next = d.chars[i + 1];
    // LB9: after a mark, the break is the one between its base and what
    // follows (the library keeps "ideograph + mark" from breaking before a
    // letter). Marks after a space or a break start a letter of their own (LB10).
    if (attaches(c) && base != c && !opens_mark_as_letter(base) && !attaches(next) && next != kZeroWidthJoiner)
      after[i] = is_line_breakable(stand_in(base), stand_in(next), "en") == LINEBREAK_ALLOWBREAK ? LineBreak::allow
                                                                                                   : LineBreak::none;
    if (after[i] != LineBreak::allow) continue;
    if (c == kZeroWidthJoiner) after[i] = LineBreak::none;                                          // LB8a
    else if (regional_indicator(base) && regional_indicator(next) && ri_run % 2 == 1) after[i] = LineBreak::none;  // LB30a
    else if (modifier_base(base) && emoji_modifier(next)) after[i] = LineBreak::none;               // LB30b
  }
  for (std::size_t i = 0; i < n; ++i) out[d.last_byte[i]] = after[i];
  return out;
}

}  // namespace forme
