#pragma once
/// Which colour, dash and fill pattern each series of each panel wears.
///
/// A panel takes its palette from its own `colours` or the page's (estuary
/// by default). Categorical palettes hand out colours in order of first
/// appearance on the page, keyed by each series' own name — the value of
/// its series-by column, before a transform renames it ("North − South" is
/// still "North") — so a series keeps its colour and dash in every panel.
/// Graded palettes (sequential) give ordered series — numeric names in
/// numeric order, others as they appear — evenly spaced classes from their
/// stops that stand out from the paper; a diverging palette needs series named by numbers and
/// draws the midpoint (default 0) in its neutral middle, values below on
/// one arm and above on the other, on one step size for both arms.
/// In a report, a name keeps the place it took on an earlier page
/// (`ColourSpec::kept`) unless the page needs it for a series before it;
/// a new name takes a place no earlier page gave.
/// A series given its own colour takes none of the palette's, which go to
/// the rest in order. With `patterns: true`, series
/// get dashes (lines) and fill patterns (bars) in the same page order as
/// their colours, so a categorical palette of n colours tells
/// lcm(n, 5) series apart instead of n.
#include <map>
#include <optional>
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
  /// Categorical palettes: the series' place (colour = place mod colours,
  /// dash = place mod dashes), which a report keeps for it on later pages.
  std::optional<std::size_t> place;
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

/// A series' own name: `name` as the panel shows it, less what the panel's
/// transform added (a difference's " − MINUS").
std::string series_identity(const std::string& name, const PanelSpec& panel);

/// Looks for every panel, in panel order. Throws InputError when a page
/// has more series than a categorical palette has colours (or looks, with
/// patterns), located at the series-by key of the first panel that runs out
/// whether the palette was named or not; when a panel asks for more classes
/// than a graded palette keeps distinct (at the palette); or when a
/// diverging palette meets series names that are not numbers.
std::vector<PanelLooks> assign_looks(const PageSpec& spec, const std::vector<PanelData>& panels);

/// Dash lengths (on, off, …) in points for a line `width` points wide;
/// empty for solid.
std::vector<double> dash_lengths(DashStyle d, double width);

/// The vector pattern drawn over a bar of colour `fill` (none for plain):
/// spaced for a page whose base type size is `base` points, in paper white
/// or text ink, whichever stands out more from the fill.
std::optional<Hatch> hatch_for(FillPattern pattern, const Rgb& fill, double base);

}  // namespace forme
