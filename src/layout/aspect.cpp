#include "layout/aspect.h"

#include <algorithm>
#include <cmath>
#include <limits>

#include "scale/banking.h"

namespace forme {

std::optional<double> banked_aspect(const std::vector<PanelData>& panels, const std::vector<PanelAxes>& axes,
                                    AspectRule rule) {
  if (rule == AspectRule::fill || panels.empty()) return std::nullopt;
  // Every line of every panel, joined by NaN points: segments touching a
  // NaN are skipped, so no false segment links two lines.
  std::vector<double> xs, ys;
  const double nan = std::numeric_limits<double>::quiet_NaN();
  for (const auto& p : panels)
    for (const auto& s : p.series) {
      xs.insert(xs.end(), s.x.begin(), s.x.end());
      ys.insert(ys.end(), s.y.begin(), s.y.end());
      xs.push_back(nan);
      ys.push_back(nan);
    }
  auto data_alpha = rule == AspectRule::bank_median_slope ? aspect_median_slope(xs, ys) : aspect_average_orientation(xs, ys);
  if (!data_alpha) return std::nullopt;
  // The banking functions measure slopes against the data's extent; the
  // panels draw against their axes' (wider) domains. Same physical slopes:
  // α_axes = α_data · (Rx_data / Ry_data) · (Ry_axes / Rx_axes).
  double x0 = INFINITY, x1 = -INFINITY, y0 = INFINITY, y1 = -INFINITY;
  for (std::size_t i = 0; i < xs.size(); ++i)
    if (std::isfinite(xs[i]) && std::isfinite(ys[i])) {
      x0 = std::min(x0, xs[i]), x1 = std::max(x1, xs[i]);
      y0 = std::min(y0, ys[i]), y1 = std::max(y1, ys[i]);
    }
  const Axis& ax = axes.front().x;
  const Axis& ay = axes.front().y;
  return *data_alpha * ((x1 - x0) / (y1 - y0)) * ((ay.hi - ay.lo) / (ax.hi - ax.lo));
}

}  // namespace forme
