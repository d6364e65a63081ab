#pragma once
/// Ticks for date axes: years, quarters, months or days, chosen so about
/// `m` ticks cover the range, each with its label.
///
/// Candidate steps, finest first: days 1, 2, 7, 14; months 1, 3, 6; years
/// 1, 2, 5, 10, 20, 50, 100, … Ticks sit on calendar boundaries:
/// - year ticks on 1 January of years divisible by the step (1990, 2000);
/// - month ticks on the 1st of months counted from January (every 3 months:
///   Jan, Apr, Jul, Oct; every 6: Jan, Jul);
/// - day ticks restart each month on days 1, 1 + step, 1 + 2·step, …, and
///   leave out a day closer than `step` days to the next month's 1st
///   (step 7: days 1, 8, 15, 22; step 14: 1, 15; step 2: 1, 3, …, 27 or 29).
/// Only ticks inside [day_min, day_max] are returned. The step whose tick
/// count is nearest `m` wins; on a tie, the coarser step.
#include <string>
#include <vector>

namespace forme {

enum class DateUnit { day, month, year };

struct DateTick {
  double day = 0;     ///< days since 1970-01-01
  std::string label;  ///< e.g. "2024", "Mar", "15 Mar"
  bool major = false; ///< first tick of a new year (month/day ticks) — drawn with the year under it
};

struct DateTicks {
  std::vector<DateTick> ticks;
  DateUnit unit = DateUnit::year;
  int step = 1;  ///< in units: every `step` years / months / days
};

/// Chooses date ticks for [day_min, day_max] (days since 1970-01-01).
/// Month labels are English three-letter abbreviations ("Mar"). For month
/// and day ticks, `major` marks the first tick of each year (and the first
/// tick overall); the caller draws the year beneath those ticks. Year ticks
/// are never major: their label already is the year. Years before 1 print
/// astronomically with a minus sign (year 0 is 1 BC: "0", "−44").
///
/// The ends may come in either order; `m` is clamped to 1 … 100. Ends that
/// are not finite or lie more than 1e11 days (about 270 million years) from
/// 1970 give no ticks.
DateTicks date_ticks(double day_min, double day_max, int m);

}  // namespace forme
