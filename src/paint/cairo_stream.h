#pragma once
/// Lets Cairo surfaces write into a std::ostream or a C file.
#include <cairo.h>

#include <cstdio>
#include <ostream>

namespace forme {

inline cairo_status_t write_to_ostream(void* closure, const unsigned char* data, unsigned int length) {
  auto* out = static_cast<std::ostream*>(closure);
  out->write(reinterpret_cast<const char*>(data), static_cast<std::streamsize>(length));
  return *out ? CAIRO_STATUS_SUCCESS : CAIRO_STATUS_WRITE_ERROR;
}

inline cairo_status_t write_to_file(void* closure, const unsigned char* data, unsigned int length) {
  return std::fwrite(data, 1, length, static_cast<std::FILE*>(closure)) == length ? CAIRO_STATUS_SUCCESS
                                                                                   : CAIRO_STATUS_WRITE_ERROR;
}

/// Throws std::runtime_error when a surface or context is in error.
void check_cairo(cairo_status_t status, const char* what);

}  // namespace forme
