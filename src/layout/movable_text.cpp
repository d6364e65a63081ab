#include "layout/movable_text.h"

#include <algorithm>
#include <cmath>
#include <optional>
#include <utility>

#include "layout/marks/marks.h"
#include "place/callout_spot.h"
#include "place/point_labels.h"
#include "place/spatial_index.h"
#include "text/wrap.h"

namespace forme {

namespace {

// Every piece of text on the page so far, grown by `gap` so that nothing
// placed against it touches it.
std::vector<Rect> text_boxes(const DisplayPage& page, double gap) {
  std::vector<Rect> out;
  for (const auto& item : page.items)
    if (const auto* t = std::get_if<TextItem>(&item)) out.push_back(t->box().inflate(gap));
  return out;
}

// Rules drawn across the plot (a zero line, an axis inside the data) are
// not data, but a name struck through by one reads as badly: they join the
// marks names keep clear of, as points 1.5 pt apart like a line's.
void add_rules_inside(const Rect& plot, const DisplayPage& page, std::vector<Rect>& marks) {
  for (const auto& item : page.items) {
    const auto* p = std::get_if<PathItem>(&item);
    if (!p || p->role != ShapeRole::furniture || p->closed || !p->stroke || p->points.size() < 2) continue;
    for (std::size_t i = 1; i < p->points.size(); ++i) {
      const Point a = p->points[i - 1], b = p->points[i];
      if (!plot.inflate(1).contains(a) || !plot.inflate(1).contains(b)) continue;
      const int n = static_cast<int>(std::hypot(b.x - a.x, b.y - a.y) / 1.5);
      for (int k = 0; k <= n; ++k) {
        const double t = n > 0 ? static_cast<double>(k) / n : 0;
        marks.push_back({a.x + (b.x - a.x) * t, a.y + (b.y - a.y) * t, 0, 0});
      }
    }
  }
}

void draw_leader(Point from, Point to, const Stroke& stroke, DisplayPage& page, SourceLoc loc = {}) {
  PathItem p;
  p.points = {from, to};
  p.stroke = stroke;
  p.role = ShapeRole::leader;
  p.loc = std::move(loc);
  page.add(std::move(p));
}

// The leader starts at the rim of a dot rather than its centre.
Point off_rim(Point centre, Point toward, double radius) {
  const double dx = toward.x - centre.x, dy = toward.y - centre.y, d = std::hypot(dx, dy);
  if (d <= radius) return centre;
  return {centre.x + dx / d * radius, centre.y + dy / d * radius};
}

Rect pinned_box(const CalloutSpec& c, Point target, const Rect& plot, double w, double h, double pad) {
  using C = CalloutSpec::Corner;
  if (c.offset) return {target.x + c.offset->x - w / 2, target.y - c.offset->y - h / 2, w, h};
  const double l = plot.left() + pad, r = plot.right() - pad - w, t = plot.top() + pad, b = plot.bottom() - pad - h;
  switch (c.corner) {
    case C::upper_left: return {l, t, w, h};
    case C::upper_right: return {r, t, w, h};
    case C::lower_left: return {l, b, w, h};
    case C::lower_right:
    case C::none: break;
  }
  return {r, b, w, h};
}

void place_choices(const PanelMovables& p, const PageStyle& st, DisplayPage& page, DiagnosticSink& warnings) {
  const double gap = st.base * 0.15;
  // Spots outside the plot must stay well inside the sheet.
  const Rect sheet = Rect{0, 0, page.width, page.height}.inflate(-st.base * 1.5);
  for (const SpotChoiceRequest& c : p.choices) {
    if (c.spots.empty()) continue;
    const std::vector<Rect> obstacles = text_boxes(page, gap);
    int best = -1, best_marks = 0;
    for (std::size_t i = 0; i < c.spots.size(); ++i) {
      const Rect& box = c.spots[i];
      if (!within(box, sheet)) continue;
      if (std::any_of(obstacles.begin(), obstacles.end(), [&](const Rect& o) { return o.overlaps(box); })) continue;
      // Marks are counted with a little air around the box, so the label does not touch them.
      const Rect near = box.inflate(gap);
      const int marks = static_cast<int>(std::count_if(page.data_marks.begin(), page.data_marks.end(),
                                                       [&](const Rect& m) { return m.overlaps(near); }));
      if (best < 0 || marks < best_marks) best = static_cast<int>(i), best_marks = marks;
      if (marks == 0) break;
    }
    if (best < 0) {
      warnings.warn(c.loc, "the label '" + c.text.utf8 + "' covers other text wherever it goes",
                    "shorten it, or give the panel more room");
      best = 0;
    }
    const Rect& box = c.spots[static_cast<std::size_t>(best)];
    if (best_marks > 0) {
      // Last resort. Crossed only by thin lines (points along a line), the
      // label gets paper behind it; over a bar or a dot it would hide data,
      // so it is left out and the page says so.
      const Rect near = box.inflate(gap);
      const bool solid = std::any_of(page.data_marks.begin(), page.data_marks.end(),
                                     [&](const Rect& m) { return m.w > 0 && m.h > 0 && m.overlaps(near); });
      if (solid) {
        warnings.warn(c.loc, "the label '" + c.text.utf8 + "' is left out: it would cover data wherever it goes",
                      "shorten it, or give the panel more room");
        continue;
      }
      PathItem halo = filled_rect(box.inflate(gap), st.ink.paper);
      halo.loc = c.loc;
      page.add(std::move(halo));
    }
    const double asc = c.text.ascent;
    page.add(TextItem{c.text, {box.x, box.y + asc}, c.ink, c.role, c.loc});
  }
}

void place_callouts(const PanelMovables& p, const PageStyle& st, DisplayPage& page, std::vector<Leader>& leaders,
                    DiagnosticSink& warnings) {
  const double pad = st.base * 0.3, gap = st.base * 0.15;
  const double size = st.label_size();
  const double lh = PageStyle::line_height(st.fonts.regular, size);
  for (const CalloutRequest& req : p.callouts) {
    const CalloutSpec& c = *req.spec;
    const double width = c.width > 0 ? c.width : st.base * 16;
    std::vector<ShapedText> lines = wrap_text(c.text, st.fonts.regular, size, width - 2 * pad);
    double w = 0;
    for (const auto& l : lines) w = std::max(w, l.width);
    w += 2 * pad;
    const double h = static_cast<double>(lines.size()) * lh + 2 * pad;
    const std::vector<Rect> obstacles = text_boxes(page, gap);
    Rect box;
    if (c.offset || c.corner != CalloutSpec::Corner::none) {
      box = pinned_box(c, req.target, p.plot, w, h, pad);
      for (const Rect& o : obstacles)
        if (o.overlaps(box)) {
          warnings.warn(c.loc, "the callout's pinned place covers other text",
                        "move it with 'offset' or 'corner', or leave both out and forme finds a free place");
          break;
        }
    } else {
      // A note never covers data while any other place will do: first in
      // the plot at the given width, then wrapped narrower, then anywhere on
      // the sheet clear of text and data (the margin beside the plot), and
      // only then in the plot over the fewest marks, where the page audit
      // reports it.
      const Rect sheet = Rect{0, 0, page.width, page.height}.inflate(-st.base * 1.5);
      std::optional<CalloutSpot> spot;
      auto wrapped = [&](double wrap_width) {
        std::vector<ShapedText> out = wrap_text(c.text, st.fonts.regular, size, wrap_width - 2 * pad);
        double ww = 0;
        for (const auto& l : out) ww = std::max(ww, l.width);
        return std::pair{std::move(out), ww + 2 * pad};
      };
      for (const double share : {1.0, 0.75, 0.5}) {
        if (share < 1 && width * share < st.base * 6) break;
        auto [narrow, nw] = share < 1 ? wrapped(width * share) : std::pair{lines, w};
        const double nh = static_cast<double>(narrow.size()) * lh + 2 * pad;
        CalloutSearch search{p.plot, st.base * 0.4, st.base * 0.8, 24, 0};
        spot = find_callout_spot(req.target, nw, nh, search, obstacles, page.data_marks, leaders);
        if (spot) {
          lines = std::move(narrow);
          break;
        }
      }
      if (!spot) spot = find_callout_spot(req.target, w, h, CalloutSearch{sheet, st.base * 0.4, st.base * 0.8, 48, 0},
                                          obstacles, page.data_marks, leaders);
      if (!spot) spot = find_callout_spot(req.target, w, h, CalloutSearch{p.plot, st.base * 0.4, st.base * 0.8, 24},
                                          obstacles, page.data_marks, leaders);
      if (!spot) {
        warnings.warn(c.loc, "no free room in the panel for the callout '" + lines.front().utf8 + "…'; it is left out",
                      "shorten it, give it a smaller 'width', or pin it with 'corner' or 'offset'");
        continue;
      }
      box = spot->box;
    }
    // Paper behind the note keeps it readable where it must cover data.
    const bool covers = std::any_of(page.data_marks.begin(), page.data_marks.end(),
                                    [&](const Rect& m) { return m.overlaps(box); });
    if (covers) {
      PathItem paper = filled_rect(box, st.ink.paper);
      paper.role = ShapeRole::callout_box;
      paper.loc = c.loc;
      page.add(std::move(paper));
    }
    const Point end = nearest_point_of(box.inset(pad * 0.5), req.target);
    if (std::hypot(end.x - req.target.x, end.y - req.target.y) > st.base * 0.3) {
      draw_leader(req.target, end, Stroke{st.ink.text, st.rule_width() * 1.5, {}, true}, page, c.loc);
      leaders.push_back({req.target, end});
      note_line_marks({req.target, end}, page);
    }
    page.add(CircleItem{req.target, st.rule_width() * 2.2, st.ink.text, std::nullopt, ShapeRole::leader, {}});
    double top = box.y + pad;
    for (auto& l : lines) {
      const double asc = l.ascent;
      page.add(TextItem{std::move(l), {box.x + pad, top + asc}, st.ink.text, TextRole::callout, c.loc});
      top += lh;
    }
    page.data_marks.push_back(box);
  }
}

void place_point_names(const PanelMovables& p, std::size_t panel, const PageStyle& st, DisplayPage& page,
                       DiagnosticSink& warnings) {
  if (p.names.empty()) return;
  const double pad = st.base * 0.1, gap = st.base * 0.15;
  // Names are set a step smaller than tick labels (never below 6 pt), so
  // more of them find room beside their dots.
  const double size = st.note_size();
  PlacementProblem problem;
  problem.area = p.plot;
  problem.obstacles = text_boxes(page, gap);
  for (const Rect& m : page.data_marks)
    if (m.overlaps(p.plot.inflate(1)) || p.plot.contains({m.x, m.y})) problem.marks.push_back(m);
  add_rules_inside(p.plot, page, problem.marks);
  std::vector<ShapedText> texts;
  double radius = 0;
  for (const auto& n : p.names) {
    texts.push_back(shape_text(n.text, st.fonts.regular, size));
    problem.labels.push_back({n.anchor, texts.back().width + 2 * pad, texts.back().height() + 2 * pad, n.priority,
                              IfUnplaced::leader});
    radius = std::max(radius, n.radius);
  }
  PlacementOptions options;
  // A name over another dot or across a line misleads: covering any mark
  // costs more than leaving the name out (and saying so).
  double top_priority = 1;
  for (const auto& n : p.names) top_priority = std::max(top_priority, n.priority);
  options.mark_cost = options.omit_cost * top_priority * 2;
  options.offset = radius;
  options.seed = 1 + panel;  // fixed: the same page always comes out the same
  options.leader_rings = 4;
  const PlacementResult r = place_labels_annealing(problem, options);
  const Stroke leader_stroke{st.ink.muted, st.rule_width() * 1.5, {}, true};
  for (std::size_t i = 0; i < p.names.size(); ++i) {
    const LabelPlacement& lp = r.labels[i];
    if (!lp.placed) continue;
    if (lp.leader)
      draw_leader(off_rim(p.names[i].anchor, lp.leader->to, p.names[i].radius), lp.leader->to, leader_stroke, page,
                  p.names[i].loc);
    const double asc = texts[i].ascent;
    page.add(TextItem{std::move(texts[i]), {lp.box.x + pad, lp.box.y + pad + asc}, st.ink.text,
                      p.names[i].is_value ? TextRole::value_label : TextRole::point_label, p.names[i].loc});
  }
  for (int i : r.left_out) {
    const PointNameRequest& n = p.names[static_cast<std::size_t>(i)];
    if (n.is_value)
      warnings.warn(n.loc, "value label '" + n.text + "' left out: no free room near its point",
                    "label fewer points (value-labels: last, highest or lowest), or give the panel more room");
    else
      warnings.warn(n.loc, "point name '" + n.text + "' left out: no free room near its point",
                    "give it a higher 'label-priority', shorten the names, or give the panel more room");
  }
}

}  // namespace

void place_movable_text(const std::vector<PanelMovables>& panels, const PageStyle& st, DisplayPage& page,
                        DiagnosticSink& warnings) {
  std::vector<Leader> leaders;
  for (const auto& p : panels) place_choices(p, st, page, warnings);
  for (const auto& p : panels) place_callouts(p, st, page, leaders, warnings);
  for (std::size_t i = 0; i < panels.size(); ++i) place_point_names(panels[i], i, st, page, warnings);
}

}  // namespace forme
