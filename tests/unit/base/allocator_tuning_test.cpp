// tune_allocator: after it, a block of 30 MiB comes from glibc's heap, not
// from a fresh kernel mapping (mallinfo2's hblkhd counts mapped bytes;
// glibc's default threshold is 128 KiB, rising only after frees up to
// 32 MiB, per mallopt(3), recalled from memory).
#include "base/allocator_tuning.h"

#include <catch2/catch.hpp>
#include <cstdlib>

#if defined(__GLIBC__)
#include <malloc.h>
#endif

TEST_CASE("after tune_allocator a 30 MiB block is served from the heap, not mapped afresh", "[base]") {
#if defined(__GLIBC__)
  forme::tune_allocator();
  const std::size_t mapped_before = mallinfo2().hblkhd;
  void* block = std::malloc(30u << 20);
  REQUIRE(block != nullptr);
  const std::size_t mapped_during = mallinfo2().hblkhd;
  std::free(block);
  CHECK(mapped_during == mapped_before);
#else
  SUCCEED("not glibc: tune_allocator does nothing");
#endif
}
