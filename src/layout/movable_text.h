#pragma once
/// Text whose place forme chooses once every panel is drawn: callouts and
/// point names. At that moment the page holds all fixed text (heading,
/// titles, tick labels, axis titles, footer, line-end and value labels) and
/// knows where every data mark lies, so each movable piece is placed in
/// page coordinates against all of it and against what was placed before:
/// nothing collides across panels or with the furniture.
///
/// Order: labels with a few fixed spots first (reference-line labels, whose
/// place is nearly given), then callouts (the author wrote them, so they
/// matter most), then point names, panel by panel, each seeing everything
/// placed before it.
/// A point name that finds no room is joined to its point by a leader line
/// or, failing that, left out and reported as a warning at its table row.
#include <string>
#include <vector>

#include "base/diagnostic.h"
#include "describe/page_spec.h"
#include "text/shaped_text.h"
#include "layout/page_style.h"
#include "paint/display_list.h"

namespace forme {

struct PointNameRequest {
  Point anchor;        ///< centre of the dot
  double radius = 0;   ///< the dot's radius: names keep clear of it
  std::string text;
  double priority = 1; ///< > 0, higher is named first
  SourceLoc loc;       ///< its table row, for the warning if left out
  bool is_value = false;  ///< a value label at a point of a line, not a name from the table
};

struct CalloutRequest {
  const CalloutSpec* spec = nullptr;  ///< text, width and any pinned place
  Point target;                       ///< where the leader starts
};

/// A label with a few possible spots, best first (a reference line's
/// label: above or below the line, at its right or left end). The page
/// pass takes the first spot clear of all text, covering the fewest marks.
struct SpotChoiceRequest {
  ShapedText text;
  std::vector<Rect> spots;  ///< boxes of text.width × text.height(), best first
  Rgb ink;
  TextRole role = TextRole::value_label;
  SourceLoc loc;  ///< for the warning when every spot covers text
};

/// Everything movable in one panel.
struct PanelMovables {
  Rect plot;
  std::vector<SpotChoiceRequest> choices;
  std::vector<CalloutRequest> callouts;
  std::vector<PointNameRequest> names;
};

/// Places every panel's callouts and point names on `page`, adding text and
/// leader lines to it, and reports what could not be placed.
void place_movable_text(const std::vector<PanelMovables>& panels, const PageStyle& st, DisplayPage& page,
                        DiagnosticSink& warnings);

}  // namespace forme
