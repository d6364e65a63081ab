#pragma once
/// Periods of a date axis: a date as a count of whole years, months or days,
/// so that consecutive periods differ by one, and the step a regular series
/// keeps. Gaps (series/gaps) and restatements that compare a value with one
/// some periods earlier (series/apply_transform) count in these units.
#include <optional>
#include <vector>

#include "data/dates.h"

namespace forme {

/// The period `day` falls in, at precision `p`.
long period_index(double day, DatePrecision p);

/// The first day of period `index` at precision `p`.
double period_day(long index, DatePrecision p);

/// The series' step in whole periods: the greatest common divisor of its
/// steps (1 for a yearly series with a year missing, 3 for quarters), when
/// the series is regular: three points or more, covering at least half the
/// periods between its first and last. `idx` is in increasing order.
std::optional<long> usual_step(const std::vector<long>& idx);

}  // namespace forme
