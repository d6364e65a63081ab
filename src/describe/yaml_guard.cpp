#include "describe/yaml_guard.h"

#include <sstream>
#include <unordered_map>
#include <vector>

#include <yaml-cpp/eventhandler.h>
#include <yaml-cpp/mark.h>
#include <yaml-cpp/parser.h>

namespace forme {

namespace {

SourceLoc at(const std::string& file, const YAML::Mark& m) {
  if (m.is_null()) return SourceLoc{file, 1, 1};
  return SourceLoc{file, m.line + 1, m.column + 1};
}

// Line and column (1-based) of byte `offset` in `text`.
SourceLoc at_offset(const std::string& file, const std::string& text, std::size_t offset) {
  int line = 1, col = 1;
  for (std::size_t i = 0; i < offset && i < text.size(); ++i) {
    if (text[i] == '\n') {
      ++line;
      col = 1;
    } else {
      ++col;
    }
  }
  return SourceLoc{file, line, col};
}

// Raw scan of nesting depth: block levels from indentation (each deeper
// indent, and each "- " that opens a list item, is one level) plus open
// flow brackets. Comments and quoted strings are skipped. It sees the text
// as yaml-cpp's scanner does in the cases that matter (unclosed brackets,
// where yaml-cpp's own marks drift) and never recurses.
void scan_depth(const std::string& t, const std::string& file, int limit) {
  std::vector<int> indents;  // block indentation levels open at this line
  int flow = 0, line = 1;
  int block_scalar_indent = -1;  // inside a `|` or `>` scalar deeper than this
  std::size_t i = 0;
  char quote = 0;
  auto refuse = [&](int col) {
    throw InputError(SourceLoc{file, line, col}, "nesting deeper than " + std::to_string(limit) + " levels",
                     "a page description needs only a few levels of mappings and lists");
  };
  while (i < t.size()) {
    const std::size_t start = i;
    std::size_t end = t.find('\n', start);
    if (end == std::string::npos) end = t.size();
    int block = static_cast<int>(indents.size());
    std::size_t j = start;
    if (flow == 0 && quote == 0) {
      while (j < end && t[j] == ' ') ++j;
      const int indent = static_cast<int>(j - start);
      const bool blank = j == end || t[j] == '#' || t[j] == '\r';
      if (block_scalar_indent >= 0 && (blank || indent > block_scalar_indent)) {
        j = end;  // the text of a block scalar
      } else if (!blank) {
        block_scalar_indent = -1;
        while (!indents.empty() && indents.back() > indent) indents.pop_back();
        // A line that opens with a bracket is a flow value, not a block level.
        const bool flow_value = t[j] == '[' || t[j] == '{';
        if (!flow_value && (indents.empty() || indents.back() < indent)) indents.push_back(indent);
        block = static_cast<int>(indents.size());
        while (j + 1 < end && t[j] == '-' && (t[j + 1] == ' ')) {  // "- - x": a list per dash
          if (++block > limit) refuse(static_cast<int>(j - start) + 1);
          j += 2;
          while (j < end && t[j] == ' ') ++j;
        }
        if (block > limit) refuse(static_cast<int>(j - start) + 1);
      }
    }
    char prev = ' ';
    std::size_t last_token = std::string::npos;
    for (; j < end; ++j) {
      const char c = t[j];
      if (quote) {
        if (quote == '"' && c == '\\') ++j;
        else if (c == quote) {
          if (quote == '\'' && j + 1 < end && t[j + 1] == '\'') ++j;
          else quote = 0;
        }
        prev = c;
        continue;
      }
      const bool token_start = prev == ' ' || prev == '[' || prev == '{' || prev == ',' || j == start;
      if (c == '#' && (prev == ' ' || j == start)) break;
      if ((c == '"' || c == '\'') && token_start) quote = c;
      else if (c == '[' || c == '{') {
        if (block + ++flow > limit) refuse(static_cast<int>(j - start) + 1);
      } else if ((c == ']' || c == '}') && flow > 0) {
        --flow;
      }
      if (c != ' ') last_token = j;
      prev = c;
    }
    // A line ending in a block scalar indicator (`|`, `>-`, `|2` ...) starts
    // lines of text that are not structure.
    if (flow == 0 && quote == 0 && last_token != std::string::npos) {
      std::size_t k = last_token;
      while (k > start && t[k] != ' ' && t[k] != ':') --k;
      const std::size_t tok = t[k] == ' ' || t[k] == ':' ? k + 1 : k;
      if (tok <= last_token && (t[tok] == '|' || t[tok] == '>')) {
        bool indicator = true;
        for (std::size_t m = tok + 1; m <= last_token; ++m)
          indicator &= t[m] == '+' || t[m] == '-' || (t[m] >= '1' && t[m] <= '9');
        if (indicator) block_scalar_indent = indents.empty() ? 0 : indents.back();
      }
    }
    i = end + 1;
    ++line;
  }
}

// Walks yaml-cpp's events without building a tree. Every callback runs
// before the parser descends into a collection, so throwing from here stops
// deep nesting after `nesting_depth` levels of recursion, not thousands.
class Guard : public YAML::EventHandler {
 public:
  Guard(const std::string& file, const Limits& limits) : file_(file), limits_(limits) {}

