#pragma once
/// Ordinary least-squares line y = intercept + slope·x.
#include <cstddef>
#include <optional>
#include <span>

namespace forme {

struct LinearFit {
  double intercept = 0;
  double slope = 0;
  /// Pearson correlation of the pairs used; NaN when every y is the same
  /// (the line is then exact, but correlation is undefined).
  double r = 0;
  double r_squared = 0;  ///< r², the share of y's variance the line explains; NaN with r
  std::size_t n = 0;     ///< pairs used
};

/// Fits the pairs (xs[i], ys[i]), skipping any pair with a NaN or infinite
/// member. nullopt when xs and ys differ in length, fewer than two pairs
/// remain, or all remaining x are equal (no slope can be fitted).
/// Sums are taken about the means, for accuracy with large offsets.
std::optional<LinearFit> fit_line(std::span<const double> xs, std::span<const double> ys);

}  // namespace forme
