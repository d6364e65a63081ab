#include "series/select_series.h"

#include <algorithm>
#include <cmath>
#include <map>

#include "describe/suggest.h"
#include "series/apply_transform.h"
#include "series/gaps.h"

namespace forme {

namespace {

const Table& find_table(const PageSpec& page, const std::vector<Table>& tables, const PanelSpec& p) {
  if (p.table.empty()) {
    if (tables.size() == 1) return tables[0];
    throw InputError(p.loc, "panel does not say which table it shows", "add 'table:' naming one of the tables");
  }
  for (const auto& t : tables)
    if (t.name == p.table.value) return t;
  std::vector<std::string> names;
  for (const auto& t : page.tables) names.push_back(t.name);
  auto near = nearest(p.table.value, names);
  throw InputError(p.table.loc, "no table named '" + p.table.value + "'",
                   near ? "did you mean '" + *near + "'?" : "tables are declared under 'tables'");
}

const Column& find_column(const Table& t, const Located& name, const char* role) {
  if (const Column* c = t.find(name.value)) return *c;
  std::vector<std::string> names;
  for (const auto& c : t.columns) names.push_back(c.name);
  auto near = nearest(name.value, names);
  std::string all;
  for (std::size_t i = 0; i < names.size() && i < 12; ++i) all += (i ? ", " : "") + names[i];
  throw InputError(name.loc, std::string("table '") + t.name + "' has no column '" + name.value + "' for " + role,
                   near ? "did you mean '" + *near + "'?" : "its columns are: " + all);
}

AxisKind kind_of(const Column& c) {
  switch (c.type) {
    case ColumnType::number: return AxisKind::number;
    case ColumnType::date: return AxisKind::date;
    case ColumnType::text: return AxisKind::category;
  }
  return AxisKind::category;
}

// The panel's category axis: x for vertical bars, y for horizontal bars
// and dot strips. Line charts have none.
// Bars over dates stand on a time axis, one bar per period.
bool x_is_category(const PanelSpec& p, const Column& x) {
  if (p.kind == ChartKind::vertical_bar || p.kind == ChartKind::stacked_bar) return x.type != ColumnType::date;
  return p.kind != ChartKind::horizontal_bar && x.type == ColumnType::text;
}
bool y_is_category(const PanelSpec& p, const Column& y) {
  return p.kind == ChartKind::horizontal_bar || (p.kind == ChartKind::dot && y.type == ColumnType::text);
}

// The placer needs priorities above zero; the author's numbers may be any
// sign or size, so only their order is kept: 1 for the lowest (or a missing
// cell) up to 2 for the highest.
void rank_priorities(std::vector<PointName>& names) {
  std::vector<double> v;
  for (const auto& n : names)
    if (!std::isnan(n.priority)) v.push_back(n.priority);
  std::sort(v.begin(), v.end());
  v.erase(std::unique(v.begin(), v.end()), v.end());
  for (auto& n : names) {
    if (std::isnan(n.priority) || v.size() < 2) {
      n.priority = 1;
      continue;
    }
    const auto at = std::lower_bound(v.begin(), v.end(), n.priority) - v.begin();
    n.priority = 1 + static_cast<double>(at) / static_cast<double>(v.size() - 1);
  }
}

// Stacked areas add up from zero: every value must be zero or more, and
// every series needs a value at every x, or the stack would thin silently.
void check_stackable(const PanelSpec& p, const PanelData& d, const Table& t) {
  const Series* first = d.series.empty() ? nullptr : &d.series.front();
  for (const auto& s : d.series) {
    for (std::size_t i = 0; i < s.y.size(); ++i)
      if (s.y[i] < 0)
        throw InputError(p.y.loc, "stacked areas add up from zero, but '" + (s.name.empty() ? p.y.value : s.name) +
                                      "' has a negative value (" + format_number(s.y[i], NumberFormat{}) + ")",
                         "show values that can fall below zero as lines, or as side-by-side bars");
    if (s.x != first->x)
      throw InputError(p.series_by.empty() ? p.loc : p.series_by.loc,
                       "stacked areas need every series at every x, but '" + s.name + "' and '" + first->name +
                           "' differ in table '" + t.name + "'",
                       "add the missing rows (a zero where there was nothing), or draw lines instead");
  }
}

std::size_t count_points(const PanelData& d) {
  std::size_t n = 0;
  for (const auto& s : d.series) n += s.x.size();
  return n;
}

std::size_t longest_series(const PanelData& d) {
  std::size_t n = 0;
  for (const auto& s : d.series) n = std::max(n, s.x.size());
  return n;
}

// A transform that leaves nothing would draw an empty chart on a made-up
// axis: refuse it where the transform is written. `longest` is the longest
// series before the transform.
[[noreturn]] void refuse_empty_transform(const PanelSpec& p, const PanelData& d, std::size_t longest) {
  const std::string panel = d.title.empty() ? std::string("the panel") : "panel '" + d.title + "'";
  std::string hint = "check the transform against the rows the panel shows";
  if (p.transform.kind == TransformSpec::Kind::percent_change)
    hint = "the longest series has " + std::to_string(longest) + (longest == 1 ? " value" : " values") +
           ", so the lag can be at most " + std::to_string(longest > 0 ? longest - 1 : 0);
  throw InputError(p.transform.loc, "the transform leaves " + panel + " with no value to show", hint);
}

PanelData build_panel(const PanelSpec& p, const Table& t, const std::vector<std::size_t>& rows,
                      std::string title) {
  if (p.x.empty()) throw InputError(p.loc, "panel has no 'x' column", "name the column for the horizontal position");
  if (p.y.empty()) throw InputError(p.loc, "panel has no 'y' column", "name the column for the vertical position");
  const Column& xc = find_column(t, p.x, "x");
  const Column& yc = find_column(t, p.y, "y");
  const Column* sc = p.series_by.empty() ? nullptr : &find_column(t, p.series_by, "series-by");
  const Column* names = p.label_points_by.empty() ? nullptr : &find_column(t, p.label_points_by, "label-points-by");
  const Column* ranks = p.label_priority.empty() ? nullptr : &find_column(t, p.label_priority, "label-priority");
  if (names && p.kind != ChartKind::dot)
    throw InputError(p.label_points_by.loc, "'label-points-by' names the points of dot panels only",
                     "use 'kind: dot', or name lines and bars with 'series-by'");
  if (ranks && ranks->type != ColumnType::number)
    throw InputError(p.label_priority.loc, "column '" + ranks->name + "' holds text, but 'label-priority' needs numbers",
                     "higher numbers are named first; declare its type under the table's 'types' if it was misread");

  PanelData d;
  d.spec = &p;
  d.kind = p.kind;
  d.title = std::move(title);
  d.table = t.name;
  const bool xcat = x_is_category(p, xc), ycat = y_is_category(p, yc);
  d.x_kind = xcat ? AxisKind::category : kind_of(xc);
  d.y_kind = ycat ? AxisKind::category : kind_of(yc);
  d.x_dates = xc.date_precision;
  if (d.x_kind == AxisKind::category && d.y_kind == AxisKind::category)
    throw InputError(p.y.loc, "both axes of this panel would be categories",
                     "one of 'x' and 'y' must be a number column");
  const Column& value_col = d.y_kind == AxisKind::category ? xc : yc;
  const Located& value_name = d.y_kind == AxisKind::category ? p.x : p.y;
  if (value_col.type != ColumnType::number)
    throw InputError(value_name.loc, "column '" + value_col.name + "' holds " +
                                         (value_col.type == ColumnType::date ? "dates" : "text") +
                                         ", but this axis needs numbers",
                     "declare its type under the table's 'types' if it was misread");

  std::map<std::string, std::size_t> cat_index, series_index;
  auto category = [&](const std::string& name) {
    auto [it, fresh] = cat_index.emplace(name, d.categories.size());
    if (fresh) d.categories.push_back(name);
    return static_cast<double>(it->second);
  };
  // Rows of one series usually come together: the last series found is
  // tried first, so a million-row table does not search the map per row.
  const std::string no_name;
  std::vector<MissingCell> missing;
  const std::string* last_name = nullptr;
  std::size_t last_series = 0;
  d.rows.reserve(rows.size());
  // A blank name cannot be placed on an axis or beside a line: drawing it
  // as an unnamed bar or series would hide the damage.
  auto refuse_blank = [&](std::size_t r, const Column& c, const char* what) {
    throw InputError(SourceLoc{t.path, r < t.row_lines.size() ? t.row_lines[r] : 0, 1},
                     "this row has no name in column '" + c.name + "', which names the " + what,
                     "fill the cell in, or leave the row out with 'where'");
  };
  auto blank = [](const std::string& s) { return s.find_first_not_of(" \t") == std::string::npos; };
  for (std::size_t r : rows) {
    const std::string& sname = sc ? sc->text[r] : no_name;
    if (sc && blank(sname)) refuse_blank(r, *sc, "series");
    if (xcat && blank(xc.text[r])) refuse_blank(r, xc, "categories");
    if (ycat && blank(yc.text[r])) refuse_blank(r, yc, "categories");
    if (!last_name || *last_name != sname) {
      auto it = series_index.find(sname);
      if (it == series_index.end()) {
        it = series_index.emplace(sname, d.series.size()).first;
        d.series.push_back(Series{sname, {}, {}});
      }
      last_name = &sname;
      last_series = it->second;
    }
    Series& s = d.series[last_series];
    double x = d.x_kind == AxisKind::category ? category(xc.text[r]) : xc.values[r];
    double y = d.y_kind == AxisKind::category ? category(yc.text[r]) : yc.values[r];
    if (std::isnan(x) || std::isnan(y)) {  // missing cell: a gap, not a zero
      if (ycat) missing.push_back({sname, y, yc.text[r]});
      else missing.push_back({sname, x, xc.text[r]});
      d.gap_rows.push_back(r);
      continue;
    }
    if (names && !names->text[r].empty())
      d.point_names.push_back({last_series, s.x.size(), names->text[r], ranks ? ranks->values[r] : 0,
                               SourceLoc{t.path, r < t.row_lines.size() ? t.row_lines[r] : 0, 1}});
    s.x.push_back(x);
    s.y.push_back(y);
    ++d.rows_used;
    d.rows.push_back(r);
  }
  // Where each category name first appears, so a message about the name
  // (shortened to fit, say) can point at its row.
  if (const Column* cat_col = d.y_kind == AxisKind::category ? &yc : d.x_kind == AxisKind::category ? &xc : nullptr)
    for (std::size_t r : d.rows)
      d.category_rows.try_emplace(cat_col->text[r], SourceLoc{t.path, r < t.row_lines.size() ? t.row_lines[r] : 0, 1});
  // Lines are drawn in x order whatever order the file had (for text
  // categories, their order of first appearance: an ordinal scale).
  if (p.kind == ChartKind::line || p.kind == ChartKind::stacked_area)
    for (auto& s : d.series) {
      if (std::is_sorted(s.x.begin(), s.x.end())) continue;  // the usual case: rows in time order
      std::vector<std::size_t> idx(s.x.size());
      for (std::size_t i = 0; i < idx.size(); ++i) idx[i] = i;
      std::stable_sort(idx.begin(), idx.end(), [&](auto a, auto b) { return s.x[a] < s.x[b]; });
      Series sorted{s.name, {}, {}};
      for (auto i : idx) {
        sorted.x.push_back(s.x[i]);
        sorted.y.push_back(s.y[i]);
      }
      s = std::move(sorted);
    }
  const std::size_t before = count_points(d), longest = longest_series(d);
  d.transform = apply_transform(p.transform, d);
  if (before > 0 && count_points(d) == 0) refuse_empty_transform(p, d, longest);
  d.gap_note = mark_gaps(d, missing, d.title.empty() ? p.y.value : d.title);
  if (p.kind == ChartKind::stacked_area) check_stackable(p, d, t);
  rank_priorities(d.point_names);
  return d;
}

std::vector<std::size_t> filter_rows(const PanelSpec& p, const Table& t) {
  std::vector<const Column*> cols;
  for (const auto& [name, value] : p.where) cols.push_back(&find_column(t, name, "a row filter"));
  std::vector<std::size_t> rows;
  for (std::size_t r = 0; r < t.rows; ++r) {
    bool keep = true;
    for (std::size_t i = 0; i < cols.size() && keep; ++i) keep = cols[i]->text[r] == p.where[i].second.value;
    if (keep) rows.push_back(r);
  }
  return rows;
}

// Says which row filter left a panel empty, at the value written: the first
// that no row matches on its own, else the filters together.
void refuse_empty_filter(const PanelSpec& p, const Table& t, const std::string& panel_name, DiagnosticSink& warnings) {
  for (const auto& [name, value] : p.where) {
    const Column& c = find_column(t, name, "a row filter");
    if (std::find(c.text.begin(), c.text.end(), value.value) != c.text.end()) continue;
    std::string hint = "the column's values run ";
    if (t.rows == 0) hint = "the table has no rows";
    else hint += "from '" + *std::min_element(c.text.begin(), c.text.end()) + "' to '" +
                 *std::max_element(c.text.begin(), c.text.end()) + "'";
    warnings.report({Severity::error, value.loc,
                  "no row of table '" + t.name + "' has " + name.value + " = '" + value.value + "', so " + panel_name +
                      " is empty",
                  hint});
    return;
  }
  warnings.report({Severity::error, p.where.front().second.loc,
                   "no row of table '" + t.name + "' matches all of the panel's 'where' filters, so " + panel_name +
                       " is empty",
                   "each filter matches some rows on its own; check that they can hold together"});
}

// Panels of one grid are read against one scale, so a category axis lists
// the same categories in the same order in every panel.
// Only panels showing the same columns with the same kind are shared.
void share_categories(std::vector<PanelData>& panels) {
  auto key = [](const PanelData& p) {
    return std::to_string(static_cast<int>(p.kind)) + '\x1f' + p.spec->x.value + '\x1f' + p.spec->y.value;
  };
  std::map<std::string, std::vector<std::string>> all;
  std::map<std::string, std::map<std::string, std::size_t>> index;
  for (const auto& d : panels)
    for (const auto& c : d.categories)
      if (index[key(d)].emplace(c, all[key(d)].size()).second) all[key(d)].push_back(c);
  for (auto& d : panels) {
    if (d.categories.empty()) continue;
    auto& idx = index[key(d)];
    for (auto& s : d.series) {
      auto& v = d.x_kind == AxisKind::category ? s.x : s.y;
      for (auto& c : v) c = static_cast<double>(idx[d.categories[static_cast<std::size_t>(c)]]);
    }
    d.categories = all[key(d)];
  }
}

}  // namespace

std::vector<PanelData> select_series(const PageSpec& page, const std::vector<Table>& tables,
                                     DiagnosticSink& warnings, const Limits& limits) {
  std::vector<PanelData> out;
  if (!page.grid.one_panel_per.empty()) {
    const PanelSpec& tmpl = page.panels.front();
    const Table& t = find_table(page, tables, tmpl);
    const Column& by = find_column(t, page.grid.one_panel_per, "one-panel-per");
    std::vector<std::size_t> rows = filter_rows(tmpl, t);
    std::vector<std::string> values;
    std::map<std::string, std::vector<std::size_t>> groups;
    for (std::size_t r : rows) {
      auto [it, fresh] = groups.try_emplace(by.text[r]);
      if (fresh) values.push_back(by.text[r]);
      it->second.push_back(r);
    }
    if (!page.grid.order.empty()) {
      for (const auto& v : page.grid.order)
        if (!groups.count(v))
          throw InputError(page.grid.loc, "grid order names '" + v + "', which is not a value of column '" + by.name + "'");
      std::vector<std::string> rest;
      for (const auto& v : values)
        if (std::find(page.grid.order.begin(), page.grid.order.end(), v) == page.grid.order.end()) rest.push_back(v);
      values = page.grid.order;
      values.insert(values.end(), rest.begin(), rest.end());
    }
    for (const auto& v : values) out.push_back(build_panel(tmpl, t, groups[v], v));
  } else {
    for (const auto& p : page.panels) {
      const Table& t = find_table(page, tables, p);
      out.push_back(build_panel(p, t, filter_rows(p, t), p.title));
    }
  }
  share_categories(out);
  for (const PanelData& d : out)
    for (const auto& series : d.series)
      if (series.x.size() > limits.points_per_series)
        throw InputError(d.spec->y.loc,
                         "series '" + (series.name.empty() ? d.spec->y.value : series.name) + "' has " +
                             std::to_string(series.x.size()) +
                             " points, more than the " + std::to_string(limits.points_per_series) +
                             " one series may hold",
                         "aggregate or filter the rows first, or raise the limit with "
                         "'--limit points-per-series=N'");
  for (std::size_t i = 0; i < out.size(); ++i) {
    const PanelData& d = out[i];
    if (d.rows_used > 0) continue;
    const std::string name = d.title.empty() ? "panel " + std::to_string(i + 1) : "panel '" + d.title + "'";
    if (!d.spec->where.empty()) refuse_empty_filter(*d.spec, find_table(page, tables, *d.spec), name, warnings);
    else
      warnings.report({Severity::error, d.spec->y.loc,
                       "column '" + d.spec->y.value + "' has no value in any row " + name + " shows, so it is empty",
                       "fill in the cells, or leave the panel out"});
  }
  // Gaps are said on the page and by `check`, panel by panel.
  for (PanelData& d : out) {
    if (d.gap_note.empty()) continue;
    if (out.size() > 1 && !d.title.empty() && d.gap_note.find("for " + d.title + " ") == std::string::npos)
      d.gap_note = d.title + ": n" + d.gap_note.substr(1);
    std::string said = d.gap_note.substr(0, d.gap_note.size() - 1);
    if (said.rfind("No data", 0) == 0) said[0] = 'n';
    warnings.report({Severity::note, d.spec->y.loc, said,
                     d.kind == ChartKind::line ? "the line breaks at each gap; a value standing alone is a dot"
                                               : "the gaps are left empty"});
  }
  if (out.empty()) throw InputError(page.grid.one_panel_per.loc, "no panels: the table has no rows to split");
  return out;
}

}  // namespace forme
