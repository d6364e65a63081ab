#include "audit/layout_audit.h"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <map>
#include <optional>

#include <hb.h>

#include "colour/contrast.h"
#include "place/spatial_index.h"

namespace forme {

namespace {

// Glyph bands as an independent reader measures them (see the header).
constexpr double kCollideBand = 0.70, kTouchEm = 0.05;
constexpr double kEdgeUp = 0.78, kEdgeDown = 0.22;
constexpr double kInkShrink = 0.5;   // points
constexpr double kMarkContrast = 1.5;

// True when the UTF-8 character at byte i is a space (no ink).
bool is_space_at(const std::string& s, std::size_t i) {
  if (i >= s.size()) return false;
  const auto c = static_cast<unsigned char>(s[i]);
  if (c == ' ' || c == '\t') return true;
  if (c == 0xC2 && i + 1 < s.size()) return static_cast<unsigned char>(s[i + 1]) == 0xA0;
  if (c == 0xE2 && i + 2 < s.size()) {
    const auto c1 = static_cast<unsigned char>(s[i + 1]), c2 = static_cast<unsigned char>(s[i + 2]);
    return c1 == 0x80 && (c2 <= 0x8B || c2 == 0xAF);  // U+2000-U+200B, U+202F
  }
  if (c == 0xE3 && i + 2 < s.size()) return s.compare(i, 3, "\xE3\x80\x80") == 0;  // U+3000
  return false;
}

struct TextGeom {
  const TextItem* item = nullptr;
  Rect band, edge, ink;     // ink: the union of the glyphs' ink
  std::vector<Rect> glyphs;  // each inked glyph's ink, shrunk like `ink`
  int order = 0;             // 1 + its index among the page's items: what was drawn before it
};

// The font that drew glyph `i` (a fallback font for some runs).
const Font* font_of(const ShapedText& s, std::size_t i) {
  for (const GlyphRun& r : s.runs)
    if (i >= r.glyph_begin && i < r.glyph_end && r.font) return r.font.get();
  return s.font.get();
}

// The glyph run's boxes; nullopt when the text puts no ink on the page.
std::optional<TextGeom> measure(const TextItem& t) {
  const ShapedText& s = t.text;
  double x0 = 1e300, x1 = -1e300;
  for (const ShapedGlyph& g : s.glyphs) {
    if (g.advance <= 1e-3 || is_space_at(s.utf8, g.cluster)) continue;
    x0 = std::min(x0, t.origin.x + g.x);
    x1 = std::max(x1, t.origin.x + g.x + g.advance);
  }
  if (!(x0 < x1) || s.size <= 0) return std::nullopt;
  const double em = s.size, base = t.origin.y;
  bool wide = false, tall = false, deep = false;
  for (char ch : s.utf8) {
    const auto c = static_cast<unsigned char>(ch);
    if (c >= 0x80) wide = true;
    if (std::string_view("bdfhklt()[]{}|/").find(ch) != std::string_view::npos) tall = true;
    if (std::string_view("gjpqyQ(),;[]{}|_").find(ch) != std::string_view::npos) deep = true;
  }
  const double cap = s.cap_height > 0 ? s.cap_height : 0.714 * em;
  const double up = wide ? kEdgeUp * em : tall ? std::max(cap, 0.76 * em) : cap;
  const double down = wide || deep ? kEdgeDown * em : 0;
  TextGeom g;
  g.item = &t;
  g.band = {x0, base - kCollideBand * em, x1 - x0, kCollideBand * em};
  g.edge = {x0, base - kEdgeUp * em, x1 - x0, (kEdgeUp + kEdgeDown) * em};
  // Each glyph's ink from its outline's extents; without a font, the cap
  // height and any descender stand in for it.
  Rect ink;
  for (std::size_t i = 0; i < s.glyphs.size(); ++i) {
    const ShapedGlyph& sg = s.glyphs[i];
    if (is_space_at(s.utf8, sg.cluster)) continue;
    const Font* f = font_of(s, i);
    Rect r;
    hb_glyph_extents_t e{};
    if (f && f->hb() && hb_font_get_glyph_extents(f->hb(), sg.index, &e)) {
      const double k = em / std::max(1u, f->units_per_em());
      r = {t.origin.x + sg.x + e.x_bearing * k, base + sg.y - e.y_bearing * k, e.width * k, -e.height * k};
    } else if (sg.advance > 1e-3) {
      r = {t.origin.x + sg.x, base - up, sg.advance, up + down};
    }
    if (r.empty()) continue;  // no outline
    ink = ink.united(r);
    const Rect shrunk = r.inset(std::min({kInkShrink * 0.5, r.w / 4, r.h / 4}));
    g.glyphs.push_back(shrunk);
  }
  if (ink.empty()) return std::nullopt;
  g.ink = ink.inset(std::min({kInkShrink, ink.w / 4, ink.h / 4}));
  return g;
}

// A piece of a shape a text or leader may meet.
struct Piece {
  enum Kind { stroke, edge, circle, area } kind;
  ShapeRole role;
  Point a, b;         // stroke and edge: the segment; circle: a = centre
  double half = 0;    // stroke: half its width; circle: its radius
  int shape = 0;      // which shape it comes from
  int poly = -1;      // area: index into polygons (a patterned or covering fill)
  Rect bbox;
  const SourceLoc* loc = nullptr;
};

double dist_point_segment(Point p, Point a, Point b) {
  const double dx = b.x - a.x, dy = b.y - a.y, l2 = dx * dx + dy * dy;
  double t = l2 > 0 ? ((p.x - a.x) * dx + (p.y - a.y) * dy) / l2 : 0;
  t = std::clamp(t, 0.0, 1.0);
  return std::hypot(p.x - a.x - t * dx, p.y - a.y - t * dy);
}

double cross(Point o, Point a, Point b) { return (a.x - o.x) * (b.y - o.y) - (a.y - o.y) * (b.x - o.x); }

double dist_segments(Point a, Point b, Point c, Point d) {
  const double d1 = cross(a, b, c), d2 = cross(a, b, d), d3 = cross(c, d, a), d4 = cross(c, d, b);
  if (((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0)) && ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0))) return 0;
  return std::min({dist_point_segment(a, c, d), dist_point_segment(b, c, d), dist_point_segment(c, a, b),
                   dist_point_segment(d, a, b)});
}

