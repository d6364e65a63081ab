#include "colour/convert.h"

#include <algorithm>
#include <cmath>
#include <cstdio>

namespace forme {
namespace {

struct Vec3 {
  double x, y, z;
};

using Mat3 = double[3][3];

Vec3 mul(const Mat3& m, Vec3 v) {
  return {m[0][0] * v.x + m[0][1] * v.y + m[0][2] * v.z,
          m[1][0] * v.x + m[1][1] * v.y + m[1][2] * v.z,
          m[2][0] * v.x + m[2][1] * v.y + m[2][2] * v.z};
}

// Linear sRGB → XYZ (D65) and back: CSS Color 4 `conversions.js`, exact
// rationals derived from the sRGB primaries and D65 xy (0.3127, 0.3290).
constexpr Mat3 kRgbToXyz = {
    {506752.0 / 1228815.0, 87881.0 / 245763.0, 12673.0 / 70218.0},
    {87098.0 / 409605.0, 175762.0 / 245763.0, 12673.0 / 175545.0},
    {7918.0 / 409605.0, 87881.0 / 737289.0, 1001167.0 / 1053270.0}};
constexpr Mat3 kXyzToRgb = {
    {12831.0 / 3959.0, -329.0 / 214.0, -1974.0 / 3959.0},
    {-851781.0 / 878810.0, 1648619.0 / 878810.0, 36519.0 / 878810.0},
    {705.0 / 12673.0, -2585.0 / 12673.0, 705.0 / 667.0}};

// OKLab (Ottosson 2020, matrices updated 2021-01-25): linear sRGB → LMS,
// LMS′ → Lab and their inverses, as in the post's C++ code.
constexpr Mat3 kRgbToLms = {{0.4122214708, 0.5363325363, 0.0514459929},
                            {0.2119034982, 0.6806995451, 0.1073969566},
                            {0.0883024619, 0.2817188376, 0.6299787005}};
constexpr Mat3 kLmsToRgb = {{+4.0767416621, -3.3077115913, +0.2309699292},
                            {-1.2684380046, +2.6097574011, -0.3413193965},
                            {-0.0041960863, -0.7034186147, +1.7076147010}};
constexpr Mat3 kLmsToLab = {{+0.2104542553, +0.7936177850, -0.0040720468},
                            {+1.9779984951, -2.4285922050, +0.4505937099},
                            {+0.0259040371, +0.7827717662, -0.8086757660}};
constexpr Mat3 kLabToLms = {{1.0, +0.3963377774, +0.2158037573},
                            {1.0, -0.1055613458, -0.0638541728},
                            {1.0, -0.0894841775, -1.2914855480}};
// M1 of the post: XYZ (D65) → LMS.
constexpr Mat3 kXyzToLms = {{+0.8189330101, +0.3618667424, -0.1288597137},
                            {+0.0329845436, +0.9293118715, +0.0361456387},
                            {+0.0482003018, +0.2643662691, +0.6338517070}};

OkLab lms_to_oklab(Vec3 lms) {
  // std::cbrt keeps the sign, as OKLab needs for out-of-gamut input.
  Vec3 lab = mul(kLmsToLab, {std::cbrt(lms.x), std::cbrt(lms.y), std::cbrt(lms.z)});
  return {lab.x, lab.y, lab.z};
}

// CIELAB constants, exact: ε = (6/29)³, κ = (29/3)³.
constexpr double kEpsilon = 216.0 / 24389.0;
constexpr double kKappa = 24389.0 / 27.0;

double lab_f(double t) { return t > kEpsilon ? std::cbrt(t) : (kKappa * t + 16.0) / 116.0; }

double lab_f_inverse(double f) {
  double t = f * f * f;
  return t > kEpsilon ? t : (116.0 * f - 16.0) / kKappa;
}

constexpr double kPi = 3.14159265358979323846;

}  // namespace

double srgb_decode(double v) {
  double a = std::fabs(v);
  double lin = a <= 0.04045 ? a / 12.92 : std::pow((a + 0.055) / 1.055, 2.4);
  return std::copysign(lin, v);
}

double srgb_encode(double v) {
  double a = std::fabs(v);
  double enc = a <= 0.0031308 ? 12.92 * a : 1.055 * std::pow(a, 1.0 / 2.4) - 0.055;
  return std::copysign(enc, v);
}

LinearRgb to_linear(const Rgb& c) {
  return {srgb_decode(c.r), srgb_decode(c.g), srgb_decode(c.b)};
}

Rgb from_linear(const LinearRgb& c) {
  return {srgb_encode(c.r), srgb_encode(c.g), srgb_encode(c.b)};
}

Rgb clamp_rgb(const Rgb& c) {
  return {std::clamp(c.r, 0.0, 1.0), std::clamp(c.g, 0.0, 1.0), std::clamp(c.b, 0.0, 1.0)};
}

bool in_gamut(const LinearRgb& c, double tol) {
  auto ok = [tol](double v) { return v >= -tol && v <= 1.0 + tol; };
  return ok(c.r) && ok(c.g) && ok(c.b);
}

namespace {
unsigned code_8bit(double v) { return static_cast<unsigned>(std::lround(std::clamp(v, 0.0, 1.0) * 255.0)); }
}  // namespace

Rgb round_to_8bit(const Rgb& c) {
  return {code_8bit(c.r) / 255.0, code_8bit(c.g) / 255.0, code_8bit(c.b) / 255.0};
}

std::string to_hex(const Rgb& c) {
  char buf[8];
  std::snprintf(buf, sizeof buf, "#%02x%02x%02x", code_8bit(c.r), code_8bit(c.g), code_8bit(c.b));
  return buf;
}

Xyz to_xyz(const LinearRgb& c) {
  Vec3 v = mul(kRgbToXyz, {c.r, c.g, c.b});
  return {v.x, v.y, v.z};
}

LinearRgb from_xyz(const Xyz& c) {
  Vec3 v = mul(kXyzToRgb, {c.x, c.y, c.z});
  return {v.x, v.y, v.z};
}

Lab xyz_to_lab(const Xyz& c, const Xyz& white) {
  double fx = lab_f(c.x / white.x);
  double fy = lab_f(c.y / white.y);
  double fz = lab_f(c.z / white.z);
  return {116.0 * fy - 16.0, 500.0 * (fx - fy), 200.0 * (fy - fz)};
}

Xyz lab_to_xyz(const Lab& c, const Xyz& white) {
  double fy = (c.l + 16.0) / 116.0;
  double fx = fy + c.a / 500.0;
  double fz = fy - c.b / 200.0;
  // For Y the CIE inverse tests L* against κε = 8 rather than f against ε;
  // the two tests agree, since L* = 116 f − 16.
  double y = c.l > kKappa * kEpsilon ? fy * fy * fy : c.l / kKappa;
  return {lab_f_inverse(fx) * white.x, y * white.y, lab_f_inverse(fz) * white.z};
}

Lab to_lab(const Rgb& c) { return xyz_to_lab(to_xyz(to_linear(c)), d65_white); }

OkLab linear_to_oklab(const LinearRgb& c) { return lms_to_oklab(mul(kRgbToLms, {c.r, c.g, c.b})); }

LinearRgb oklab_to_linear(const OkLab& c) {
  Vec3 p = mul(kLabToLms, {c.l, c.a, c.b});
  Vec3 v = mul(kLmsToRgb, {p.x * p.x * p.x, p.y * p.y * p.y, p.z * p.z * p.z});
  return {v.x, v.y, v.z};
}

OkLab xyz_to_oklab(const Xyz& c) { return lms_to_oklab(mul(kXyzToLms, {c.x, c.y, c.z})); }

OkLab to_oklab(const Rgb& c) { return linear_to_oklab(to_linear(c)); }

OkLch to_oklch(const OkLab& c) {
  double chroma = std::hypot(c.a, c.b);
  double h = chroma == 0.0 ? 0.0 : std::atan2(c.b, c.a) * 180.0 / kPi;
  if (h < 0) h += 360.0;
  return {c.l, chroma, h};
}

OkLab from_oklch_to_oklab(const OkLch& c) {
  double rad = c.h * kPi / 180.0;
  return {c.l, c.c * std::cos(rad), c.c * std::sin(rad)};
}

OkLch to_oklch(const Rgb& c) { return to_oklch(to_oklab(c)); }

Rgb from_oklch(const OkLch& c) {
  if (c.l >= 1.0) return {1, 1, 1};
  if (c.l <= 0.0) return {0, 0, 0};
  auto linear_at = [&](double chroma) {
    return oklab_to_linear(from_oklch_to_oklab({c.l, chroma, c.h}));
  };
  LinearRgb lin = linear_at(c.c);
  if (!in_gamut(lin)) {
    // At chroma 0 the colour is a grey, always inside; bisect on chroma
    // between that and the requested value, keeping the inside end.
    double lo = 0.0, hi = c.c;
    while (hi - lo > 1e-7) {
      double mid = 0.5 * (lo + hi);
      (in_gamut(linear_at(mid)) ? lo : hi) = mid;
    }
    lin = linear_at(lo);
  }
  return clamp_rgb(from_linear(lin));
}

}  // namespace forme
