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

namespace {

// Which axis carries the values: the other one when an axis holds
// categories (bars, dots), else the vertical one.
bool values_on_x(const PanelData& p) { return p.y_kind == AxisKind::category && p.x_kind != AxisKind::category; }

bool same_domain(const Axis& a, const Axis& b) {
  if (!a.categories.empty() || !b.categories.empty()) return a.categories == b.categories;
  const double tol = 1e-9 * std::max({1.0, std::abs(a.lo), std::abs(a.hi)});
  return std::abs(a.lo - b.lo) <= tol && std::abs(a.hi - b.hi) <= tol;
}

// Whether the panels share their scales, said as the axes were resolved.
std::string scales_sentence(std::span<const PanelAxes> axes) {
  bool x_shared = true, y_shared = true;
  for (const auto& a : axes) {
    x_shared = x_shared && same_domain(a.x, axes.front().x);
    y_shared = y_shared && same_domain(a.y, axes.front().y);
  }
  if (x_shared && y_shared) return ", on one shared scale.";
  if (!x_shared && !y_shared) return ", each on its own scales.";
  return x_shared ? ", sharing the horizontal scale, each with its own vertical scale."
                  : ", sharing the vertical scale, each with its own horizontal scale.";
}

}  // namespace

std::string describe_chart(const PageSpec& page, std::span<const PanelData> panels,
                           std::span<const PanelAxes> axes) {
  if (panels.empty()) return {};
  std::string out;
  const PanelData& first = panels.front();
  auto value_name = [&](std::size_t i) {
    const bool on_x = values_on_x(panels[i]);
    const Axis* a = i < axes.size() ? (on_x ? &axes[i].x : &axes[i].y) : nullptr;
    if (a && !a->title.empty()) return a->title;
    const PanelSpec* s = panels[i].spec;
    return s ? (on_x ? s->x.value : s->y.value) : std::string("value");
  };
  const PanelSpec* s = first.spec;
  const std::string along = s ? (values_on_x(first) ? s->y.value : s->x.value) : std::string();
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
    out += axes.size() == panels.size() ? scales_sentence(axes) : ".";
  }
  for (std::size_t i = 0; i < panels.size(); ++i) {
    const PanelData& p = panels[i];
    const bool on_x = values_on_x(p);
    double lo = INFINITY, hi = -INFINITY;
    for (const auto& se : p.series)
      for (double v : on_x ? se.x : se.y) {
        if (!std::isfinite(v)) continue;  // a gap holds no value
        lo = std::min(lo, v);
        hi = std::max(hi, v);
      }
    out += " " + (p.title.empty() ? "Panel " + std::to_string(i + 1) : "Panel '" + p.title + "'") + ": " +
           plural(p.rows_used, "row", "rows");
    // Categories are named as categories, never as numbers.
    const AxisKind along_kind = on_x ? p.y_kind : p.x_kind;
    if (along_kind == AxisKind::category && !p.categories.empty()) {
      const std::string name = p.spec ? (on_x ? p.spec->y.value : p.spec->x.value) : std::string("category");
      out += ", " + plural(p.categories.size(), name + " category", name + " categories");
      if (p.categories.size() > 1) out += ", from " + p.categories.front() + " to " + p.categories.back();
      else out += ", " + p.categories.front();
    }
    if (lo <= hi) out += ", " + value_name(i) + " from " + number(lo) + " to " + number(hi);
    out += ".";
    if (!p.gap_note.empty()) out += " " + p.gap_note;  // the gaps, as the page says them
  }
  return out;
}

}  // namespace forme
