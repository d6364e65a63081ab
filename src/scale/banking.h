#pragma once
/// Banking to 45°: choosing a panel's shape from the slopes in its data.
///
/// A line through the points (xs[i], ys[i]), in order, is cut into segments
/// i → i+1. The panel shows the data's full extent: Rx = max x − min x
/// across its width w, Ry = max y − min y across its height h. Every
/// function here returns the aspect ratio α = h / w, the panel's physical
/// height over its physical width (α = 2: twice as tall as wide). A segment
/// with data slope s = Δy/Δx is drawn with physical slope
///     σ = s · (Rx / Ry) · α
/// and orientation θ = arctan |σ|, between 0° and 90°.
///
/// Segments:
/// - a segment with a non-finite end (a gap in the data, NaN) is skipped;
/// - a zero-length segment (Δx = Δy = 0) has no direction and is skipped;
/// - a vertical segment (Δx = 0) has |σ| = ∞ and θ = 90° at every α;
/// - a horizontal segment (Δy = 0) has σ = 0 and θ = 0° at every α.
/// Vertical and horizontal segments still count (in the median, and in the
/// averages with their fixed angle), since they are part of the line's look.
///
/// Every function gives nullopt when no aspect ratio meets its rule: xs and
/// ys differ in length, no segment is left, Rx or Ry is zero, or so many
/// segments are horizontal (or vertical) that no shape brings the line to
/// 45°. Each result is symmetric: swapping xs and ys gives 1/α.
///
/// Methods (Cleveland, McGill & McGill 1988; Cleveland, "Visualizing Data",
/// 1993):
/// - median absolute slope: median |σ| = 1, closed form
///   α = (Ry / Rx) / median |s|; for an even count the median is the
///   geometric mean of the two middle slopes (so the rule stays symmetric);
/// - average absolute orientation: mean θ = 45°;
/// - length-weighted average orientation: mean θ weighted by each segment's
///   physical length = 45°.
/// The two averages grow monotonically with α and are solved by bisection on
/// log α, to a relative precision of about 1e-12.
#include <optional>
#include <span>

namespace forme {

/// h/w with the median absolute physical slope equal to 1.
std::optional<double> aspect_median_slope(std::span<const double> xs, std::span<const double> ys);

/// h/w with the mean absolute physical orientation equal to 45°.
std::optional<double> aspect_average_orientation(std::span<const double> xs, std::span<const double> ys);

/// h/w with the length-weighted mean absolute physical orientation equal to 45°.
std::optional<double> aspect_weighted_orientation(std::span<const double> xs, std::span<const double> ys);

}  // namespace forme
