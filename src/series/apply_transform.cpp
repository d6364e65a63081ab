#include "series/apply_transform.h"

#include <algorithm>
#include <charconv>
#include <cmath>
#include <map>
#include <optional>
#include <unordered_map>

#include "data/dates.h"
#include "data/transform.h"
#include "series/periods.h"

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

// A percent change on a regular date series compares each value with the
// one `lag` periods earlier, found by date: where that period has no value
// (a missed year), the change has none either, instead of silently spanning
// two years.
struct PeriodLag {
  std::vector<std::size_t> earlier;
  std::string words;  // "the previous year", "4 quarters earlier"
};

std::optional<PeriodLag> period_lag(const Series& s, DatePrecision prec, std::size_t lag) {
  std::vector<long> idx;
  idx.reserve(s.x.size());
  for (double x : s.x) idx.push_back(period_index(x, prec));
  std::vector<long> sorted = idx;
  std::sort(sorted.begin(), sorted.end());
  if (std::adjacent_find(sorted.begin(), sorted.end()) != sorted.end()) return std::nullopt;  // two values in one period
  const std::optional<long> step = usual_step(sorted);
  if (!step) return std::nullopt;
  // Working days only (no Saturday or Sunday value): Monday compares with
  // Friday, the previous value, as a reader of such a series expects.
  if (prec == DatePrecision::day && *step == 1 &&
      std::none_of(sorted.begin(), sorted.end(), [](long d) { return ((d % 7) + 7 + 4) % 7 == 0 || ((d % 7) + 7 + 4) % 7 == 6; }))
    return std::nullopt;
  std::unordered_map<long, std::size_t> at;
  for (std::size_t i = 0; i < idx.size(); ++i) at.emplace(idx[i], i);
  PeriodLag out;
  out.earlier.assign(idx.size(), kNoEarlier);
  const long back = *step * static_cast<long>(lag);
  for (std::size_t i = 0; i < idx.size(); ++i)
    if (auto it = at.find(idx[i] - back); it != at.end()) out.earlier[i] = it->second;
  const char* unit = prec == DatePrecision::year                      ? "year"
                     : prec == DatePrecision::month && *step == 3     ? "quarter"
                     : prec == DatePrecision::month && *step == 12    ? "year"
                     : prec == DatePrecision::month && *step == 1     ? "month"
                     : prec == DatePrecision::day && *step == 7       ? "week"
                     : prec == DatePrecision::day && *step == 1       ? "day"
                                                                      : nullptr;
  const long count = prec == DatePrecision::year ? back : static_cast<long>(lag);
  if (unit)
    out.words = count == 1 ? std::string("the previous ") + unit : std::to_string(count) + " " + unit + "s earlier";
  else
    out.words = lag == 1 ? "the previous value" : std::to_string(lag) + " values earlier";
  return out;
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
      const std::size_t lag = static_cast<std::size_t>(t.lag);
      std::string back = lag == 1 ? "the previous value" : std::to_string(lag) + " values earlier";
      std::optional<std::string> same_back;  // the words, when every series counts in one period
      bool periods_for_all = true;
      for (auto& s : p.series) {
        const std::optional<PeriodLag> by_period = p.x_kind == AxisKind::date ? period_lag(s, p.x_dates, lag) : std::nullopt;
        if (by_period) {
          s.y = percent_change_from(s.y, by_period->earlier);
          if (!same_back) same_back = by_period->words;
          periods_for_all = periods_for_all && *same_back == by_period->words;
        } else {
          s.y = percent_change(s.y, lag);
          periods_for_all = false;
        }
        drop_missing(s);
      }
      if (periods_for_all && same_back) back = *same_back;
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
