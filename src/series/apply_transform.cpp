#include "series/apply_transform.h"

#include <algorithm>
#include <charconv>
#include <cmath>
#include <map>

#include "data/dates.h"
#include "data/transform.h"

namespace forme {

namespace {

// The x position the author's `base:` names, in the panel's x units.
double base_position(const Located& base, const PanelData& p) {
  switch (p.x_kind) {
    case AxisKind::category: {
      auto it = std::find(p.categories.begin(), p.categories.end(), base.value);
      if (it != p.categories.end()) return static_cast<double>(it - p.categories.begin());
      break;
    }
    case AxisKind::date:
      if (auto d = parse_date(base.value)) return d->day;
      break;
    case AxisKind::number: {
      double v = 0;
      auto [end, ec] = std::from_chars(base.value.data(), base.value.data() + base.value.size(), v);
      if (ec == std::errc() && end == base.value.data() + base.value.size()) return v;
      break;
    }
  }
  throw InputError(base.loc, "the base '" + base.value + "' is not a value of the x column",
                   "name an x value present in every series, e.g. the first year shown");
}

void drop_missing(Series& s) {
  Series out{s.name, {}, {}};
  for (std::size_t i = 0; i < s.x.size(); ++i)
    if (std::isfinite(s.y[i])) {
      out.x.push_back(s.x[i]);
      out.y.push_back(s.y[i]);
    }
  s = std::move(out);
}

// Every series' y at each x, aligned on the union of x values.
struct Aligned {
  std::vector<double> xs;
  std::vector<std::vector<double>> ys;  // [series][x], NaN where missing
};
Aligned align(const std::vector<Series>& series) {
  Aligned a;
  for (const auto& s : series) a.xs.insert(a.xs.end(), s.x.begin(), s.x.end());
  std::sort(a.xs.begin(), a.xs.end());
  a.xs.erase(std::unique(a.xs.begin(), a.xs.end()), a.xs.end());
  for (const auto& s : series) {
    std::vector<double> row(a.xs.size(), std::nan(""));
    for (std::size_t i = 0; i < s.x.size(); ++i)
      row[static_cast<std::size_t>(std::lower_bound(a.xs.begin(), a.xs.end(), s.x[i]) - a.xs.begin())] = s.y[i];
    a.ys.push_back(std::move(row));
  }
  return a;
}

}  // namespace

TransformStatement apply_transform(const TransformSpec& t, PanelData& p) {
  using Kind = TransformSpec::Kind;
  TransformStatement said;
  switch (t.kind) {
    case Kind::none: return said;
    case Kind::index: {
      const double bx = base_position(t.base, p);
      for (auto& s : p.series) {
        auto it = std::find(s.x.begin(), s.x.end(), bx);
        if (it == s.x.end())
          throw InputError(t.base.loc, "series '" + s.name + "' has no value at the base '" + t.base.value + "'",
                           "choose a base every series has");
        const std::size_t at = static_cast<std::size_t>(it - s.x.begin());
        if (s.y[at] == 0)
          throw InputError(t.base.loc, "series '" + s.name + "' is zero at the base '" + t.base.value +
                                           "', so it cannot be indexed to it");
        s.y = index_to_base(s.y, at);
        drop_missing(s);
      }
      said.axis_title = "Index, " + t.base.value + " = 100";
      said.sentence = "Values are indexed to " + t.base.value + " = 100.";
      break;
    }
    case Kind::percent_change: {
      for (auto& s : p.series) {
        s.y = percent_change(s.y, static_cast<std::size_t>(t.lag));
        drop_missing(s);
      }
      const std::string back = t.lag == 1 ? "the previous value" : std::to_string(t.lag) + " values earlier";
      said.axis_title = "% change from " + back;
      said.sentence = "Values are the percentage change from " + back + ".";
      break;
    }
    case Kind::difference: {
      auto it = std::find_if(p.series.begin(), p.series.end(), [&](const Series& s) { return s.name == t.minus.value; });
      if (it == p.series.end())
        throw InputError(t.minus.loc, "no series named '" + t.minus.value + "' to subtract",
                         "name one of the values of the series-by column");
      Aligned a = align(p.series);
      const std::size_t m = static_cast<std::size_t>(it - p.series.begin());
      std::vector<Series> out;
      for (std::size_t k = 0; k < p.series.size(); ++k) {
        if (k == m) continue;
        Series s{p.series[k].name + " − " + t.minus.value, a.xs, difference(a.ys[k], a.ys[m])};
        s.y.resize(s.x.size());
        drop_missing(s);
        out.push_back(std::move(s));
      }
      p.series = std::move(out);
      said.axis_title = "Difference from " + t.minus.value;
      said.keeps_unit = true;
      said.sentence = "Differences are each series minus " + t.minus.value + ".";
      break;
    }
    case Kind::share: {
      Aligned a = align(p.series);
      auto shares = share_of_total(a.ys);
      for (std::size_t k = 0; k < p.series.size(); ++k) {
        p.series[k].x = a.xs;
        p.series[k].y = shares[k];
        drop_missing(p.series[k]);
      }
      said.axis_title = "Share of total (%)";
      said.sentence = "Values are each series' share of the total at each point.";
      break;
    }
  }
  return said;
}

}  // namespace forme
