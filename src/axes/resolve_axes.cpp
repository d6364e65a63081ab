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
  if (!fmt || fmt->decimals < 0) {
    // Enough decimals to tell every tick apart, counted in the printed unit:
    // a fraction printed as a percent needs two fewer; SI prefixes choose
    // their own (shortest exact) digits.
    switch (a.format.style) {
      case NumberFormat::Style::fraction_percent: a.format.decimals = std::max(0, t.decimals - 2); break;
      case NumberFormat::Style::si: a.format.decimals = -1; break;
      default: a.format.decimals = std::max(0, t.decimals); break;
    }
  }
  a.lo = std::min(e.lo, t.values.empty() ? e.lo : t.values.front());
  a.hi = std::max(e.hi, t.values.empty() ? e.hi : t.values.back());
  for (double v : t.values) a.ticks.push_back({v, format_number(v, a.format), false});
  return a;
}

Axis date_axis(Extent e, DatePrecision precision, double pad) {
  Axis a;
  a.kind = AxisKind::date;
  a.dates = precision;
  if (e.empty()) e = {0, 365};
  if (e.hi <= e.lo) e = {e.lo - 15, e.hi + 15};
  a.lo = e.lo - pad;
  a.hi = e.hi + pad;
  DateTicks dt = date_ticks(e.lo, e.hi, kWantedTicks + 1);
  for (const auto& t : dt.ticks)
    if (t.day >= a.lo - 1e-9 && t.day <= a.hi + 1e-9) a.ticks.push_back({t.day, t.label, t.major});
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

}  // namespace

double smallest_step(const std::vector<const PanelData*>& panels) {
  double step = std::numeric_limits<double>::infinity();
  for (const PanelData* p : panels)
    for (const auto& s : p->series) {
      std::vector<double> xs = s.x;
      std::sort(xs.begin(), xs.end());
      for (std::size_t i = 1; i < xs.size(); ++i)
        if (xs[i] > xs[i - 1]) step = std::min(step, xs[i] - xs[i - 1]);
    }
  return std::isfinite(step) ? step : 1.0;
}

namespace {

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
  // Bars on a date axis are one period wide: leave half a period of room
  // beyond the first and last so the outer bars are not cut in half.
  const double date_pad = bars(first.kind) ? smallest_step(panels) / 2 : 0;
  auto make = [&](AxisKind kind, const Extent& e, bool zero, const AxisSpec& as, DatePrecision dp) {
    Axis a = kind == AxisKind::category ? category_axis(first.categories)
             : kind == AxisKind::date   ? date_axis(e, dp, date_pad)
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
