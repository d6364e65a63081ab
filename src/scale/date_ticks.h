#pragma once
/// Ticks for date axes: years, quarters, months or days, chosen so about
/// `m` ticks cover the range, each with its label.
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
/// tick overall); the caller draws the year beneath those ticks.
DateTicks date_ticks(double day_min, double day_max, int m);

}  // namespace forme
