// Text set in a series colour must still read: WCAG 2.x SC 1.4.3 asks a
// contrast of at least 4.5:1 for normal-size text (check-values.md §2b).
#include <catch2/catch.hpp>

#include "colour/contrast.h"
#include "colour/convert.h"
#include "colour/palette.h"
#include "colour/text_ink.h"

using namespace forme;

TEST_CASE("text ink of every default series colour reaches 4.5:1 on white, keeping its hue", "[colour]") {
  const Rgb white{1, 1, 1};
  for (const Rgb& c : default_categorical().colours) {
    Rgb ink = text_ink(c, white);
    INFO(to_hex(c) << " -> " << to_hex(ink));
    CHECK(meets(contrast_ratio(ink, white), 4.5));
    if (contrast_ratio(c, white) >= 4.5) {
      CHECK(ink == c);  // already dark enough: unchanged
    } else {
      // Darkened only as far as needed: a little lighter would fail.
      OkLch l = to_oklch(ink);
      Rgb lighter = round_to_8bit(from_oklch({l.l + 0.02, l.c, l.h}));
      CHECK_FALSE(meets(contrast_ratio(lighter, white), 4.5));
      CHECK(std::abs(to_oklch(c).h - l.h) < 3.0);
    }
  }
}

TEST_CASE("a light grey becomes the lightest grey that passes: #767676 on white", "[colour]") {
  // check-values.md §2c: #767676 on white is 4.54:1 (passes), #777777 is 4.48:1 (fails);
  // greys keep R = G = B under OKLCH darkening at zero chroma.
  Rgb ink = text_ink(rgb8(0x99, 0x99, 0x99), Rgb{1, 1, 1});
  CHECK(to_hex(ink) == "#767676");
}
