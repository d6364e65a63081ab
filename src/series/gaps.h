#pragma once
/// Gaps: where a panel's data have no value, the page shows it.
///
/// Two kinds of gap, found after the series are built and transformed:
/// - a row of the series whose x or y cell is missing (empty, or a declared
///   missing-value marker): `MissingCell`;
/// - a regular time series that skips a period: on a date axis, consecutive
///   points further apart than the series' step: the greatest common
///   divisor of its steps in whole years, months or days (1 for a yearly
///   series missing a year, 3 for quarters, 7 for weeks). A series is
///   regular when it has three points or more and they cover at least half
///   the periods between its first and last; others have no such gaps. In
///   a daily series with no value on a Saturday or Sunday (working days),
///   weekends are no gap.
/// A gap between two points of a series breaks its line there
/// (`Series::breaks`); one at either end only shortens it. Every gap, ends
/// included, is listed in one short note per panel, grouped by series,
/// consecutive periods as a range ("2015–2017"), and counted instead of
/// listed when there are more than five.
#include <cstddef>
#include <string>
#include <vector>

#include "series/panel_data.h"

namespace forme {

/// A row of the panel that names a series but lacks its x or y value.
struct MissingCell {
  std::string series;  ///< the series name of the row
  double x = 0;        ///< in the panel's x units; NaN when the x cell is missing
  std::string x_text;  ///< the x cell as written
};

/// Sets `Series::breaks` in `d` for `missing` and for skipped periods, and
/// returns the note the page prints ("No data for Route 7 in 2017 and
/// 2020."), empty when the panel has no gap. `who` names a series without
/// a name (the panel title, or its y column).
std::string mark_gaps(PanelData& d, const std::vector<MissingCell>& missing, const std::string& who);

/// The period a day number stands for on a date axis of precision `p`,
/// written for a reader: "2017", "March 2017", "Q2 2017" (`quarters`),
/// "3 March 2017".
std::string period_words(double day, DatePrecision p, bool quarters);

}  // namespace forme
