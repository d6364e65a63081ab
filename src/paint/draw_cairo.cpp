#include "paint/draw_cairo.h"

#include <cairo.h>

#include <algorithm>
#include <vector>

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

void draw(cairo_t* cr, const PathItem& p) {
  if (p.points.empty()) return;
  cairo_move_to(cr, p.points[0].x, p.points[0].y);
  for (std::size_t i = 1; i < p.points.size(); ++i) cairo_line_to(cr, p.points[i].x, p.points[i].y);
  if (p.closed) cairo_close_path(cr);
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
void draw_run(cairo_t* cr, const TextItem& t, const GlyphRun& run) {
  const ShapedText& s = t.text;
  cairo_set_font_face(cr, run.font->cairo_face());
  cairo_set_font_size(cr, s.size);

  std::vector<cairo_glyph_t> glyphs;
  for (std::size_t i = run.glyph_begin; i < run.glyph_end; ++i)
    glyphs.push_back({s.glyphs[i].index, t.origin.x + s.glyphs[i].x, t.origin.y + s.glyphs[i].y});

  // HarfBuzz clusters are byte offsets, one per glyph, monotone in visual
  // order (rising left to right, falling in a right-to-left run). Cairo
  // wants (bytes, glyphs) pairs in the order the glyphs are drawn.
  std::vector<cairo_text_cluster_t> clusters;
  std::vector<unsigned> starts;
  std::size_t i = run.glyph_begin;
  while (i < run.glyph_end) {
    const unsigned c = s.glyphs[i].cluster;
    std::size_t j = i;
    while (j < run.glyph_end && s.glyphs[j].cluster == c) ++j;
    clusters.push_back({0, static_cast<int>(j - i)});
    starts.push_back(c);
    i = j;
  }
  // A cluster runs from its start to the next larger start (or the run's end).
  for (std::size_t k = 0; k < clusters.size(); ++k) {
    unsigned next = static_cast<unsigned>(run.byte_end);
    if (!run.rtl && k + 1 < clusters.size()) next = starts[k + 1];
    if (run.rtl && k > 0) next = starts[k - 1];
    clusters[k].num_bytes = static_cast<int>(next - starts[k]);
  }
  const auto flags = run.rtl ? CAIRO_TEXT_CLUSTER_FLAG_BACKWARD : static_cast<cairo_text_cluster_flags_t>(0);
  if (run.rtl) std::reverse(clusters.begin(), clusters.end());  // backward: clusters listed from the run's end
  cairo_show_text_glyphs(cr, s.utf8.data() + run.byte_begin, static_cast<int>(run.byte_end - run.byte_begin),
                         glyphs.data(), static_cast<int>(glyphs.size()), clusters.data(),
                         static_cast<int>(clusters.size()), flags);
}

void draw(cairo_t* cr, const TextItem& t) {
  if (t.text.glyphs.empty()) return;
  set_colour(cr, t.colour);
  for (const auto& run : t.text.runs) draw_run(cr, t, run);
}

}  // namespace

void draw_page(cairo_t* cr, const DisplayPage& page) {
  cairo_save(cr);
  cairo_font_options_t* fo = cairo_font_options_create();
  // Positions come from HarfBuzz in unhinted font units; hinting would
  // move glyphs away from the measured layout.
  cairo_font_options_set_hint_style(fo, CAIRO_HINT_STYLE_NONE);
  cairo_font_options_set_hint_metrics(fo, CAIRO_HINT_METRICS_OFF);
  cairo_set_font_options(cr, fo);
  cairo_font_options_destroy(fo);
  for (const auto& item : page.items) std::visit([cr](const auto& it) { draw(cr, it); }, item);
  cairo_restore(cr);
}

}  // namespace forme
