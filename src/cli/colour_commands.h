#pragma once
/// `forme contrast FG BG` and `forme palette NAME`: colour answers on the
/// command line, from the same colour stage the page audit uses.
#include <ostream>
#include <string>

namespace forme {

/// Prints the WCAG 2.x contrast ratio of two colours and which thresholds it
/// meets. Returns the exit code (1 when a colour cannot be read).
int run_contrast(const std::string& fg, const std::string& bg, std::ostream& out, std::ostream& err);

/// Prints a palette's colours and, for normal vision, each simulated
/// colour-vision deficiency and greyscale, the closest pair (CIEDE2000).
int run_palette(const std::string& name, std::ostream& out, std::ostream& err);

/// Writes the sheet of every palette under each simulated vision
/// (layout/palette_sheet.h) to `path` (.png, .pdf or .svg). Returns the
/// exit code.
int run_palette_sheet(const std::string& path, const std::string& font_dir, std::ostream& err);

}  // namespace forme