double dist_point_rect(Point p, const Rect& r) {
  const double dx = std::max({r.left() - p.x, 0.0, p.x - r.right()});
  const double dy = std::max({r.top() - p.y, 0.0, p.y - r.bottom()});
  return std::hypot(dx, dy);
}

bool inside_polygon(Point p, const std::vector<Point>& poly) {
  bool in = false;
  for (std::size_t i = 0, j = poly.size() - 1; i < poly.size(); j = i++)
    if ((poly[i].y > p.y) != (poly[j].y > p.y) &&
        p.x < (poly[j].x - poly[i].x) * (p.y - poly[i].y) / (poly[j].y - poly[i].y) + poly[i].x)
      in = !in;
  return in;
}

// Does the piece put visible ink inside `r`?
bool meets(const Piece& p, const Rect& r, const std::vector<const std::vector<Point>*>& polys) {
  switch (p.kind) {
    case Piece::stroke: return segment_meets_rect(p.a, p.b, r.inflate(p.half));
    case Piece::edge: return segment_meets_rect(p.a, p.b, r);
    case Piece::circle: return dist_point_rect(p.a, r) < p.half;
    case Piece::area: return inside_polygon({r.cx(), r.cy()}, *polys[static_cast<std::size_t>(p.poly)]);
  }
  return false;
}

double dist_to_point(const Piece& p, Point q) {
  switch (p.kind) {
    case Piece::stroke: return std::max(0.0, dist_point_segment(q, p.a, p.b) - p.half);
    case Piece::edge: return dist_point_segment(q, p.a, p.b);
    case Piece::circle: return std::max(0.0, std::hypot(q.x - p.a.x, q.y - p.a.y) - p.half);
    case Piece::area: return 1e300;
  }
  return 1e300;
}

// Does the segment c-d (of width 2 × half) meet the piece?
bool meets_segment(const Piece& p, Point c, Point d, double half) {
  switch (p.kind) {
    case Piece::stroke: return dist_segments(p.a, p.b, c, d) < p.half + half;
    case Piece::edge: return dist_segments(p.a, p.b, c, d) < half;
    case Piece::circle: return dist_point_segment(p.a, c, d) < p.half + half;
    case Piece::area: return false;  // edges tell when a leader enters a fill
  }
  return false;
}

Rect bounds(Point a, Point b, double pad) {
  const double l = std::min(a.x, b.x), t = std::min(a.y, b.y);
  return Rect{l, t, std::abs(a.x - b.x), std::abs(a.y - b.y)}.inflate(pad);
}

