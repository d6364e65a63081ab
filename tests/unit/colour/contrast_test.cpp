// WCAG 2.x relative luminance and contrast (check-values.md §2b, §2c).
#include <catch2/catch.hpp>

#include "colour/contrast.h"

using Catch::Matchers::WithinAbs;
using namespace forme;

namespace {
const Rgb kWhite = {1, 1, 1};
const Rgb kBlack = {0, 0, 0};
Rgb hex3(int r, int g, int b) {  // "#rgb": each digit doubled
  return rgb8(static_cast<std::uint8_t>(r * 17), static_cast<std::uint8_t>(g * 17),
              static_cast<std::uint8_t>(b * 17));
}
}  // namespace

TEST_CASE("relative luminance uses the WCAG coefficients", "[colour]") {
  // w3c/wcag relative-luminance definition: L = 0.2126 R + 0.7152 G + 0.0722 B.
  CHECK_THAT(relative_luminance({1, 0, 0}), WithinAbs(0.2126, 1e-15));
  CHECK_THAT(relative_luminance({0, 1, 0}), WithinAbs(0.7152, 1e-15));
  CHECK_THAT(relative_luminance({0, 0, 1}), WithinAbs(0.0722, 1e-15));
  CHECK_THAT(relative_luminance(kWhite), WithinAbs(1.0, 1e-15));
  CHECK(relative_luminance(kBlack) == 0.0);
}

TEST_CASE("contrast ratios published by library test suites", "[colour]") {
  // color.js test/contrast.js, ε 1e-4.
  CHECK_THAT(contrast_ratio(kBlack, kWhite), WithinAbs(21.0, 1e-4));
  CHECK_THAT(contrast_ratio(kWhite, kWhite), WithinAbs(1.0, 1e-4));
  CHECK_THAT(contrast_ratio(hex3(15, 15, 14), kWhite), WithinAbs(1.01007, 1e-4));
  CHECK_THAT(contrast_ratio(rgb8(0xaf, 0xba, 0xae), kWhite), WithinAbs(2.008125, 1e-4));
  CHECK_THAT(contrast_ratio(rgb8(0x8b, 0x99, 0x86), kWhite), WithinAbs(3.000644, 1e-4));
  CHECK_THAT(contrast_ratio(hex3(7, 6, 5), kWhite), WithinAbs(5.502984, 1e-4));
  // Ogeon/palette relative_contrast.rs tests, ε 0.01.
  CHECK_THAT(contrast_ratio(hex3(6, 0, 0), kWhite), WithinAbs(13.41, 0.01));
  CHECK_THAT(contrast_ratio(hex3(6, 0, 0), kBlack), WithinAbs(1.56, 0.01));
  CHECK_THAT(contrast_ratio(hex3(0, 6, 6), kWhite), WithinAbs(6.79, 0.01));
  CHECK_THAT(contrast_ratio(hex3(0, 6, 6), kBlack), WithinAbs(3.09, 0.01));
  CHECK_THAT(contrast_ratio(hex3(9, 15, 9), kWhite), WithinAbs(1.22, 0.01));
  CHECK_THAT(contrast_ratio(hex3(9, 15, 9), kBlack), WithinAbs(17.11, 0.01));
  // Order does not matter: lighter over darker.
  CHECK(contrast_ratio(kWhite, hex3(0, 6, 6)) == contrast_ratio(hex3(0, 6, 6), kWhite));
}

TEST_CASE("grey boundary pairs for 4.5:1 and 3:1 on white", "[colour]") {
  // #767676 is 4.54 (secondary web pages, V) and the lightest neutral grey
  // that passes 4.5:1; #777777 fails. Exact values are D (regression).
  double c76 = contrast_ratio(rgb8(0x76, 0x76, 0x76), kWhite);
  double c77 = contrast_ratio(rgb8(0x77, 0x77, 0x77), kWhite);
  CHECK_THAT(c76, WithinAbs(4.54, 0.005));
  CHECK_THAT(c76, WithinAbs(4.542225, 1e-6));
  CHECK_THAT(c77, WithinAbs(4.478089, 1e-6));
  CHECK(meets(c76, wcag::text_aa));
  CHECK_FALSE(meets(c77, wcag::text_aa));
  // #595959 is 7.0 (secondary web page, V): passes AAA.
  CHECK_THAT(contrast_ratio(rgb8(0x59, 0x59, 0x59), kWhite), WithinAbs(7.0, 0.005));
  CHECK(meets(contrast_ratio(rgb8(0x59, 0x59, 0x59), kWhite), wcag::text_aaa));
  // #949494 passes 3:1, #999999 fails (D).
  CHECK(meets(contrast_ratio(rgb8(0x94, 0x94, 0x94), kWhite), wcag::graphics));
  CHECK_FALSE(meets(contrast_ratio(rgb8(0x99, 0x99, 0x99), kWhite), wcag::graphics));
  // #8b9986 just passes 3:1 (color.js value 3.000644).
  CHECK(meets(contrast_ratio(rgb8(0x8b, 0x99, 0x86), kWhite), wcag::graphics));
  // Primaries against white and black (D: L = 0.2126, 0.0722, 0.7152).
  CHECK_THAT(contrast_ratio({1, 0, 0}, kWhite), WithinAbs(3.998477, 1e-6));
  CHECK_THAT(contrast_ratio({0, 0, 1}, kWhite), WithinAbs(8.592471, 1e-6));
  CHECK_THAT(contrast_ratio({0, 1, 0}, kBlack), WithinAbs(15.304000, 1e-6));
}

TEST_CASE("meets() does not round at the threshold", "[colour]") {
  // W3C Understanding Non-text Contrast: "2.999:1 would not meet the 3:1
  // threshold" (check-values §2b).
  CHECK_FALSE(meets(2.999, 3.0));
  CHECK_FALSE(meets(4.499, 4.5));
  CHECK(meets(3.0, 3.0));
  CHECK(meets(4.5, wcag::text_aa));
}
