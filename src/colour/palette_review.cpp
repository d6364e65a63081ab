#include "colour/palette_review.h"

#include <algorithm>

#include "colour/difference.h"

namespace forme {

namespace {

double min_neighbours(const std::vector<Rgb>& colours, Vision v) {
  double worst = 1e300;
  for (std::size_t i = 0; i + 1 < colours.size(); ++i)
    worst = std::min(worst, delta_e(as_seen(colours[i], v), as_seen(colours[i + 1], v)));
  return worst;
}

}  // namespace

bool PaletteReview::passes() const {
  return std::all_of(visions.begin(), visions.end(), [](const VisionReview& v) { return v.passes(); });
}

PaletteReview review_palette(const Palette& p) {
  PaletteReview r;
  r.palette = &p;
  for (Vision v : all_visions) {
    VisionReview vr;
    vr.vision = v;
    switch (p.kind) {
      case PaletteKind::categorical:
        if (v == Vision::greyscale) {
          const std::vector<Rgb> first3(p.colours.begin(), p.colours.begin() + std::min<std::size_t>(3, p.colours.size()));
          vr.min_delta_e = closest_pair(first3, v)->delta_e;
          vr.floor = 10;
          vr.scope = "first 3";
        } else {
          vr.min_delta_e = closest_pair(p.colours, v)->delta_e;
          vr.floor = v == Vision::normal ? 20 : 8;
          vr.scope = "all pairs";
        }
        break;
      case PaletteKind::sequential:
        vr.min_delta_e = min_neighbours(p.colours, v);
        vr.floor = 5;
        vr.scope = "neighbours";
        break;
      case PaletteKind::diverging:
        vr.min_delta_e = min_neighbours(p.colours, v);
        if (v != Vision::greyscale) vr.floor = 10;
        vr.scope = "neighbours";
        break;
    }
    r.visions.push_back(vr);
  }
  return r;
}

}  // namespace forme
