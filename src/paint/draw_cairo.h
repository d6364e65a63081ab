#pragma once
/// Draws a display page onto any Cairo context. Every output format shares
/// this; only the surface differs.
#include "paint/display_list.h"

typedef struct _cairo cairo_t;

namespace forme {

void draw_page(cairo_t* cr, const DisplayPage& page);

/// The pieces of `draw_page`, for painters that mark up items as they go
/// (the tagged PDF): set up the context, draw one item, restore.
void begin_drawing(cairo_t* cr);
void draw_item(cairo_t* cr, const DisplayItem& item);
void end_drawing(cairo_t* cr);

}  // namespace forme
