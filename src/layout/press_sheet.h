#pragma once
/// The trimmed page set on a press sheet: the background run into the
/// bleed, crop marks and a slug line outside the trim, and the trim and
/// bleed boxes a PDF carries for the print shop.
#include <string>

#include "describe/page_spec.h"
#include "layout/page_style.h"
#include "paint/display_list.h"

namespace forme {

/// Space around the trim, in points, the same on every side.
struct PressGeometry {
  double bleed = 0;        ///< background past the trim
  double mark_offset = 0;  ///< gap between the trim and where a crop mark starts
  double mark_length = 0;
  double outside = 0;      ///< everything outside the trim: MediaBox = trim + 2 × outside
};

PressGeometry press_geometry(const PressSpec& press);

/// The slug line's words: job name, date (YYYY-MM-DD, UTC) and page.
std::string slug_line(const std::string& job, long long unix_seconds, std::size_t page, std::size_t pages);

/// Sets `page` (laid out at trim size) on its press sheet. With nothing to
/// add but a background, only the background is drawn and the size stays.
DisplayPage to_press_sheet(DisplayPage page, const PressSpec& press, const PageStyle& st, const std::string& slug);

}  // namespace forme
