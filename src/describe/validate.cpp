#include "describe/validate.h"

#include <algorithm>
#include <charconv>
#include <cmath>
#include <map>

#include "describe/lengths.h"
#include "describe/suggest.h"

namespace forme {

namespace {

std::string shape_of(const YAML::Node& n) {
  switch (n.Type()) {
    case YAML::NodeType::Map: return "a mapping";
    case YAML::NodeType::Sequence: return "a list";
    case YAML::NodeType::Scalar: return "'" + n.Scalar() + "'";
    default: return "nothing";
  }
}

bool parses_integer(const std::string& s) {
  long v = 0;
  auto [p, ec] = std::from_chars(s.data(), s.data() + s.size(), v);
  return ec == std::errc() && p == s.data() + s.size();
}

bool parses_number(const std::string& s) {
  double v = 0;
  auto [p, ec] = std::from_chars(s.data(), s.data() + s.size(), v);
  return ec == std::errc() && p == s.data() + s.size() && std::isfinite(v);
}

std::string join_choices(const std::vector<std::string_view>& c) {
  std::string out;
  for (std::size_t i = 0; i < c.size(); ++i) {
    if (i) out += i + 1 == c.size() ? " or " : ", ";
    out += c[i];
  }
  return out;
}

class Validator {
 public:
  explicit Validator(const YamlDocument& doc) : doc_(doc) {
    line_starts_.push_back(0);
    for (std::size_t i = 0; i < doc.text.size(); ++i)
      if (doc.text[i] == '\n') line_starts_.push_back(i + 1);
  }

  void node(const YAML::Node& n, const NodeSpec& spec, const std::string& path) {
    if (!spec.refused.empty()) {
      error(n, "'" + path + "' is not available", std::string(spec.refused));
      return;
    }
    if (n.IsScalar() && spec.scalar_ok) return scalar(n, spec, path);
    if (n.IsMap() && (spec.map_ok)) return mapping(n, spec, path);
    if (n.IsSequence() && spec.list_ok) {
      for (const auto& item : n) node(item, *spec.item, path);
      return;
    }
    if (n.IsScalar()) check_quotes(n);
    error(n, "'" + path + "' should be " + std::string(spec.what) + ", not " + shape_of(n));
  }

  std::vector<Diagnostic> take() { return std::move(found_); }

 private:
  void scalar(const YAML::Node& n, const NodeSpec& spec, const std::string& path) {
    if (!check_quotes(n)) return;
    const std::string& s = n.Scalar();
    bool ok = true;
    std::string hint;
    switch (spec.scalar) {
      case ScalarType::text: break;
      case ScalarType::integer: ok = parses_integer(s); break;
      case ScalarType::number: ok = parses_number(s); break;
      case ScalarType::length:
        ok = parse_length(s).has_value();
        if (!ok && parses_number(s)) hint = "add a unit: mm, cm, in or pt";
        break;
      case ScalarType::boolean: ok = s == "true" || s == "false"; break;
      case ScalarType::choice: {
        ok = std::find(spec.choices.begin(), spec.choices.end(), s) != spec.choices.end();
        if (!ok) {
          std::vector<std::string> cands(spec.choices.begin(), spec.choices.end());
          if (auto near = nearest(s, cands)) hint = "did you mean '" + *near + "'?";
          else hint = "choose " + join_choices(spec.choices);
        }
        break;
      }
    }
    if (!ok) error(n, "'" + path + "' should be " + std::string(spec.what) + ", not " + shape_of(n), hint);
  }

  void mapping(const YAML::Node& n, const NodeSpec& spec, const std::string& path) {
    std::map<std::string, int> seen;  // key -> line of its first use
    for (auto it = n.begin(); it != n.end(); ++it) {
      const YAML::Node k = it->first;  // a copy: it->first dies with the proxy it-> returns
      if (!k.IsScalar()) {
        error(k, "keys of " + (path.empty() ? std::string("the page description") : "'" + path + "'") +
                     " must be plain words");
        continue;
      }
      const std::string key = k.Scalar();
      const std::string child = path.empty() ? key : path + "." + key;
      if (auto [at, fresh] = seen.emplace(key, doc_.loc(k).line); !fresh) {
        error(k, "duplicate key '" + key + "'",
              "it was already given on line " + std::to_string(at->second) + "; each key may appear once");
        continue;
      }
      if (const KeySpec* ks = spec.find_key(key)) {
        node(it->second, *ks->value, child);
      } else if (spec.any_key) {
        node(it->second, *spec.any_key, child);
      } else {
        std::vector<std::string> cands;
        for (const auto& ks2 : spec.keys) cands.emplace_back(ks2.key);
        std::string hint;
        if (auto near = nearest(key, cands)) hint = "did you mean '" + *near + "'?";
        else {
          hint = "valid keys here: ";
          for (std::size_t i = 0; i < cands.size(); ++i) hint += (i ? ", " : "") + cands[i];
        }
        error(k, "unknown key '" + key + "'" + (path.empty() ? "" : " in '" + path + "'"), hint);
      }
    }
    for (const auto& ks : spec.keys)
      if (ks.required && !seen.count(std::string(ks.key)))
        error(n, "missing required key '" + std::string(ks.key) + "'" +
                     (path.empty() ? "" : " in '" + path + "'"),
              std::string(ks.doc));
  }

  // yaml-cpp accepts a quoted scalar whose closing quote is missing (it runs
  // to the end of the file). Find the closing quote in the source ourselves.
  bool check_quotes(const YAML::Node& n) {
    if (n.Tag() != "!") return true;  // only quoted scalars carry the "!" tag
    const YAML::Mark m = n.Mark();
    if (m.is_null() || static_cast<std::size_t>(m.line) >= line_starts_.size()) return true;
    std::size_t i = line_starts_[static_cast<std::size_t>(m.line)] + static_cast<std::size_t>(m.column);
    const std::string& t = doc_.text;
    if (i >= t.size() || (t[i] != '"' && t[i] != '\'')) return true;
    const char q = t[i];
    for (std::size_t j = i + 1; j < t.size(); ++j) {
      if (q == '"' && t[j] == '\\') {
        ++j;
        continue;
      }
      if (t[j] == q) {
        if (q == '\'' && j + 1 < t.size() && t[j + 1] == '\'') {
          ++j;
          continue;
        }
        return true;
      }
    }
    error(n, "quoted string is never closed", std::string("add the closing ") + q);
    return false;
  }

  void error(const YAML::Node& n, std::string msg, std::string hint = {}) {
    found_.push_back({Severity::error, doc_.loc(n), std::move(msg), std::move(hint)});
  }

  const YamlDocument& doc_;
  std::vector<std::size_t> line_starts_;
  std::vector<Diagnostic> found_;
};

}  // namespace

std::vector<Diagnostic> validate_document(const YamlDocument& doc, const NodeSpec& root) {
  Validator v(doc);
  if (!doc.root.IsMap()) {
    return {{Severity::error, doc.root.IsDefined() && !doc.root.IsNull() ? doc.loc(doc.root) : SourceLoc{doc.file, 1, 1},
             "a page description is a mapping of keys such as 'sheet', 'tables' and 'panel'",
             doc.root.IsNull() ? "the file is empty" : ""}};
  }
  v.node(doc.root, root, "");
  return v.take();
}

}  // namespace forme
