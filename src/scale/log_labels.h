#pragma once
/// How a logarithmic axis writes its ticks, and where its minor ticks go.
///
/// A log axis is read in powers of ten, so its labels are the powers
/// themselves (10⁻⁴ … 10⁶, "2×10³" between them), each exactly as it is,
/// with no digits shared from a common decimal count (which wrote
/// 1,000,000.000 beside 0.001, and 0.0001 as "0.000"). An axis whose ticks
/// all lie within 0.001 … 10,000 reads as well in plain decimals (0.001,
/// 0.1, 10, 1,000), each its own shortest; an SI axis writes 1m, 1, 1k,
/// 1M; a percent axis 0.1%, 1%, 10%.
#include <optional>
#include <string>
#include <vector>

#include "scale/number_format.h"

namespace forme {

/// One label per tick (ticks > 0, ascending), in the author's style
/// (`asked`, or none): SI, percent and fraction-percent as each tick's
/// shortest; power-of-ten always as powers; plain (or none) as plain
/// decimals when every tick lies within 10⁻³ … 10⁴, else as powers. The
/// author's prefix and suffix are kept; fixed decimals are not used (a
/// fixed count cannot show 0.001 and 1,000 both as they are).
std::vector<std::string> log_tick_labels(const std::vector<double>& ticks, const std::optional<NumberFormat>& asked);

/// Whether log_tick_labels writes these ticks as powers of ten.
bool log_labels_in_powers(const std::vector<double>& ticks, const std::optional<NumberFormat>& asked);

/// Unlabelled minor ticks inside [lo, hi] between the labelled `major`
/// ones: the decades a thinned axis leaves unlabelled; on an axis labelled
/// at every decade, 2…9 × each power when it spans at most `most_decades`
/// decades (beyond, they would crowd into a grey band); on one labelled at
/// 1, 2 and 5, the other whole multiples 3, 4, 6…9. None for linear
/// fallback ticks. Ascending, never equal to a major tick.
std::vector<double> log_minor_ticks(double lo, double hi, const std::vector<double>& major, int most_decades = 8);

/// Whether `v` is a whole multiple 1…9 of a power of ten; sets `power`.
bool decade_multiple(double v, int& multiple, int& power);

}  // namespace forme
