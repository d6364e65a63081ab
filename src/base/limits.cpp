#include "base/limits.h"

#include <charconv>
#include <limits>

namespace forme {

namespace {

// One table for names, help and setting, so the three cannot drift.
struct Entry {
  LimitName name;
  std::size_t Limits::* size = nullptr;
  int Limits::* count = nullptr;
};

const std::vector<Entry>& entries() {
  static const std::vector<Entry> table = {
      {{"description-bytes", "largest page description, in bytes"}, &Limits::description_bytes, nullptr},
      {{"yaml-anchors", "anchors (&name) in one description"}, nullptr, &Limits::yaml_anchors},
      {{"yaml-aliases", "aliases (*name) in one description"}, nullptr, &Limits::yaml_aliases},
      {{"yaml-expanded-nodes", "values a description stands for once aliases are expanded"},
       &Limits::yaml_expanded_nodes, nullptr},
      {{"nesting-depth", "deepest nesting of mappings and lists"}, nullptr, &Limits::nesting_depth},
      {{"panels", "panels listed on one page"}, &Limits::panels, nullptr},
      {{"table-bytes", "largest CSV table, in bytes"}, &Limits::table_bytes, nullptr},
      {{"pages", "pages in one output document"}, &Limits::pages, nullptr},
      {{"points-per-series", "points in one series"}, &Limits::points_per_series, nullptr},
      {{"labels", "labels on one page"}, &Limits::labels, nullptr},
  };
  return table;
}

}  // namespace

const std::vector<LimitName>& limit_names() {
  static const std::vector<LimitName> names = [] {
    std::vector<LimitName> out;
    for (const auto& e : entries()) out.push_back(e.name);
    return out;
  }();
  return names;
}

std::string set_limit(Limits& limits, std::string_view assignment) {
  const auto eq = assignment.find('=');
  const std::string_view name = assignment.substr(0, eq);
  const Entry* entry = nullptr;
  for (const auto& e : entries())
    if (name == e.name.name) entry = &e;
  if (!entry) {
    std::string known;
    for (const auto& e : entries()) known += std::string(known.empty() ? "" : ", ") + e.name.name;
    return "unknown limit '" + std::string(name) + "' (limits: " + known + ")";
  }
  if (eq == std::string_view::npos) return "write the limit as " + std::string(name) + "=N";
  const std::string_view text = assignment.substr(eq + 1);
  unsigned long long value = 0;
  const auto [end, ec] = std::from_chars(text.data(), text.data() + text.size(), value);
  const unsigned long long most =
      entry->count ? static_cast<unsigned long long>(std::numeric_limits<int>::max()) : std::numeric_limits<std::size_t>::max();
  if (ec != std::errc() || end != text.data() + text.size() || value == 0 || value > most)
    return "limit " + std::string(name) + " needs a whole number from 1 to " + std::to_string(most) + ", not '" +
           std::string(text) + "'";
  if (entry->count) limits.*(entry->count) = static_cast<int>(value);
  else limits.*(entry->size) = static_cast<std::size_t>(value);
  return {};
}

}  // namespace forme
