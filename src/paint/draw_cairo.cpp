#include "paint/draw_cairo.h"

#include <cairo.h>

#include <algorithm>
#include <cmath>
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

void trace(cairo_t* cr, const PathItem& p) {
  cairo_move_to(cr, p.points[0].x, p.points[0].y);
  for (std::size_t i = 1; i < p.points.size(); ++i) cairo_line_to(cr, p.points[i].x, p.points[i].y);
  if (p.closed) cairo_close_path(cr);
}

// Parallel lines at `angle` through the box, `spacing` apart, anchored to
// the page origin so neighbouring shapes' patterns line up.
void hatch_lines(cairo_t* cr, double x0, double y0, double x1, double y1, double angle, double spacing) {
  const double a = angle * 3.141592653589793 / 180;
  const double dx = std::cos(a), dy = -std::sin(a);  // along the line (page y runs down)
  const double nx = -dy, ny = dx;                    // across the lines
  double lo = 1e300, hi = -1e300;
  for (double x : {x0, x1})
    for (double y : {y0, y1}) lo = std::min(lo, x * nx + y * ny), hi = std::max(hi, x * nx + y * ny);
  const double reach = std::hypot(x1 - x0, y1 - y0) + spacing;
  for (double d = std::floor(lo / spacing) * spacing; d <= hi + spacing; d += spacing) {
    const double cx = nx * d + dx * (x0 * dx + y0 * dy), cy = ny * d + dy * (x0 * dx + y0 * dy);
    const double span = reach + std::abs(x1 - x0) + std::abs(y1 - y0);
    cairo_move_to(cr, cx - dx * span, cy - dy * span);
    cairo_line_to(cr, cx + dx * span, cy + dy * span);
  }
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
    const double s = h.spacing;
    for (double y = std::floor(y0 / s) * s; y <= y1 + s; y += s) {
      // Alternate rows shift by half a step: an even, staggered field.
      const bool odd = static_cast<long>(std::lround(y / s)) % 2 != 0;
      for (double x = std::floor(x0 / s) * s + (odd ? s / 2 : 0); x <= x1 + s; x += s) {
        cairo_new_sub_path(cr);
        cairo_arc(cr, x, y, h.width / 2, 0, 6.283185307179586);
      }
    }
    cairo_fill(cr);
  } else {
    hatch_lines(cr, x0, y0, x1, y1, h.angle, h.spacing);
    if (h.kind == Hatch::Kind::crossed) hatch_lines(cr, x0, y0, x1, y1, h.angle + 90, h.spacing);
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
