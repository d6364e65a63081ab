#include "layout/series_looks.h"

#include <algorithm>
#include <cstdlib>
#include <optional>
#include <stdexcept>

#include "colour/contrast.h"
#include "colour/palette.h"

namespace forme {

namespace {

// The colours a panel asks for, with the page's filling what it leaves unset.
struct Effective {
  const Palette* palette = nullptr;
  SourceLoc palette_loc;  ///< line 0 when the default palette applies
  double midpoint = 0;
  bool patterns = false;
  std::vector<const SeriesLookSpec*> looks;  ///< page entries first, then the panel's
};

Effective effective(const PageSpec& page, const PanelSpec& panel) {
  Effective e;
  const Located& name = !panel.colours.palette.empty() ? panel.colours.palette : page.colours.palette;
  e.palette = name.empty() ? &default_categorical() : find_palette(name.value);
  if (!e.palette) throw InputError(name.loc, "there is no palette called '" + name.value + "'");  // validated before
  e.palette_loc = name.loc;
  e.midpoint = panel.colours.midpoint.value_or(page.colours.midpoint.value_or(0.0));
  e.patterns = panel.colours.patterns.value_or(page.colours.patterns.value_or(false));
  for (const auto& l : page.colours.series) e.looks.push_back(&l);
  for (const auto& l : panel.colours.series) e.looks.push_back(&l);
  return e;
}

std::optional<double> as_number(const std::string& s) {
  if (s.empty()) return std::nullopt;
  char* end = nullptr;
  const double v = std::strtod(s.c_str(), &end);
  if (end != s.c_str() + s.size()) return std::nullopt;
  return v;
}

// Ordered series: numbers in numeric order when every name is one.
void order_for_grading(std::vector<std::string>& names) {
  for (const auto& n : names)
    if (!as_number(n)) return;
  std::stable_sort(names.begin(), names.end(),
                   [](const std::string& a, const std::string& b) { return *as_number(a) < *as_number(b); });
}

SourceLoc blame(const Effective& e, const PanelSpec& panel) {
  if (e.palette_loc.line) return e.palette_loc;
  return panel.series_by.loc.line ? panel.series_by.loc : panel.loc;
}

// Where running out of colours is told: the key that makes the series.
SourceLoc series_key(const Effective& e, const PanelSpec& panel) {
  if (panel.series_by.loc.line) return panel.series_by.loc;
  return e.palette_loc.line ? e.palette_loc : panel.loc;
}

std::string too_many(std::size_t n, const Palette& p, int most, const std::string& what) {
  return std::to_string(n) + " series are more classes than palette '" + p.name + "' keeps distinct " + what +
         " (at most " + std::to_string(most) + ")";
}

const char* const kGroupHint =
    "group the series into fewer classes, show them as small multiples, or name each line directly and use one colour";

constexpr DashStyle kDashOrder[] = {DashStyle::solid, DashStyle::long_dash, DashStyle::short_dash, DashStyle::dotted,
                                    DashStyle::dash_dot};
constexpr FillPattern kPatternOrder[] = {FillPattern::plain, FillPattern::hatch, FillPattern::dots,
                                         FillPattern::back_hatch, FillPattern::cross_hatch};

constexpr std::size_t kDashes = std::size(kDashOrder);
static_assert(std::size(kPatternOrder) == kDashes, "series k wears dash k and pattern k together");

std::size_t gcd(std::size_t a, std::size_t b) { return b == 0 ? a : gcd(b, a % b); }

// How many series a categorical palette tells apart: one colour each, or
// with dashes and patterns the distinct (colour, dash) pairs that series
// k's (k mod colours, k mod dashes) runs through before it repeats.
std::size_t categorical_most(const Palette& p, bool patterns) {
  const std::size_t n = p.colours.size();
  return patterns ? n / gcd(n, kDashes) * kDashes : n;
}

// Dashes (lines) and patterns (bars) tell series apart too; dots carry colour only.
bool dashes_help(const Effective& e, const PanelData& p) { return e.patterns && p.kind != ChartKind::dot; }

// Running out of colours: the same error whether the palette was named or
// left to the default, located at the key that makes the series.
[[noreturn]] void out_of_colours(std::size_t n, const Palette& p, bool patterns, const SourceLoc& where,
                                 const std::string& column) {
  const std::size_t most = categorical_most(p, patterns);
  std::string message = std::to_string(n) + " series but palette '" + p.name + "' has " +
                        std::to_string(p.colours.size()) + " colours";
  if (patterns) message += " and " + std::to_string(kDashes) + " dashes, " + std::to_string(most) + " distinct looks";
  message += ": beyond " + std::to_string(most) + ", series would share " + (patterns ? "a look" : "a colour");
  std::string hint = "show them as small multiples ('grid: {one-panel-per: " +
                     (column.empty() ? std::string("COLUMN") : column) +
                     "}'), keep fewer series with 'where', highlight one series by giving it its own colour under " +
                     "'colours: series' and the rest one grey";
  if (!patterns)
    hint += ", or add dashes with 'colours: {patterns: true}' (up to " + std::to_string(categorical_most(p, true)) +
            " series)";
  throw InputError(where, message, hint);
}

// Places in a categorical palette of `room` places for `names` (page
// order): a name a report's earlier page placed keeps its place unless a
// name before it here took it; a new name takes the first place no earlier
// page gave anyone, else the first free on this page.
std::map<std::string, std::size_t> palette_places(const std::vector<std::string>& names,
                                                  const std::map<std::string, std::size_t>& kept, std::size_t room) {
  std::map<std::string, std::size_t> out;
  std::vector<bool> taken(room, false), given_before(room, false);
  for (const auto& [name, place] : kept)
    if (place < room) given_before[place] = true;
  for (const auto& n : names)
    if (auto it = kept.find(n); it != kept.end() && it->second < room && !taken[it->second])
      out[n] = it->second, taken[it->second] = true;
  for (const bool fresh_only : {true, false})
    for (const auto& n : names) {
      if (out.count(n)) continue;
      for (std::size_t k = 0; k < room; ++k)
        if (!taken[k] && !(fresh_only && given_before[k])) {
          out[n] = k, taken[k] = true;
          break;
        }
    }
  return out;
}

// Colours for `names` (page order) from one palette.
std::map<std::string, Rgb> colour_group(std::vector<std::string> names, const Effective& e, const SourceLoc& where,
                                        const Rgb& paper) {
  const Palette& p = *e.palette;
  std::map<std::string, Rgb> out;
  if (p.kind == PaletteKind::categorical) {
    // Places are handed out, and exhaustion told, by assign_looks.
    for (std::size_t i = 0; i < names.size(); ++i) out[names[i]] = p.colours[i % p.colours.size()];
    return out;
  }
  if (p.kind == PaletteKind::sequential) {
    Palette usable = p;
    usable.colours = series_stops(p, paper);
    const int most = static_cast<int>(usable.colours.size());
    if (static_cast<int>(names.size()) > most)
      throw InputError(where, too_many(names.size(), p, most, "as series that stand out from the paper"),
                       kGroupHint);
    order_for_grading(names);
    if (names.size() == 1) return {{names[0], usable.colours.back()}};
    const std::vector<Rgb> classes = sample_sequential(usable, static_cast<int>(names.size()));
    for (std::size_t i = 0; i < names.size(); ++i) out[names[i]] = classes[i];
    return out;
  }
  // Diverging about the midpoint, one step size for both arms.
  std::vector<std::pair<double, std::string>> below, above;
  std::vector<std::string> middle;
  for (const auto& n : names) {
    auto v = as_number(n);
    if (!v)
      throw InputError(where, "palette '" + p.name + "' diverges about a midpoint, so its series must be named by numbers; '" +
                                  n + "' is not one",
                       "use a categorical palette such as 'estuary', or series named by numbers");
    if (*v < e.midpoint) below.push_back({*v, n});
    else if (*v > e.midpoint) above.push_back({*v, n});
    else middle.push_back(n);
  }
  std::sort(below.begin(), below.end());
  std::sort(above.begin(), above.end());
  const std::size_t arm = std::max(below.size(), above.size());
  const std::size_t most_arm = (static_cast<std::size_t>(max_classes) - 1) / 2;
  if (arm > most_arm)
    throw InputError(where,
                     std::to_string(arm) + " series on one side of the midpoint are more classes than palette '" + p.name +
                         "' keeps distinct (at most " + std::to_string(most_arm) + " on each side)",
                     kGroupHint);
  if (arm == 0) {
    for (const auto& n : middle) out[n] = p.colours[p.colours.size() / 2];
    return out;
  }
  const std::vector<Rgb> classes = sample_sequential(p, static_cast<int>(2 * arm + 1));
  for (std::size_t i = 0; i < below.size(); ++i) out[below[i].second] = classes[arm - below.size() + i];
  for (const auto& n : middle) out[n] = classes[arm];
  for (std::size_t i = 0; i < above.size(); ++i) out[above[i].second] = classes[arm + 1 + i];
  return out;
}

}  // namespace

std::vector<Rgb> series_stops(const Palette& p, const Rgb& paper) {
  std::vector<Rgb> out;
  for (const Rgb& c : p.colours)
    if (meets(contrast_ratio(c, paper), wcag::graphics)) out.push_back(c);
  return out;
}

std::string series_identity(const std::string& name, const PanelSpec& panel) {
  const TransformSpec& t = panel.transform;
  if (t.kind != TransformSpec::Kind::difference) return name;
  // apply_transform names each difference "NAME − MINUS".
  const std::string suffix = " \u2212 " + t.minus.value;
  if (name.size() > suffix.size() && name.compare(name.size() - suffix.size(), suffix.size(), suffix) == 0)
    return name.substr(0, name.size() - suffix.size());
  return name;
}

std::vector<PanelLooks> assign_looks(const PageSpec& spec, const std::vector<PanelData>& panels) {
  const Rgb paper = spec.sheet.press.background.value_or(Rgb{1, 1, 1});
  // Panels that use the same palette share one order of series, keyed by
  // each series' own name (before a transform renames it), so a series
  // wears one colour and one dash on every panel.
  std::vector<Effective> eff;
  std::map<const Palette*, std::vector<std::string>> names;
  std::vector<std::string> page_order;  // every named series, for dashes of series given their own colour
  std::optional<std::size_t> overflow;  // the first panel whose palette runs out
  for (const auto& p : panels) {
    eff.push_back(effective(spec, *p.spec));
    const Effective& e = eff.back();
    auto& list = names[e.palette];
    // A series given its own colour leaves the palette's colours to the rest.
    auto given = [&](const std::string& shown, const std::string& own) {
      for (const SeriesLookSpec* l : e.looks)
        if ((l->name.value == shown || l->name.value == own) && l->colour) return true;
      return false;
    };
    for (const auto& s : p.series) {
      if (s.name.empty()) continue;
      const std::string own = series_identity(s.name, *p.spec);
      if (std::find(page_order.begin(), page_order.end(), own) == page_order.end()) page_order.push_back(own);
      if (given(s.name, own) || std::find(list.begin(), list.end(), own) != list.end()) continue;
      list.push_back(own);
      const Palette& pal = *e.palette;
      if (!overflow && pal.kind == PaletteKind::categorical && list.size() > categorical_most(pal, dashes_help(e, p)))
        overflow = eff.size() - 1;
    }
  }
  // Told at the first panel that runs out, with the whole page's count.
  if (overflow) {
    const Effective& e = eff[*overflow];
    const PanelSpec& ps = *panels[*overflow].spec;
    out_of_colours(names[e.palette].size(), *e.palette, dashes_help(e, panels[*overflow]), series_key(e, ps),
                   ps.series_by.value);
  }
  std::map<const Palette*, std::map<std::string, Rgb>> coloured;
  // Categorical palettes: each series' place, colour place mod colours and
  // dash place mod dashes, so no two share both.
  std::map<const Palette*, std::map<std::string, std::size_t>> places;
  std::map<const Palette*, bool> dashed;
  for (std::size_t i = 0; i < panels.size(); ++i) dashed[eff[i].palette] = dashed[eff[i].palette] || eff[i].patterns;
  for (const auto& [pal, list] : names)
    if (pal->kind == PaletteKind::categorical)
      places[pal] = palette_places(list, spec.colours.kept, categorical_most(*pal, dashed[pal]));
  std::vector<PanelLooks> out;
  for (std::size_t i = 0; i < panels.size(); ++i) {
    const Effective& e = eff[i];
    const PanelSpec& ps = *panels[i].spec;
    if (!coloured.count(e.palette)) coloured[e.palette] = colour_group(names[e.palette], e, blame(e, ps), paper);
    const auto& colours = coloured[e.palette];
    const auto& list = names[e.palette];
    PanelLooks looks;
    looks.loc = ps.loc;
    looks.palette = e.palette->name;
    for (const auto& s : panels[i].series) {
      SeriesLook l;
      l.loc = blame(e, ps);
      const std::string own = series_identity(s.name, ps);
      if (s.name.empty()) {
        const Palette& p = *e.palette;
        l.colour = p.kind == PaletteKind::categorical ? p.colours.front()
                   : p.kind == PaletteKind::sequential ? p.colours.back()
                                                        : p.colours.front();
      } else {
        if (auto it = colours.find(own); it != colours.end()) l.colour = it->second;
        std::optional<std::size_t> place;
        if (auto pl = places.find(e.palette); pl != places.end())
          if (auto it = pl->second.find(own); it != pl->second.end()) place = it->second;
        if (place) l.colour = e.palette->colours[*place % e.palette->colours.size()], l.place = place;
        if (e.patterns) {
          // In the page's order of the palette's series, the same index as
          // the colour, so the first series stays solid and plain and no two
          // series share both colour and dash.
          std::size_t k = place ? *place
                                : static_cast<std::size_t>(std::find(list.begin(), list.end(), own) - list.begin());
          if (!place && k == list.size())
            k = static_cast<std::size_t>(std::find(page_order.begin(), page_order.end(), own) - page_order.begin());
          l.dash = kDashOrder[k % std::size(kDashOrder)];
          l.pattern = kPatternOrder[k % std::size(kPatternOrder)];
        }
      }
      for (const SeriesLookSpec* given : e.looks)
        if (given->name.value == s.name || given->name.value == own) {
          if (given->colour) l.colour = *given->colour, l.loc = given->colour_loc;
          if (given->dash) l.dash = *given->dash;
          if (given->pattern) l.pattern = *given->pattern;
        }
      looks.series[s.name] = l;
    }
    out.push_back(std::move(looks));
  }
  return out;
}

std::vector<double> dash_lengths(DashStyle d, double width) {
  // Lengths in line widths; a near-zero "on" with round caps draws a dot.
  switch (d) {
    case DashStyle::solid: return {};
    case DashStyle::long_dash: return {6 * width, 2.5 * width};
    case DashStyle::short_dash: return {2.5 * width, 2 * width};
    case DashStyle::dotted: return {0.01 * width, 2.2 * width};
    case DashStyle::dash_dot: return {6 * width, 2 * width, 0.01 * width, 2 * width};
  }
  return {};
}

std::optional<Hatch> hatch_for(FillPattern pattern, const Rgb& fill, double base) {
  if (pattern == FillPattern::plain) return std::nullopt;
  Hatch h;
  const Rgb paper{1, 1, 1};
  h.ink = contrast_ratio(fill, paper) >= contrast_ratio(fill, ink::text) ? paper : ink::text;
  h.spacing = base * 0.45;
  h.width = base * 0.09;
  switch (pattern) {
    case FillPattern::hatch: h.angle = 45; break;
    case FillPattern::back_hatch: h.angle = -45; break;
    case FillPattern::cross_hatch: h.kind = Hatch::Kind::crossed; h.angle = 45; break;
    case FillPattern::dots: h.kind = Hatch::Kind::dots; h.width = base * 0.16; break;
    case FillPattern::plain: break;
  }
  return h;
}

}  // namespace forme
