#pragma once
/// Scales: maps from a data domain [d0, d1] to a range [r0, r1] of
/// positions (PDF points along an axis).
///
/// Either end may be the larger (r0 > r1 flips an axis, as y axes on a
/// page that grows downward need). Values outside the domain extrapolate.
#include <vector>

namespace forme {

/// Linear map: d0 → r0, d1 → r1, exactly at both ends.
struct LinearScale {
  double d0 = 0, d1 = 1, r0 = 0, r1 = 1;

  /// Position of data value `x`. An empty domain (d0 == d1) maps every
  /// value to the middle of the range.
  double map(double x) const;
  /// Data value at position `r`; inverse of `map`. An empty range
  /// (r0 == r1) or empty domain gives the middle of the domain.
  double invert(double r) const;
};

/// Base-10 logarithmic map: d0 → r0, d1 → r1, equal ratios in the data
/// give equal distances. The domain must be strictly positive and finite.
struct LogScale {
  double d0 = 1, d1 = 10, r0 = 0, r1 = 1;

  /// Whether the domain is finite and strictly positive.
  bool valid() const;
  /// Position of data value `x`; NaN for x ≤ 0 or an invalid domain. An
  /// empty domain (d0 == d1) maps every positive value to the middle.
  double map(double x) const;
  /// Data value at position `r`; NaN for an invalid domain. An empty range
  /// or domain gives the domain's geometric middle.
  double invert(double r) const;
  /// Tick values inside the domain, ascending: powers of ten (when there are
  /// more than `m`, every k-th: the powers divisible by k, k the first of
  /// 2, 3, 5, 10, 20, 30, 50, … leaving at most `m`); with 2 and 5 times each power
  /// added, or every whole multiple 1–9, when the span is small and that
  /// brings the count nearer `m` (ties go to the sparser set). A domain
  /// holding fewer than two such ticks (3 … 4) gets linear ticks
  /// (extended method) inside it. Empty for an invalid domain.
  std::vector<double> ticks(int m = 5) const;
};

}  // namespace forme
