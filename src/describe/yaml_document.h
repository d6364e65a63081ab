#pragma once
/// Loading a YAML page description: text → yaml-cpp node tree, with every
/// yaml-cpp complaint turned into a located `InputError`.
#include <string>

#include <yaml-cpp/yaml.h>

#include "base/diagnostic.h"
#include "base/limits.h"

namespace forme {

struct YamlDocument {
  std::string file;  ///< path for messages
  std::string text;  ///< the raw source, for checks yaml-cpp does not make
  YAML::Node root;

  /// Location of a node (yaml-cpp marks are 0-based; ours are 1-based).
  SourceLoc loc(const YAML::Node& n) const;
};

/// Parses `text`; throws InputError at the offending line:col. Text that
/// breaks `limits` (size, aliases, nesting) is refused before a tree is built.
YamlDocument parse_yaml(std::string text, const std::string& file, const Limits& limits = {});

/// Reads and parses a file; throws InputError if it cannot be read.
YamlDocument load_yaml_file(const std::string& path, const Limits& limits = {});

}  // namespace forme
