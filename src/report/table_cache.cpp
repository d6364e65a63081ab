#include "report/table_cache.h"

namespace forme {

std::string TableCache::key(const TableSource& s) {
  // The same file read with different declared types is a different table.
  std::string k = s.path;
  for (const auto& [column, type] : s.declared) k += '\n' + column + '=' + std::to_string(static_cast<int>(type));
  for (const auto& marker : s.missing) k += "\nmissing=" + marker;  // and with other missing-value markers
  return k;
}

void TableCache::expect(const TableSource& source) { ++entries_[key(source)].uses; }

Table TableCache::take(const TableSource& source) {
  auto it = entries_.find(key(source));
  if (it == entries_.end() || it->second.uses <= 1) {
    // Last (or unannounced) use: hand the table over and forget it.
    Table t = it != entries_.end() && it->second.table ? std::move(*it->second.table) : load_(source);
    if (it != entries_.end()) entries_.erase(it);
    t.name = source.name;
    return t;
  }
  Entry& e = it->second;
  if (!e.table) e.table = load_(source);
  --e.uses;
  Table t = *e.table;
  t.name = source.name;
  return t;
}

}  // namespace forme
