#pragma once
/// The page's language applied to its laid-out text: every line whose
/// base direction the text alone decided (UAX #9 P2, P3) is set again in
/// the language's direction (HL1), so "ירושלים leads the list" on an
/// English page reads left to right with the Hebrew name in place.
///
/// Run after layout: a line's advance width does not depend on the order
/// its runs are set in, so every box layout and placement measured stays
/// where it is; only the order of the runs within it changes.
#include <string_view>

#include "paint/display_list.h"

namespace forme {

/// Sets each text line of `page` whose direction came from its text in
/// the direction of `language` (a BCP 47 tag; empty leaves the page as it is).
void apply_page_language(DisplayPage& page, std::string_view language);

}  // namespace forme
