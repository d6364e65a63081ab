#pragma once
/// Draws a display page onto any Cairo context. Every output format shares
/// this; only the surface differs.
#include "paint/display_list.h"

typedef struct _cairo cairo_t;

namespace forme {

void draw_page(cairo_t* cr, const DisplayPage& page);

}  // namespace forme
