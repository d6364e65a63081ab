#pragma once
/// The laid-out page as a reader sees it, checked before it is painted.
///
/// Every text's glyph run and every shape of the composed page is measured
/// in page coordinates, and these faults are found:
///   - text reaching the trim edge (the sheet when the page is not trimmed)
///     or beyond it, with how far;
///   - text over a data mark: a bar's or area's edge, a line, a dot, a
///     patterned fill under it (a value wholly inside its own bar is fine);
///   - text crossed by a reference or trend line, a leader or a rule
///     (gridlines may be crossed);
///   - text over other text;
///   - a callout's paper box over data;
///   - a leader crossing a data mark or reference line it does not point to;
///   - text set below the smallest size print carries.
///
/// The boxes are those an independent reader of the PDF measures: a run of
/// glyphs spans its inked advances (spaces at the ends left out); for
/// collisions it spans the baseline to 0.70 em up, grown 0.05 em on each
/// side so that faces nearer than 0.10 em count as touching; for the sheet
/// edge it spans 0.22 em below the baseline to 0.78 em above; against marks
/// it spans the glyphs' ink (cap height, descenders and accents when the
/// string has them), shrunk by 0.5 pt so a leader ending at its edge does
/// not count. Lines are their polylines with half their stroke width each
/// side; shapes lighter than 1.5:1 against the paper (pale bands, paper
/// rims) are not marks a reader sees over text.
///
/// Shapes and texts are looked up through a grid index, so the cost
/// follows the number of items plus the number of near pairs, not all pairs.
#include <string>
#include <vector>

#include "base/diagnostic.h"
#include "base/limits.h"
#include "describe/page_spec.h"
#include "paint/display_list.h"

namespace forme {

/// The smallest type size the audit accepts, points (common practice: 6 pt
/// is the least print carries legibly; `PageStyle` never sets less).
inline constexpr double kMinimumTypeSize = 6;

/// Kinds of layout fault, each reported in its own words.
enum class LayoutFault {
  off_sheet,          ///< text reaching the trim edge or beyond
  over_data,          ///< text over a data mark
  crossed_by_line,    ///< text crossed by a reference line, leader or rule
  over_text,          ///< text over text
  callout_over_data,  ///< a callout's box covers data
  leader_crossing,    ///< a leader crosses a mark it does not point to
  small_text,         ///< text under the minimum size
};

/// One fault, located at the item it concerns (empty: the page).
struct LayoutFinding {
  LayoutFault fault;
  SourceLoc loc;
  std::string subject;  ///< the text, or what the shape is
  std::string detail;   ///< what it lies over, or how far it runs out
  TextRole role = TextRole::note;  ///< for grouping findings about text
};

/// Every fault on `page`, in page order, one per item or pair of items.
std::vector<LayoutFinding> find_layout_faults(const DisplayPage& page, double minimum_size = kMinimumTypeSize);

/// Reports the faults of `page` into `findings` as warnings located at the
/// item (or `spec.loc`), many of one kind and role as one finding; more
/// than `limits.labels` labels on the page is an error.
void audit_layout(const PageSpec& spec, const DisplayPage& page, DiagnosticSink& findings,
                  const Limits& limits = {});

}  // namespace forme
