#pragma once
/// Axes of one panel: gridlines and baseline behind the data, ticks and
/// tick labels around the plot.
#include <vector>

#include "layout/name_fit.h"
#include "layout/page_style.h"
#include "layout/plot_frame.h"
#include "paint/display_list.h"

namespace forme {

/// Tick labels of an axis, shaped (tabular figures for numbers).
std::vector<ShapedText> shape_tick_labels(const Axis& axis, const PageStyle& style);

/// Widest label, in points.
double widest(const std::vector<ShapedText>& labels);

/// Every n-th tick label is shown so neighbours keep a clear gap: n is the
/// least stride at which every pair of shown neighbours, `length` points
/// apart for the whole axis, is at least `extent` + `gap` apart centre to
/// centre (`extent`: the widest label across, or one label's height up).
int label_stride(const Axis& axis, double extent, double length, double gap);

/// Gridlines (value axes) and the zero baseline, drawn before the marks.
void draw_axis_backdrop(const PlotFrame& f, const PageStyle& style, DisplayPage& page);

/// Which sides of a panel carry tick labels.
struct AxisLabelling {
  bool x_labels = true;
  bool y_labels = true;
  const NameFit* x_names = nullptr;  ///< category names under the plot, fitted to their slots
  const NameFit* y_names = nullptr;  ///< category names beside the plot, fitted to the name column
};

/// Tick marks and labels, drawn after the marks.
void draw_axis_labels(const PlotFrame& f, const PageStyle& style, const AxisLabelling& which,
                      DisplayPage& page);

/// Height taken below the plot by x tick labels (and year lines of date
/// axes); category names take the lines `names` fitted them in.
double x_label_band(const Axis& x, const PageStyle& style, const NameFit* names);

/// The least gap between neighbouring labels: half an em of the label size
/// (common practice).
double label_gap(const PageStyle& style);

}  // namespace forme
