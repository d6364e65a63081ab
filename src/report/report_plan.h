#pragma once
/// A report made concrete: every page it will hold, in order, each with
/// its placeholder values and, for a repeated page, the rows of its value.
/// A page's description is built again from its report entry when the page
/// is composed: the plan keeps only what counting and listing the pages
/// needs, so its size per page stays small however long the report.
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
  std::size_t entry = 0;    ///< index into that section's pages
  std::string title;        ///< its contents and bookmark entry
  PlaceholderValues values;  ///< what its placeholders stand for
  std::vector<TableSource> tables;  ///< as its description lists them, placeholders filled
  bool table_page = false;          ///< followed by pages tabling its rows
  /// A repeated page: the table (by name) it sees only `rows` of.
  std::string repeat_table;
  std::optional<Table> rows;
};

/// Builds every page of the report. Repeat tables are read here (through
/// `cache`) and split by value; every other table a page names is announced
/// to `cache` once per page, to be read when the page is composed.
/// Throws InputError.
std::vector<PlannedPage> plan_report(const ReportSpec& report, TableCache& cache, const Limits& limits);

/// The description of a planned page, built from its report entry with its
/// placeholders filled. Placeholders are filled in the report's YAML tree
/// and restored, so calls for one report must not run at the same time.
/// Throws InputError.
PageSpec planned_spec(const ReportSpec& report, const PlannedPage& page, const Limits& limits);

/// The page's tables in the order of its description, its repeat rows
/// handed over (so call once per announced use).
std::vector<Table> take_tables(PlannedPage& page, TableCache& cache);

}  // namespace forme
