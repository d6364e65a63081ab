#pragma once
/// Lets Cairo surfaces write into a std::ostream.
#include <cairo.h>

#include <ostream>

namespace forme {

inline cairo_status_t write_to_ostream(void* closure, const unsigned char* data, unsigned int length) {
  auto* out = static_cast<std::ostream*>(closure);
  out->write(reinterpret_cast<const char*>(data), static_cast<std::streamsize>(length));
  return *out ? CAIRO_STATUS_SUCCESS : CAIRO_STATUS_WRITE_ERROR;
}

/// Throws std::runtime_error when a surface or context is in error.
void check_cairo(cairo_status_t status, const char* what);

}  // namespace forme
