#include "paint/draw_cairo.h"

#include <cairo.h>

#include <algorithm>
#include <cmath>
#include <vector>

#include "paint/hatch_geometry.h"

namespace forme {

namespace {

void set_colour(cairo_t* cr, const Rgb& c) { cairo_set_source_rgb(cr, c.r, c.g, c.b); }

void apply_stroke(cairo_t* cr, const Stroke& s) {
  set_colour(cr, s.colour);
  cairo_set_line_width(cr, s.width);
  cairo_set_line_cap(cr, s.round ? CAIRO_LINE_CAP_ROUND : CAIRO_LINE_CAP_BUTT);
  cairo_set_line_join(cr, s.round ? CAIRO_LINE_JOIN_ROUND : CAIRO_LINE_JOIN_MITER);
  cairo_set_dash(cr, s.dash.empty() ? nullptr : s.dash.data(), static_cast<int>(s.dash.size()), 0);
}

void fill_and_stroke(cairo_t* cr, const std::optional<Rgb>& fill, const std::optional<Stroke>& stroke) {
  if (fill) {
    set_colour(cr, *fill);
    if (stroke) cairo_fill_preserve(cr);
    else cairo_fill(cr);
  }
  if (stroke) {
    apply_stroke(cr, *stroke);
    cairo_stroke(cr);
  }
  cairo_new_path(cr);
}

void trace(cairo_t* cr, const PathItem& p) {
  cairo_move_to(cr, p.points[0].x, p.points[0].y);
  for (std::size_t i = 1; i < p.points.size(); ++i) cairo_line_to(cr, p.points[i].x, p.points[i].y);
  if (p.closed) cairo_close_path(cr);
}

// The pattern is real vector drawing (strokes and dots under a clip), so it
// stays sharp at any zoom and prints as line work.
void draw_hatch(cairo_t* cr, const PathItem& p, const Hatch& h) {
  double x0 = 1e300, y0 = 1e300, x1 = -1e300, y1 = -1e300;
  for (const Point& pt : p.points) x0 = std::min(x0, pt.x), y0 = std::min(y0, pt.y), x1 = std::max(x1, pt.x), y1 = std::max(y1, pt.y);
  cairo_save(cr);
  trace(cr, p);
  cairo_clip(cr);
  set_colour(cr, h.ink);
  if (h.kind == Hatch::Kind::dots) {
    for (const Point& c : hatch_dots(x0, y0, x1, y1, h.spacing)) {
      cairo_new_sub_path(cr);
      cairo_arc(cr, c.x, c.y, h.width / 2, 0, 6.283185307179586);
    }
    cairo_fill(cr);
  } else {
    for (const auto& [from, to] : hatch_segments(x0, y0, x1, y1, h)) {
      cairo_move_to(cr, from.x, from.y);
      cairo_line_to(cr, to.x, to.y);
    }
    cairo_set_line_width(cr, h.width);
    cairo_set_line_cap(cr, CAIRO_LINE_CAP_BUTT);
    cairo_set_dash(cr, nullptr, 0, 0);
    cairo_stroke(cr);
  }
  cairo_restore(cr);
}

void draw(cairo_t* cr, const PathItem& p) {
  if (p.points.empty()) return;
  if (p.hatch && p.closed && p.fill) {
    trace(cr, p);
    set_colour(cr, *p.fill);
    cairo_fill(cr);
    draw_hatch(cr, p, *p.hatch);
    if (p.stroke) {
      trace(cr, p);
      apply_stroke(cr, *p.stroke);
      cairo_stroke(cr);
    }
    return;
  }
  trace(cr, p);
  fill_and_stroke(cr, p.fill, p.stroke);
}

void draw(cairo_t* cr, const CircleItem& c) {
  cairo_new_sub_path(cr);
  cairo_arc(cr, c.centre.x, c.centre.y, c.radius, 0, 6.283185307179586);
  cairo_close_path(cr);
  fill_and_stroke(cr, c.fill, c.stroke);
}

// Glyphs go out with their clusters (cairo_show_text_glyphs) so the PDF
// maps every glyph back to the characters it came from: text stays
// searchable even where the font substitutes ligatures or contextual forms.
// Each run is one font and one direction, drawn with its own bytes.
//
// A right-to-left run is shown in logical order: its glyphs go into the
// content stream from the right end leftwards, each at its own place, so a
// reader that follows the content stream (mupdf) and one that orders by
// position and then applies the bidi algorithm (poppler) both read the
// characters as written. A marked-content span with /ActualText (ISO
// 32000-1 §14.9.4) was tried and measured: poppler 22.12 reverses an
// /ActualText of Hebrew as if it were in visual order, and mupdf 1.21 and
// Ghostscript 10.0 txtwrite ignore it, so it made every reader worse.
void draw_run(cairo_t* cr, const TextItem& t, const GlyphRun& run) {
  const ShapedText& s = t.text;
  cairo_set_font_face(cr, run.font->cairo_face());
  cairo_set_font_size(cr, s.size);

  // HarfBuzz clusters are byte offsets, one per glyph, monotone in visual
  // order (rising left to right, falling in a right-to-left run). Cairo
  // wants (bytes, glyphs) pairs in the order the glyphs are shown, which
  // is logical order either way; a cluster runs from its start to the
  // next larger start (or the run's end).
  std::vector<std::size_t> order;  // glyph indices in logical order
  for (std::size_t i = run.glyph_begin; i < run.glyph_end; ++i) order.push_back(i);
  if (run.rtl) std::reverse(order.begin(), order.end());
  std::vector<cairo_glyph_t> glyphs;
  for (std::size_t i : order) glyphs.push_back({s.glyphs[i].index, t.origin.x + s.glyphs[i].x, t.origin.y + s.glyphs[i].y});
  std::vector<cairo_text_cluster_t> clusters;
  std::size_t k = 0;
  while (k < order.size()) {
    const unsigned c = s.glyphs[order[k]].cluster;
    std::size_t j = k;
    while (j < order.size() && s.glyphs[order[j]].cluster == c) ++j;
    const unsigned next = j < order.size() ? s.glyphs[order[j]].cluster : static_cast<unsigned>(run.byte_end);
    clusters.push_back({static_cast<int>(next - c), static_cast<int>(j - k)});
    k = j;
  }
  cairo_show_text_glyphs(cr, s.utf8.data() + run.byte_begin, static_cast<int>(run.byte_end - run.byte_begin),
                         glyphs.data(), static_cast<int>(glyphs.size()), clusters.data(),
                         static_cast<int>(clusters.size()), static_cast<cairo_text_cluster_flags_t>(0));
}

void draw(cairo_t* cr, const TextItem& t) {
  if (t.text.glyphs.empty()) return;
  set_colour(cr, t.colour);
  for (const auto& run : t.text.runs) draw_run(cr, t, run);
}

}  // namespace

void begin_drawing(cairo_t* cr) {
  cairo_save(cr);
  cairo_font_options_t* fo = cairo_font_options_create();
  // Positions come from HarfBuzz in unhinted font units; hinting would
  // move glyphs away from the measured layout.
  cairo_font_options_set_hint_style(fo, CAIRO_HINT_STYLE_NONE);
  cairo_font_options_set_hint_metrics(fo, CAIRO_HINT_METRICS_OFF);
  cairo_set_font_options(cr, fo);
  cairo_font_options_destroy(fo);
}

void draw_item(cairo_t* cr, const DisplayItem& item) {
  std::visit([cr](const auto& it) { draw(cr, it); }, item);
}

void end_drawing(cairo_t* cr) { cairo_restore(cr); }

void draw_page(cairo_t* cr, const DisplayPage& page) {
  begin_drawing(cr);
  for (const auto& item : page.items) draw_item(cr, item);
  end_drawing(cr);
}

}  // namespace forme
