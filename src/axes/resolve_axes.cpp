#include <algorithm>
#include <cmath>
#include <limits>

#include "axes/axis.h"
#include "scale/date_ticks.h"
#include "scale/ticks.h"

namespace forme {

std::string axis_title(const std::string& title, const std::string& unit) {
  if (title.empty()) return unit;
  if (unit.empty()) return title;
  return title + " (" + unit + ")";
}

namespace {

constexpr int kWantedTicks = 5;

struct Extent {
  double lo = std::numeric_limits<double>::infinity();
  double hi = -std::numeric_limits<double>::infinity();
  void add(double v) {
    lo = std::min(lo, v);
    hi = std::max(hi, v);
  }
  bool empty() const { return lo > hi; }
};

Axis number_axis(Extent e, bool from_zero, const std::optional<NumberFormat>& fmt) {
  Axis a;
  a.kind = AxisKind::number;
  if (e.empty()) e = {0, 1};
  if (from_zero) {
    e.lo = std::min(e.lo, 0.0);
    e.hi = std::max(e.hi, 0.0);
  }
  if (e.hi - e.lo <= 0) {
    // One value (or all equal): give the axis a unit of room around it.
    double pad = e.lo == 0 ? 1 : std::abs(e.lo) * 0.1;
    e = {from_zero && e.lo >= 0 ? 0 : e.lo - pad, e.hi + pad};
  }
  Ticks t = extended_ticks(e.lo, e.hi, kWantedTicks, false);
  a.format = fmt.value_or(NumberFormat{});
  if (!fmt || fmt->decimals < 0) a.format.decimals = std::max(0, t.decimals);
  a.lo = std::min(e.lo, t.values.empty() ? e.lo : t.values.front());
  a.hi = std::max(e.hi, t.values.empty() ? e.hi : t.values.back());
  for (double v : t.values) a.ticks.push_back({v, format_number(v, a.format), false});
  return a;
}

Axis date_axis(Extent e, DatePrecision precision) {
  Axis a;
  a.kind = AxisKind::date;
  a.dates = precision;
  if (e.empty()) e = {0, 365};
  if (e.hi <= e.lo) e = {e.lo - 15, e.hi + 15};
  a.lo = e.lo;
  a.hi = e.hi;
  DateTicks dt = date_ticks(e.lo, e.hi, kWantedTicks + 1);
  for (const auto& t : dt.ticks)
    if (t.day >= e.lo - 1e-9 && t.day <= e.hi + 1e-9) a.ticks.push_back({t.day, t.label, t.major});
  return a;
}

Axis category_axis(const std::vector<std::string>& cats) {
  Axis a;
  a.kind = AxisKind::category;
  a.categories = cats;
  a.lo = -0.5;
  a.hi = static_cast<double>(cats.size()) - 0.5;
  for (std::size_t i = 0; i < cats.size(); ++i) a.ticks.push_back({static_cast<double>(i), cats[i], false});
  return a;
}

bool bars(ChartKind k) { return k == ChartKind::vertical_bar || k == ChartKind::horizontal_bar; }

// Axes for panels that show the same measure in the same way.
PanelAxes shared_axes(const std::vector<const PanelData*>& panels) {
  Extent ex, ey;
  bool x_zero = false, y_zero = false;
  for (const PanelData* p : panels) {
    for (const auto& s : p->series) {
      for (double v : s.x) ex.add(v);
      for (double v : s.y) ey.add(v);
    }
    if (bars(p->kind)) (p->x_kind == AxisKind::category ? y_zero : x_zero) = true;
  }
  const PanelData& first = *panels.front();
  const PanelSpec& spec = *first.spec;
  auto make = [&](AxisKind kind, const Extent& e, bool zero, const AxisSpec& as, DatePrecision dp) {
    Axis a = kind == AxisKind::category ? category_axis(first.categories)
             : kind == AxisKind::date   ? date_axis(e, dp)
                                        : number_axis(e, zero, as.format);
    a.title = axis_title(as.title, as.unit);
    return a;
  };
  return {make(first.x_kind, ex, x_zero, spec.x_axis, first.x_dates),
          make(first.y_kind, ey, y_zero, spec.y_axis, DatePrecision::day)};
}

}  // namespace

std::vector<PanelAxes> resolve_axes(const std::vector<PanelData>& panels) {
  // Panels share a scale when they show the same columns with the same
  // chart kind; a page mixing, say, a line and a bar panel has two scales.
  auto key = [](const PanelData& p) {
    return std::to_string(static_cast<int>(p.kind)) + '\x1f' + p.spec->x.value + '\x1f' + p.spec->y.value +
           '\x1f' + std::to_string(static_cast<int>(p.x_kind)) + std::to_string(static_cast<int>(p.y_kind));
  };
  std::vector<PanelAxes> out(panels.size());
  std::vector<bool> done(panels.size(), false);
  for (std::size_t i = 0; i < panels.size(); ++i) {
    if (done[i]) continue;
    std::vector<const PanelData*> group;
    std::vector<std::size_t> members;
    for (std::size_t j = i; j < panels.size(); ++j)
      if (!done[j] && key(panels[j]) == key(panels[i])) {
        group.push_back(&panels[j]);
        members.push_back(j);
        done[j] = true;
      }
    PanelAxes shared = shared_axes(group);
    for (std::size_t j : members) {
      out[j] = shared;
      // Explicit panel lists may title their axes differently.
      out[j].x.title = axis_title(panels[j].spec->x_axis.title, panels[j].spec->x_axis.unit);
      out[j].y.title = axis_title(panels[j].spec->y_axis.title, panels[j].spec->y_axis.unit);
    }
  }
  return out;
}

}  // namespace forme
