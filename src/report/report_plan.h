#pragma once
/// A report made concrete: every page it will hold, in order, each with
/// its page description built (placeholders filled) and, for a repeated
/// page, the rows of its value. Pages are composed from the plan one at a
/// time, so the plan holds descriptions and rows, never laid-out pages.
#include <optional>
#include <string>
#include <vector>

#include "base/limits.h"
#include "describe/page_spec.h"
#include "report/placeholders.h"
#include "report/report_spec.h"
#include "report/table_cache.h"

namespace forme {

struct PlannedPage {
  std::size_t section = 0;  ///< index into ReportSpec::sections
  std::string title;        ///< its contents and bookmark entry
  PageSpec spec;
  PlaceholderValues values;  ///< what its placeholders stood for
  /// A repeated page: the table (by name) it sees only `rows` of.
  std::string repeat_table;
  std::optional<Table> rows;
};

/// Builds every page of the report. Repeat tables are read here (through
/// `cache`) and split by value; every other table a page names is announced
/// to `cache` once per page, to be read when the page is composed.
/// Throws InputError.
std::vector<PlannedPage> plan_report(const ReportSpec& report, TableCache& cache, const Limits& limits);

/// The page's tables in the order of spec.tables, its repeat rows handed
/// over (so call once per announced use).
std::vector<Table> take_tables(PlannedPage& page, TableCache& cache);

}  // namespace forme