Rect bounds(const std::vector<Point>& pts) {
  double l = 1e300, t = 1e300, r = -1e300, b = -1e300;
  for (Point p : pts) l = std::min(l, p.x), t = std::min(t, p.y), r = std::max(r, p.x), b = std::max(b, p.y);
  return {l, t, r - l, b - t};
}

std::string what_it_is(const Piece& p) {
  switch (p.role) {
    case ShapeRole::data: return p.kind == Piece::circle ? "a data dot" : p.kind == Piece::stroke ? "a data line"
                                                          : p.kind == Piece::area ? "a patterned fill" : "the edge of a bar or area";
    case ShapeRole::reference: return "a reference or trend line";
    case ShapeRole::leader: return p.kind == Piece::circle ? "a callout's target dot" : "a leader line";
    case ShapeRole::furniture: return "a rule";
    default: return "a shape";
  }
}

std::string points(double v) {
  char buf[32];
  std::snprintf(buf, sizeof buf, "%.1f", v);
  return buf;
}

bool finite(Point p) { return std::isfinite(p.x) && std::isfinite(p.y); }

struct PageShapes {
  std::vector<Piece> pieces;
  std::vector<const std::vector<Point>*> polys;
  std::vector<const PathItem*> leaders, callouts;
  std::vector<std::pair<int, Rect>> papers;  // callout boxes: drawn when, and where
};

PageShapes collect_shapes(const DisplayPage& page, Rgb paper) {
  PageShapes s;
  auto seen = [&](Rgb c) { return contrast_ratio(c, paper) >= kMarkContrast; };
  int shape = 0;
  for (const auto& item : page.items) {
    ++shape;
    if (const auto* c = std::get_if<CircleItem>(&item)) {
      // Data dots, and the dot a callout's leader marks its target with.
      if ((c->role != ShapeRole::data && c->role != ShapeRole::leader) || !finite(c->centre)) continue;
      const bool fill = c->fill && seen(*c->fill), edge = c->stroke && seen(c->stroke->colour);
      if (!fill && !edge) continue;
      const double r = c->radius + (edge ? c->stroke->width / 2 : 0);  // a paper rim adds no ink
      s.pieces.push_back({Piece::circle, c->role, c->centre, c->centre, r, shape, -1,
                          Rect{c->centre.x - r, c->centre.y - r, 2 * r, 2 * r}, &c->loc});
      continue;
    }
    const auto* p = std::get_if<PathItem>(&item);
    if (!p || p->points.empty()) continue;
    if (p->role == ShapeRole::leader) s.leaders.push_back(p);
    if (p->role == ShapeRole::callout_box) {
      s.callouts.push_back(p);
      s.papers.push_back({shape, bounds(p->points)});
    }
    if (p->role == ShapeRole::grid || p->role == ShapeRole::callout_box) continue;
    if (!std::all_of(p->points.begin(), p->points.end(), finite)) continue;
    const std::size_t n = p->points.size();
    if (p->closed && p->fill) {
      if (p->role != ShapeRole::data) continue;  // backgrounds, swatches and bands are not data
      if (seen(*p->fill))
        for (std::size_t i = 0; i < n; ++i) {
          const Point a = p->points[i], b = p->points[(i + 1) % n];
          s.pieces.push_back({Piece::edge, p->role, a, b, 0, shape, -1, bounds(a, b, 0.01), &p->loc});
        }
      if (p->hatch && contrast_ratio(p->hatch->ink, *p->fill) >= kMarkContrast && n >= 3) {
        s.polys.push_back(&p->points);
        s.pieces.push_back({Piece::area, p->role, {}, {}, 0, shape, static_cast<int>(s.polys.size() - 1),
                            bounds(p->points), &p->loc});
      }
      continue;
    }
    if (!p->stroke || !seen(p->stroke->colour) || n < 2) continue;
    const double half = p->stroke->width / 2;
    for (std::size_t i = 0; i + 1 < n + (p->closed ? 1 : 0); ++i) {
      const Point a = p->points[i], b = p->points[(i + 1) % n];
      s.pieces.push_back({Piece::stroke, p->role, a, b, half, shape, -1, bounds(a, b, half + 0.01), &p->loc});
    }
  }
  return s;
}

Rgb paper_of(const DisplayPage& page) {
  // A background is a filled rectangle drawn first over the whole sheet.
  if (!page.items.empty())
    if (const auto* p = std::get_if<PathItem>(&page.items.front()))
      if (p->fill && p->closed) {
        const Rect b = bounds(p->points);
        if (b.w >= page.width - 0.5 && b.h >= page.height - 0.5) return *p->fill;
      }
  return Rgb{1, 1, 1};
}

