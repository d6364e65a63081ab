#include <algorithm>
#include <charconv>
#include <cmath>
#include <limits>
#include <map>
#include <string_view>

#include "axes/axis.h"
#include "data/dates.h"
#include "scale/date_ticks.h"
#include "scale/log_labels.h"
#include "scale/power_of_ten.h"
#include "scale/scale.h"
#include "scale/ticks.h"

namespace forme {

std::string axis_title(const std::string& title, const std::string& unit) {
  if (title.empty()) return unit;
  if (unit.empty()) return title;
  const std::string said = "(" + unit + ")";
  if (title.size() >= said.size() && title.compare(title.size() - said.size(), said.size(), said) == 0) return title;
  return title + " (" + unit + ")";
}

std::string scale_title(const std::string& title, bool log) {
  if (!log) return title;
  constexpr std::string_view kSaid = "log scale";
  if (title.empty()) return "Log scale";
  if (title.find(kSaid) != std::string::npos || title.find("Log scale") != std::string::npos) return title;
  // A title wholly in parentheses is a unit alone: drop them.
  if (title.front() == '(' && title.back() == ')' && title.find(')') == title.size() - 1)
    return title.substr(1, title.size() - 2) + ", log scale";
  if (title.back() == ')') return title.substr(0, title.size() - 1) + ", log scale)";
  return title + ", log scale";
}

std::string value_title(const PanelData& p, const AxisSpec& a) {
  const TransformStatement& t = p.transform;
  if (t.axis_title.empty()) return axis_title(a.title, a.unit);
  return t.keeps_unit ? axis_title(t.axis_title, a.unit) : t.axis_title;
}

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

constexpr int kWantedTicks = 5;
// Powers of ten label briefly (10⁻⁴), so a log axis carries one more.
constexpr int kWantedLogTicks = kWantedTicks + 1;

struct Extent {
  double lo = std::numeric_limits<double>::infinity();
  double hi = -std::numeric_limits<double>::infinity();
  void add(double v) {
    lo = std::min(lo, v);
    hi = std::max(hi, v);
  }
  bool empty() const { return lo > hi; }
};

bool bars(ChartKind k) {
  return k == ChartKind::vertical_bar || k == ChartKind::horizontal_bar || k == ChartKind::stacked_bar;
}

// A stack reaches the sum of its positive segments above zero and of its
// negative ones below.
void add_stack_ends(const PanelData& p, Extent& e) {
  std::map<double, std::pair<double, double>> ends;
  for (const auto& s : p.series)
    for (std::size_t i = 0; i < s.x.size(); ++i) (s.y[i] >= 0 ? ends[s.x[i]].first : ends[s.x[i]].second) += s.y[i];
  for (const auto& [x, ud] : ends) e.add(ud.first), e.add(ud.second);
}

// A value the author wrote for an axis end, in the axis's units.
double author_value(const Located& v, AxisKind kind) {
  if (kind == AxisKind::date) {
    if (auto d = parse_date(v.value)) return d->day;
    throw InputError(v.loc, "'" + v.value + "' is not a date", "write YYYY, YYYY-MM or YYYY-MM-DD");
  }
  double out = 0;
  auto [end, ec] = std::from_chars(v.value.data(), v.value.data() + v.value.size(), out);
  if (ec != std::errc() || end != v.value.data() + v.value.size() || !std::isfinite(out))
    throw InputError(v.loc, "'" + v.value + "' is not a number");
  return out;
}

void finish_number_format(Axis& a, const std::optional<NumberFormat>& fmt, int tick_decimals) {
  a.format = fmt.value_or(NumberFormat{});
  if (fmt && fmt->decimals >= 0) return;
  // Enough decimals to tell every tick apart, counted in the printed unit:
  // a fraction printed as a percent needs two fewer; SI prefixes choose
  // their own (shortest exact) digits.
  switch (a.format.style) {
    case NumberFormat::Style::fraction_percent: a.format.decimals = std::max(0, tick_decimals - 2); break;
    case NumberFormat::Style::si: a.format.decimals = -1; break;
    default: a.format.decimals = std::max(0, tick_decimals); break;
  }
}

// Values beside marks take the axis's style but not its tick decimals:
// those follow the step, the values follow the data (value_format).
NumberFormat values_format(const NumberFormat& ticks, int author_decimals) {
  NumberFormat v = ticks;
  v.decimals = author_decimals;
  v.significant = 0;
  v.own_power = false;
  return v;
}

// Labels the ticks of a linear number axis. Ticks a step apart always
// print apart; should rounding still merge two (a step finer than the
// decimals the author allowed is not the author's wish either), the
// labels get more decimals until they do not.
void label_linear_ticks(Axis& a, const Ticks& t, std::optional<NumberFormat> format) {
  const int author_decimals = format ? format->decimals : -1;
  const bool asked_power = format && format->style == NumberFormat::Style::power_of_ten;
  if ((!format || asked_power) && t.values.size() >= 2) {
    // Very large or very small values are written against a power of ten
    // (that of the largest tick), as is any axis whose author asks for it.
    double largest = 0;
    for (double v : t.values) largest = std::max(largest, std::abs(v));
    NumberFormat automatic = automatic_format(largest, t.values[1] - t.values[0], asked_power);
    if (asked_power) {
      format->exponent = automatic.exponent;
      if (format->decimals < 0) format->decimals = automatic.decimals;
    } else if (automatic.style != NumberFormat::Style::plain) {
      format = automatic;
    }
  }
  finish_number_format(a, format, t.decimals);
  a.values = values_format(a.format, author_decimals);
  for (int more = 0;; ++more) {
    a.ticks.clear();
    for (double v : t.values) a.ticks.push_back({v, format_number(v, a.format), false});
    bool apart = true;
    for (std::size_t i = 1; i < a.ticks.size() && apart; ++i) apart = a.ticks[i].label != a.ticks[i - 1].label;
    if (apart || a.format.decimals < 0 || more >= 17) break;
    ++a.format.decimals;
  }
}

// Nice ticks, even for data near the largest double: such an extent (whose
// span may not even be a finite double) is ticked after scaling it down by
// its power of ten, and the ticks scaled back up; ticks beyond the largest
// double are dropped, so the axis then ends at the data.
Ticks ticks_within_doubles(Extent e) {
  const double magnitude = std::min(std::max(std::abs(e.lo), std::abs(e.hi)), std::numeric_limits<double>::max());
  if (magnitude < 1e300 && std::isfinite(e.hi - e.lo)) return extended_ticks(e.lo, e.hi, kWantedTicks, false);
  const int power = static_cast<int>(std::floor(std::log10(magnitude)));
  Ticks t = extended_ticks(times_power_of_ten(e.lo, -power), times_power_of_ten(e.hi, -power), kWantedTicks, false);
  for (double& v : t.values) v = times_power_of_ten(v, power);
  t.step = times_power_of_ten(t.step, power);
  std::erase_if(t.values, [](double v) { return !std::isfinite(v); });
  return t;
}

Axis number_axis(Extent e, bool from_zero, const AxisSpec& spec) {
  Axis a;
  a.kind = AxisKind::number;
  if (e.empty()) e = {0, 1};
  if (from_zero) {
    e.lo = std::min(e.lo, 0.0);
    e.hi = std::max(e.hi, 0.0);
  }
  if (e.hi - e.lo <= 0) {
    // One value (or all equal): give the axis room around it.
    // Held within the doubles: a lone -1.7e308 padded by a tenth would be -inf.
    const double pad = e.lo == 0 ? 1 : std::abs(e.lo) * 0.1;
    const double most = std::numeric_limits<double>::max();
    e = {from_zero && e.lo >= 0 ? 0 : std::max(e.lo - pad, -most), std::min(e.hi + pad, most)};
  }
  const Ticks t = ticks_within_doubles(e);
  label_linear_ticks(a, t, spec.format);
  a.lo = std::min(e.lo, t.values.empty() ? e.lo : t.values.front());
  a.hi = std::max(e.hi, t.values.empty() ? e.hi : t.values.back());
  return a;
}

void label_log_ticks(Axis& a, const std::vector<double>& ticks, const std::optional<NumberFormat>& asked) {
  a.format = asked.value_or(NumberFormat{});
  a.format.decimals = -1;
  a.values = values_format(a.format, asked ? asked->decimals : -1);
  // Values beside marks on an axis read in powers are written in powers too
  // (6.4×10⁶, not 6,400,000 beside 10⁶).
  if (log_labels_in_powers(ticks, asked)) a.values.style = NumberFormat::Style::power_of_ten;
  a.ticks.clear();
  const std::vector<std::string> labels = log_tick_labels(ticks, asked);
  for (std::size_t i = 0; i < ticks.size(); ++i) a.ticks.push_back({ticks[i], labels[i], false});
  a.minor = log_minor_ticks(a.lo, a.hi, ticks);
}

Axis log_axis(Extent e, const AxisSpec& spec) {
  Axis a;
  a.kind = AxisKind::number;
  a.log = true;
  LogScale s{e.lo, e.hi, 0, 1};
  std::vector<double> ticks = s.ticks(kWantedLogTicks);
  if (!ticks.empty()) {
    a.lo = std::min(e.lo, ticks.front());
    a.hi = std::max(e.hi, ticks.back());
  } else {
    a.lo = e.lo;
    a.hi = e.hi;
  }
  if (a.hi <= a.lo) a.hi = a.lo * 10;
  label_log_ticks(a, ticks, spec.format);
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
  DateTicks dt = date_ticks(a.lo, a.hi, kWantedTicks + 1);
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

// Builds one axis (x or y) over a set of panels that share it.
Axis build_axis(const std::vector<const PanelData*>& panels, bool is_x, DiagnosticSink& sink) {
  const PanelData& first = *panels.front();
  const PanelSpec& spec = *first.spec;
  const AxisSpec& as = is_x ? spec.x_axis : spec.y_axis;
  const AxisKind kind = is_x ? first.x_kind : first.y_kind;
  if (kind == AxisKind::category) {
    Axis a = category_axis(first.categories);
    a.title = axis_title(as.title, as.unit);
    return a;
  }
  Extent e;
  bool from_zero = false;
  for (const PanelData* p : panels) {
    for (const auto& s : p->series)
      for (double v : is_x ? s.x : s.y) e.add(v);
    if ((p->kind == ChartKind::stacked_bar || p->kind == ChartKind::stacked_area) && !is_x) add_stack_ends(*p, e);
    // A band's depth encodes its value, so stacked areas stand on zero too.
    if (p->kind == ChartKind::stacked_area && !is_x) from_zero = true;
    // Bar length encodes the value, so the value axis of bars shows zero.
    const bool value_axis = is_x ? p->y_kind == AxisKind::category : p->x_kind == AxisKind::category ||
                                                                        p->x_kind == AxisKind::date;
    if (bars(p->kind) && value_axis) from_zero = true;
    for (const auto& r : p->spec->references)
      if (!is_x && r.y) e.add(*r.y);
  }
  // Refusals are reported and the axis carries on honestly (from zero,
  // linear), so one check run lists every problem on the page.
  if (!as.min.empty()) {
    const double v = author_value(as.min, kind);
    if (from_zero && v > 0)
      sink.report({Severity::error, as.min.loc, "bars must start at zero, so the axis cannot begin at " + as.min.value,
                   "a bar's length stands for its value; a cut axis makes small differences look large. "
                   "Use a line or dot panel to show values far from zero"});
    else
      e.add(v);
  }
  if (!as.max.empty()) {
    const double v = author_value(as.max, kind);
    if (from_zero && v < 0)
      sink.report({Severity::error, as.max.loc, "bars must reach zero, so the axis cannot end at " + as.max.value,
                   "a bar's length stands for its value; use a line or dot panel instead"});
    else
      e.add(v);
  }
  Axis a;
  if (kind == AxisKind::date) {
    a = date_axis(e, first.x_dates, bars(first.kind) ? smallest_step(panels) / 2 : 0);
  } else if (as.log && from_zero) {
    sink.report({Severity::error, as.scale_loc, "bars cannot stand on a logarithmic scale, which has no zero",
                 "use a dot or line panel for a log scale"});
    a = number_axis(e, from_zero, as);
  } else if (as.log && (e.empty() || e.lo <= 0)) {
    sink.report({Severity::error, as.scale_loc,
                 "a logarithmic scale needs strictly positive data, and this axis has values ≤ 0",
                 "use a linear scale, or transform the data first"});
    a = number_axis(e, from_zero, as);
  } else if (as.log) {
    a = log_axis(e, as);
  } else {
    a = number_axis(e, from_zero, as);
  }
  a.title = scale_title(is_x ? axis_title(as.title, as.unit) : value_title(first, as), a.log);
  return a;
}

}  // namespace

Axis with_at_most_ticks(const Axis& axis, int most) {
  most = std::max(most, 2);
  if (axis.kind != AxisKind::number || static_cast<int>(axis.ticks.size()) <= most) return axis;
  Axis a = axis;
  const std::optional<NumberFormat> asked = axis.values;  // the style the axis was given or chose
  if (axis.log) {
    for (int m = most; m >= 2; --m) {
      const std::vector<double> ticks = LogScale{axis.lo, axis.hi, 0, 1}.ticks(m);
      if (static_cast<int>(ticks.size()) <= most || m == 2) {
        label_log_ticks(a, ticks, asked);
        break;
      }
    }
    return a;
  }
  for (int m = most; m >= 2; --m) {
    Ticks t = extended_ticks(axis.lo, axis.hi, m);
    std::erase_if(t.values, [&](double v) { return v < axis.lo - 1e-9 * std::abs(t.step) || v > axis.hi + 1e-9 * std::abs(t.step); });
    if (static_cast<int>(t.values.size()) <= most && t.values.size() >= 2) {
      label_linear_ticks(a, t, asked);
      return a;
    }
  }
  return axis;
}

std::vector<PanelAxes> resolve_axes(const std::vector<PanelData>& panels, const GridSpec& grid, DiagnosticSink& sink) {
  // Panels share a scale when they show the same columns with the same
  // chart kind; a page mixing, say, a line and a bar panel has two scales.
  auto key = [](const PanelData& p) {
    return std::to_string(static_cast<int>(p.kind)) + '\x1f' + p.spec->x.value + '\x1f' + p.spec->y.value + '\x1f' +
           std::to_string(static_cast<int>(p.x_kind)) + std::to_string(static_cast<int>(p.y_kind));
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
    const Axis shared_x = build_axis(group, true, sink), shared_y = build_axis(group, false, sink);
    for (std::size_t j : members) {
      std::vector<const PanelData*> one{&panels[j]};
      const bool own_x = grid.free_x && group.size() > 1 && panels[j].x_kind != AxisKind::category;
      const bool own_y = grid.free_y && group.size() > 1 && panels[j].y_kind != AxisKind::category;
      DiagnosticSink repeat;  // a panel's own axis repeats what the shared one reported
      out[j].x = own_x ? build_axis(one, true, repeat) : shared_x;
      out[j].y = own_y ? build_axis(one, false, repeat) : shared_y;
      out[j].x.own_scale = own_x;
      out[j].y.own_scale = own_y;
      // Explicit panel lists may title their axes differently.
      out[j].x.title = scale_title(axis_title(panels[j].spec->x_axis.title, panels[j].spec->x_axis.unit), out[j].x.log);
      out[j].y.title = scale_title(value_title(panels[j], panels[j].spec->y_axis), out[j].y.log);
    }
  }
  return out;
}

}  // namespace forme
