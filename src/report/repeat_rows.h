#pragma once
/// The rows behind a repeated page: the distinct values of the repeat
/// column, in the order the report asks for, and the table split into one
/// table per value (read once, split once, however many pages it makes).
#include <map>
#include <string>
#include <vector>

#include "data/table.h"
#include "report/report_spec.h"

namespace forme {

/// The values that each get a page, in order. Throws InputError (at the
/// report's column or listed value) when the column is missing or a listed
/// value never occurs; an empty cell is not a value.
std::vector<std::string> repeat_values(const Table& table, const RepeatSpec& repeat);

/// `table` split by the text of `column`: for each value, the rows holding it,
/// in file order, every column kept.
std::map<std::string, Table, std::less<>> split_rows(const Table& table, const std::string& column);

}  // namespace forme