Rect sheet_region(const DisplayPage& page) {
  return Rect{0, 0, std::max(page.width, 1.0), std::max(page.height, 1.0)}.inflate(36);
}

void check_edges(const std::vector<TextGeom>& texts, const DisplayPage& page, std::vector<LayoutFinding>& out) {
  const Rect trim = page.trim_box.value_or(Rect{0, 0, page.width, page.height});
  const char* what = page.trim_box ? "trim" : "sheet";
  for (const TextGeom& g : texts) {
    const Rect& e = g.edge;
    if (page.bleed_box && !e.overlaps(*page.bleed_box)) continue;  // a slug line, outside the printed page
    const double over[4] = {trim.left() - e.left(), e.right() - trim.right(), trim.top() - e.top(),
                            e.bottom() - trim.bottom()};
    const char* side[4] = {"left", "right", "top", "bottom"};
    int worst = -1;
    for (int i = 0; i < 4; ++i)
      if (over[i] >= 0 && (worst < 0 || over[i] > over[worst])) worst = i;
    if (worst < 0) continue;
    const std::string detail = over[worst] < 0.05
                                   ? std::string("reaches the ") + side[worst] + " edge of the " + what
                                   : "runs " + points(over[worst]) + " pt past the " + side[worst] + " edge of the " + what;
    out.push_back({LayoutFault::off_sheet, g.item->loc, g.item->text.utf8, detail, g.item->role});
  }
}

void check_text_pairs(const std::vector<TextGeom>& texts, const DisplayPage& page, std::vector<LayoutFinding>& out) {
  GridIndex index(sheet_region(page), 24, 24);
  index.reserve(texts.size());
  std::vector<Rect> grown(texts.size());
  for (std::size_t i = 0; i < texts.size(); ++i) {
    const double em = texts[i].item->text.size;
    grown[i] = texts[i].band.inflate(kTouchEm * em);
    index.insert(static_cast<int>(i), grown[i]);
  }
  for (std::size_t i = 0; i < texts.size(); ++i) {
    const TextItem& a = *texts[i].item;
    index.query(grown[i], [&](int jd, const Rect&) {
      const auto j = static_cast<std::size_t>(jd);
      if (j <= i) return;
      const TextItem& b = *texts[j].item;
      // The same run drawn twice in one place (a halo) is one text.
      if (a.text.utf8 == b.text.utf8 && std::abs(a.origin.x - b.origin.x) < 0.05 &&
          std::abs(a.origin.y - b.origin.y) < 0.05)
        return;
      // On one baseline only a true overlap counts: words of one line sit close.
      const double em = std::min(a.text.size, b.text.size);
      const bool one_line = std::abs(a.origin.y - b.origin.y) < 0.1 * em;
      if (one_line && !texts[i].band.inset(0.01).overlaps(texts[j].band.inset(0.01))) return;
      out.push_back({LayoutFault::over_text, a.loc, a.text.utf8, "'" + b.text.utf8 + "'", a.role});
    });
  }
}

