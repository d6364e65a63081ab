#include "report/placeholders.h"

#include <cctype>

namespace forme {

namespace {

bool name_char(char c) {
  return std::isalnum(static_cast<unsigned char>(c)) || c == '-' || c == '_';
}

// Where byte `offset` of a scalar sits in the file: on the scalar's line,
// after its opening quote when quoted. Multi-line scalars keep the start.
SourceLoc at(const SourceLoc& start, std::string_view text, std::size_t offset, bool quoted) {
  SourceLoc l = start;
  if (l.line == 0 || text.substr(0, offset).find('\n') != std::string_view::npos) return l;
  l.col += static_cast<int>(offset) + (quoted ? 1 : 0);
  return l;
}

std::string list(const std::set<std::string>& names) {
  if (names.empty()) return "this page has no placeholders (write $$ for a literal $)";
  std::string s = "known here: ";
  bool first = true;
  for (const auto& n : names) {
    s += (first ? "$(" : ", $(") + n + ")";
    first = false;
  }
  return s;
}

void check_scalar(const YamlDocument& doc, const YAML::Node& n, const std::set<std::string>& known,
                  std::vector<Diagnostic>& errors) {
  const std::string& text = n.Scalar();
  if (text.find('$') == std::string::npos) return;
  const bool quoted = n.Tag() == "!";
  const SourceLoc loc = doc.loc(n);
  try {
    for (const auto& p : find_placeholders(text, loc))
      if (!known.count(p.name))
        errors.push_back({Severity::error, at(loc, text, p.offset, quoted), "unknown placeholder '$(" + p.name + ")'",
                          list(known)});
  } catch (const InputError& e) {
    Diagnostic d = e.diagnostic();
    if (quoted && d.loc.line == loc.line && d.loc.col != loc.col) d.loc.col += 1;
    errors.push_back(d);
  }
}

}  // namespace

std::vector<Placeholder> find_placeholders(std::string_view text, const SourceLoc& loc) {
  std::vector<Placeholder> found;
  for (std::size_t i = 0; i < text.size(); ++i) {
    if (text[i] != '$' || i + 1 >= text.size()) continue;
    if (text[i + 1] == '$') {  // "$$" is a literal '$'
      ++i;
      continue;
    }
    if (text[i + 1] != '(') continue;
    const std::size_t close = text.find(')', i + 2);
    if (close == std::string_view::npos)
      throw InputError(at(loc, text, i, false), "placeholder '$(' is never closed",
                       "write $(name) with a closing ')', or $$ for a literal $");
    const std::string_view name = text.substr(i + 2, close - i - 2);
    bool ok = !name.empty();
    for (char c : name) ok = ok && name_char(c);
    if (!ok)
      throw InputError(at(loc, text, i, false), "'" + std::string(text.substr(i, close - i + 1)) + "' is not a placeholder",
                       "a placeholder is $(name), the name in letters, digits, '-' and '_'; write $$ for a literal $");
    found.push_back({i, std::string(name)});
    i = close;
  }
  return found;
}

std::string fill_placeholders(std::string_view text, const PlaceholderValues& values) {
  std::string out;
  out.reserve(text.size());
  for (std::size_t i = 0; i < text.size(); ++i) {
    if (text[i] == '$' && i + 1 < text.size() && text[i + 1] == '$') {
      out += '$';
      ++i;
      continue;
    }
    if (text[i] == '$' && i + 1 < text.size() && text[i + 1] == '(') {
      const std::size_t close = text.find(')', i + 2);
      if (close != std::string_view::npos) {
        auto v = values.find(text.substr(i + 2, close - i - 2));
        if (v != values.end()) {
          out += v->second;
          i = close;
          continue;
        }
      }
    }
    out += text[i];
  }
  return out;
}

void check_placeholders(const YamlDocument& doc, const YAML::Node& node, const std::set<std::string>& known,
                        std::vector<Diagnostic>& errors) {
  if (node.IsScalar()) {
    check_scalar(doc, node, known, errors);
  } else if (node.IsMap()) {
    for (auto it = node.begin(); it != node.end(); ++it) check_placeholders(doc, it->second, known, errors);
  } else if (node.IsSequence()) {
    for (const auto& item : node) check_placeholders(doc, item, known, errors);
  }
}

FilledTree::FilledTree(YAML::Node root, const PlaceholderValues& values) { fill(root, values); }

FilledTree::~FilledTree() {
  // Newest first, so a scalar reached twice (through an alias) ends as written.
  for (auto it = written_.rbegin(); it != written_.rend(); ++it) it->first = it->second;
}

void FilledTree::fill(YAML::Node node, const PlaceholderValues& values) {
  if (node.IsScalar()) {
    const std::string text = node.Scalar();
    if (text.find('$') == std::string::npos) return;
    written_.emplace_back(node, text);
    node = fill_placeholders(text, values);  // yaml-cpp keeps the node's mark
  } else if (node.IsMap()) {
    for (auto it = node.begin(); it != node.end(); ++it) fill(it->second, values);
  } else if (node.IsSequence()) {
    for (auto item : node) fill(item, values);
  }
}

bool has_placeholders(const YAML::Node& node) {
  if (node.IsScalar()) return node.Scalar().find("$(") != std::string::npos;
  if (node.IsMap()) {
    for (auto it = node.begin(); it != node.end(); ++it)
      if (has_placeholders(it->second)) return true;
  } else if (node.IsSequence()) {
    for (const auto& item : node)
      if (has_placeholders(item)) return true;
  }
  return false;
}

}  // namespace forme