  int documents() const { return documents_; }

  void OnDocumentStart(const YAML::Mark& mark) override {
    if (++documents_ > 1)
      throw InputError(at(file_, mark), "a second YAML document ('---') in the page description",
                       "a page description is one document; split pages into separate files");
    open_.clear();
    open_.push_back({0, 0});  // the document itself
  }
  void OnDocumentEnd() override {}

  void OnNull(const YAML::Mark& mark, YAML::anchor_t anchor) override { leaf(mark, anchor); }
  void OnScalar(const YAML::Mark& mark, const std::string&, YAML::anchor_t anchor, const std::string&) override {
    leaf(mark, anchor);
  }

  void OnAlias(const YAML::Mark& mark, YAML::anchor_t anchor) override {
    if (++aliases_ > limits_.yaml_aliases)
      throw InputError(at(file_, mark), "more than " + std::to_string(limits_.yaml_aliases) + " aliases",
                       "a page description needs few aliases ('*name'); write the values out");
    auto it = weight_.find(anchor);
    const std::size_t w = it == weight_.end() ? 1 : it->second;
    add(mark, w, true);
  }

  void OnSequenceStart(const YAML::Mark& mark, const std::string&, YAML::anchor_t anchor,
                       YAML::EmitterStyle::value) override {
    open(mark, anchor);
  }
  void OnSequenceEnd() override { close(); }
  void OnMapStart(const YAML::Mark& mark, const std::string&, YAML::anchor_t anchor,
                  YAML::EmitterStyle::value) override {
    open(mark, anchor);
  }
  void OnMapEnd() override { close(); }

 private:
  struct Open {
    YAML::anchor_t anchor;
    std::size_t weight;  // nodes inside so far, aliases expanded
  };

  void anchor_defined(const YAML::Mark& mark, YAML::anchor_t anchor) {
    if (anchor == 0) return;
    if (++anchors_ > limits_.yaml_anchors)
      throw InputError(at(file_, mark), "more than " + std::to_string(limits_.yaml_anchors) + " anchors",
                       "a page description needs few anchors ('&name')");
  }

  void leaf(const YAML::Mark& mark, YAML::anchor_t anchor) {
    anchor_defined(mark, anchor);
    if (anchor != 0) weight_[anchor] = 1;
    add(mark, 1, false);
  }

  void open(const YAML::Mark& mark, YAML::anchor_t anchor) {
    anchor_defined(mark, anchor);
    if (static_cast<int>(open_.size()) > limits_.nesting_depth)
      throw InputError(at(file_, mark), "nesting deeper than " + std::to_string(limits_.nesting_depth) + " levels",
                       "a page description needs only a few levels of mappings and lists");
    last_mark_ = mark;
    open_.push_back({anchor, 0});
  }

  void close() {
    if (open_.size() < 2) return;
    Open done = open_.back();
    open_.pop_back();
    if (done.anchor != 0) weight_[done.anchor] = done.weight + 1;
    add(last_mark_, 1, false);
    open_.back().weight += done.weight;
  }

  // Counts `w` more nodes inside the innermost open collection.
  void add(const YAML::Mark& mark, std::size_t w, bool alias) {
    total_ += w;
    open_.back().weight += w;
    if (total_ <= limits_.yaml_expanded_nodes) return;
    const std::string n = std::to_string(limits_.yaml_expanded_nodes);
    if (alias)
      throw InputError(at(file_, mark), "aliases expand to more than " + n + " values",
                       "aliases that refer to aliases multiply; a page description needs no such structure");
    throw InputError(at(file_, mark), "the description holds more than " + n + " values",
                     "keep data in CSV tables");
  }

  const std::string& file_;
  const Limits& limits_;
  int documents_ = 0, anchors_ = 0, aliases_ = 0;
  std::size_t total_ = 0;
  std::vector<Open> open_;
  std::unordered_map<YAML::anchor_t, std::size_t> weight_;
  YAML::Mark last_mark_;
};

}  // namespace

void guard_yaml(const std::string& text, const std::string& file, const Limits& limits) {
  if (text.size() > limits.description_bytes)
    throw InputError(at_offset(file, text, limits.description_bytes),
                     "page description is larger than " + std::to_string(limits.description_bytes) + " bytes",
                     "a page description is a few kilobytes; keep data in CSV tables");
  scan_depth(text, file, limits.nesting_depth);
  std::istringstream in(text);
  YAML::Parser parser(in);
  Guard guard(file, limits);
  while (parser.HandleNextDocument(guard)) {
  }
}

}  // namespace forme
