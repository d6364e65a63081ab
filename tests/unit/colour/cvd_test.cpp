// Colour-vision-deficiency simulation and greyscale (check-values.md §3).
#include <catch2/catch.hpp>

#include <stdexcept>

#include "colour/cvd.h"

using Catch::Matchers::WithinAbs;
using namespace forme;

namespace {

void check_matrix(const Matrix3& got, const Matrix3& want, double tol) {
  for (std::size_t i = 0; i < 3; ++i) {
    for (std::size_t j = 0; j < 3; ++j) {
      INFO("row " << i + 1 << ", column " << j + 1);
      CHECK_THAT(got[i][j], WithinAbs(want[i][j], tol));
    }
  }
}

constexpr Deficiency kAll[] = {Deficiency::protan, Deficiency::deutan, Deficiency::tritan};

}  // namespace

TEST_CASE("Machado 2009 matrices at severity 1.0 are the published ones", "[colour]") {
  // Machado, Oliveira & Fernandes 2009, as read in colour-science
  // machado2010.py and DaltonLens simulate.py (check-values §3a, V2).
  check_matrix(machado_matrix(Deficiency::protan, 1.0),
               {{{0.152286, 1.052583, -0.204868},
                 {0.114503, 0.786281, 0.099216},
                 {-0.003882, -0.048116, 1.051998}}},
               1e-12);
  check_matrix(machado_matrix(Deficiency::deutan, 1.0),
               {{{0.367322, 0.860646, -0.227968},
                 {0.280085, 0.672501, 0.047413},
                 {-0.011820, 0.042940, 0.968881}}},
               1e-12);
  check_matrix(machado_matrix(Deficiency::tritan, 1.0),
               {{{1.255528, -0.076749, -0.178779},
                 {-0.078411, 0.930809, 0.147602},
                 {0.004733, 0.691367, 0.303900}}},
               1e-12);
}

TEST_CASE("Machado 2009 matrices at severities 0.5 and 0.6 are the published ones", "[colour]") {
  // check-values §3a, severity-0.5 table (V2).
  check_matrix(machado_matrix(Deficiency::protan, 0.5),
               {{{0.458064, 0.679578, -0.137642},
                 {0.092785, 0.846313, 0.060902},
                 {-0.007494, -0.016807, 1.024301}}},
               1e-12);
  check_matrix(machado_matrix(Deficiency::deutan, 0.5),
               {{{0.547494, 0.607765, -0.155259},
                 {0.181692, 0.781742, 0.036566},
                 {-0.010410, 0.027275, 0.983136}}},
               1e-12);
  check_matrix(machado_matrix(Deficiency::tritan, 0.5),
               {{{1.017277, 0.027029, -0.044306},
                 {-0.006113, 0.958479, 0.047634},
                 {0.006379, 0.248708, 0.744913}}},
               1e-12);
  check_matrix(machado_matrix(Deficiency::tritan, 0.6),
               {{{1.104996, -0.046633, -0.058363},
                 {-0.032137, 0.971635, 0.060503},
                 {0.001336, 0.317922, 0.680742}}},
               1e-12);
}

TEST_CASE("Machado severities between grid points interpolate linearly", "[colour]") {
  // check-values §3a: the linear interpolation for tritan 0.55 (D,
  // regression value). It is NOT colour-science's extrapolated test value
  // (first row 1.060887, -0.0150435, -0.0458435), see the pitfall there.
  Matrix3 m = machado_matrix(Deficiency::tritan, 0.55);
  check_matrix(m,
               {{{1.0611365, -0.009802, -0.0513345},
                 {-0.019125, 0.965057, 0.0540685},
                 {0.0038575, 0.283315, 0.7128275}}},
               1e-9);
  // The same, as the mean of the published 0.5 and 0.6 grids (V2 rows).
  const Matrix3 g05 = {{{1.017277, 0.027029, -0.044306},
                        {-0.006113, 0.958479, 0.047634},
                        {0.006379, 0.248708, 0.744913}}};
  const Matrix3 g06 = {{{1.104996, -0.046633, -0.058363},
                        {-0.032137, 0.971635, 0.060503},
                        {0.001336, 0.317922, 0.680742}}};
  Matrix3 mean{};
  for (std::size_t i = 0; i < 3; ++i) {
    for (std::size_t j = 0; j < 3; ++j) mean[i][j] = 0.5 * (g05[i][j] + g06[i][j]);
  }
  check_matrix(m, mean, 1e-12);
  // Severity 0 is the identity: normal vision.
  check_matrix(machado_matrix(Deficiency::protan, 0.0),
               {{{1, 0, 0}, {0, 1, 0}, {0, 0, 1}}}, 0.0);
}

