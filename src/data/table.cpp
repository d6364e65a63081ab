#include "data/table.h"

namespace forme {

const Column* Table::find(std::string_view column_name) const {
  for (const Column& c : columns)
    if (c.name == column_name) return &c;
  return nullptr;
}

}  // namespace forme
