#include "colour/difference.h"

#include <cmath>

namespace forme {
namespace {

constexpr double kPi = 3.14159265358979323846;
constexpr double deg(double rad) { return rad * 180.0 / kPi; }
constexpr double rad(double deg) { return deg * kPi / 180.0; }

// Hue angle in degrees, [0, 360); 0 for a neutral (a′ = b = 0), as the
// Sharma notes prescribe (eq. 7).
double hue_deg(double b, double a_prime) {
  if (b == 0.0 && a_prime == 0.0) return 0.0;
  double h = deg(std::atan2(b, a_prime));
  return h < 0.0 ? h + 360.0 : h;
}

}  // namespace

double ciede2000(const Lab& first, const Lab& second) {
  // Step 1: C′ and h′ after the a* rescaling G.
  double c1 = std::hypot(first.a, first.b);
  double c2 = std::hypot(second.a, second.b);
  double c_mean7 = std::pow(0.5 * (c1 + c2), 7.0);
  double g = 0.5 * (1.0 - std::sqrt(c_mean7 / (c_mean7 + std::pow(25.0, 7.0))));
  double a1p = (1.0 + g) * first.a;
  double a2p = (1.0 + g) * second.a;
  double c1p = std::hypot(a1p, first.b);
  double c2p = std::hypot(a2p, second.b);
  double h1p = hue_deg(first.b, a1p);
  double h2p = hue_deg(second.b, a2p);

  // Step 2: ΔL′, ΔC′, ΔH′. The hue difference wraps into (−180, 180] and is
  // 0 when either colour is neutral.
  double dl = second.l - first.l;
  double dc = c2p - c1p;
  double dh = 0.0;
  if (c1p * c2p != 0.0) {
    dh = h2p - h1p;
    if (dh > 180.0) dh -= 360.0;
    else if (dh < -180.0) dh += 360.0;
  }
  double dhh = 2.0 * std::sqrt(c1p * c2p) * std::sin(rad(dh) / 2.0);

  // Step 3: weighting functions around the means.
  double l_mean = 0.5 * (first.l + second.l);
  double cp_mean = 0.5 * (c1p + c2p);
  double hp_mean = h1p + h2p;
  if (c1p * c2p != 0.0) {
    // Mean hue on the shorter arc; at exactly 180° apart the notes' rule
    // (sum < 360 → add 360) decides.
    if (std::fabs(h1p - h2p) <= 180.0) hp_mean = 0.5 * (h1p + h2p);
    else if (h1p + h2p < 360.0) hp_mean = 0.5 * (h1p + h2p + 360.0);
    else hp_mean = 0.5 * (h1p + h2p - 360.0);
  }
  double t = 1.0 - 0.17 * std::cos(rad(hp_mean - 30.0)) + 0.24 * std::cos(rad(2.0 * hp_mean)) +
             0.32 * std::cos(rad(3.0 * hp_mean + 6.0)) - 0.20 * std::cos(rad(4.0 * hp_mean - 63.0));
  double d_theta = 30.0 * std::exp(-std::pow((hp_mean - 275.0) / 25.0, 2.0));
  double cp_mean7 = std::pow(cp_mean, 7.0);
  double rc = 2.0 * std::sqrt(cp_mean7 / (cp_mean7 + std::pow(25.0, 7.0)));
  double l50 = (l_mean - 50.0) * (l_mean - 50.0);
  double sl = 1.0 + 0.015 * l50 / std::sqrt(20.0 + l50);
  double sc = 1.0 + 0.045 * cp_mean;
  double sh = 1.0 + 0.015 * cp_mean * t;
  double rt = -std::sin(rad(2.0 * d_theta)) * rc;

  double tl = dl / sl, tc = dc / sc, th = dhh / sh;
  return std::sqrt(tl * tl + tc * tc + th * th + rt * tc * th);
}

double delta_e(const Rgb& first, const Rgb& second) {
  return ciede2000(to_lab(first), to_lab(second));
}

}  // namespace forme
