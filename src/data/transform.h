#pragma once
/// Stated transforms of series: pure functions from x-ordered values to new
/// values, for charts that show an index, a change, a gap or a share.
///
/// No transform throws. Where a result is undefined (a missing input, a
/// division by zero, a position outside the series) or would not be a finite
/// number, it is NaN, which later stages treat as a missing value, the same
/// as an empty cell. Results are never -0.
#include <cstddef>
#include <vector>

namespace forme {

/// values[i] / values[base_position] * 100, so the base reads 100.
/// Every result is NaN when base_position is outside the series or its value
/// is missing or zero. A negative base gives the plain ratio (a later value
/// twice as far below zero reads 200).
std::vector<double> index_to_base(const std::vector<double>& values, std::size_t base_position);

/// Percent change from `lag` positions earlier: (v[i] - v[i-lag]) / v[i-lag] * 100.
/// The first `lag` results are NaN, as is any whose earlier value is missing
/// or zero. The formula is the plain one: after a negative earlier value the
/// sign follows the ratio, not the direction of the change.
std::vector<double> percent_change(const std::vector<double>& values, std::size_t lag = 1);

/// No earlier value to compare with (see `percent_change_from`).
inline constexpr std::size_t kNoEarlier = static_cast<std::size_t>(-1);

/// Percent change of each value from the one at `earlier[i]` (kNoEarlier:
/// NaN), for series whose comparison is not a fixed count of positions back:
/// a yearly series missing a year compares 2018 with 2017, which it lacks,
/// not with 2016.
std::vector<double> percent_change_from(const std::vector<double>& values, const std::vector<std::size_t>& earlier);

/// a[i] - b[i]. The result is as long as the longer input; positions that
/// only one input has are NaN.
std::vector<double> difference(const std::vector<double>& a, const std::vector<double>& b);

/// Each series' share of the per-x total, in percent: out[s][i] =
/// series[s][i] / sum over s of series[s][i] * 100, so the shares at each x
/// sum to 100. The result has the shape of the input. A share is defined only
/// where every series has a value at that x, none is negative and the total
/// is positive; elsewhere all shares at that x are NaN.
std::vector<std::vector<double>> share_of_total(const std::vector<std::vector<double>>& values_per_series);

}  // namespace forme
