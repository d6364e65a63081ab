#include "colour/palette.h"

#include <algorithm>
#include <stdexcept>
#include <string>

#include "colour/convert.h"

namespace forme {
namespace {

// estuary: three lightness tiers, alternated so that neighbouring series
// differ in lightness as well as hue; lightness survives every colour-vision
// deficiency and black-and-white printing, hue does not.
// - mid tier, OKLab L 0.52: the first colour, a slate blue;
// - light tier, L 0.65–0.66: as light as 3:1 contrast on white allows;
// - dark tier, L 0.40–0.41: dark enough to separate from the light tier,
//   yet clearly coloured next to text ink (L 0.25).
// Hues are spread round the circle. The first two, blue and amber, lie on
// the blue–yellow axis that protan and deutan vision keeps; the third, a
// dark oxblood, is set apart from both by lightness. The plum turns to
// 335°, away from the oxblood, because tritan vision pulls pinks towards
// red. Chroma stays at or below 0.18 so no series shouts over the others.
// The exact values were refined on a grid (L 0.01, C 0.01, hue 5°) against
// the audit's numbers.
constexpr OkLch kEstuary[] = {
    {0.52, 0.12, 255},  // slate blue
    {0.65, 0.16, 55},   // amber
    {0.40, 0.16, 30},   // oxblood
    {0.65, 0.10, 205},  // shallow-water teal
    {0.40, 0.12, 335},  // plum
    {0.41, 0.10, 155},  // deep moss
    {0.65, 0.10, 130},  // sage
    {0.66, 0.18, 310},  // orchid
};

// fjord: pale ice to deep water. L falls evenly from 0.96 to 0.30; the hue
// turns from cyan-blue (210°) to ink blue (265°) and the chroma arcs,
// highest mid-ramp, where sRGB has room for it.
constexpr OkLch kFjord[] = {
    {0.96, 0.035, 210}, {0.88, 0.090, 217}, {0.79, 0.120, 224},
    {0.71, 0.135, 231}, {0.63, 0.135, 238}, {0.55, 0.135, 244},
    {0.46, 0.120, 251}, {0.38, 0.095, 258}, {0.30, 0.065, 265},
};

// heath: pale blush to deep heather, a warm counterpart to fjord with the
// same lightness steps; hue 355° → 305°.
constexpr OkLch kHeath[] = {
    {0.95, 0.025, 355}, {0.87, 0.080, 349}, {0.79, 0.130, 342},
    {0.71, 0.150, 336}, {0.62, 0.160, 330}, {0.54, 0.155, 324},
    {0.46, 0.140, 318}, {0.38, 0.120, 311}, {0.30, 0.090, 305},
};

// foreshore: wet clay ↔ neutral light grey ↔ sea blue. The arms mirror each
// other in L (0.43, 0.57, 0.71, 0.84 outward-in) so neither side looks
// heavier; clay and blue sit across the blue–yellow axis, which protan and
// deutan vision keeps. The midpoint is an exact grey, light enough to read
// as "no change" yet visible as a fill on white.
constexpr OkLch kForeshore[] = {
    {0.43, 0.110, 45},  {0.57, 0.130, 50},  {0.71, 0.100, 55},
    {0.84, 0.050, 60},  {0.95, 0.000, 0},   {0.84, 0.050, 235},
    {0.71, 0.090, 238}, {0.57, 0.120, 242}, {0.43, 0.110, 248},
};

template <std::size_t N>
Palette make(std::string name, PaletteKind kind, const OkLch (&stops)[N]) {
  Palette p{std::move(name), kind, {}};
  for (const OkLch& s : stops) p.colours.push_back(round_to_8bit(from_oklch(s)));
  return p;
}

std::string quoted(const Palette& p) { return "palette '" + p.name + "'"; }

}  // namespace

const std::vector<Palette>& all_palettes() {
  static const std::vector<Palette> palettes = {
      make("estuary", PaletteKind::categorical, kEstuary),
      make("fjord", PaletteKind::sequential, kFjord),
      make("heath", PaletteKind::sequential, kHeath),
      make("foreshore", PaletteKind::diverging, kForeshore),
  };
  return palettes;
}

const Palette* find_palette(std::string_view name) {
  for (const Palette& p : all_palettes()) {
    if (p.name == name) return &p;
  }
  return nullptr;
}

const Palette& default_categorical() { return all_palettes().front(); }

std::vector<Rgb> take_categorical(const Palette& p, int n) {
  if (p.kind != PaletteKind::categorical) {
    throw std::invalid_argument(quoted(p) + " is a graded scale, not a set of series colours; "
                                "use a categorical palette such as 'estuary'");
  }
  if (n < 1) {
    throw std::invalid_argument("asked for " + std::to_string(n) + " colours from " + quoted(p) +
                                "; at least 1 is needed");
  }
  auto size = static_cast<int>(p.colours.size());
  if (n > size) {
    throw std::invalid_argument(
        std::to_string(n) + " series need more colours than " + quoted(p) + " has (" +
        std::to_string(size) + "); group the smallest series into one, split the chart into "
        "small multiples, or label the lines directly");
  }
  return {p.colours.begin(), p.colours.begin() + n};
}

std::vector<Rgb> sample_sequential(const Palette& p, int n) {
  if (p.kind == PaletteKind::categorical) {
    throw std::invalid_argument(quoted(p) + " is a set of series colours, not a graded scale; "
                                "use a sequential or diverging palette such as 'fjord'");
  }
  if (n > max_classes) {
    throw std::invalid_argument(
        std::to_string(n) + " classes are more than readers can match to a legend (at most " +
        std::to_string(max_classes) + "); group the values into " +
        std::to_string(max_classes) + " or fewer classes, or label the values directly");
  }
  if (n < 2) {
    throw std::invalid_argument("a graded scale needs at least 2 classes, got " +
                                std::to_string(n));
  }
  std::vector<OkLab> stops;
  for (const Rgb& c : p.colours) stops.push_back(to_oklab(c));
  std::vector<Rgb> out;
  std::size_t last = p.colours.size() - 1;
  for (int i = 0; i < n; ++i) {
    // Position along the stops; exact whenever it is a whole number, so the
    // ends (and the midpoint for odd n) are the stored colours themselves.
    double pos = static_cast<double>(last) * i / (n - 1);
    std::size_t k = std::min(static_cast<std::size_t>(pos), last - 1);
    double t = pos - static_cast<double>(k);
    if (t == 0.0 || t == 1.0) {
      out.push_back(p.colours[k + (t == 1.0 ? 1 : 0)]);
      continue;
    }
    OkLab a = to_oklab(p.colours[k]);
    OkLab b = to_oklab(p.colours[k + 1]);
    OkLab mix = {a.l + t * (b.l - a.l), a.a + t * (b.a - a.a), a.b + t * (b.b - a.b)};
    out.push_back(round_to_8bit(from_oklch(to_oklch(mix))));
  }
  return out;
}

}  // namespace forme