void check_marks(const std::vector<TextGeom>& texts, const PageShapes& shapes, const DisplayPage& page,
                 std::vector<LayoutFinding>& out) {
  GridIndex index(sheet_region(page), 24, 24);
  index.reserve(shapes.pieces.size());
  for (std::size_t i = 0; i < shapes.pieces.size(); ++i) index.insert(static_cast<int>(i), shapes.pieces[i].bbox);

  // A callout's paper, drawn after a mark and before a text, hides the mark there.
  auto hidden = [&](const Piece& p, const Rect& r, int text_order) {
    for (const auto& [order, box] : shapes.papers)
      if (order > p.shape && order < text_order && within(r, box)) return true;
    return false;
  };
  for (const TextGeom& g : texts) {
    // One finding per text and kind of thing under it: the nearest-first piece is enough to name it.
    std::optional<std::size_t> data, line;
    index.query(g.ink, [&](int id, const Rect&) {
      const Piece& p = shapes.pieces[static_cast<std::size_t>(id)];
      const bool is_data = p.role == ShapeRole::data;
      if ((is_data && data) || (!is_data && line)) return;
      if (!std::any_of(g.glyphs.begin(), g.glyphs.end(),
                       [&](const Rect& r) { return meets(p, r, shapes.polys) && !hidden(p, r, g.order); }))
        return;
      (is_data ? data : line) = static_cast<std::size_t>(id);
    });
    if (data)
      out.push_back({LayoutFault::over_data, g.item->loc, g.item->text.utf8, what_it_is(shapes.pieces[*data]), g.item->role});
    if (line)
      out.push_back({LayoutFault::crossed_by_line, g.item->loc, g.item->text.utf8, what_it_is(shapes.pieces[*line]),
                     g.item->role});
  }

  for (const PathItem* c : shapes.callouts) {
    const Rect box = bounds(c->points).inset(0.01);
    bool covers = false;
    index.query(box, [&](int id, const Rect&) {
      const Piece& p = shapes.pieces[static_cast<std::size_t>(id)];
      if (covers || p.role != ShapeRole::data) return;
      if (meets(p, box, shapes.polys)) covers = true;
    });
    // A box wholly inside one bar meets no edge: the bar's fill under its centre tells.
    if (!covers)
      for (const auto& item : page.items)
        if (const auto* f = std::get_if<PathItem>(&item))
          if (f->role == ShapeRole::data && f->closed && f->fill && f->points.size() >= 3 &&
              inside_polygon({box.cx(), box.cy()}, f->points)) {
            covers = true;
            break;
          }
    if (covers) out.push_back({LayoutFault::callout_over_data, c->loc, "callout", "covers data", TextRole::callout});
  }

  for (const PathItem* l : shapes.leaders) {
    if (l->points.size() < 2 || !std::all_of(l->points.begin(), l->points.end(), finite)) continue;
    const Point from = l->points.front(), to = l->points.back();
    const double half = l->stroke ? l->stroke->width / 2 : 0.25;
    const double end_room = std::max(1.5, 4 * half);  // where the leader meets what it joins
    std::optional<std::size_t> hit;
    for (std::size_t k = 0; k + 1 < l->points.size() && !hit; ++k) {
      Point a = l->points[k], b = l->points[k + 1];
      const double len = std::hypot(b.x - a.x, b.y - a.y);
      if (len <= 0) continue;
      const double ux = (b.x - a.x) / len, uy = (b.y - a.y) / len;
      if (k == 0) {
        if (len <= end_room) continue;
        a = {a.x + ux * end_room, a.y + uy * end_room};
      }
      if (k + 2 == l->points.size()) {
        const double rest = std::hypot(b.x - a.x, b.y - a.y);
        if (rest <= end_room) continue;
        b = {b.x - ux * end_room, b.y - uy * end_room};
      }
      index.query(bounds(a, b, half + 0.01), [&](int id, const Rect&) {
        const Piece& p = shapes.pieces[static_cast<std::size_t>(id)];
        if (hit || (p.role != ShapeRole::data && p.role != ShapeRole::reference)) return;
        // The mark the leader points to, or starts from, is where it ends.
        if (dist_to_point(p, from) < end_room || dist_to_point(p, to) < end_room) return;
        if (meets_segment(p, a, b, half)) hit = static_cast<std::size_t>(id);
      });
    }
    if (hit) out.push_back({LayoutFault::leader_crossing, l->loc, "leader", "crosses " + what_it_is(shapes.pieces[*hit]),
                            TextRole::point_label});
  }
}

std::string fault_phrase(const LayoutFinding& f) {
  switch (f.fault) {
    case LayoutFault::off_sheet: return "text '" + f.subject + "' " + f.detail;
    case LayoutFault::over_data: return "text '" + f.subject + "' lies over " + f.detail;
    case LayoutFault::crossed_by_line: return "text '" + f.subject + "' is crossed by " + f.detail;
    case LayoutFault::over_text: return "text '" + f.subject + "' overlaps " + f.detail;
    case LayoutFault::callout_over_data: return "a callout's box covers data";
    case LayoutFault::leader_crossing: return "a leader " + f.detail + " it does not point to";
    case LayoutFault::small_text: return "text '" + f.subject + "' is set at " + f.detail;
  }
  return {};
}

