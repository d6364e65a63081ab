// Every palette forme ships passes its own review, the one the palette
// sheet prints; and the review can fail. The instruments (CIEDE2000,
// Machado 2009, greyscale) are tested against published values elsewhere.
#include <catch2/catch.hpp>

#include "colour/difference.h"
#include "colour/palette_review.h"

using namespace forme;

TEST_CASE("every forme palette passes its own review", "[colour][palette]") {
  for (const Palette& p : all_palettes()) {
    const PaletteReview r = review_palette(p);
    INFO(p.name);
    REQUIRE(r.visions.size() == all_visions.size());
    for (const VisionReview& v : r.visions) {
      INFO(to_string(v.vision) << " " << v.min_delta_e);
      CHECK(v.passes());
    }
    CHECK(r.passes());
  }
}

TEST_CASE("the review measures what the palette promises: any pair, or neighbours", "[colour][palette]") {
  const Palette& fjord = *find_palette("fjord");
  const PaletteReview r = review_palette(fjord);
  // Neighbouring stops, worked out here directly.
  double worst = 1e9;
  for (std::size_t i = 0; i + 1 < fjord.colours.size(); ++i)
    worst = std::min(worst, delta_e(fjord.colours[i], fjord.colours[i + 1]));
  CHECK(r.visions.front().min_delta_e == Approx(worst));
  CHECK(r.visions.front().scope == "neighbours");
  // foreshore promises nothing in greyscale: its arms differ only in hue.
  CHECK_FALSE(review_palette(*find_palette("foreshore")).visions.back().floor);
}

TEST_CASE("a palette with two near-equal colours fails its review", "[colour][palette]") {
  Palette bad = default_categorical();
  bad.colours[5] = rgb8(0x5b, 0x6f, 0xb0);  // close to the first colour, slate blue
  bad.colours[0] = rgb8(0x5a, 0x6e, 0xae);
  const PaletteReview r = review_palette(bad);
  CHECK_FALSE(r.passes());
  CHECK_FALSE(r.visions.front().passes());
  CHECK(r.visions.front().min_delta_e < 2);
}
