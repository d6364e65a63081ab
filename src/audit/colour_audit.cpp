#include "audit/colour_audit.h"

#include <algorithm>
#include <cstdio>
#include <set>
#include <tuple>

#include "base/fixed_decimals.h"
#include "colour/audit.h"
#include "colour/contrast.h"
#include "colour/cvd.h"
#include "colour/difference.h"
#include "colour/text_ink.h"
#include "describe/suggest.h"
#include "layout/series_looks.h"

namespace forme {

namespace {

std::string quoted(const std::string& name) { return name.empty() ? "the unnamed series" : "'" + name + "'"; }

bool separated(ChartKind kind, const SeriesLook& a, const SeriesLook& b) {
  if (kind == ChartKind::line) return a.dash != b.dash;
  if (kind == ChartKind::vertical_bar || kind == ChartKind::horizontal_bar) return a.pattern != b.pattern;
  return false;  // dots carry colour only
}

// One pair of series, in one panel, that some readers cannot tell apart.
struct HardPair {
  std::string a, b;
  std::size_t panel = 0;
  ChartKind kind = ChartKind::line;
  std::vector<Vision> failed;
  double worst = 0;
  bool patterned = false;  ///< the panel's series already wear dashes or patterns
};

std::string hint_for(ChartKind kind, bool patterned) {
  const bool bars = kind == ChartKind::vertical_bar || kind == ChartKind::horizontal_bar;
  return kind == ChartKind::dot || patterned
             ? "give them colours further apart in lightness, or split them into panels"
             : std::string("give them colours further apart in lightness, or 'colours: {patterns: true}' to add ") +
                   (bars ? "fill patterns" : "dashes");
}

// Pairs that share one cause (the colours chosen at one place) are one
// finding: one pair as itself, many as the series involved and a count per
// vision, so twenty series give one warning, not seventy-five.
void tell_pairs(const SourceLoc& loc, const std::vector<HardPair>& pairs, DiagnosticSink& out) {
  double worst = 1e300;
  for (const auto& p : pairs) worst = std::min(worst, p.worst);
  const std::string below = ": CIEDE2000 difference " + std::string(pairs.size() > 1 ? "as low as " : "") +
                            fixed(worst, 1) + ", below " + fixed(kSeriesDeltaE, 0) + " (common practice)";
  if (pairs.size() == 1) {
    const HardPair& p = pairs.front();
    std::string failed;
    for (Vision v : p.failed) failed += (failed.empty() ? "" : ", ") + std::string(to_string(v));
    out.warn(loc, "series " + quoted(p.a) + " and " + quoted(p.b) + " in panel " + std::to_string(p.panel + 1) +
                      " are hard to tell apart (" + failed + ")" + below,
             hint_for(p.kind, p.patterned));
    return;
  }
  std::vector<std::string> names;
  for (const auto& p : pairs)
    for (const std::string* n : {&p.a, &p.b})
      if (std::find(names.begin(), names.end(), *n) == names.end()) names.push_back(*n);
  constexpr std::size_t kNamed = 6;  // enough to recognise the group on one line
  std::string list;
  for (std::size_t i = 0; i < names.size() && i < kNamed; ++i) list += (i ? ", " : "") + quoted(names[i]);
  if (names.size() > kNamed) list += " and " + std::to_string(names.size() - kNamed) + " more";
  std::string counts;
  for (Vision v : all_visions) {
    std::size_t n = 0;
    for (const auto& p : pairs) n += std::count(p.failed.begin(), p.failed.end(), v);
    if (n) counts += (counts.empty() ? "" : ", ") + std::to_string(n) + " " + std::string(to_string(v));
  }
  std::set<std::size_t> in;
  for (const auto& p : pairs) in.insert(p.panel);
  const std::string where = in.size() == 1 ? "in panel " + std::to_string(*in.begin() + 1)
                                           : "over " + std::to_string(in.size()) + " panels";
  out.warn(loc,
           std::to_string(pairs.size()) + " pairs of series " + where + " are hard to tell apart (" + counts +
               "), among " + list + below,
           hint_for(pairs.front().kind, pairs.front().patterned) + "; with this many series, small multiples or fewer series read better");
}

void audit_series(const std::vector<PanelData>& panels, const std::vector<PanelLooks>& looks, const Rgb& paper,
                  bool greyscale, DiagnosticSink& out) {
  // One-panel-per grids repeat the same pairs in every panel: say each once.
  std::set<std::tuple<std::string, std::string, int, int>> said;
  std::set<std::pair<std::string, int>> said_paper;
  // Hard pairs by where their colours were chosen, in the order found.
  std::vector<std::pair<SourceLoc, std::vector<HardPair>>> causes;
  for (std::size_t i = 0; i < panels.size(); ++i) {
    const auto& series = panels[i].series;
    const PanelLooks& pl = looks[i];
    for (const auto& s : series) {
      const SeriesLook& l = pl.series.at(s.name);
      const Rgb seen = greyscale ? as_seen(l.colour, Vision::greyscale) : l.colour;
      const double ratio = contrast_ratio(seen, paper);
      if (!meets(ratio, wcag::graphics) && said_paper.insert({s.name, l.loc.line}).second)
        out.warn(l.loc,
                 "series " + quoted(s.name) + " stands out from the paper at only " + fixed(ratio, 2) +
                     ":1, below the 3:1 that WCAG 2.x SC 1.4.11 asks of graphics",
                 "choose a colour further from the paper's, or a palette whose colours all reach 3:1 on white such as 'estuary'");
    }
    bool patterned = false;
    for (const auto& [name, look] : pl.series)
      patterned = patterned || look.dash != DashStyle::solid || look.pattern != FillPattern::plain;
    for (std::size_t a = 0; a < series.size(); ++a)
      for (std::size_t b = a + 1; b < series.size(); ++b) {
        const SeriesLook& la = pl.series.at(series[a].name);
        const SeriesLook& lb = pl.series.at(series[b].name);
        if (separated(panels[i].kind, la, lb)) continue;
        HardPair hp{series[a].name, series[b].name, i, panels[i].kind, {}, 1e300, patterned};
        for (Vision v : all_visions) {
          if (greyscale && v != Vision::greyscale) continue;
          const double d = delta_e(as_seen(la.colour, v), as_seen(lb.colour, v));
          if (d >= kSeriesDeltaE) continue;
          hp.failed.push_back(v);
          hp.worst = std::min(hp.worst, d);
        }
        if (hp.failed.empty()) continue;
        if (!said.insert({series[a].name, series[b].name, lb.loc.line, lb.loc.col}).second) continue;
        auto c = std::find_if(causes.begin(), causes.end(), [&](const auto& k) {
          return k.first.file == lb.loc.file && k.first.line == lb.loc.line && k.first.col == lb.loc.col;
        });
        if (c == causes.end()) c = causes.insert(causes.end(), {lb.loc, {}});
        c->second.push_back(std::move(hp));
      }
  }
  for (const auto& [loc, pairs] : causes) tell_pairs(loc, pairs, out);
}

// A looked-for series that no panel shows is most likely a typo.
void audit_unused_looks(const PageSpec& spec, const std::vector<PanelData>& panels, DiagnosticSink& out) {
  std::vector<std::string> names;
  for (const auto& p : panels)
    for (const auto& s : p.series) names.push_back(s.name);
  auto check = [&](const ColourSpec& c) {
    for (const auto& l : c.series) {
      if (std::find(names.begin(), names.end(), l.name.value) != names.end()) continue;
      auto near = nearest(l.name.value, names);
      out.warn(l.name.loc, "no panel shows a series called '" + l.name.value + "'",
               near ? "did you mean '" + *near + "'?" : "series are the values of the panel's 'series-by' column");
    }
  };
  check(spec.colours);
  std::set<const PanelSpec*> seen;
  for (const auto& p : panels)
    if (seen.insert(p.spec).second) check(p.spec->colours);
}

struct Backdrop {
  Rgb colour;
  std::optional<Rgb> pattern;  ///< a hatch drawn over it
};

// What is painted under the middle of `box`: the last filled shape drawn
// before the text that covers that point, else the paper.
Backdrop backdrop(const DisplayPage& page, std::size_t text_index, const Rect& box, const Rgb& paper) {
  const Point c{box.cx(), box.y + box.h / 2};
  Backdrop b{paper, std::nullopt};
  for (std::size_t k = 0; k < text_index; ++k) {
    if (const auto* p = std::get_if<PathItem>(&page.items[k])) {
      if (!p->closed || !p->fill || p->points.empty()) continue;
      double x0 = 1e300, y0 = 1e300, x1 = -1e300, y1 = -1e300;
      for (const Point& q : p->points) x0 = std::min(x0, q.x), y0 = std::min(y0, q.y), x1 = std::max(x1, q.x), y1 = std::max(y1, q.y);
      if (Rect{x0, y0, x1 - x0, y1 - y0}.contains(c)) b = {*p->fill, p->hatch ? std::optional<Rgb>(p->hatch->ink) : std::nullopt};
    } else if (const auto* o = std::get_if<CircleItem>(&page.items[k])) {
      if (!o->fill) continue;
      const double dx = c.x - o->centre.x, dy = c.y - o->centre.y;
      if (dx * dx + dy * dy <= o->radius * o->radius) b = {*o->fill, std::nullopt};
    }
  }
  return b;
}

// Where to point a reader at a text: the series whose colour it is set in,
// else the panel it sits in, else the page.
SourceLoc text_loc(const PageSpec& spec, const DisplayPage& page, const std::vector<PanelLooks>& looks,
                   const TextItem& t) {
  const Rect box = t.box();
  const Point c{box.cx(), box.y + box.h / 2};
  std::optional<std::size_t> panel;
  double best = 1e300;
  for (std::size_t i = 0; i < page.plot_areas.size() && i < looks.size(); ++i) {
    const Rect& r = page.plot_areas[i];
    const double dx = std::max({r.x - c.x, 0.0, c.x - r.right()}), dy = std::max({r.y - c.y, 0.0, c.y - r.bottom()});
    const double d = dx * dx + dy * dy;
    if (d < best && r.inflate(60).contains(c)) best = d, panel = i;
  }
  if (!panel) return spec.loc;
  for (const auto& [name, look] : looks[*panel].series)
    for (const Rgb& ink : {look.colour, text_ink(look.colour, Rgb{1, 1, 1})})
      if (ink == t.colour || to_greyscale(ink) == t.colour) return look.loc;
  return looks[*panel].loc;
}

void audit_text(const PageSpec& spec, const DisplayPage& page, const std::vector<PanelLooks>& looks, const Rgb& paper,
                DiagnosticSink& out) {
  for (std::size_t k = 0; k < page.items.size(); ++k) {
    const auto* t = std::get_if<TextItem>(&page.items[k]);
    if (!t || t->text.utf8.empty()) continue;
    const Backdrop b = backdrop(page, k, t->box(), paper);
    double ratio = contrast_ratio(t->colour, b.colour);
    if (b.pattern) ratio = std::min(ratio, contrast_ratio(t->colour, *b.pattern));
    const bool large = t->text.size >= 18;
    const double need = large ? wcag::large_text_aa : wcag::text_aa;
    if (meets(ratio, need)) continue;
    out.warn(text_loc(spec, page, looks, *t),
             "text '" + t->text.utf8 + "' reads at " + fixed(ratio, 2) + ":1 against what is behind it, below the " +
                 fixed(need, 1) + ":1 of WCAG 2.x SC 1.4.3" + (large ? " for large text" : ""),
             b.pattern ? "set the text clear of the patterned bar, or choose a plain fill"
                       : "choose a darker colour for it, or a lighter one behind it");
  }
}

}  // namespace

void audit_colours(const PageSpec& spec, const std::vector<PanelData>& panels, const std::vector<PanelLooks>& looks,
                   const DisplayPage& page, bool greyscale, DiagnosticSink& out) {
  audit_unused_looks(spec, panels, out);
  // The paper: white, or the colour the press sheet prints under the page.
  Rgb paper = spec.sheet.press.background.value_or(Rgb{1, 1, 1});
  if (greyscale) paper = as_seen(paper, Vision::greyscale);
  audit_series(panels, looks, paper, greyscale, out);
  audit_text(spec, page, looks, paper, out);
}

}  // namespace forme
