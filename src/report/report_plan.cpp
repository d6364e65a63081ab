#include "report/report_plan.h"

#include "describe/read_page.h"
#include "report/repeat_rows.h"

namespace forme {

namespace {

PageSpec build_filled(const YamlDocument& page, const PlaceholderValues& values, const Limits& limits) {
  FilledTree filled(page.root, values);
  return build_page_spec(page, limits);
}

const TableSource& source_named(const PageSpec& spec, const std::string& name) {
  for (const auto& t : spec.tables)
    if (t.name == name) return t;
  throw InputError(spec.loc, "the page has no table '" + name + "'");  // read_report checked this
}

// What the plan keeps of a page's description.
void keep(PlannedPage& p, const PageSpec& spec, const ReportPageEntry& entry) {
  p.title = entry.title.empty() ? spec.title : fill_placeholders(entry.title.value, p.values);
  p.tables = spec.tables;
  p.table_page = spec.data.table_page;
}

void announce(PlannedPage& p, TableCache& cache) {
  for (const auto& t : p.tables)
    if (t.name != p.repeat_table) cache.expect(t);
}

}  // namespace

std::vector<PlannedPage> plan_report(const ReportSpec& report, TableCache& cache, const Limits& limits) {
  std::vector<PlannedPage> pages;
  for (std::size_t s = 0; s < report.sections.size(); ++s) {
    const ReportSection& section = report.sections[s];
    for (std::size_t e = 0; e < section.pages.size(); ++e) {
      const ReportPageEntry& entry = section.pages[e];
      PlaceholderValues values{{"section", section.title}};
      if (!entry.repeat) {
        PlannedPage p;
        p.section = s;
        p.entry = e;
        p.values = values;
        keep(p, build_filled(entry.page, values, limits), entry);
        announce(p, cache);
        pages.push_back(std::move(p));
        continue;
      }
      const RepeatSpec& r = *entry.repeat;
      // The repeat table's file names no placeholder (read_report checked),
      // so any filling of the description finds it.
      values[r.column.value] = "";
      const TableSource source = source_named(build_filled(entry.page, values, limits), r.table.value);
      cache.expect(source);
      const Table whole = cache.take(source);
      const std::vector<std::string> order = repeat_values(whole, r);
      auto parts = split_rows(whole, r.column.value);
      for (const auto& v : order) {
        values[r.column.value] = v;
        PlannedPage p;
        p.section = s;
        p.entry = e;
        p.values = values;
        keep(p, build_filled(entry.page, values, limits), entry);
        p.repeat_table = r.table.value;
        auto part = parts.find(v);
        p.rows = std::move(part->second);
        announce(p, cache);
        pages.push_back(std::move(p));
      }
    }
  }
  if (pages.size() > limits.report_pages)
    throw InputError(SourceLoc{report.file, 1, 1}, "the report would have more than " +
                                                      std::to_string(limits.report_pages) + " pages",
                     "split it into several reports");
  return pages;
}

PageSpec planned_spec(const ReportSpec& report, const PlannedPage& page, const Limits& limits) {
  PageSpec spec = build_filled(report.sections[page.section].pages[page.entry].page, page.values, limits);
  if (spec.language.empty()) spec.language = report.language;  // a page's own language wins
  return spec;
}

std::vector<Table> take_tables(PlannedPage& page, TableCache& cache) {
  std::vector<Table> tables;
  for (const auto& t : page.tables) {
    if (t.name == page.repeat_table && page.rows) {
      tables.push_back(std::move(*page.rows));
      page.rows.reset();
      tables.back().name = t.name;
    } else {
      tables.push_back(cache.take(t));
    }
  }
  return tables;
}

}  // namespace forme
