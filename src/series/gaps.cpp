#include "series/gaps.h"

#include <algorithm>
#include <cmath>
#include <map>
#include <optional>

#include "data/dates.h"
#include "series/periods.h"

namespace forme {

namespace {

const char* const kMonthNames[] = {"January", "February", "March",     "April",   "May",      "June",
                                   "July",    "August",   "September", "October", "November", "December"};

// 1970-01-01 was a Thursday: day 0 is weekday 4 when Sunday is 0.
bool is_weekend(long day) {
  const long w = ((day % 7) + 7 + 4) % 7;
  return w == 0 || w == 6;
}

struct Gap {
  double at = 0;                 ///< x position (NaN: the row has no x)
  std::optional<long> period;    ///< on a date axis: the period index
  std::string label;
};

std::string join_words(const std::vector<std::string>& items) {
  std::string out;
  for (std::size_t i = 0; i < items.size(); ++i)
    out += (i == 0 ? "" : i + 1 == items.size() ? " and " : ", ") + items[i];
  return out;
}

// "in 2017 and 2020", "in 2015–2017", "in 9 periods between 2003 and 2019".
std::string where_words(std::vector<Gap> gaps, long step, bool dates) {
  std::sort(gaps.begin(), gaps.end(), [](const Gap& a, const Gap& b) { return a.at < b.at; });
  const std::string in = dates ? "in " : "at ";
  if (gaps.size() > 5)
    return in + std::to_string(gaps.size()) + (dates ? " periods" : " points") + " between " + gaps.front().label +
           " and " + gaps.back().label;
  std::vector<std::string> items;
  for (std::size_t i = 0; i < gaps.size();) {
    std::size_t j = i;
    while (j + 1 < gaps.size() && gaps[i].period && gaps[j + 1].period && *gaps[j + 1].period - *gaps[j].period == step)
      ++j;
    if (j >= i + 2) items.push_back(gaps[i].label + "–" + gaps[j].label);  // three or more in a row: a range
    else
      for (std::size_t k = i; k <= j; ++k) items.push_back(gaps[k].label);
    i = j + 1;
  }
  return in + join_words(items);
}

}  // namespace

std::string period_words(double day, DatePrecision p, bool quarters) {
  const CivilDate c = civil_from_days(static_cast<long>(day));
  const std::string year = std::to_string(c.year);
  switch (p) {
    case DatePrecision::year: return year;
    case DatePrecision::month:
      if (quarters) return "Q" + std::to_string((c.month - 1) / 3 + 1) + " " + year;
      return std::string(kMonthNames[c.month - 1]) + " " + year;
    case DatePrecision::day: return std::to_string(c.day) + " " + kMonthNames[c.month - 1] + " " + year;
  }
  return year;
}

std::string mark_gaps(PanelData& d, const std::vector<MissingCell>& missing, const std::string& who) {
  const bool dates = d.x_kind == AxisKind::date;
  const DatePrecision prec = d.x_dates;
  // Stacked areas need every series at every x and refuse the rest; dots
  // are no series over time, so only their missing cells are gaps.
  const bool periods = dates && (d.kind == ChartKind::line || d.kind == ChartKind::vertical_bar ||
                                 d.kind == ChartKind::stacked_bar);
  // Only lines are drawn in x order and joined, so only they break.
  const bool lines = d.kind == ChartKind::line;

  std::vector<std::string> order;  // series names, in the panel's order
  std::map<std::string, std::vector<Gap>> gaps;
  std::map<std::string, std::size_t> no_x;
  std::map<std::string, long> steps;
  std::map<std::string, bool> quarters;
  for (const Series& s : d.series) order.push_back(s.name);
  auto series_named = [&](const std::string& name) -> Series* {
    for (Series& s : d.series)
      if (s.name == name) return &s;
    return nullptr;
  };

  for (Series& s : d.series) {
    if (!dates) continue;
    std::vector<long> idx;
    idx.reserve(s.x.size());
    for (double x : s.x) idx.push_back(period_index(x, prec));
    if (!lines) std::sort(idx.begin(), idx.end());  // bars keep the file's order
    const std::optional<long> step = usual_step(idx);
    if (!step) continue;
    steps[s.name] = *step;
    bool q = prec == DatePrecision::month && *step == 3;
    for (long i : idx) q = q && i % 3 == 0;
    quarters[s.name] = q;
    if (!periods) continue;
    // Daily values on weekdays only: Saturdays and Sundays are no gap.
    const bool working_days = prec == DatePrecision::day && *step == 1 &&
                              std::none_of(idx.begin(), idx.end(), [](long k) { return is_weekend(k); });
    for (std::size_t i = 1; i < idx.size(); ++i) {
      if (idx[i] - idx[i - 1] <= *step) continue;
      std::vector<long> skipped;
      for (long k = idx[i - 1] + *step; k < idx[i]; k += *step) skipped.push_back(k);
      if (working_days) std::erase_if(skipped, is_weekend);  // a series of working days skips weekends
      if (skipped.empty()) continue;
      for (long k : skipped) gaps[s.name].push_back({period_day(k, prec), k, period_words(period_day(k, prec), prec, q)});
      if (lines) s.breaks.push_back(i);
    }
  }

  for (const MissingCell& m : missing) {
    if (std::find(order.begin(), order.end(), m.series) == order.end()) order.push_back(m.series);
    if (std::isnan(m.x)) {
      ++no_x[m.series];
      continue;
    }
    Gap g{m.x, std::nullopt, m.x_text};
    if (dates) {
      g.period = period_index(m.x, prec);
      g.label = period_words(m.x, prec, quarters[m.series]);
    }
    std::vector<Gap>& list = gaps[m.series];
    if (std::any_of(list.begin(), list.end(), [&](const Gap& o) { return o.at == g.at; })) continue;
    if (Series* s = lines ? series_named(m.series) : nullptr) {
      if (std::find(s->x.begin(), s->x.end(), m.x) != s->x.end()) continue;  // another row has the value
      const std::size_t i = static_cast<std::size_t>(std::upper_bound(s->x.begin(), s->x.end(), m.x) - s->x.begin());
      if (i > 0 && i < s->x.size() && std::find(s->breaks.begin(), s->breaks.end(), i) == s->breaks.end())
        s->breaks.push_back(i);
    }
    list.push_back(std::move(g));
  }
  for (Series& s : d.series) std::sort(s.breaks.begin(), s.breaks.end());

  std::vector<std::string> parts;
  std::size_t with_gaps = 0, total = 0;
  for (const std::string& name : order) {
    const auto g = gaps.find(name);
    const std::size_t rows_without_x = no_x.count(name) ? no_x[name] : 0;
    if ((g == gaps.end() || g->second.empty()) && rows_without_x == 0) continue;
    ++with_gaps;
    const std::string named = name.empty() ? who : name;
    std::string part;
    if (g != gaps.end() && !g->second.empty()) {
      total += g->second.size();
      part = named + " " + where_words(g->second, steps.count(name) ? steps[name] : 1, dates);
    }
    if (rows_without_x > 0) {
      total += rows_without_x;
      part += (part.empty() ? named + " in " : ", and in ") + std::to_string(rows_without_x) +
              (rows_without_x == 1 ? " row" : " rows") + " without " + (d.spec ? d.spec->x.value : "x");
    }
    parts.push_back(std::move(part));
  }
  if (parts.empty()) return {};
  constexpr std::size_t kListed = 3;
  std::string note = "No data for " + parts[0];
  for (std::size_t i = 1; i < parts.size() && i < kListed; ++i) note += "; for " + parts[i];
  if (parts.size() > kListed)
    note += "; and for " + std::to_string(with_gaps - kListed) + " more series (" + std::to_string(total) + " gaps in all)";
  return note + ".";
}

}  // namespace forme
