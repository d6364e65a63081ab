#include "series/plotted_rows.h"

#include <algorithm>
#include <set>

namespace forme {

std::string csv_field(std::string_view text) {
  const bool quote = text.find_first_of(",\"\r\n") != std::string_view::npos ||
                     (!text.empty() && (text.front() == ' ' || text.back() == ' '));
  if (!quote) return std::string(text);
  std::string out = "\"";
  for (char c : text) {
    if (c == '"') out += '"';
    out += c;
  }
  return out + '"';
}

namespace {

// Lower-case ASCII letters and digits, other runs as one '-': a name every
// file system and PDF reader accepts.
std::string slug(std::string_view s) {
  std::string out;
  for (unsigned char c : s) {
    if ((c >= 'a' && c <= 'z') || (c >= '0' && c <= '9')) out += static_cast<char>(c);
    else if (c >= 'A' && c <= 'Z') out += static_cast<char>(c - 'A' + 'a');
    else if (!out.empty() && out.back() != '-') out += '-';
  }
  while (!out.empty() && out.back() == '-') out.pop_back();
  return out.substr(0, 60);
}

std::vector<const Column*> columns_read(const PageSpec& page, const PanelData& d, const Table& t) {
  std::set<std::string> names;
  const PanelSpec& p = *d.spec;
  for (const auto& [col, value] : p.where) names.insert(col.value);
  if (!page.grid.one_panel_per.empty()) names.insert(page.grid.one_panel_per.value);
  for (const Located* l : {&p.series_by, &p.x, &p.y})
    if (!l->empty()) names.insert(l->value);
  std::vector<const Column*> cols;
  for (const auto& c : t.columns)
    if (names.count(c.name)) cols.push_back(&c);
  return cols;
}

}  // namespace

std::vector<PlottedRows> plotted_rows(const PageSpec& page, const std::vector<PanelData>& panels,
                                      const std::vector<Table>& tables) {
  std::vector<PlottedRows> out;
  std::set<std::string> used;
  for (std::size_t i = 0; i < panels.size(); ++i) {
    const PanelData& d = panels[i];
    auto t = std::find_if(tables.begin(), tables.end(), [&](const Table& x) { return x.name == d.table; });
    if (t == tables.end() || !d.spec) continue;
    PlottedRows r;
    const std::string panel = d.title.empty() ? "panel " + std::to_string(i + 1) : "panel '" + d.title + "'";
    r.description = "Rows of table '" + t->name + "' plotted in " + panel;
    std::string stem = slug(t->name);
    const std::string tail = slug(d.title.empty() ? "panel " + std::to_string(i + 1) : d.title);
    if (!tail.empty()) stem += (stem.empty() ? "" : "-") + tail;
    if (stem.empty()) stem = "panel-" + std::to_string(i + 1);
    r.file_name = stem + ".csv";
    for (int n = 2; !used.insert(r.file_name).second; ++n) r.file_name = stem + "-" + std::to_string(n) + ".csv";

    const auto cols = columns_read(page, d, *t);
    auto line = [&](const std::vector<std::string>& fields) {
      for (std::size_t k = 0; k < fields.size(); ++k) r.csv += (k ? "," : "") + csv_field(fields[k]);
      r.csv += "\r\n";  // RFC 4180 §2 rule 1: records end in CRLF
    };
    for (const Column* c : cols) {
      r.columns.push_back(c->name);
      r.numeric.push_back(c->type == ColumnType::number);
    }
    line(r.columns);
    // Rows with a gap are listed too, their missing cells as written.
    std::vector<std::size_t> rows = d.rows;
    rows.insert(rows.end(), d.gap_rows.begin(), d.gap_rows.end());
    std::sort(rows.begin(), rows.end());
    for (std::size_t row : rows) {
      std::vector<std::string> cells;
      for (const Column* c : cols) cells.push_back(c->text[row]);
      line(cells);
      r.cells.push_back(std::move(cells));
    }
    out.push_back(std::move(r));
  }
  return out;
}

}  // namespace forme
