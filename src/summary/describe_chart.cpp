#include "summary/describe_chart.h"

#include <algorithm>
#include <cmath>
#include <set>
#include <sstream>

namespace forme {

namespace {

const char* kind_name(ChartKind k) {
  switch (k) {
    case ChartKind::line: return "Line chart";
    case ChartKind::vertical_bar: return "Vertical bar chart";
    case ChartKind::horizontal_bar: return "Horizontal bar chart";
    case ChartKind::dot: return "Dot chart";
    case ChartKind::stacked_bar: return "Stacked bar chart";
    case ChartKind::stacked_area: return "Stacked area chart";
  }
  return "Chart";
}

std::string number(double v) {
  std::ostringstream o;
  o.precision(std::abs(v) >= 1e6 || (v != 0 && std::abs(v) < 1e-3) ? 3 : 6);
  o << v;
  return o.str();
}

// At most `n` names, then how many more.
std::string list(const std::vector<std::string>& names, std::size_t n = 8) {
  std::string out;
  for (std::size_t i = 0; i < names.size() && i < n; ++i) out += (i ? ", " : "") + names[i];
  if (names.size() > n) out += " and " + std::to_string(names.size() - n) + " more";
  return out;
}

std::string plural(std::size_t n, const std::string& one, const std::string& many) {
  return std::to_string(n) + " " + (n == 1 ? one : many);
}

}  // namespace

std::string describe_chart(const PageSpec& page, std::span<const PanelData> panels,
                           std::span<const PanelAxes> axes) {
  if (panels.empty()) return {};
  std::string out;
  const PanelData& first = panels.front();
  const bool value_on_x = first.y_kind == AxisKind::category;
  auto value_name = [&](std::size_t i) {
    const Axis* a = i < axes.size() ? (value_on_x ? &axes[i].x : &axes[i].y) : nullptr;
    if (a && !a->title.empty()) return a->title;
    const PanelSpec* s = panels[i].spec;
    return s ? (value_on_x ? s->x.value : s->y.value) : std::string("value");
  };
  const PanelSpec* s = first.spec;
  const std::string along = s ? (value_on_x ? s->y.value : s->x.value) : std::string();
  out += std::string(kind_name(first.kind)) + " of " + value_name(0) + (along.empty() ? "" : " by " + along) + ".";

  std::vector<std::string> series;
  std::set<std::string> seen;
  for (const auto& p : panels)
    for (const auto& se : p.series)
      if (!se.name.empty() && seen.insert(se.name).second) series.push_back(se.name);
  if (!series.empty()) out += " " + plural(series.size(), "series", "series") + ": " + list(series) + ".";

  if (panels.size() > 1) {
    out += " " + plural(panels.size(), "panel", "panels");
    if (!page.grid.one_panel_per.empty()) out += ", one per " + page.grid.one_panel_per.value;
    bool own = false;
    for (const auto& a : axes) own = own || a.x.own_scale || a.y.own_scale;
    out += own ? ", each on its own scale." : ", on one shared scale.";
  }
  for (std::size_t i = 0; i < panels.size(); ++i) {
    const PanelData& p = panels[i];
    double lo = INFINITY, hi = -INFINITY;
    for (const auto& se : p.series)
      for (double v : value_on_x ? se.x : se.y) {
        lo = std::min(lo, v);
        hi = std::max(hi, v);
      }
    out += " " + (p.title.empty() ? "Panel " + std::to_string(i + 1) : "Panel '" + p.title + "'") + ": " +
           plural(p.rows_used, "row", "rows");
    if (lo <= hi) out += ", " + value_name(i) + " from " + number(lo) + " to " + number(hi);
    out += ".";
    if (!p.gap_note.empty()) out += " " + p.gap_note;  // the gaps, as the page says them
  }
  return out;
}

}  // namespace forme
