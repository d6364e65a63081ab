#pragma once
/// Colour findings about the composed page: can every reader tell a
/// panel's series apart, and read every piece of text?
///
/// - Series: every pair of series that share a panel, unless a dash (lines)
///   or fill pattern (bars) already separates them, must stay at least
///   `kSeriesDeltaE` CIEDE2000 apart for normal vision, under simulated
///   protan, deutan and tritan vision (Machado 2009, severity 1.0) and in
///   greyscale (CIE luminance kept). On a page painted in grey only the
///   greyscale view counts: series must differ in lightness, dash or
///   pattern.
/// - Graphics: every series colour against the paper reaches 3:1 (WCAG 2.x
///   SC 1.4.11, non-text contrast).
/// - Text: every piece of text against what is painted behind it reaches
///   4.5:1, or 3:1 at 18 pt and above (WCAG 2.x SC 1.4.3, large text). Bold
///   text from 14 pt is large text too in WCAG; forme holds it to 4.5:1,
///   the stricter reading.
/// Findings are located at the series' colour (its entry under
/// `colours.series`, or the palette), else the panel, else the page. Pairs
/// whose colours were chosen at one place are one finding: one pair as
/// itself, more as a count of pairs per vision among the series named.
#include <vector>

#include "base/diagnostic.h"
#include "describe/page_spec.h"
#include "layout/series_looks.h"
#include "paint/display_list.h"
#include "series/panel_data.h"

namespace forme {

/// Smallest ΔE00 between series colours that share a panel. Common
/// practice, not a standard: ΔE00 ≈ 1 is a just-noticeable difference for
/// large patches side by side, and thin lines and small marks need about
/// ten times that to be told apart at a glance.
inline constexpr double kSeriesDeltaE = 10;

/// Checks series colours (per panel, per simulated vision) and text
/// contrast on the laid-out page `page` (painted in grey when
/// `greyscale`), with the series looks the page was drawn with.
void audit_colours(const PageSpec& spec, const std::vector<PanelData>& panels, const std::vector<PanelLooks>& looks,
                   const DisplayPage& page, bool greyscale, DiagnosticSink& findings);

}  // namespace forme
