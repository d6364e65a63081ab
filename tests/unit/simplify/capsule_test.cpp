// The interval of a segment within r of another segment, against a brute
// force: many parameters along the segment, each measured from scratch
// with ruler.h's distance. Segments are invented, from a fixed seed.
#include "simplify/capsule.h"

#include <catch2/catch.hpp>
#include <random>

#include "ruler.h"

using forme::Point;
using forme::Span;
using forme::span_within;
using forme::test::distance_to_segment;

TEST_CASE("the span of a segment within r of another matches a brute-force walk along it", "[simplify]") {
  std::mt19937_64 rng(3);
  std::uniform_real_distribution<double> coord(0, 2);
  const double r = 0.3;
  int inside = 0, outside = 0;
  for (int trial = 0; trial < 2000; ++trial) {
    const Point p{coord(rng), coord(rng)}, q{coord(rng), coord(rng)};
    // Every tenth drawn segment degenerates to a point.
    const Point a{coord(rng), coord(rng)};
    const Point b = trial % 10 == 0 ? a : Point{coord(rng), coord(rng)};
    const Span s = span_within(p, q, a, b, r);
    for (int k = 0; k <= 400; ++k) {
      const double u = k / 400.0;
      const double d = distance_to_segment({p.x + u * (q.x - p.x), p.y + u * (q.y - p.y)}, a, b);
      // Clear of the boundary, so rounding cannot decide.
      if (d < r - 1e-9) {
        ++inside;
        INFO("trial " << trial << " u " << u << " span " << s.lo << ".." << s.hi);
        CHECK((s.lo <= u && u <= s.hi));
      } else if (d > r + 1e-9) {
        ++outside;
        INFO("trial " << trial << " u " << u << " span " << s.lo << ".." << s.hi);
        CHECK(!(s.lo <= u && u <= s.hi));
      }
    }
  }
  // Both sides were exercised.
  CHECK(inside > 10000);
  CHECK(outside > 10000);
}
