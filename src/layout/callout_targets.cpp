#include "layout/callout_targets.h"

#include <algorithm>
#include <cmath>
#include <cstdio>

#include "data/dates.h"
#include "describe/suggest.h"
#include "scale/number_format.h"

namespace forme {

namespace {

double category_index(const Located& v, const std::vector<std::string>& categories) {
  for (std::size_t i = 0; i < categories.size(); ++i)
    if (categories[i] == v.value) return static_cast<double>(i);
  auto near = nearest(v.value, categories);
  std::string some;
  for (std::size_t i = 0; i < categories.size() && i < 8; ++i) some += (i ? ", " : "") + categories[i];
  throw InputError(v.loc, "'" + v.value + "' is not a category of this panel",
                   near ? "did you mean '" + *near + "'?" : "its categories are: " + some);
}

// A value as written, read on an axis of the given kind.
double read_value(const Located& v, const Axis& a) {
  if (a.kind == AxisKind::category) return category_index(v, a.categories);
  if (a.kind == AxisKind::date) {
    if (auto d = parse_date(v.value)) return d->day;
    throw InputError(v.loc, "'" + v.value + "' is not a date", "write YYYY, YYYY-MM or YYYY-MM-DD");
  }
  try {
    std::size_t used = 0;
    const double x = std::stod(v.value, &used);
    if (used == v.value.size() && std::isfinite(x)) return x;
  } catch (const std::exception&) {
  }
  throw InputError(v.loc, "'" + v.value + "' is not a number");
}

struct Extent {
  double lo = INFINITY, hi = -INFINITY;
};

Extent data_extent(const PanelData& d, bool along_x) {
  Extent e;
  for (const auto& s : d.series)
    for (double v : along_x ? s.x : s.y) e.lo = std::min(e.lo, v), e.hi = std::max(e.hi, v);
  return e;
}

std::string shown(double v, const Axis& a) {
  if (a.kind == AxisKind::date) {
    const CivilDate c = civil_from_days(static_cast<long>(std::lround(v)));
    char buf[32];
    std::snprintf(buf, sizeof buf, "%04d-%02d-%02d", c.year, c.month, c.day);
    return buf;
  }
  return format_number(v, a.format);
}

// A number or date target must lie within the data it points into.
double within_data(const Located& v, const Axis& a, const PanelData& d, bool along_x, const char* name) {
  const double x = read_value(v, a);
  if (a.kind == AxisKind::category) return x;
  const Extent e = data_extent(d, along_x);
  if (!(x >= e.lo && x <= e.hi))
    throw InputError(v.loc, std::string(name) + " = " + v.value + " lies outside the data",
                     "the panel's data run from " + shown(e.lo, a) + " to " + shown(e.hi, a));
  return x;
}

}  // namespace

CalloutTarget resolve_callout_target(const CalloutSpec& c, const PanelData& d, const PlotFrame& f) {
  CalloutTarget t;
  switch (c.target) {
    case CalloutSpec::Target::point: {
      const double x = within_data(c.x, f.x, d, true, "x");
      const double y = within_data(c.y, f.y, d, false, "y");
      t.anchor = {f.px(x), f.py(y)};
      break;
    }
    case CalloutSpec::Target::category: {
      const bool on_y = f.y.kind == AxisKind::category;
      if (!on_y && f.x.kind != AxisKind::category)
        throw InputError(c.category.loc, "this panel has no categories to point at",
                         "point at a value with 'x' and 'y', or at a stretch with 'from' and 'to'");
      const double k = category_index(c.category, on_y ? f.y.categories : f.x.categories);
      // The end of the longest bar (or farthest dot) in that category; for
      // a stack, the top of its positive part (or the foot of a negative one).
      double end = 0, up = 0, down = 0;
      for (const auto& s : d.series)
        for (std::size_t i = 0; i < s.x.size(); ++i) {
          const double cat = on_y ? s.y[i] : s.x[i], v = on_y ? s.x[i] : s.y[i];
          if (cat != k) continue;
          if (std::abs(v) > std::abs(end)) end = v;
          (v >= 0 ? up : down) += v;
        }
      if (d.kind == ChartKind::stacked_bar) end = up > 0 || down == 0 ? up : down;
      t.anchor = on_y ? Point{f.px(end), f.py(k)} : Point{f.px(k), f.py(end)};
      break;
    }
    case CalloutSpec::Target::span: {
      double a = within_data(c.from, f.x, d, true, "from"), b = within_data(c.to, f.x, d, true, "to");
      if (!(a < b)) throw InputError(c.to.loc, "'to' must come after 'from'");
      if (f.x.kind == AxisKind::category) a -= 0.5, b += 0.5;  // whole category bands
      const double l = f.px(a), r = f.px(b);
      t.band = Rect{l, f.plot.top(), r - l, f.plot.h};
      t.anchor = {(l + r) / 2, f.plot.top() + f.plot.h * 0.08};
      break;
    }
  }
  return t;
}

}  // namespace forme
