#pragma once
/// Values on a decimal lattice: an integer times a power of ten.
///
/// Tick values are built as n·10^e from an integer n rather than by adding
/// or multiplying a binary step (3 × 0.1 is 0.30000000000000004, but 3 / 10
/// is the double nearest 0.3). Both ticks and scales use this.

namespace forme {

/// n·10^e. For an integer-valued `n` (|n| < 2^53) and |e| ≤ 22 the result
/// is the double nearest the exact value (10^|e| is then exact, and one
/// multiplication or division rounds once); beyond, within a few ulps. Any
/// `n` is accepted. Gives ±inf where the result exceeds the double range and
/// never an infinity or NaN from an intermediate power (5e-324 × 10^330 is 5e6).
double times_power_of_ten(double n, int e);

}  // namespace forme