TEST_CASE("every Machado matrix keeps the neutral axis", "[colour]") {
  // check-values §3a (D): every published row sums to 1 within 1e-6, so
  // white and greys map to themselves; interpolated matrices inherit this.
  for (Deficiency d : kAll) {
    for (int step = 0; step <= 20; ++step) {
      double severity = step / 20.0;
      Matrix3 m = machado_matrix(d, severity);
      for (const auto& row : m) {
        INFO(to_string(d) << " severity " << severity);
        CHECK_THAT(row[0] + row[1] + row[2], WithinAbs(1.0, 1e-6 + 1e-12));
      }
      for (double v : {0.0, 0.2, 0.5, 0.8, 1.0}) {
        Rgb grey = simulate_machado({v, v, v}, d, severity);
        CHECK_THAT(grey.r, WithinAbs(v, 1e-5));
        CHECK_THAT(grey.g, WithinAbs(v, 1e-5));
        CHECK_THAT(grey.b, WithinAbs(v, 1e-5));
      }
    }
  }
}

TEST_CASE("Machado simulation works in linear light and clamps the result", "[colour]") {
  // Pure red under protanopia: linear (1,0,0) → first column of the matrix,
  // (0.152286, 0.114503, -0.003882); blue is clamped to 0 before encoding.
  Rgb red = simulate_machado({1, 0, 0}, Deficiency::protan, 1.0);
  CHECK_THAT(red.r, WithinAbs(srgb_encode(0.152286), 1e-12));
  CHECK_THAT(red.g, WithinAbs(srgb_encode(0.114503), 1e-12));
  CHECK(red.b == 0.0);
  CHECK_THROWS_AS(machado_matrix(Deficiency::deutan, 1.5), std::invalid_argument);
  CHECK_THROWS_AS(machado_matrix(Deficiency::deutan, -0.1), std::invalid_argument);
}

TEST_CASE("Brettel 1997 simulation keeps greys and projects onto its half-planes", "[colour]") {
  // libDaltonLens parameters (check-values §3c). White is the neutral axis,
  // so greys stay grey (rows sum to 1 within the published 5 dp).
  for (Deficiency d : kAll) {
    for (double v : {0.0, 0.3, 1.0}) {
      INFO(to_string(d) << " grey " << v);
      Rgb g = simulate_brettel({v, v, v}, d);
      CHECK_THAT(g.r, WithinAbs(v, 1e-4));
      CHECK_THAT(g.g, WithinAbs(v, 1e-4));
      CHECK_THAT(g.b, WithinAbs(v, 1e-4));
    }
  }
  // A dichromat's projection applied twice changes nothing more: each
  // published matrix M satisfies M·M = M to about 1e-5. (Checked on colours
  // whose simulation needs no clamping, which would break the identity.)
  for (Deficiency d : kAll) {
    for (Rgb c : {Rgb{0.8, 0.3, 0.2}, Rgb{0.2, 0.6, 0.4}, Rgb{0.5, 0.45, 0.6}}) {
      INFO(to_string(d) << " " << to_hex(c));
      Rgb once = simulate_brettel(c, d);
      REQUIRE(in_gamut(to_linear(once), -1e-6));
      Rgb twice = simulate_brettel(once, d);
      CHECK_THAT(twice.r, WithinAbs(once.r, 1e-3));
      CHECK_THAT(twice.g, WithinAbs(once.g, 1e-3));
      CHECK_THAT(twice.b, WithinAbs(once.b, 1e-3));
    }
  }
  // Severity 0 leaves the colour as it was.
  Rgb c = {0.8, 0.3, 0.2};
  Rgb same = simulate_brettel(c, Deficiency::tritan, 0.0);
  CHECK_THAT(same.r, WithinAbs(c.r, 1e-12));
  CHECK_THAT(same.g, WithinAbs(c.g, 1e-12));
  CHECK_THAT(same.b, WithinAbs(c.b, 1e-12));
}

TEST_CASE("greyscale keeps CIE luminance and so CIELAB L*", "[colour]") {
  for (Rgb c : {Rgb{1, 0, 0}, Rgb{0.2, 0.6, 0.4}, Rgb{0.9, 0.8, 0.1}, Rgb{0.5, 0.5, 0.5}}) {
    Rgb g = to_greyscale(c);
    CHECK(g.r == g.g);
    CHECK(g.g == g.b);
    CHECK_THAT(to_lab(g).l, WithinAbs(to_lab(c).l, 1e-9));
  }
  // Pure red's luminance is the Y of the red primary, 0.2126390059 in the
  // CSS Color 4 matrix (check-values §5b).
  CHECK_THAT(srgb_decode(to_greyscale({1, 0, 0}).r), WithinAbs(0.2126390059, 1e-10));
  CHECK_THAT(to_greyscale({1, 1, 1}).r, WithinAbs(1.0, 1e-9));
}
