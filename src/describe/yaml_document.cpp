#include "describe/yaml_document.h"

#include <filesystem>
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
}  // namespace

YamlDocument parse_yaml(std::string text, const std::string& file, const Limits& limits) {
  YamlDocument doc;
  doc.file = file;
  doc.text = std::move(text);
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
