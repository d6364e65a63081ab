#pragma once
/// Tables shared by the pages of a report, read once. Pages say up front
/// which tables they will take (`expect`); a table is read at its first
/// `take` and dropped at its last, so memory holds only tables still to be
/// used, however many pages the report has.
#include <functional>
#include <map>
#include <optional>
#include <string>

#include "data/table.h"
#include "describe/page_spec.h"

namespace forme {

class TableCache {
 public:
  using Loader = std::function<Table(const TableSource&)>;
  explicit TableCache(Loader load) : load_(std::move(load)) {}

  /// Announces one future `take` of `source`.
  void expect(const TableSource& source);
  /// The table, named as the page names it; read on first use.
  Table take(const TableSource& source);

 private:
  struct Entry {
    std::size_t uses = 0;
    std::optional<Table> table;
  };
  static std::string key(const TableSource& source);
  Loader load_;
  std::map<std::string, Entry> entries_;
};

}  // namespace forme
