// Tick positions: Heckbert's loose labelling and the extended method of
// Talbot, Lin & Hanrahan.
//
// Both searches work on a decimal lattice: a candidate labelling is
// first·10^e, (first + stride)·10^e, … with integer `first` and `stride`, so
// the values handed out are computed once from integers (no accumulated
// binary drift) and the decimals needed to print them follow from the
// integers' trailing zeros.
//
// The extended search is the published reference code's: for each skip j,
// each nice number q in Q, each tick count k and each power of ten z it
// scores every labelling that can cover the data, and it stops a loop as
// soon as the best score that loop could still reach (simplicity, coverage
// and density bounds) falls below the best found. Those bounds end every
// loop after a handful of rounds; the explicit caps below only guard
// against inputs the bounds were not written for.
#include "scale/ticks.h"

#include <algorithm>
#include <cmath>
#include <cstdlib>
#include <numeric>
#include <optional>
#include <utility>

#include "scale/power_of_ten.h"

namespace forme {

namespace {

constexpr int kMinTicks = 2;
constexpr int kMaxTicks = 100;
// Ranges narrower than this fraction of their magnitude are treated as a
// single value: ticks that close together could not be told apart in print.
constexpr double kRelativeResolution = 1e-9;
// Magnitudes beyond these are rescaled by a power of ten before the search,
// so spans, steps and bounds stay finite and normal.
constexpr double kHuge = 1e300;
constexpr double kTiny = 1e-290;
// Integers used as lattice coordinates stay well inside the 2^53 range
// where doubles count exactly.
constexpr double kMaxLatticeIndex = 1e15;

/// A labelling first·10^e, (first + stride)·10^e, … (count values).
struct Lattice {
  long long first = 0;
  long long stride = 1;
  long long count = 0;
  int exponent = 0;
  double score = 0;
};

/// The data range after validation: ordered, non-degenerate, and divided by
/// 10^shift when its magnitude was extreme.
struct Range {
  double lo = 0, hi = 0;
  int shift = 0;
};

std::optional<Range> prepare(double a, double b) {
  if (!std::isfinite(a) || !std::isfinite(b)) return std::nullopt;
  if (a > b) std::swap(a, b);
  Range r{a, b, 0};
  double mag = std::max(std::abs(a), std::abs(b));
  if (mag > kHuge) {
    r.shift = 10;
  } else if (mag != 0 && mag < kTiny) {
    r.shift = -20;
  }
  if (r.shift != 0) {
    r.lo = times_power_of_ten(a, -r.shift);
    r.hi = times_power_of_ten(b, -r.shift);
    mag = std::max(std::abs(r.lo), std::abs(r.hi));
  }
  if (!(r.hi - r.lo > kRelativeResolution * mag)) {
    const double v = r.lo / 2 + r.hi / 2;
    if (v == 0) {
      r.lo = -1;
      r.hi = 1;
    } else {
      const double pad = times_power_of_ten(1, static_cast<int>(std::floor(std::log10(std::abs(v)))));
      r.lo = v - pad;
      r.hi = v + pad;
    }
  }
  return r;
}

int trailing_decimal_zeros(long long n) {
  int zeros = 0;
  while (n != 0 && n % 10 == 0) {
    n /= 10;
    ++zeros;
  }
  return zeros;
}

Ticks to_ticks(const Lattice& l, int shift) {
  Ticks t;
  const int e = l.exponent + shift;
  t.step = times_power_of_ten(static_cast<double>(l.stride), e);
  t.score = l.score;
  t.values.reserve(static_cast<std::size_t>(l.count));
  for (long long i = 0; i < l.count; ++i) {
    double v = times_power_of_ten(static_cast<double>(l.first + i * l.stride), e);
    if (!std::isfinite(v)) continue;  // beyond the double range
    if (std::abs(v) < 1e-12 * t.step) v = 0.0;
    t.values.push_back(v);
  }
  const long long g = std::gcd(std::llabs(l.first), l.stride);
  t.decimals = std::max(0, -(e + trailing_decimal_zeros(g)));
  return t;
}

// ---- Heckbert ----

/// mantissa·10^exponent with mantissa 1, 2, 5 or 10.
struct NiceNumber {
  int mantissa = 1;
  int exponent = 0;
  double value() const { return times_power_of_ten(mantissa, exponent); }
};

/// Heckbert's nicenum: a nice number near x (x > 0), rounded to the nearest
/// nice number when `round`, else the nice number at or above x.
NiceNumber nicenum(double x, bool round) {
  const int e = static_cast<int>(std::floor(std::log10(x)));
  const double f = x / times_power_of_ten(1, e);
  int nf = 10;
  if (round) {
    if (f < 1.5) nf = 1;
    else if (f < 3) nf = 2;
    else if (f < 7) nf = 5;
  } else {
    if (f <= 1) nf = 1;
    else if (f <= 2) nf = 2;
    else if (f <= 5) nf = 5;
  }
  return {nf, e};
}

Lattice heckbert_lattice(double lo, double hi, int m) {
  const NiceNumber range = nicenum(hi - lo, false);
  NiceNumber d = nicenum(range.value() / (m - 1), true);
  if (d.mantissa == 10) d = {1, d.exponent + 1};
  const double step = d.value();
  const auto tick = [&](long long k) {
    return times_power_of_ten(static_cast<double>(k * d.mantissa), d.exponent);
  };
  // ⌊lo/d⌋ and ⌈hi/d⌉, corrected by one where the division rounded across a
  // tick (0.3 / 0.1 is 2.9999999999999996).
  long long kmin = static_cast<long long>(std::floor(lo / step));
  long long kmax = static_cast<long long>(std::ceil(hi / step));
  if (tick(kmin + 1) <= lo) ++kmin;
  if (tick(kmin) > lo) --kmin;
  if (tick(kmax - 1) >= hi) --kmax;
  if (tick(kmax) < hi) ++kmax;
  return {kmin * d.mantissa, d.mantissa, kmax - kmin + 1, d.exponent, 0.0};
}

// ---- Talbot, Lin & Hanrahan ----

// Nice numbers in order of preference, as tenths so steps stay integers.
constexpr int kQTenths[] = {10, 50, 20, 25, 40, 30};
constexpr int kQCount = 6;
// Weights of simplicity, coverage, density and legibility.
constexpr double kW[] = {0.25, 0.2, 0.5, 0.05};
constexpr int kMaxSkip = 32;      // the bounds stop j by about 14
constexpr int kMaxPowerRounds = 64;

double square(double x) { return x * x; }

/// i is q's 0-based index in Q; `zero` whether 0 is among the labels.
double simplicity(int i, int j, bool zero) {
  return 1.0 - static_cast<double>(i) / (kQCount - 1) - j + (zero ? 1.0 : 0.0);
}

double simplicity_max(int i, int j) { return simplicity(i, j, true); }

double coverage(double dmin, double dmax, double lmin, double lmax) {
  const double range = dmax - dmin;
  return 1.0 - 0.5 * (square(dmax - lmax) + square(dmin - lmin)) / square(0.1 * range);
}

double coverage_max(double dmin, double dmax, double span) {
  const double range = dmax - dmin;
  if (span <= range) return 1.0;
  const double half = (span - range) / 2;
  return 1.0 - 0.5 * (2 * square(half)) / square(0.1 * range);
}

double density(int k, int m, double dmin, double dmax, double lmin, double lmax) {
  const double r = (k - 1) / (lmax - lmin);
  const double rt = (m - 1) / (std::max(lmax, dmax) - std::min(dmin, lmin));
  return 2.0 - std::max(r / rt, rt / r);
}

double density_max(int k, int m) {
  return k >= m ? 2.0 - static_cast<double>(k - 1) / (m - 1) : 1.0;
}

constexpr double kLegibility = 1.0;  // the reference code scores every labelling as legible

std::optional<Lattice> extended_lattice(double dmin, double dmax, int m, bool only_loose) {
  std::optional<Lattice> best;
  double best_score = -2;
  const int max_k = 8 * m + 8;  // the density bound stops k near 7m
  for (int j = 1; j <= kMaxSkip; ++j) {
    for (int qi = 0; qi < kQCount; ++qi) {
      const double sm = simplicity_max(qi, j);
      // Later j and q only simplify less: nothing further can win.
      if (kW[0] * sm + kW[1] + kW[2] + kW[3] < best_score) return best;
      const int q_tenths = kQTenths[qi];
      const double q = q_tenths / 10.0;
      for (int k = 2; k <= max_k; ++k) {
        const double dm = density_max(k, m);
        if (kW[0] * sm + kW[1] + kW[2] * dm + kW[3] < best_score) break;
        const double delta = (dmax - dmin) / (k + 1) / j / q;
        int z = static_cast<int>(std::ceil(std::log10(delta)));
        for (int round = 0; round < kMaxPowerRounds; ++round, ++z) {
          // step = j·q·10^z = (j·q_tenths)·10^(z−1)
          const long long stride = static_cast<long long>(j) * q_tenths;
          const double step = times_power_of_ten(static_cast<double>(stride), z - 1);
          const double cm = coverage_max(dmin, dmax, step * (k - 1));
          if (kW[0] * sm + kW[1] * cm + kW[2] * dm + kW[3] < best_score) break;
          // Starts in units of step/j.
          const double min_start = std::floor(dmax / step) * j - static_cast<double>(k - 1) * j;
          const double max_start = std::ceil(dmin / step) * j;
          if (min_start > max_start) continue;
          if (std::abs(min_start) > kMaxLatticeIndex || std::abs(max_start) > kMaxLatticeIndex) continue;
          for (auto start = static_cast<long long>(min_start); start <= static_cast<long long>(max_start);
               ++start) {
            const long long first = start * q_tenths;
            const long long last_index = start + static_cast<long long>(k - 1) * j;
            const double lmin = times_power_of_ten(static_cast<double>(first), z - 1);
            const double lmax = times_power_of_ten(static_cast<double>(last_index * q_tenths), z - 1);
            const bool zero = start <= 0 && last_index >= 0 && start % j == 0;
            const double score = kW[0] * simplicity(qi, j, zero) +
                                 kW[1] * coverage(dmin, dmax, lmin, lmax) +
                                 kW[2] * density(k, m, dmin, dmax, lmin, lmax) + kW[3] * kLegibility;
            if (score > best_score && (!only_loose || (lmin <= dmin && lmax >= dmax))) {
              best_score = score;
              best = Lattice{first, stride, k, z - 1, score};
            }
          }
        }
      }
    }
  }
  return best;
}

int clamp_ticks(int m) { return std::clamp(m, kMinTicks, kMaxTicks); }

}  // namespace

Ticks heckbert_ticks(double min, double max, int m) {
  const auto r = prepare(min, max);
  if (!r) return {};
  return to_ticks(heckbert_lattice(r->lo, r->hi, clamp_ticks(m)), r->shift);
}

Ticks extended_ticks(double dmin, double dmax, int m, bool only_loose) {
  const auto r = prepare(dmin, dmax);
  if (!r) return {};
  m = clamp_ticks(m);
  if (auto best = extended_lattice(r->lo, r->hi, m, only_loose)) return to_ticks(*best, r->shift);
  // The search always finds a labelling for a finite, non-empty range; this
  // keeps the contract if it ever does not.
  return to_ticks(heckbert_lattice(r->lo, r->hi, m), r->shift);
}

}  // namespace forme
