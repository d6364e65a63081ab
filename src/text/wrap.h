#pragma once
/// Breaks a paragraph into lines that fit a width. Break opportunities come
/// from the Unicode line breaking algorithm (UAX #14, via libunibreak);
/// lines are filled greedily, each measured with shaped advances.
#include <string>
#include <vector>

#include "text/shaped_text.h"

namespace forme {

/// Lines of `utf8` no wider than `width` points where possible. A single
/// word wider than the line is kept whole on its own line (and reported by
/// its width, so callers can see it overflows). Mandatory breaks ("\n") are
/// honoured.
std::vector<ShapedText> wrap_text(const std::string& utf8, const FontRef& font, double size, double width,
                                  const ShapeOptions& options = {});

}  // namespace forme
