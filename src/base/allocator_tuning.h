#pragma once
/// Process-wide allocator settings for forme's runs, called once at the
/// start of main (the command line and the benchmarks alike).
namespace forme {

/// Asks glibc's allocator to serve blocks up to 32 MiB from its heap and to
/// keep up to 128 MiB of freed heap for reuse (mallopt M_MMAP_THRESHOLD and
/// M_TRIM_THRESHOLD). By default each block above a few megabytes is a
/// fresh mapping from the kernel, returned on free, so a big table's text,
/// columns and points are page-faulted in anew every time; on this
/// project's virtual machine that was two thirds of the time to compose a
/// million-point page (forme-bench series: 0.68 → 0.20 s). Peak memory is
/// unchanged; memory freed after the peak is kept rather than returned.
/// Does nothing where the C library is not glibc.
void tune_allocator();

}  // namespace forme
