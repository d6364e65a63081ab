#pragma once
/// Fitting category names into the room a chart gives them.
///
/// Each name gets a box: `width` wide and `height` tall (a horizontal bar's
/// band beside the plot, an upright bar's slot under it). The names are
/// tried, in this order, until every one fits its box:
///  1. wrapped at UAX #14 break opportunities (`wrap_text`), at the size asked for;
///  2. the same at smaller sizes, in 0.5 pt steps down to `min_size`
///     (all names share one size, so the column reads as one);
///  3. at `min_size`, a name that still does not fit keeps the lines that
///     fit and its last line is shortened at a break with "…"
///     (`shorten_text`); that name is marked `shortened`.
/// A box less than one line tall still holds one line: the caller decides
/// whether to thin such labels.
#include <string>
#include <vector>

#include "text/shaped_text.h"

namespace forme {

/// One name as it will be set: one or more lines, each within the width.
struct FittedName {
  std::string full;  ///< the name as given
  std::vector<ShapedText> lines;
  bool shortened = false;  ///< cut with "…": the page should say so
};

struct NameFit {
  double size = 0;  ///< the one size every name is set in
  double line_height = 0;
  std::vector<FittedName> names;  ///< in the order given
  double box_width = 0;  ///< the width each name was fitted to
  double width = 0;   ///< widest line set
  int most_lines = 0; ///< deepest name, in lines
  int stride = 1;     ///< every stride-th name is shown (the others have no lines)
};

/// Fits `names` in boxes of `width` × `height` points, from `size` down to
/// `min_size`, with `max_lines` lines at most per name (0: as the height allows).
NameFit fit_names(const std::vector<std::string>& names, const FontRef& font, double size, double min_size,
                  double width, double height, int max_lines = 0);

/// Names in a row of slots `slot` wide (upright bars' categories): fitted
/// as `fit_names` does, each `gap` clear of its neighbours; when even then
/// some name would be cut, only every 2nd, 3rd… name is shown, each over
/// the room of that many slots, at the least stride where no shown name is
/// cut. When every stride cuts, all names are shown, cut.
NameFit fit_name_row(const std::vector<std::string>& names, const FontRef& font, double size, double min_size,
                     double slot, double gap, int max_lines);

}  // namespace forme
