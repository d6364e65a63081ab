// The palette audit: every forme palette keeps the promises stated in
// src/colour/palette.h. Thresholds are forme's own design targets; the
// instruments are outside references tested elsewhere (CIEDE2000 against
// Sharma 2005, Machado 2009 and Brettel 1997 matrices, WCAG 2.x contrast).
#include <catch2/catch.hpp>

#include <set>
#include <stdexcept>

#include "colour/audit.h"
#include "colour/contrast.h"
#include "colour/convert.h"
#include "colour/cvd.h"
#include "colour/difference.h"
#include "colour/palette.h"

using namespace forme;

namespace {

const Rgb kWhite = {1, 1, 1};

double min_pair(const std::vector<Rgb>& colours, Vision v) {
  return closest_pair(colours, v)->delta_e;
}

double min_pair_brettel(const std::vector<Rgb>& colours, Deficiency d) {
  double worst = 1e9;
  for (std::size_t i = 0; i < colours.size(); ++i) {
    for (std::size_t j = i + 1; j < colours.size(); ++j) {
      worst = std::min(worst, delta_e(simulate_brettel(colours[i], d),
                                      simulate_brettel(colours[j], d)));
    }
  }
  return worst;
}

double min_adjacent(const std::vector<Rgb>& colours, Vision v) {
  double worst = 1e9;
  for (std::size_t i = 0; i + 1 < colours.size(); ++i) {
    worst = std::min(worst, delta_e(as_seen(colours[i], v), as_seen(colours[i + 1], v)));
  }
  return worst;
}

constexpr Vision kDeficiencies[] = {Vision::protan, Vision::deutan, Vision::tritan};

}  // namespace

TEST_CASE("palettes: names, kinds, sizes and exact 8-bit colours", "[colour][palette]") {
  std::set<std::string> names;
  for (const Palette& p : all_palettes()) {
    INFO(p.name);
    CHECK(names.insert(p.name).second);
    CHECK(find_palette(p.name) == &p);
    CHECK(p.colours.size() == (p.kind == PaletteKind::categorical ? 8u : 9u));
    for (const Rgb& c : p.colours) CHECK(round_to_8bit(c) == c);
  }
  CHECK(default_categorical().name == "estuary");
  CHECK(default_categorical().kind == PaletteKind::categorical);
  CHECK(find_palette("no-such-palette") == nullptr);
}

TEST_CASE("estuary: every colour reaches 3:1 on white as graphics", "[colour][palette]") {
  // WCAG SC 1.4.11 Non-text Contrast, no rounding.
  for (const Rgb& c : default_categorical().colours) {
    INFO(to_hex(c) << " " << contrast_ratio(c, kWhite));
    CHECK(meets(contrast_ratio(c, kWhite), wcag::graphics));
  }
}

TEST_CASE("estuary: pairwise differences under normal vision and CVD", "[colour][palette]") {
  const Palette& p = default_categorical();
  std::vector<Rgb> all8 = take_categorical(p, 8);
  std::vector<Rgb> first5 = take_categorical(p, 5);
  std::vector<Rgb> first3 = take_categorical(p, 3);

  CHECK(min_pair(all8, Vision::normal) >= 20);
  for (Vision v : kDeficiencies) {
    INFO(to_string(v));
    CHECK(min_pair(all8, v) >= 8);
    CHECK(min_pair(first5, v) >= 12);
  }
  for (Deficiency d : {Deficiency::protan, Deficiency::deutan, Deficiency::tritan}) {
    INFO("Brettel " << to_string(d));
    CHECK(min_pair_brettel(all8, d) >= 8);
  }
  CHECK(min_pair(first3, Vision::greyscale) >= 10);
}

TEST_CASE("sequential palettes: monotone lightness, visible steps for every reader",
          "[colour][palette]") {
  for (const Palette& p : all_palettes()) {
    if (p.kind != PaletteKind::sequential) continue;
    INFO(p.name);
    for (std::size_t i = 0; i + 1 < p.colours.size(); ++i) {
      CHECK(to_oklab(p.colours[i]).l - to_oklab(p.colours[i + 1]).l >= 0.07);
    }
    for (Vision v : all_visions) {
      INFO(to_string(v));
      CHECK(min_adjacent(p.colours, v) >= 5);
    }
    // Every sampling keeps the order and the ends.
    for (int n = 2; n <= max_classes; ++n) {
      INFO(n << " classes");
      std::vector<Rgb> s = sample_sequential(p, n);
      REQUIRE(s.size() == static_cast<std::size_t>(n));
      CHECK(s.front() == p.colours.front());
      CHECK(s.back() == p.colours.back());
      for (std::size_t i = 0; i + 1 < s.size(); ++i) {
        CHECK(to_oklab(s[i]).l > to_oklab(s[i + 1]).l);
      }
    }
    CHECK(sample_sequential(p, 9) == p.colours);
  }
}

