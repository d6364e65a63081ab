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

}  // namespace forme
