#include "place/spread.h"

#include <algorithm>
#include <cmath>
#include <limits>
#include <numeric>
#include <stdexcept>

namespace forme {
namespace {

void check_inputs(std::span<const double> desired, std::span<const double> heights,
                  const SpreadOptions& o) {
  if (desired.size() != heights.size())
    throw std::invalid_argument("spread_labels: desired and heights differ in length");
  for (double y : desired)
    if (!std::isfinite(y))
      throw std::invalid_argument("spread_labels: desired position not finite");
  for (double h : heights)
    if (!std::isfinite(h) || h < 0)
      throw std::invalid_argument("spread_labels: height must be finite and >= 0");
  if (!std::isfinite(o.gap) || o.gap < 0)
    throw std::invalid_argument("spread_labels: gap must be finite and >= 0");
  const double inf = std::numeric_limits<double>::infinity();
  if (std::isnan(o.lo) || std::isnan(o.hi) || o.lo > o.hi || o.lo == inf || o.hi == -inf)
    throw std::invalid_argument("spread_labels: need lo <= hi, lo < +inf and hi > -inf");
}

/// Unweighted isotonic regression by pool-adjacent-violators: returns the
/// non-decreasing sequence closest to `v` in least squares.
std::vector<double> isotonic_fit(const std::vector<double>& v) {
  struct Block {
    double sum;
    std::size_t count;
    double mean() const { return sum / static_cast<double>(count); }
  };
  std::vector<Block> blocks;
  blocks.reserve(v.size());
  for (double x : v) {
    blocks.push_back({x, 1});
    while (blocks.size() > 1 && blocks[blocks.size() - 2].mean() > blocks.back().mean()) {
      Block top = blocks.back();
      blocks.pop_back();
      blocks.back().sum += top.sum;
      blocks.back().count += top.count;
    }
  }
  std::vector<double> fit;
  fit.reserve(v.size());
  for (const Block& b : blocks) fit.insert(fit.end(), b.count, b.mean());
  return fit;
}

}  // namespace

SpreadResult spread_labels(std::span<const double> desired, std::span<const double> heights,
                           const SpreadOptions& options) {
  check_inputs(desired, heights, options);
  const std::size_t n = desired.size();
  SpreadResult result;
  result.centres.assign(n, 0.0);
  result.gap = options.gap;
  if (n == 0) return result;

  // order[k] = input index of the k-th label from the top.
  std::vector<std::size_t> order(n);
  std::iota(order.begin(), order.end(), std::size_t{0});
  std::stable_sort(order.begin(), order.end(),
                   [&](std::size_t a, std::size_t b) { return desired[a] < desired[b]; });

  // offset[k]: distance from the first centre to the k-th when packed at `gap`.
  auto offsets_for = [&](double gap) {
    std::vector<double> offset(n, 0.0);
    for (std::size_t k = 1; k < n; ++k)
      offset[k] = offset[k - 1] + (heights[order[k - 1]] + heights[order[k]]) / 2 + gap;
    return offset;
  };
  const double first_half = heights[order.front()] / 2;
  const double last_half = heights[order.back()] / 2;

  std::vector<double> offset = offsets_for(options.gap);
  const double extent = offset.back() + first_half + last_half;
  const double room = options.hi - options.lo;

  std::vector<double> q(n);
  if (extent <= room) {
    std::vector<double> v(n);
    for (std::size_t k = 0; k < n; ++k) v[k] = desired[order[k]] - offset[k];
    q = isotonic_fit(v);
    const double a = options.lo + first_half;
    const double b = options.hi - last_half - offset.back();
    for (double& x : q) x = std::clamp(x, a, b);
  } else {
    // Does not fit: pack over exactly [lo, hi] with one even gap.
    const double total_height = std::accumulate(heights.begin(), heights.end(), 0.0);
    result.status = total_height <= room ? SpreadStatus::gap_reduced : SpreadStatus::overlapping;
    if (n == 1) {
      result.gap = 0;
      q.assign(1, (options.lo + options.hi) / 2);
    } else {
      result.gap = (room - total_height) / static_cast<double>(n - 1);
      offset = offsets_for(result.gap);
      q.assign(n, options.lo + first_half);
    }
  }

  for (std::size_t k = 0; k < n; ++k) {
    const std::size_t i = order[k];
    result.centres[i] = q[k] + offset[k];
    const double d = result.centres[i] - desired[i];
    result.cost += d * d;
  }
  return result;
}

}  // namespace forme
