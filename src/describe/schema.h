#pragma once
/// The page description's vocabulary as data: every key, what it holds and
/// what it means. The validator walks a YAML tree against this table, and
/// the same table documents the format, so the two cannot drift apart.
#include <string_view>
#include <vector>

namespace forme {

/// What a scalar must parse as.
enum class ScalarType {
  text,     ///< any string
  integer,  ///< whole number
  number,   ///< decimal number
  length,   ///< number with unit: 18mm, 1.5cm, 0.5in, 9pt
  boolean,  ///< true / false
  choice,   ///< one of `choices`
};

struct NodeSpec;

struct KeySpec {
  std::string_view key;
  const NodeSpec* value = nullptr;
  bool required = false;
  std::string_view doc;
};

/// What one YAML node may be: a scalar, a mapping, a list, or one of several.
struct NodeSpec {
  std::string_view what;  ///< noun for messages: "a length such as 18mm"
  bool scalar_ok = false;
  ScalarType scalar = ScalarType::text;
  std::vector<std::string_view> choices;
  bool map_ok = false;
  std::vector<KeySpec> keys;          ///< fixed keys of a mapping
  const NodeSpec* any_key = nullptr;  ///< mappings with author-chosen keys (table names)
  bool list_ok = false;
  const NodeSpec* item = nullptr;
  std::string_view doc;
  /// When set, any value is refused with this explanation (for keys an
  /// author may reach for that forme deliberately does not offer).
  std::string_view refused;

  const KeySpec* find_key(std::string_view k) const {
    for (const auto& ks : keys)
      if (ks.key == k) return &ks;
    return nullptr;
  }
};

/// The root of a page description.
const NodeSpec& page_schema();

/// The root of a report description: sections of pages in one PDF.
const NodeSpec& report_schema();

}  // namespace forme
