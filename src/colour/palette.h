#pragma once
/// forme's own palettes, designed in OKLCH for lines, bars and areas on
/// white paper, and the neutral inks for text, axes and grids.
///
/// Every palette is specified as OKLCH stops in palette.cpp, mapped into
/// sRGB (`from_oklch`) and rounded to 8-bit codes, so each colour has an
/// exact "#rrggbb". The promises below are measured by the palette audit
/// test (tests/unit/colour/palette_audit_test.cpp) with audit.h: ΔE00 is
/// CIEDE2000, deficiencies are Machado 2009 at severity 1.0.
///
/// "estuary" (categorical, 8 colours; the default):
/// - every colour has ≥ 3:1 contrast against white (WCAG SC 1.4.11);
/// - all 8: pairwise ΔE00 ≥ 20 with normal vision, ≥ 8 under simulated
///   protan, deutan and tritan vision (Machado, and Brettel 1997 as a
///   second model);
/// - the first 5: pairwise ΔE00 ≥ 12 under each simulated deficiency
///   (Machado);
/// - the first 3 stay apart in greyscale (ΔE00 ≥ 10); beyond three series
///   a black-and-white print needs direct labels or marker shapes.
/// Measured (8-bit colours): contrast ≥ 3.12; normal 26.7; all 8 under
/// protan/deutan/tritan 10.8/11.0/13.9 (Brettel 9.8/11.0/11.0); first 5
/// 18.4/15.3/16.5; first 3 greyscale 13.4.
///
/// "fjord", "heath" (sequential, 9 stops, light to dark): OKLab L falls
/// by ≥ 0.07 at every step; neighbouring stops differ by ΔE00 ≥ 5 under
/// normal vision, each deficiency and greyscale.
///
/// "foreshore" (diverging, 9 stops): an exactly neutral grey midpoint
/// (OKLCH C < 0.002), arms of equal lightness (within 0.01 in OKLab L) in
/// clay and sea blue; neighbouring stops differ by ΔE00 ≥ 10 under normal
/// vision and each deficiency. The two arms differ only in hue, so on a
/// black-and-white print the sign must be labelled.
#include <string>
#include <string_view>
#include <vector>

#include "colour/rgb.h"

namespace forme {

enum class PaletteKind { categorical, sequential, diverging };

struct Palette {
  std::string name;
  PaletteKind kind = PaletteKind::categorical;
  std::vector<Rgb> colours;  ///< categorical: in order of use; others: light → dark / end → end
};

/// Most classes a sequential or diverging scale is sampled into; beyond
/// this readers cannot match shades to the legend reliably.
inline constexpr int max_classes = 9;

/// Every forme palette, the default categorical one first.
const std::vector<Palette>& all_palettes();

/// The palette called `name`, or nullptr.
const Palette* find_palette(std::string_view name);

/// The default categorical palette ("estuary").
const Palette& default_categorical();

/// The first `n` colours of a categorical palette. Throws
/// std::invalid_argument (message meant for the reader of the page) when
/// `n` exceeds the palette's size, when `n` < 1, or when the palette is
/// not categorical.
std::vector<Rgb> take_categorical(const Palette& p, int n);

/// `n` evenly spaced classes (2 ≤ n ≤ 9) of a sequential or diverging
/// palette, interpolated in OKLab between its stops and rounded to 8-bit
/// codes; the ends are the palette's ends, and for a diverging palette an
/// odd `n` keeps the neutral midpoint. Throws std::invalid_argument beyond
/// 9 classes (suggesting grouping or direct labels), below 2, or for a
/// categorical palette.
std::vector<Rgb> sample_sequential(const Palette& p, int n);

/// Neutral inks, slightly cool (OKLCH hue 260, chroma ≤ 0.012) so they sit
/// with the palettes rather than looking like printer black. Each is the
/// 8-bit rounding of the OKLCH value given; WCAG contrast against white in
/// brackets.
namespace ink {
/// Titles, labels, body text: OKLCH 0.25 0.012 260 (16.0:1).
inline constexpr Rgb text = rgb8(0x1e, 0x22, 0x28);
/// Secondary text (source notes, units, axis titles): OKLCH 0.52 0.010 260
/// (5.50:1, above the 4.5:1 of SC 1.4.3 with room for thin glyphs).
inline constexpr Rgb muted = rgb8(0x66, 0x69, 0x6f);
/// Axis lines, tick marks, leader lines: OKLCH 0.40 0.010 260 (9.2:1).
inline constexpr Rgb rule = rgb8(0x45, 0x48, 0x4d);
/// Gridlines: OKLCH 0.90 0.005 260 (1.35:1). Deliberately faint so the grid
/// recedes behind the data (common practice); never use it for data marks.
inline constexpr Rgb grid = rgb8(0xdc, 0xde, 0xe1);
}  // namespace ink

/// Named inks for lookup from page descriptions ("ink.text" etc.).
struct NamedInk {
  std::string_view name;
  Rgb colour;
};
inline constexpr NamedInk named_inks[] = {
    {"text", ink::text}, {"muted", ink::muted}, {"rule", ink::rule}, {"grid", ink::grid}};

}  // namespace forme
