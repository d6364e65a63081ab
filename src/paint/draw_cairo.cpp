#include "paint/draw_cairo.h"

#include <cairo.h>

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
void draw(cairo_t* cr, const TextItem& t) {
  const ShapedText& s = t.text;
  if (s.glyphs.empty()) return;
  cairo_set_font_face(cr, s.font->cairo_face());
  cairo_set_font_size(cr, s.size);
  set_colour(cr, t.colour);

  std::vector<cairo_glyph_t> glyphs(s.glyphs.size());
  for (std::size_t i = 0; i < s.glyphs.size(); ++i)
    glyphs[i] = {s.glyphs[i].index, t.origin.x + s.glyphs[i].x, t.origin.y + s.glyphs[i].y};

  // HarfBuzz clusters are byte offsets, one per glyph, monotone in visual
  // order. Cairo wants runs of (bytes, glyphs).
  std::vector<cairo_text_cluster_t> clusters;
  const int total = static_cast<int>(s.utf8.size());
  std::size_t i = 0;
  while (i < s.glyphs.size()) {
    unsigned c = s.glyphs[i].cluster;
    std::size_t j = i;
    while (j < s.glyphs.size() && s.glyphs[j].cluster == c) ++j;
    unsigned next_cluster = j < s.glyphs.size() ? s.glyphs[j].cluster : static_cast<unsigned>(total);
    int bytes = s.rtl ? 0 : static_cast<int>(next_cluster) - static_cast<int>(c);
    clusters.push_back({bytes, static_cast<int>(j - i)});
    i = j;
  }
  cairo_text_cluster_flags_t flags = static_cast<cairo_text_cluster_flags_t>(0);
  if (s.rtl) {
    // Visual order runs backwards through the string: recompute byte counts.
    flags = CAIRO_TEXT_CLUSTER_FLAG_BACKWARD;
    std::size_t g = 0;
    unsigned prev_end = static_cast<unsigned>(total);
    for (auto& cl : clusters) {
      unsigned start = s.glyphs[g].cluster;
      cl.num_bytes = static_cast<int>(prev_end - start);
      prev_end = start;
      g += static_cast<std::size_t>(cl.num_glyphs);
    }
  }
  cairo_show_text_glyphs(cr, s.utf8.data(), total, glyphs.data(), static_cast<int>(glyphs.size()),
                         clusters.data(), static_cast<int>(clusters.size()), flags);
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
