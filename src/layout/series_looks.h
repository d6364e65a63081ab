#pragma once
/// Which colour, dash and fill pattern each series of each panel wears.
///
/// A panel takes its palette from its own `colours` or the page's (estuary
/// by default). Categorical palettes hand out colours in order of first
/// appearance on the page, so a series keeps its colour in every panel.
/// Graded palettes (sequential) give ordered series — numeric names in
/// numeric order, others as they appear — evenly spaced classes from their
/// stops that stand out from the paper; a diverging palette needs series named by numbers and
/// draws the midpoint (default 0) in its neutral middle, values below on
/// one arm and above on the other, on one step size for both arms.
/// A series given its own colour takes none of the palette's, which go to
/// the rest in order. With `patterns: true`, series
/// get dashes (lines) and fill patterns (bars) in each panel's order as well.
#include <map>
#include <string>
#include <vector>

#include "base/diagnostic.h"
#include "colour/palette.h"
#include "colour/rgb.h"
#include "describe/page_spec.h"
#include "paint/display_list.h"
#include "series/panel_data.h"

namespace forme {

struct SeriesLook {
  Rgb colour;
  DashStyle dash = DashStyle::solid;
  FillPattern pattern = FillPattern::plain;
  SourceLoc loc;  ///< where the colour was chosen: the series entry, the palette, or the panel
};

/// One panel's looks by series name (the unnamed series is "").
struct PanelLooks {
  std::map<std::string, SeriesLook> series;
  SourceLoc loc;  ///< the panel in the description
  std::string palette;  ///< the palette the panel uses
};

/// The stops of a sequential palette that series may wear: those that
/// reach 3:1 against `paper` (WCAG 2.x SC 1.4.11, graphics). Paler stops
/// are for areas behind data.
std::vector<Rgb> series_stops(const Palette& p, const Rgb& paper);

/// Looks for every panel, in panel order. Throws InputError, located at the
/// palette (or the series column), when a panel asks for more classes than
/// its palette can keep distinct, or when a diverging palette meets series
/// names that are not numbers.
std::vector<PanelLooks> assign_looks(const PageSpec& spec, const std::vector<PanelData>& panels);

/// Dash lengths (on, off, …) in points for a line `width` points wide;
/// empty for solid.
std::vector<double> dash_lengths(DashStyle d, double width);

/// The vector pattern drawn over a bar of colour `fill` (none for plain):
/// spaced for a page whose base type size is `base` points, in paper white
/// or text ink, whichever stands out more from the fill.
std::optional<Hatch> hatch_for(FillPattern pattern, const Rgb& fill, double base);

}  // namespace forme
