#pragma once
/// The painted page as plain values: shapes and shaped text in page
/// coordinates (points, y down). Layout produces it; painters consume it and
/// know nothing else about the page.
#include <optional>
#include <string>
#include <variant>
#include <vector>

#include "base/diagnostic.h"
#include "base/geometry.h"
#include "colour/rgb.h"
#include "text/shaped_text.h"

namespace forme {

struct Stroke {
  Rgb colour;
  double width = 0.5;            ///< points
  std::vector<double> dash;      ///< on/off lengths in points; empty = solid
  bool round = false;            ///< round caps and joins (lines), else butt/miter
};

/// A vector pattern drawn over a filled shape, clipped to it: parallel
/// lines (one or two directions) or a grid of dots.
struct Hatch {
  enum class Kind { lines, crossed, dots };
  Kind kind = Kind::lines;
  double angle = 45;   ///< degrees, counter-clockwise on the page, for lines
  double spacing = 3;  ///< points between lines or dot centres
  double width = 0.6;  ///< line width, or dot diameter, points
  Rgb ink;
};

/// What a drawn shape is for. Painters ignore it; the page audit and the
/// placer read it: text may not lie over data, a leader may cross only
/// what it points to, a callout box may not cover data.
enum class ShapeRole {
  furniture,    ///< rules, axis lines, ticks, backgrounds, swatches
  grid,         ///< light gridlines text may cross
  data,         ///< lines, dots, bars, areas, bands of the data
  reference,    ///< reference and trend lines
  leader,       ///< a leader line from a label to what it names
  callout_box,  ///< the paper behind a callout's note
};

/// A polyline or polygon.
struct PathItem {
  std::vector<Point> points;
  bool closed = false;
  std::optional<Rgb> fill;
  std::optional<Stroke> stroke;
  std::optional<Hatch> hatch;  ///< closed shapes: pattern over the fill
  ShapeRole role = ShapeRole::furniture;
  SourceLoc loc;  ///< the description key or table row it draws, for findings
};

/// A rectangle filled with `fill`: corners from the top left, clockwise
/// on the page.
inline PathItem filled_rect(const Rect& r, Rgb fill) {
  PathItem p;
  p.points = {{r.left(), r.top()}, {r.right(), r.top()}, {r.right(), r.bottom()}, {r.left(), r.bottom()}};
  p.closed = true;
  p.fill = fill;
  return p;
}

struct CircleItem {
  Point centre;
  double radius = 1;
  std::optional<Rgb> fill;
  std::optional<Stroke> stroke;
  ShapeRole role = ShapeRole::data;
  SourceLoc loc;  ///< the table row or description key it draws, for findings
};

/// What a piece of text is for; tests and the overlap check use it.
enum class TextRole {
  title, standfirst, panel_title, axis_title, tick_label, series_label, value_label, note, source,
  point_label, callout
};

struct TextItem {
  ShapedText text;
  Point origin;  ///< left end of the baseline
  Rgb colour;
  TextRole role = TextRole::note;
  SourceLoc loc;  ///< the description key or table row the text comes from; empty: the page

  /// The ink-independent box: advance width × (ascent + descent).
  Rect box() const {
    return {origin.x, origin.y - text.ascent, text.width, text.ascent + text.descent};
  }
};

/// An area a reader can click to open `uri` (a PDF link annotation,
/// ISO 32000-1 §12.5.6.5, with a URI action, §12.6.4.7).
struct LinkArea {
  Rect area;  ///< page coordinates, points, y down
  std::string uri;
};

using DisplayItem = std::variant<PathItem, CircleItem, TextItem>;

/// A run of items that together draw one panel: a figure in a tagged PDF
/// (ISO 32000-1 §14.8.4.5), with alternate text (§14.9.3).
struct FigureSpan {
  std::size_t first = 0, end = 0;  ///< item indices [first, end)
  std::string alt;                 ///< the panel in words
};

struct DisplayPage {
  double width = 0, height = 0;  ///< sheet size, points
  std::vector<DisplayItem> items;
  std::string title;  ///< document title for metadata
  /// Where layout put each panel's plot area, in panel order. Painters
  /// ignore it; checks and tests read it.
  std::vector<Rect> plot_areas;
  /// Where data is drawn (dots, bars, points sampled along lines), so that
  /// text placed later can keep clear of it. Painters ignore it.
  std::vector<Rect> data_marks;
  /// Clickable areas (PDF only; drawn by nothing, placed over items drawn).
  std::vector<LinkArea> links;
  /// Where the printed page is cut and how far its background runs past
  /// the cut (PDF TrimBox and BleedBox, ISO 32000-1 §14.11.2); unset when
  /// the sheet is the trimmed page itself.
  std::optional<Rect> trim_box, bleed_box;
  /// Which items draw each panel, for the PDF's structure tree.
  std::vector<FigureSpan> figures;

  void add(DisplayItem item) { items.push_back(std::move(item)); }
};

}  // namespace forme
