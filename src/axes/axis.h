#pragma once
/// Stage 3, resolve scales: the axes every panel is drawn against.
///
/// Panels of a page share one scale per axis: the domain is the union of
/// all panels' data (bars always include zero, because bar length encodes
/// the value), and every panel gets the identical tick set.
#include <string>
#include <vector>

#include "base/diagnostic.h"
#include "scale/number_format.h"
#include "series/panel_data.h"

namespace forme {

struct Tick {
  double value = 0;
  std::string label;
  bool major = false;  ///< date axes: first tick of a year (the year is drawn beneath)
};

struct Axis {
  AxisKind kind = AxisKind::number;
  double lo = 0, hi = 1;  ///< domain in data units (category axes: -0.5 .. n-0.5)
  std::vector<Tick> ticks;
  std::string title;      ///< axis title with its unit, ready to print
  NumberFormat format;    ///< how the tick labels were written
  /// How values written beside marks (value labels, callouts' numbers)
  /// are written: the axis's style, prefix and suffix with the author's
  /// decimals (−1 when not fixed: then `value_format` decides from the
  /// values themselves, not from the tick step).
  NumberFormat values;
  /// Unlabelled minor ticks, ascending (log axes: 2…9 × 10ⁿ, or the
  /// decades a thinned axis leaves unlabelled).
  std::vector<double> minor;
  std::vector<std::string> categories;
  DatePrecision dates = DatePrecision::day;
  bool log = false;       ///< logarithmic (base 10); lo and hi stay in data units
  bool own_scale = false; ///< this panel's scale differs from its neighbours'
};

struct PanelAxes {
  Axis x, y;
};

/// One PanelAxes per panel. Panels showing the same columns share domains
/// and ticks unless the grid frees a direction. Ranges that would mislead
/// (bars not starting at zero, log scales over data that are not all
/// positive) are reported as errors in `sink`, and the axis is built the
/// honest way instead so that later checks still run.
std::vector<PanelAxes> resolve_axes(const std::vector<PanelData>& panels, const GridSpec& grid, DiagnosticSink& sink);

/// Smallest distance between neighbouring x values in any series (1 when
/// no series has two distinct values): the width of one period on a time axis.
double smallest_step(const std::vector<const PanelData*>& panels);

/// The value axis title, restated when the values were transformed.
std::string value_title(const PanelData& p, const AxisSpec& a);

/// "Title (unit)", "Title", "unit", or "". A title that already ends with
/// its unit in parentheses is not given it again ("Height (m)", unit m).
std::string axis_title(const std::string& title, const std::string& unit);

/// A log axis's title says so once: "Spores (per litre)" → "Spores (per
/// litre, log scale)", "Density" → "Density, log scale", "(index)" →
/// "index, log scale", "" → "Log scale". A title that already says "log
/// scale" is kept. Linear axes keep `title`.
std::string scale_title(const std::string& title, bool log);

/// The format for values written beside the marks of panel `p` along axis
/// `a` (x when `along_x`): value_format over all the panel's values there,
/// in the axis's value style (`Axis::values`).
NumberFormat panel_value_format(const PanelData& p, bool along_x, const Axis& a);

/// The same axis with at most `most` labelled ticks (at least 2) over the
/// same domain, labelled in the same style: for a layout that measured its
/// labels and found them crowded. Category and date axes, and axes already
/// within `most`, come back unchanged.
Axis with_at_most_ticks(const Axis& axis, int most);

}  // namespace forme
