#pragma once
/// Tick positions for numeric axes.
///
/// Two published methods: Heckbert's "nice numbers" (Graphics Gems, 1990)
/// and the extended method of Talbot, Lin & Hanrahan (IEEE TVCG 2010),
/// which scores simplicity, coverage and density over candidate steps.
///
/// Both accept any pair of finite numbers:
/// - the ends may come in either order;
/// - a range that is empty or narrower than 1e-9 of its magnitude
///   (min == max, or 1 … 1 + 1e-15) is widened to v ± 10^⌊log10 |v|⌋ around
///   its midpoint v, or to −1 … 1 around zero;
/// - `m` is clamped to 2 … 100;
/// - ticks that would overflow the double range (ends near ±1.8e308) are
///   left out;
/// - a non-finite end gives no ticks (empty `values`, step 0).
/// Tick values are integer multiples of a decimal step built as n·10^e (see
/// power_of_ten.h), so 0.3 is the double nearest 0.3, and zero is exactly 0.
#include <vector>

namespace forme {

struct Ticks {
  std::vector<double> values;  ///< tick positions, ascending
  double step = 0;             ///< distance between ticks
  /// Digits after the point needed to show the step, and every tick, exactly
  /// (ticks 0.5 1.5 2.5 with step 1 need 1).
  int decimals = 0;
  double score = 0;            ///< extended method's score (0 for Heckbert)
};

/// Heckbert's loose labelling with about `m` ticks: first tick ≤ min, last ≥ max.
Ticks heckbert_ticks(double min, double max, int m);

/// Talbot–Lin–Hanrahan extended labelling with about `m` ticks.
/// `only_loose` forces the ticks to cover [dmin, dmax].
Ticks extended_ticks(double dmin, double dmax, int m, bool only_loose = false);

}  // namespace forme