std::string group_phrase(const std::vector<const LayoutFinding*>& g) {
  const LayoutFinding& f = *g.front();
  std::string names;
  for (std::size_t i = 0; i < std::min<std::size_t>(3, g.size()); ++i) names += (i ? ", '" : "'") + g[i]->subject + "'";
  names += ", …";
  const std::string n = std::to_string(g.size());
  switch (f.fault) {
    case LayoutFault::off_sheet: return n + " texts reach or run past the edge of the page (" + names + "); the first " + f.detail;
    case LayoutFault::over_data: return n + " texts lie over data marks (" + names + ")";
    case LayoutFault::crossed_by_line: return n + " texts are crossed by lines (" + names + ")";
    case LayoutFault::over_text: return n + " texts overlap other text (" + names + ")";
    case LayoutFault::callout_over_data: return n + " callout boxes cover data";
    case LayoutFault::leader_crossing: return n + " leaders cross marks they do not point to";
    case LayoutFault::small_text: return n + " texts are set below the smallest size (" + names + ")";
  }
  return {};
}

std::string fault_hint(LayoutFault f) {
  switch (f) {
    case LayoutFault::off_sheet: return "shorten or wrap the text, or give it a bigger sheet or smaller type";
    case LayoutFault::over_data: return "move the label ('offset', 'corner'), label fewer points, or give the panel more room";
    case LayoutFault::crossed_by_line: return "move the label or the line's label, or give the panel more room";
    case LayoutFault::over_text: return "shorten the text, or give the panels more room";
    case LayoutFault::callout_over_data: return "leave out 'corner' and 'offset' so forme finds a free place, or move it";
    case LayoutFault::leader_crossing: return "move the label nearer what it names, or label fewer points";
    case LayoutFault::small_text: return "raise 'type.size' or use a larger sheet";
  }
  return {};
}

}  // namespace

std::vector<LayoutFinding> find_layout_faults(const DisplayPage& page, double minimum_size) {
  std::vector<TextGeom> texts;
  std::vector<LayoutFinding> out;
  int order = 0;
  for (const auto& item : page.items) {
    ++order;
    if (const auto* t = std::get_if<TextItem>(&item)) {
      if (!std::isfinite(t->origin.x) || !std::isfinite(t->origin.y)) continue;
      if (t->text.size > 0 && t->text.size < minimum_size - 1e-9 && !t->text.utf8.empty())
        out.push_back({LayoutFault::small_text, t->loc, t->text.utf8, points(t->text.size) + " pt, below the " +
                                                                          points(minimum_size) + " pt print carries legibly",
                       t->role});
      if (auto g = measure(*t)) {
        g->order = order;
        texts.push_back(std::move(*g));
      }
    }
  }
  check_edges(texts, page, out);
  check_text_pairs(texts, page, out);
  check_marks(texts, collect_shapes(page, paper_of(page)), page, out);
  return out;
}

namespace {

// Text the page sets whatever its data: everything else labels the data.
bool is_furniture(TextRole r) {
  switch (r) {
    case TextRole::title: case TextRole::standfirst: case TextRole::panel_title: case TextRole::axis_title:
    case TextRole::tick_label: case TextRole::note: case TextRole::source: return true;
    default: return false;
  }
}

}  // namespace

void audit_layout(const PageSpec& spec, const DisplayPage& page, DiagnosticSink& out, const Limits& limits) {
  std::size_t labels = 0;
  for (const auto& item : page.items)
    if (const auto* t = std::get_if<TextItem>(&item)) labels += is_furniture(t->role) ? 0 : 1;
  if (labels > limits.labels) {
    out.report({Severity::error, spec.loc,
                "the page carries " + std::to_string(labels) + " labels, more than the " +
                    std::to_string(limits.labels) + " one page may hold",
                "label fewer points (or split the page), or raise the limit with '--limit labels=N'"});
    return;  // the checks below would take long and say little more
  }
  const std::vector<LayoutFinding> found = find_layout_faults(page);
  // Many findings of one kind about one kind of text are one cause: say it once.
  constexpr std::size_t kGroupOver = 3;
  std::map<std::pair<LayoutFault, TextRole>, std::vector<const LayoutFinding*>> groups;
  std::vector<std::pair<LayoutFault, TextRole>> order;
  for (const LayoutFinding& f : found) {
    auto& g = groups[{f.fault, f.role}];
    if (g.empty()) order.push_back({f.fault, f.role});
    g.push_back(&f);
  }
  auto where = [&](const SourceLoc& l) { return l.line > 0 ? l : spec.loc; };
  for (const auto& key : order) {
    const auto& g = groups[key];
    if (g.size() <= kGroupOver)
      for (const LayoutFinding* f : g) out.warn(where(f->loc), fault_phrase(*f), fault_hint(f->fault));
    else
      out.warn(where(g.front()->loc), group_phrase(g), fault_hint(key.first));
  }
}

}  // namespace forme
