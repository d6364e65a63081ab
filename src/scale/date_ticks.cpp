#include "scale/date_ticks.h"

#include <algorithm>
#include <cmath>
#include <cstdlib>
#include <limits>
#include <utility>

#include "data/dates.h"

namespace forme {

namespace {

constexpr double kMaxDay = 1e11;
constexpr int kMaxWanted = 100;
// Steps up to 5·10^8 years: more than the ±1e11-day range spans.
constexpr long long kMaxYearPower = 100'000'000;
constexpr const char* kMonthNames[] = {"Jan", "Feb", "Mar", "Apr", "May", "Jun",
                                       "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"};

struct Step {
  DateUnit unit;
  long long n;
};

long long floor_div(long long a, long long b) { return a / b - ((a % b != 0 && (a < 0) != (b < 0)) ? 1 : 0); }
long long ceil_div(long long a, long long b) { return -floor_div(-a, b); }

/// Months counted from January of year 0.
long long month_index(const CivilDate& c) { return 12LL * c.year + (c.month - 1); }

long first_of_month(long long index) {
  const long long year = floor_div(index, 12);
  return days_from_civil(static_cast<int>(year), static_cast<int>(index - 12 * year + 1), 1);
}

/// Day numbers of the ticks of `step` in [lo, hi], at most `limit` of them.
std::vector<long> tick_days(Step step, long lo, long hi, std::size_t limit) {
  std::vector<long> out;
  if (lo > hi) return out;
  const long long n = step.n;
  switch (step.unit) {
    case DateUnit::year: {
      const CivilDate c = civil_from_days(lo);
      const long long first_year = c.year + ((c.month == 1 && c.day == 1) ? 0 : 1);
      const long long last_year = civil_from_days(hi).year;
      for (long long y = ceil_div(first_year, n) * n; y <= last_year && out.size() < limit; y += n)
        out.push_back(days_from_civil(static_cast<int>(y), 1, 1));
      break;
    }
    case DateUnit::month: {
      const CivilDate c = civil_from_days(lo);
      const long long first_month = month_index(c) + (c.day == 1 ? 0 : 1);
      const long long last_month = month_index(civil_from_days(hi));
      for (long long i = ceil_div(first_month, n) * n; i <= last_month && out.size() < limit; i += n)
        out.push_back(first_of_month(i));
      break;
    }
    case DateUnit::day: {
      const long long last_month = month_index(civil_from_days(hi));
      for (long long i = month_index(civil_from_days(lo)); i <= last_month && out.size() < limit; ++i) {
        const long first = first_of_month(i);
        const long length = first_of_month(i + 1) - first;
        // Days 1, 1+n, …, but none closer than n days to the next month's 1st.
        for (long d = 1; d <= length + 1 - n && out.size() < limit; d += n) {
          const long day = first + d - 1;
          if (day >= lo && day <= hi) out.push_back(day);
        }
      }
      break;
    }
  }
  return out;
}

std::vector<Step> candidate_steps() {
  std::vector<Step> steps = {{DateUnit::day, 1},   {DateUnit::day, 2},   {DateUnit::day, 7},
                             {DateUnit::day, 14},  {DateUnit::month, 1}, {DateUnit::month, 3},
                             {DateUnit::month, 6}};
  for (long long p = 1; p <= kMaxYearPower; p *= 10)
    for (long long f : {1, 2, 5}) steps.push_back({DateUnit::year, f * p});
  return steps;
}

std::string year_label(int year) {
  return year < 0 ? "\u2212" + std::to_string(-static_cast<long long>(year)) : std::to_string(year);
}

std::string label(DateUnit unit, const CivilDate& c) {
  switch (unit) {
    case DateUnit::year:
      return year_label(c.year);
    case DateUnit::month:
      return kMonthNames[c.month - 1];
    case DateUnit::day:
      return std::to_string(c.day) + " " + kMonthNames[c.month - 1];
  }
  return {};
}

}  // namespace

DateTicks date_ticks(double day_min, double day_max, int m) {
  DateTicks out;
  if (!std::isfinite(day_min) || !std::isfinite(day_max) || std::abs(day_min) > kMaxDay ||
      std::abs(day_max) > kMaxDay)
    return out;
  if (day_min > day_max) std::swap(day_min, day_max);
  m = std::clamp(m, 1, kMaxWanted);
  const auto lo = static_cast<long>(std::ceil(day_min));
  const auto hi = static_cast<long>(std::floor(day_max));
  if (lo > hi) {  // no whole day in range: no ticks
    out.unit = DateUnit::day;
    return out;
  }

  // Counts beyond `limit` are all "far too many"; no need to list them.
  const std::size_t limit = 4 * static_cast<std::size_t>(m) + 8;
  Step best{DateUnit::day, 1};
  long long best_miss = std::numeric_limits<long long>::max();
  std::vector<long> best_days;
  for (const Step& step : candidate_steps()) {
    std::vector<long> days = tick_days(step, lo, hi, limit + 1);
    const auto count = static_cast<long long>(days.size());
    const long long miss = std::llabs(count - m);
    if (miss <= best_miss) {  // ties go to the coarser step
      best = step;
      best_miss = miss;
      best_days = std::move(days);
    }
    // Coarser year steps can only give one tick or none.
    if (step.unit == DateUnit::year && count <= 1) break;
  }

  out.unit = best.unit;
  out.step = static_cast<int>(best.n);
  int previous_year = 0;
  for (long day : best_days) {
    const CivilDate c = civil_from_days(day);
    DateTick t;
    t.day = static_cast<double>(day);
    t.label = label(best.unit, c);
    t.major = best.unit != DateUnit::year && (out.ticks.empty() || c.year != previous_year);
    previous_year = c.year;
    out.ticks.push_back(std::move(t));
  }
  return out;
}

}  // namespace forme
