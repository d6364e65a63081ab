#include "scale/power_of_ten.h"

#include <cmath>

namespace forme {

namespace {

// 10^0 … 10^22: every one is exactly representable as a double.
constexpr double kExact[] = {1e0,  1e1,  1e2,  1e3,  1e4,  1e5,  1e6,  1e7,
                             1e8,  1e9,  1e10, 1e11, 1e12, 1e13, 1e14, 1e15,
                             1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22};
constexpr int kMaxExact = 22;
constexpr int kMaxFinitePower = 308;  // 10^308 < DBL_MAX < 10^309

}  // namespace

double times_power_of_ten(double n, int e) {
  if (n == 0) return 0.0;
  if (e >= 0 && e <= kMaxExact) return n * kExact[e];
  if (e < 0 && -e <= kMaxExact) return n / kExact[-e];
  if (std::abs(e) <= kMaxFinitePower) return e > 0 ? n * std::pow(10.0, e) : n / std::pow(10.0, -e);
  // 10^|e| itself is not a finite double, though the result may be
  // (5e-324 × 10^330): scale in exact steps of 10^22.
  for (; e > kMaxExact; e -= kMaxExact) {
    n *= kExact[kMaxExact];
    if (std::isinf(n)) return n;
  }
  for (; e < -kMaxExact; e += kMaxExact) {
    n /= kExact[kMaxExact];
    if (n == 0) return n;
  }
  return e >= 0 ? n * kExact[e] : n / kExact[-e];
}

}  // namespace forme
