#pragma once
/// Placeholders in a report's text: `$(name)` stands for a value the report
/// supplies (the value a repeated page is made for, the section's title);
/// `$$` writes one `$`. Names are letters, digits, '-' and '_'.
///
/// Every text of a page description may hold placeholders: titles, notes,
/// axis titles, row filters, even table file names. They are checked when
/// the report is read, so an unknown name is a located error before any
/// page is made, and replaced in a copy of the description for each page.
#include <map>
#include <set>
#include <string>
#include <string_view>
#include <vector>

#include <yaml-cpp/yaml.h>

#include "base/diagnostic.h"
#include "describe/yaml_document.h"

namespace forme {

using PlaceholderValues = std::map<std::string, std::string, std::less<>>;

/// One `$(name)` in a text.
struct Placeholder {
  std::size_t offset = 0;  ///< byte offset of the '$'
  std::string name;
};

/// The placeholders in `text`, in order. Throws InputError (at `loc`,
/// moved to the offending byte) for a `$(` that is never closed or holds
/// no valid name.
std::vector<Placeholder> find_placeholders(std::string_view text, const SourceLoc& loc);

/// `text` with every placeholder replaced by its value. Names must be in
/// `values` (check first); an unknown one is left as written.
std::string fill_placeholders(std::string_view text, const PlaceholderValues& values);

/// Checks every scalar value under `node`: each placeholder must name one of
/// `known`. Problems are appended to `errors`, located at the placeholder.
void check_placeholders(const YamlDocument& doc, const YAML::Node& node, const std::set<std::string>& known,
                        std::vector<Diagnostic>& errors);

/// Fills the placeholders of every scalar value under a tree in place, and
/// puts the written text back when it goes out of scope. In place, because
/// yaml-cpp's copies lose each node's line:col, and later messages must
/// point into the description.
class FilledTree {
 public:
  FilledTree(YAML::Node root, const PlaceholderValues& values);
  ~FilledTree();
  FilledTree(const FilledTree&) = delete;
  FilledTree& operator=(const FilledTree&) = delete;

 private:
  void fill(YAML::Node node, const PlaceholderValues& values);
  std::vector<std::pair<YAML::Node, std::string>> written_;  ///< each changed scalar and its text as written
};

/// Whether any scalar value under `node` holds a placeholder.
bool has_placeholders(const YAML::Node& node);

}  // namespace forme
