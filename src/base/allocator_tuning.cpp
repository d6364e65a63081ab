#include "base/allocator_tuning.h"

#include <cstdlib>  // defines __GLIBC__ when the C library is glibc

#if defined(__GLIBC__)
#include <malloc.h>
#endif

namespace forme {

void tune_allocator() {
#if defined(__GLIBC__)
  mallopt(M_MMAP_THRESHOLD, 32 << 20);  // glibc refuses more than 32 MiB here
  mallopt(M_TRIM_THRESHOLD, 128 << 20);
#endif
}

}  // namespace forme
