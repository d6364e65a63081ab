#include "simplify/capsule.h"

#include <algorithm>
#include <cmath>
#include <limits>

namespace forme {

namespace {

constexpr double kInf = std::numeric_limits<double>::infinity();

/// The u with |p + u·d − c| ≤ r: the roots of a quadratic.
Span within_disc(Point p, Point d, Point c, double r) {
  const double ex = p.x - c.x, ey = p.y - c.y;
  const double a = d.x * d.x + d.y * d.y, b = d.x * ex + d.y * ey, k = ex * ex + ey * ey - r * r;
  if (a == 0) return k <= 0 ? Span{-kInf, kInf} : Span{};
  const double disc = b * b - a * k;
  if (disc < 0) return {};
  const double s = std::sqrt(disc);
  return {(-b - s) / a, (-b + s) / a};
}

/// Narrows `s` to the u with lo ≤ f0 + u·f1 ≤ hi.
void clip(Span& s, double f0, double f1, double lo, double hi) {
  if (f1 == 0) {
    if (f0 < lo || f0 > hi) s = {};
    return;
  }
  double u0 = (lo - f0) / f1, u1 = (hi - f0) / f1;
  if (u0 > u1) std::swap(u0, u1);
  s.lo = std::max(s.lo, u0);
  s.hi = std::min(s.hi, u1);
}

}  // namespace

double segment_distance2(Point p, Point a, Point b) {
  const double dx = b.x - a.x, dy = b.y - a.y;
  const double len2 = dx * dx + dy * dy;
  double t = 0;
  if (len2 > 0) t = std::clamp(((p.x - a.x) * dx + (p.y - a.y) * dy) / len2, 0.0, 1.0);
  const double ex = a.x + t * dx - p.x, ey = a.y + t * dy - p.y;
  return ex * ex + ey * ey;
}

Span span_within(Point p, Point q, Point a, Point b, double r) {
  const Point d{q.x - p.x, q.y - p.y};
  // The capsule is the union of two discs and the band between them; the
  // line meets their union, a convex set, in one interval, so the hull of
  // the three pieces is exact.
  Span out{kInf, -kInf};
  auto take = [&out](Span s) {
    if (s.lo > s.hi) return;
    out.lo = std::min(out.lo, s.lo);
    out.hi = std::max(out.hi, s.hi);
  };
  take(within_disc(p, d, a, r));
  take(within_disc(p, d, b, r));
  const double ex = b.x - a.x, ey = b.y - a.y, len2 = ex * ex + ey * ey;
  if (len2 > 0) {
    // Along the segment: 0 ≤ (x − a)·e ≤ |e|²; across it: |(x − a)·n| ≤ r·|e|
    // with n = e turned a quarter, so |n| = |e|.
    Span band{-kInf, kInf};
    const double wx = p.x - a.x, wy = p.y - a.y;
    clip(band, wx * ex + wy * ey, d.x * ex + d.y * ey, 0, len2);
    const double across = r * std::sqrt(len2);
    clip(band, wx * -ey + wy * ex, d.x * -ey + d.y * ex, -across, across);
    take(band);
  }
  return {std::max(out.lo, 0.0), std::min(out.hi, 1.0)};
}

}  // namespace forme
