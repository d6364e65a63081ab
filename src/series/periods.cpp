#include "series/periods.h"

#include <numeric>

namespace forme {

long period_index(double day, DatePrecision p) {
  const CivilDate c = civil_from_days(static_cast<long>(day));
  switch (p) {
    case DatePrecision::year: return c.year;
    case DatePrecision::month: return static_cast<long>(c.year) * 12 + (c.month - 1);
    case DatePrecision::day: return static_cast<long>(day);
  }
  return static_cast<long>(day);
}

double period_day(long index, DatePrecision p) {
  switch (p) {
    case DatePrecision::year: return static_cast<double>(days_from_civil(static_cast<int>(index), 1, 1));
    case DatePrecision::month:
      return static_cast<double>(days_from_civil(static_cast<int>(index / 12), static_cast<int>(index % 12) + 1, 1));
    case DatePrecision::day: return static_cast<double>(index);
  }
  return static_cast<double>(index);
}

std::optional<long> usual_step(const std::vector<long>& idx) {
  if (idx.size() < 3) return std::nullopt;
  long step = 0;
  for (std::size_t i = 1; i < idx.size(); ++i)
    if (idx[i] > idx[i - 1]) step = std::gcd(step, idx[i] - idx[i - 1]);
  if (step == 0) return std::nullopt;
  const long periods = (idx.back() - idx.front()) / step + 1;
  if (static_cast<long>(idx.size()) * 2 < periods) return std::nullopt;
  return step;
}

}  // namespace forme
