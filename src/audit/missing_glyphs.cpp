#include "audit/missing_glyphs.h"

#include <cstdio>
#include <fstream>
#include <set>
#include <sstream>

namespace forme {

namespace {

std::string utf8_of(char32_t cp) {
  std::string s;
  if (cp < 0x80) {
    s += static_cast<char>(cp);
  } else if (cp < 0x800) {
    s += static_cast<char>(0xC0 | (cp >> 6));
    s += static_cast<char>(0x80 | (cp & 0x3F));
  } else if (cp < 0x10000) {
    s += static_cast<char>(0xE0 | (cp >> 12));
    s += static_cast<char>(0x80 | ((cp >> 6) & 0x3F));
    s += static_cast<char>(0x80 | (cp & 0x3F));
  } else {
    s += static_cast<char>(0xF0 | (cp >> 18));
    s += static_cast<char>(0x80 | ((cp >> 12) & 0x3F));
    s += static_cast<char>(0x80 | ((cp >> 6) & 0x3F));
    s += static_cast<char>(0x80 | (cp & 0x3F));
  }
  return s;
}

// Line and column (1-based; the column counts characters, not bytes) of
// the first `needle` in the file, if it is there.
std::optional<SourceLoc> find_in_file(const std::string& path, const std::string& shown, const std::string& needle) {
  std::ifstream in(path, std::ios::binary);
  if (!in) return std::nullopt;
  std::string line;
  for (int number = 1; std::getline(in, line); ++number) {
    const std::size_t at = line.find(needle);
    if (at == std::string::npos) continue;
    int col = 1;
    for (std::size_t i = 0; i < at; ++i)
      if ((static_cast<unsigned char>(line[i]) & 0xC0) != 0x80) ++col;
    return SourceLoc{shown, number, col};
  }
  return std::nullopt;
}

std::string code_point_name(char32_t cp) {
  char buf[16];
  std::snprintf(buf, sizeof buf, "U+%04X", static_cast<unsigned>(cp));
  return buf;
}

}  // namespace

void audit_missing_glyphs(const PageSpec& spec, const DisplayPage& page, DiagnosticSink& findings) {
  std::set<char32_t> said;
  for (const auto& item : page.items) {
    const auto* t = std::get_if<TextItem>(&item);
    if (!t) continue;
    for (char32_t cp : t->text.missing) {
      if (!said.insert(cp).second) continue;
      const std::string needle = utf8_of(cp);
      std::optional<SourceLoc> at = find_in_file(spec.file, spec.file, needle);
      for (std::size_t i = 0; !at && i < spec.tables.size(); ++i)
        at = find_in_file(spec.tables[i].path, spec.tables[i].display_path, needle);
      findings.warn(at.value_or(spec.loc),
                    "no installed font can draw " + code_point_name(cp) + " in \"" + t->text.utf8 +
                        "\": it would print as an empty box",
                    "install a font that has it (on Debian: fonts-noto-core, fonts-noto-cjk), or write the text without it");
    }
  }
}

}  // namespace forme
