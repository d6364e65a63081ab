#include "report/repeat_rows.h"

#include <algorithm>
#include <set>

namespace forme {

namespace {

const Column& column_of(const Table& table, const Located& name) {
  if (const Column* c = table.find(name.value)) return *c;
  std::string names;
  for (const auto& c : table.columns) names += (names.empty() ? "" : ", ") + c.name;
  throw InputError(name.loc, "table '" + table.name + "' has no column '" + name.value + "'", "its columns are: " + names);
}

}  // namespace

std::vector<std::string> repeat_values(const Table& table, const RepeatSpec& repeat) {
  const Column& c = column_of(table, repeat.column);
  std::vector<std::string> values;
  std::set<std::string, std::less<>> seen;
  for (const auto& v : c.text)
    if (!v.empty() && seen.insert(v).second) values.push_back(v);
  if (repeat.order == RepeatSpec::Order::sorted) {
    // Numbers and dates sort by value, text by its bytes (stable for ties).
    if (c.type == ColumnType::text) {
      std::sort(values.begin(), values.end());
    } else {
      std::map<std::string, double, std::less<>> key;
      for (std::size_t i = 0; i < c.text.size(); ++i) key.emplace(c.text[i], c.values[i]);
      std::stable_sort(values.begin(), values.end(), [&](const auto& a, const auto& b) { return key[a] < key[b]; });
    }
  } else if (repeat.order == RepeatSpec::Order::listed) {
    std::vector<std::string> listed;
    for (const auto& v : repeat.listed) {
      if (!seen.count(v.value))
        throw InputError(v.loc, "'" + v.value + "' does not occur in column '" + c.name + "' of table '" + table.name + "'",
                         "list values as the table writes them");
      listed.push_back(v.value);
    }
    values = std::move(listed);
  }
  if (values.empty())
    throw InputError(repeat.column.loc, "column '" + c.name + "' of table '" + table.name + "' has no values",
                     "a repeated page needs at least one value to be made for");
  return values;
}

std::map<std::string, Table, std::less<>> split_rows(const Table& table, const std::string& column) {
  std::map<std::string, Table, std::less<>> parts;
  const Column* by = table.find(column);
  if (!by) return parts;
  // Row indices per value first, then copy each column once per part.
  std::map<std::string, std::vector<std::size_t>, std::less<>> rows;
  for (std::size_t i = 0; i < table.rows; ++i) rows[by->text[i]].push_back(i);
  for (const auto& [value, idx] : rows) {
    Table t;
    t.name = table.name;
    t.path = table.path;
    t.rows = idx.size();
    for (const auto& c : table.columns) {
      Column part;
      part.name = c.name;
      part.type = c.type;
      part.date_precision = c.date_precision;
      part.header_col = c.header_col;
      part.text.reserve(idx.size());
      for (std::size_t i : idx) part.text.push_back(c.text[i]);
      if (!c.values.empty()) {
        part.values.reserve(idx.size());
        for (std::size_t i : idx) part.values.push_back(c.values[i]);
      }
      t.columns.push_back(std::move(part));
    }
    if (!table.row_lines.empty())
      for (std::size_t i : idx) t.row_lines.push_back(table.row_lines[i]);
    parts.emplace(value, std::move(t));
  }
  return parts;
}

}  // namespace forme
