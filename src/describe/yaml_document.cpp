#include "describe/yaml_document.h"

#include <cstdio>
#include <filesystem>
#include <optional>
#include <fstream>

#include "describe/yaml_guard.h"

namespace forme {

SourceLoc YamlDocument::loc(const YAML::Node& n) const {
  const YAML::Mark m = n.Mark();
  if (m.is_null()) return SourceLoc{file};
  return SourceLoc{file, m.line + 1, m.column + 1};
}

namespace {
// yaml-cpp's messages are terse ("end of map not found"); these read better.
std::string explain(const std::string& msg) {
  if (msg == "illegal map value") return "unexpected ':' (is a value missing quotes, or a line mis-indented?)";
  if (msg == "end of map not found") return "mapping is not closed (missing '}' or bad indentation)";
  if (msg == "end of sequence not found") return "list is not closed (missing ']' or bad indentation)";
  if (msg == "end of map flow not found") return "'{' is never closed with '}'";
  if (msg == "end of sequence flow not found") return "'[' is never closed with ']'";
  return "YAML syntax: " + msg;
}
// YAML text is Unicode (YAML 1.2 §5.1 allows tab, LF, CR and printable
// characters; C0 controls other than those are excluded). Throws at the
// first byte that is not well-formed UTF-8 or is such a control character.
void check_characters(const std::string& t, const std::string& file) {
  int line = 1, col = 1;
  auto refuse = [&](const std::string& what, const std::string& hint) {
    throw InputError(SourceLoc{file, line, col}, what, hint);
  };
  for (std::size_t i = 0; i < t.size();) {
    const auto c = static_cast<unsigned char>(t[i]);
    std::size_t n = 1;
    if (c < 0x80) {
      if (c < 0x20 && c != '\t' && c != '\n' && c != '\r') {
        char hex[8];
        std::snprintf(hex, sizeof hex, "%02X", c);
        refuse(std::string("control character U+00") + hex + " in the page description",
               "remove it; YAML text may hold tabs and line breaks but no other control characters");
      }
    } else {
      n = c >= 0xF0 && c <= 0xF4 ? 4 : c >= 0xE0 ? 3 : c >= 0xC2 && c < 0xE0 ? 2 : 0;
      bool ok = n > 0 && i + n <= t.size();
      for (std::size_t k = 1; ok && k < n; ++k) ok = (static_cast<unsigned char>(t[i + k]) & 0xC0) == 0x80;
      if (ok && n == 3) {  // no overlong forms, no surrogates (RFC 3629 §4)
        const auto c1 = static_cast<unsigned char>(t[i + 1]);
        ok = !(c == 0xE0 && c1 < 0xA0) && !(c == 0xED && c1 >= 0xA0);
      } else if (ok && n == 4) {
        const auto c1 = static_cast<unsigned char>(t[i + 1]);
        ok = !(c == 0xF0 && c1 < 0x90) && !(c == 0xF4 && c1 >= 0x90);
      }
      if (!ok) {
        char hex[8];
        std::snprintf(hex, sizeof hex, "%02X", c);
        refuse(std::string("invalid UTF-8 (byte 0x") + hex + ")", "save the page description as UTF-8");
      }
    }
    if (c == '\n') {
      ++line;
      col = 1;
    } else {
      ++col;
    }
    i += n;
  }
}

// After a syntax error: where a quoted scalar opens and is never closed, or
// is closed only on a later line (usually by the next string's opening
// quote). yaml-cpp then reports a later, unrelated place.
std::optional<SourceLoc> unclosed_quote(const std::string& t, const std::string& file) {
  int line = 1, col = 1, qline = 0, qcol = 0;
  char quote = 0, prev = '\n';
  for (std::size_t i = 0; i < t.size(); ++i) {
    const char c = t[i];
    if (quote) {
      if (quote == '"' && c == '\\' && i + 1 < t.size() && t[i + 1] != '\n') {
        ++i;
        ++col;
      } else if (c == quote) {
        if (quote == '\'' && i + 1 < t.size() && t[i + 1] == '\'') {
          ++i;
          ++col;
        } else {
          quote = 0;
          if (line != qline) return SourceLoc{file, qline, qcol};
        }
      }
    } else if (c == '#' && (prev == ' ' || prev == '\n')) {
      while (i + 1 < t.size() && t[i + 1] != '\n') ++i;
    } else if ((c == '"' || c == '\'') &&
               (prev == ' ' || prev == '\n' || prev == '[' || prev == '{' || prev == ',' || prev == ':')) {
      quote = c;
      qline = line;
      qcol = col;
    }
    prev = c;
    if (c == '\n') {
      ++line;
      col = 1;
    } else {
      ++col;
    }
  }
  if (!quote) return std::nullopt;
  return SourceLoc{file, qline, qcol};
}

}  // namespace

YamlDocument parse_yaml(std::string text, const std::string& file, const Limits& limits) {
  YamlDocument doc;
  doc.file = file;
  doc.text = std::move(text);
  check_characters(doc.text, file);
  // Tabs may not indent YAML; yaml-cpp's own message for them is obscure.
  std::size_t line = 1, col = 1;
  bool at_indent = true;
  for (char c : doc.text) {
    if (c == '\n') {
      ++line;
      col = 1;
      at_indent = true;
      continue;
    }
    if (at_indent && c == '\t')
      throw InputError(SourceLoc{file, static_cast<int>(line), static_cast<int>(col)},
                       "tab character in indentation", "YAML indents with spaces only");
    if (c != ' ') at_indent = false;
    ++col;
  }
  try {
    guard_yaml(doc.text, file, limits);
    doc.root = YAML::Load(doc.text);
  } catch (const YAML::ParserException& e) {
    if (auto q = unclosed_quote(doc.text, file))
      throw InputError(*q, "quoted string is never closed", "add the closing quote");
    throw InputError(SourceLoc{file, e.mark.line + 1, e.mark.column + 1}, explain(e.msg));
  } catch (const YAML::Exception& e) {
    throw InputError(SourceLoc{file, e.mark.line + 1, e.mark.column + 1}, explain(e.msg));
  }
  return doc;
}

YamlDocument load_yaml_file(const std::string& path, const Limits& limits) {
  std::error_code ec;
  if (std::filesystem::is_directory(path, ec))
    throw InputError(SourceLoc{path}, "the page description is a folder", "name a .yaml file");
  std::ifstream in(path, std::ios::binary);
  if (!in) throw InputError(SourceLoc{path}, "cannot read page description (missing or unreadable)");
  // Read one byte past the limit at most, so a huge file is refused without
  // being loaded whole.
  std::string text(limits.description_bytes + 1, '\0');
  in.read(text.data(), static_cast<std::streamsize>(text.size()));
  text.resize(static_cast<std::size_t>(in.gcount()));
  return parse_yaml(std::move(text), path, limits);
}

}  // namespace forme
