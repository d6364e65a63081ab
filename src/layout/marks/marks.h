#pragma once
/// Marks for each chart kind. Adding a chart kind means adding one file in
/// this folder and one case in marks.cpp.
#include <map>
#include <string>

#include "base/diagnostic.h"
#include "layout/page_style.h"
#include "layout/plot_frame.h"
#include "layout/series_looks.h"
#include "paint/display_list.h"
#include "series/panel_data.h"

namespace forme {

/// Colours by series name, the same in every panel of the page.
using SeriesColours = std::map<std::string, Rgb>;

struct MarkContext {
  const PanelData& data;
  const PlotFrame& frame;
  const PageStyle& style;
  const SeriesColours& colours;
  bool label_series = false;  ///< name series directly (line ends, …)
  DiagnosticSink* warnings = nullptr;  ///< where marks report what they had to leave out
  const PanelLooks* looks = nullptr;  ///< dashes and patterns; none: solid, plain

  DashStyle dash(const std::string& series) const {
    return looks && looks->series.count(series) ? looks->series.at(series).dash : DashStyle::solid;
  }
  FillPattern pattern(const std::string& series) const {
    return looks && looks->series.count(series) ? looks->series.at(series).pattern : FillPattern::plain;
  }
};

/// Space a chart kind needs beside the plot for its own labels (line-end
/// labels on the right), given the page's series names and, for lines that
/// write their last value after the name, those values as they will print.
double marks_right_inset(ChartKind kind, const std::vector<PanelData>& panels, const std::vector<PanelAxes>& axes,
                         const PageStyle& style);

/// Records a drawn line in page.data_marks as points along it, close enough
/// together that no label box can sit across the line between two of them.
void note_line_marks(const std::vector<Point>& line, DisplayPage& page);

/// Draws the data of one panel.
void draw_marks(const MarkContext& ctx, DisplayPage& page);

void draw_line_marks(const MarkContext& ctx, DisplayPage& page);
void draw_vertical_bar_marks(const MarkContext& ctx, DisplayPage& page);
void draw_horizontal_bar_marks(const MarkContext& ctx, DisplayPage& page);
void draw_dot_marks(const MarkContext& ctx, DisplayPage& page);
void draw_stacked_bar_marks(const MarkContext& ctx, DisplayPage& page);
void draw_stacked_area_marks(const MarkContext& ctx, DisplayPage& page);

}  // namespace forme
