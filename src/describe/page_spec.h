#pragma once
/// The page description as plain values: what the YAML said, validated,
/// with the location of every value a later stage may need to complain about.
#include <map>
#include <optional>
#include <string>
#include <vector>

#include "base/diagnostic.h"
#include "base/geometry.h"
#include "colour/rgb.h"
#include "data/table.h"
#include "scale/number_format.h"

namespace forme {

/// A string from the description with where it was written.
struct Located {
  std::string value;
  SourceLoc loc;
  bool empty() const { return value.empty(); }
};

struct Margins {
  double top = 0, right = 0, bottom = 0, left = 0;  ///< points
};

/// What a print shop needs around the trimmed page.
struct PressSpec {
  double bleed = 0;         ///< points the background runs past the trim on every side
  bool crop_marks = false;  ///< marks outside the trim where the sheet is to be cut
  std::string slug;         ///< job name for a slug line outside the trim; empty = none
  std::optional<Rgb> background;  ///< paper colour printed over the trim and the bleed

  /// True when the page is set on a larger press sheet.
  bool any() const { return bleed > 0 || crop_marks || !slug.empty(); }
};

struct SheetSpec {
  std::string size_name;     ///< "A4", "letter", or "custom"
  double width = 0, height = 0;  ///< points, after orientation: the trimmed page
  Margins margins;
  bool margins_stated = false;  ///< false: the defaults, which grow with poster type
  /// Column figures without a stated height: `height` is provisional and
  /// the driver sets it from the laid-out content.
  bool height_from_content = false;
  PressSpec press;
  SourceLoc loc;
};

enum class ChartKind { line, vertical_bar, horizontal_bar, dot, stacked_bar, stacked_area };

/// One axis as the author described it.
struct AxisSpec {
  std::string title;  ///< e.g. "Stored"
  std::string unit;   ///< e.g. "% of capacity"
  std::optional<NumberFormat> format;
  Located min, max;   ///< values the axis must show, as written (numbers or dates)
  bool log = false;   ///< logarithmic scale
  SourceLoc scale_loc;
};

/// A restatement of the values that the page states in words.
struct TransformSpec {
  enum class Kind { none, index, percent_change, difference, share };
  Kind kind = Kind::none;
  Located base;   ///< index: x value that becomes 100
  Located minus;  ///< difference: series subtracted
  int lag = 1;    ///< percent-change: steps back
  SourceLoc loc;
};

struct ReferenceLine {
  std::optional<double> y;  ///< horizontal line at this value
  Located x;                ///< vertical line at this value (number or date)
  std::string label;
  SourceLoc loc;
};

/// A note attached by a leader line to something in a panel: a point, a
/// category's bar, or a stretch of x drawn as a light band.
struct CalloutSpec {
  enum class Target { point, category, span };
  enum class Corner { none, upper_left, upper_right, lower_left, lower_right };
  std::string text;
  double width = 0;  ///< wrap width in points; 0 = automatic
  Target target = Target::point;
  Located x, y;            ///< point target (x may be a date or a category)
  Located category;        ///< bar target
  Located from, to;        ///< span target along x
  Corner corner = Corner::none;      ///< pinned to a corner of the plot
  std::optional<Point> offset;       ///< pinned: note centre from the target, points (right, up)
  SourceLoc loc;
};

/// Dash of a line series, told apart from others without colour.
enum class DashStyle { solid, long_dash, short_dash, dotted, dash_dot };
/// Fill pattern of a bar series, drawn over its colour.
enum class FillPattern { plain, hatch, back_hatch, cross_hatch, dots };

/// One series' look as the author chose it.
struct SeriesLookSpec {
  Located name;                       ///< the series (a value of series-by)
  std::optional<Rgb> colour;          ///< parsed already; loc of the value in `colour_loc`
  SourceLoc colour_loc;
  std::optional<DashStyle> dash;
  std::optional<FillPattern> pattern;
};

/// How series are coloured: on the page, or for one panel (unset values
/// fall back to the page's).
struct ColourSpec {
  Located palette;                    ///< a forme palette's name; empty = the page's (or estuary)
  std::optional<double> midpoint;     ///< diverging: the value at the neutral middle (default 0)
  SourceLoc midpoint_loc;
  std::optional<bool> patterns;       ///< also tell series apart by dash (lines) and fill pattern (bars)
  SourceLoc patterns_loc;
  std::vector<SeriesLookSpec> series; ///< explicit looks by series name
  /// Set by a report, not read from the description: the place in a
  /// categorical palette each series name took on earlier pages, which it
  /// keeps on this one where it can (layout/series_looks.h).
  std::map<std::string, std::size_t> kept;
  SourceLoc loc;
};

enum class Trend { none, line, line_with_equation };
enum class AspectRule { fill, bank_median_slope, bank_orientation };

struct PanelSpec {
  ChartKind kind = ChartKind::line;
  Located table, x, y, series_by;
  std::string title;
  AxisSpec x_axis, y_axis;
  /// Rows kept: column → wanted cell text (all must match).
  std::vector<std::pair<Located, Located>> where;
  TransformSpec transform;
  std::vector<ReferenceLine> references;
  Trend trend = Trend::none;
  AspectRule aspect = AspectRule::fill;
  bool value_labels = false;  ///< write values on bars; on line panels, at `line_values`
  /// Line panels: which points of each series have their value written.
  enum class LineValues { last, highest, lowest, extremes };
  LineValues line_values = LineValues::last;
  bool line_values_named = false;  ///< written as a word (last, highest…), which only line panels take
  SourceLoc value_labels_loc;
  Located label_points_by;    ///< dot panels: column whose text names each point
  Located label_priority;     ///< number column: higher values are labelled first
  std::vector<CalloutSpec> callouts;
  ColourSpec colours;         ///< this panel's palette and series looks
  SourceLoc aspect_loc;
  SourceLoc loc;  ///< the panel mapping (or grid) this came from
};

struct GridSpec {
  int columns = 0;  ///< 0: chosen from the panel count
  int rows = 0;     ///< 0: as many as needed
  Located one_panel_per;  ///< column whose distinct values each get a panel
  std::vector<std::string> order;  ///< optional order of those values
  double gap = 0;   ///< points between panels; 0 = automatic
  bool free_x = false, free_y = false;  ///< panels have their own scales (the page says so)
  std::optional<bool> outer_labels;     ///< tick labels on outer panels only; unset = by grid size
  SourceLoc scales_loc;
  SourceLoc loc;
};

struct TableSource {
  std::string name;
  std::string path;          ///< resolved against the page file's folder
  std::string display_path;  ///< as written
  std::map<std::string, ColumnType, std::less<>> declared;
  std::vector<std::string> missing;  ///< cell texts that mean no value (`missing:`)
  SourceLoc loc;
};

/// Document information for the PDF; its title is the heading's title.
struct DocumentSpec {
  std::string author, subject;
  std::vector<std::string> keywords;
};

/// What a PDF carries of the data besides the chart.
struct DataSpec {
  bool attach = true;       ///< embed each panel's plotted rows as a CSV file
  bool table_page = false;  ///< set the plotted rows as a table after the chart
};

/// What a page is for: it sets the reading distance and the type steps.
enum class Job { none, figure, briefing, report, poster };

/// Type and stroke sizes the page states; 0 = from the job and sheet.
struct TypeSpec {
  Job job = Job::none;
  double reading_distance_cm = 0;
  double title = 0, standfirst = 0, panel_title = 0, note = 0;  ///< points
  double line_width = 0, rule_width = 0, tick_length = 0, dot_radius = 0;  ///< points
};

struct PageSpec {
  std::string file;      ///< the description's path, for messages
  std::string base_dir;  ///< folder that relative paths start from
  SheetSpec sheet;
  std::string title, standfirst;
  std::vector<TableSource> tables;
  GridSpec grid;
  /// Panels as listed, or (with one_panel_per) the single template panel.
  std::vector<PanelSpec> panels;
  std::string source;
  std::vector<std::string> notes;
  std::vector<Located> source_links;  ///< URLs the source line links to
  std::string limitations;            ///< what the data cannot show
  DocumentSpec document;
  DataSpec data;
  double type_size = 0;  ///< base text size in points; 0 = from the job, else the sheet
  TypeSpec type;
  SourceLoc heading_loc;  ///< the heading's title (or standfirst), blamed when it crowds out the panels
  SourceLoc footer_loc;   ///< the source note (or notes, limitations), likewise
  ColourSpec colours;    ///< the page's palette and series looks
  bool greyscale = false;  ///< painted in grey, for black-and-white printing
  /// The text's language, a BCP 47 tag (e.g. "en-GB"); empty: not stated.
  /// Sets the PDF /Lang, the SVG lang and the base direction of the text.
  Located language;
  SourceLoc loc;
};

}  // namespace forme