TEST_CASE("diverging palette: neutral midpoint, balanced arms, visible steps",
          "[colour][palette]") {
  for (const Palette& p : all_palettes()) {
    if (p.kind != PaletteKind::diverging) continue;
    INFO(p.name);
    const std::size_t mid = p.colours.size() / 2;
    CHECK(to_oklch(p.colours[mid]).c < 0.002);
    for (std::size_t i = 0; i < mid; ++i) {
      double left = to_oklab(p.colours[i]).l;
      double right = to_oklab(p.colours[p.colours.size() - 1 - i]).l;
      CHECK(std::abs(left - right) <= 0.01);
      // Lightness rises towards the midpoint on both arms.
      CHECK(to_oklab(p.colours[i + 1]).l > left);
      CHECK(to_oklab(p.colours[p.colours.size() - 2 - i]).l > right);
    }
    CHECK(min_adjacent(p.colours, Vision::normal) >= 10);
    for (Vision v : kDeficiencies) {
      INFO(to_string(v));
      CHECK(min_adjacent(p.colours, v) >= 10);
    }
    // Odd class counts keep the neutral midpoint itself.
    for (int n : {3, 5, 7, 9}) {
      std::vector<Rgb> s = sample_sequential(p, n);
      CHECK(s[s.size() / 2] == p.colours[mid]);
    }
  }
}

TEST_CASE("neutral inks are the stated OKLCH values and meet their contrast roles",
          "[colour][palette]") {
  // The OKLCH values given beside each constant in palette.h.
  CHECK(ink::text == round_to_8bit(from_oklch({0.25, 0.012, 260})));
  CHECK(ink::muted == round_to_8bit(from_oklch({0.52, 0.010, 260})));
  CHECK(ink::rule == round_to_8bit(from_oklch({0.40, 0.010, 260})));
  CHECK(ink::grid == round_to_8bit(from_oklch({0.90, 0.005, 260})));
  // WCAG: body text AAA (SC 1.4.6), secondary text AA (SC 1.4.3), axis
  // lines as graphics (SC 1.4.11).
  CHECK(meets(contrast_ratio(ink::text, kWhite), wcag::text_aaa));
  CHECK(meets(contrast_ratio(ink::muted, kWhite), wcag::text_aa));
  CHECK(meets(contrast_ratio(ink::rule, kWhite), wcag::graphics));
  // Gridlines recede: fainter than any data colour and than the axis rule.
  for (const Rgb& c : default_categorical().colours) {
    CHECK(contrast_ratio(ink::grid, kWhite) < contrast_ratio(c, kWhite));
  }
  CHECK(contrast_ratio(ink::grid, kWhite) < contrast_ratio(ink::rule, kWhite));
}

TEST_CASE("asking a palette for too many classes explains what to do", "[colour][palette]") {
  const Palette& estuary = default_categorical();
  CHECK(take_categorical(estuary, 3).size() == 3);
  CHECK_THROWS_WITH(take_categorical(estuary, 10),
                    "10 series need more colours than palette 'estuary' has (8); group the "
                    "smallest series into one, split the chart into small multiples, or label "
                    "the lines directly");
  CHECK_THROWS_AS(take_categorical(estuary, 0), std::invalid_argument);
  CHECK_THROWS_AS(take_categorical(*find_palette("fjord"), 3), std::invalid_argument);

  const Palette& fjord = *find_palette("fjord");
  CHECK_THROWS_WITH(sample_sequential(fjord, 12),
                    "12 classes are more than readers can match to a legend (at most 9); group "
                    "the values into 9 or fewer classes, or label the values directly");
  CHECK_THROWS_AS(sample_sequential(fjord, 1), std::invalid_argument);
  CHECK_THROWS_AS(sample_sequential(estuary, 4), std::invalid_argument);
}
