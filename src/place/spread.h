#pragma once
/// Spreading direct labels along one axis (e.g. series names at line ends).
///
/// ## Problem
/// Label i wants its centre at y_i and is h_i tall. Find centres p_i that
///
///     minimise   Σ (p_i − y_i)²
///     subject to the labels keep the order of their desired positions
///                (sorted by y_i, ties broken by input index),
///                p_{k+1} − p_k ≥ (h_k + h_{k+1})/2 + gap   (in that order),
///                lo ≤ p_i − h_i/2  and  p_i + h_i/2 ≤ hi.
///
/// It is a least-squares problem under order constraints, which is solved
/// exactly, not by iterating forces.
///
/// ## Algorithm
/// 1. Sort the labels by desired position: O(n log n).
/// 2. Let offset_0 = 0 and offset_{k+1} = offset_k + (h_k + h_{k+1})/2 + gap,
///    the smallest spacing the stack allows. With q_k = p_k − offset_k the
///    spacing constraints become plain monotonicity, q_0 ≤ q_1 ≤ … , and the
///    objective becomes Σ (q_k − v_k)² with v_k = y_k − offset_k. That is
///    isotonic regression of v.
/// 3. The bounds become q_k ≥ lo + h_k/2 − offset_k and
///    q_k ≤ hi − h_k/2 − offset_k. Both right-hand sides fall as k grows,
///    because offset_k grows by at least h (the gap is ≥ 0). So for a
///    monotone q only the first lower bound, A = lo + h_0/2, and the last
///    upper bound, B = hi − h_{n−1}/2 − offset_{n−1}, can bind: the problem is
///    isotonic regression inside the box [A, B], the same box for every k.
/// 4. Solve the unbounded isotonic regression with the pool-adjacent-
///    violators algorithm (PAVA): scan left to right, keep a stack of blocks
///    with their means, and merge the top two blocks while the earlier mean
///    exceeds the later one. O(n).
/// 5. Clamp every block mean to [A, B]. For a common box this clamp is the
///    exact constrained optimum. Within a PAVA block every suffix has a mean
///    ≤ the block mean. So when blocks merge at A, no suffix of the merged
///    block would gain by being raised, and symmetrically at B. The KKT
///    conditions therefore hold. (Barlow, Bartholomew, Bremner & Brunk,
///    *Statistical Inference under Order Restrictions*, Wiley 1972, treat
///    bounded isotonic regression. PAVA itself goes back to Ayer, Brunk,
///    Ewing, Reid & Silverman, *Ann. Math. Statist.* 26, 1955.)
/// 6. Map back, p_k = q_k + offset_k, and return the centres in input order.
///
/// ## Contract
/// - Heights and the gap must be finite and ≥ 0. Desired positions must be
///   finite. lo ≤ hi. Infinite bounds are allowed, and the defaults leave
///   the axis unbounded. Violations throw std::invalid_argument: they are
///   programming errors, not page input.
/// - `fits`: the stack fits in [lo, hi] with the requested gap. The centres
///   are the exact least-squares optimum, up to rounding.
/// - `gap_reduced`: the labels fit only with a smaller gap. They are packed
///   edge to edge over the whole of [lo, hi], with one even gap (the largest
///   that fits). With the gap reduced to that value, this is also the only
///   feasible, and so the optimal, answer.
/// - `overlapping`: Σ h_i > hi − lo, so the labels cannot fit even touching.
///   They are stacked over [lo, hi] with an even negative gap: neighbours
///   overlap by the same amount, the order is kept, and the first and last
///   labels touch the bounds. One label taller than the range is centred in
///   it. The caller should drop labels or shrink text; this answer only
///   keeps things drawable.
/// In every case, the result keeps the order, and the centres of an empty
/// input are empty.
#include <cstddef>
#include <limits>
#include <span>
#include <vector>

namespace forme {

struct SpreadOptions {
  double gap = 0;  ///< minimum clear space between neighbouring labels, ≥ 0
  double lo = -std::numeric_limits<double>::infinity();  ///< top of the allowed range
  double hi = std::numeric_limits<double>::infinity();   ///< bottom of the allowed range
};

enum class SpreadStatus {
  fits,         ///< exact optimum with the requested gap
  gap_reduced,  ///< packed over [lo, hi] with an even, smaller gap
  overlapping,  ///< labels taller than the range; packed with even overlaps
};

struct SpreadResult {
  std::vector<double> centres;  ///< p_i, in input order
  SpreadStatus status = SpreadStatus::fits;
  double gap = 0;   ///< gap actually used between neighbours (negative: overlap)
  double cost = 0;  ///< Σ (p_i − y_i)²
};

/// Spreads labels with desired centres `desired` and heights `heights`
/// (equal lengths) along one axis; see the essay above for the contract.
///
///     auto r = spread_labels(std::vector{0.0, 4.0}, std::vector{10.0, 10.0}, {});
///     // r.centres == {-3, 7}
SpreadResult spread_labels(std::span<const double> desired, std::span<const double> heights,
                           const SpreadOptions& options);

}  // namespace forme
