#pragma once
/// Page furniture: the heading (title, standfirst) at the top of the
/// content area and the footer (source line, notes) at its foot.
#include "base/geometry.h"
#include "describe/page_spec.h"
#include "layout/page_style.h"
#include "paint/display_list.h"

namespace forme {

/// Lines of `text` within `width`, wrapped at UAX #14 break opportunities.
/// When one word is wider than `width` at `size`, the whole text is set
/// smaller, in 0.5 pt steps down to `min_size`; a word too wide even then
/// is an error at `loc`, naming `what` ("the title") and both widths.
std::vector<ShapedText> wrap_within(const std::string& text, const FontRef& font, double size, double min_size,
                                    double width, const std::string& what, const SourceLoc& loc);

/// Sets the heading from the top of `content`; returns the height used
/// (including the space after it).
/// `standfirst` is the author's, extended with what forme did to the values.
double set_heading(const PageSpec& spec, const std::string& standfirst, const PageStyle& style, const Rect& content,
                   DisplayPage& page);

/// Sets notes, limitations, the source line and its link addresses against
/// the bottom of `content`, recording a link area over each linked line;
/// returns the height used (including the space above it).
double set_footer(const PageSpec& spec, const PageStyle& style, const Rect& content, DisplayPage& page,
                  const std::vector<std::string>& extra_notes);

}  // namespace forme
