#pragma once
/// Tick positions for numeric axes.
///
/// Two published methods: Heckbert's "nice numbers" (Graphics Gems, 1990)
/// and the extended method of Talbot, Lin & Hanrahan (IEEE TVCG 2010),
/// which scores simplicity, coverage and density over candidate steps.
#include <vector>

namespace forme {

struct Ticks {
  std::vector<double> values;  ///< tick positions, ascending
  double step = 0;             ///< distance between ticks
  int decimals = 0;            ///< digits after the point needed to show the step exactly
  double score = 0;            ///< extended method's score (0 for Heckbert)
};

/// Heckbert's loose labelling with about `m` ticks: first tick ≤ min, last ≥ max.
Ticks heckbert_ticks(double min, double max, int m);

/// Talbot–Lin–Hanrahan extended labelling with about `m` ticks.
/// `only_loose` forces the ticks to cover [dmin, dmax].
Ticks extended_ticks(double dmin, double dmax, int m, bool only_loose = false);

}  // namespace forme
