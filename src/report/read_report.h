#pragma once
/// Reading a report description: YAML → `ReportSpec`, with every page
/// description it names loaded and validated, and every placeholder checked.
#include <optional>
#include <set>
#include <string>
#include <vector>

#include "base/diagnostic.h"
#include "base/limits.h"
#include "report/report_spec.h"

namespace forme {

/// True when the file at `path` is a report description (a mapping with a
/// `sections` key) rather than a page description. Never throws: a file
/// that cannot be read or parsed is left to the page reader to report.
bool is_report_description(const std::string& path);

/// Loads, validates and builds. Validation problems (in the report and in
/// every page it names) are all returned in `errors` and the result is
/// empty; other problems throw InputError.
std::optional<ReportSpec> read_report(const std::string& path, std::vector<Diagnostic>& errors,
                                      const Limits& limits = {});

/// The placeholder names a page entry may use: its repeat column, `section`.
std::set<std::string> placeholder_names(const ReportPageEntry& entry);

}  // namespace forme
