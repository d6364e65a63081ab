#include "colour/text_ink.h"

#include "colour/contrast.h"
#include "colour/convert.h"

namespace forme {

Rgb text_ink(const Rgb& colour, const Rgb& background, double ratio) {
  if (meets(contrast_ratio(colour, background), ratio)) return colour;
  OkLch c = to_oklch(colour);
  // A grey's hue is numerical noise; darken it as an exact grey.
  if (c.c < 1e-4) c.c = 0;
  // Bisect on lightness: contrast against a light paper grows as L falls.
  double lo = 0, hi = c.l;
  for (int i = 0; i < 40; ++i) {
    const double mid = (lo + hi) / 2;
    if (meets(contrast_ratio(round_to_8bit(from_oklch({mid, c.c, c.h})), background), ratio)) lo = mid;
    else hi = mid;
  }
  Rgb out = round_to_8bit(from_oklch({lo, c.c, c.h}));
  // Rounding to 8 bits can cost a hair of contrast; step down until it holds.
  for (double L = lo; !meets(contrast_ratio(out, background), ratio) && L > 0; L -= 0.002)
    out = round_to_8bit(from_oklch({L, c.c, c.h}));
  return out;
}

}  // namespace forme
