#include "layout/series_looks.h"

#include <algorithm>
#include <cstdlib>
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

std::string too_many(std::size_t n, const Palette& p, int most, const std::string& what) {
  return std::to_string(n) + " series are more classes than palette '" + p.name + "' keeps distinct " + what +
         " (at most " + std::to_string(most) + ")";
}

const char* const kGroupHint =
    "group the series into fewer classes, show them as small multiples, or name each line directly and use one colour";

// Colours for `names` (page order) from one palette.
std::map<std::string, Rgb> colour_group(std::vector<std::string> names, const Effective& e, const SourceLoc& where,
                                        const Rgb& paper) {
  const Palette& p = *e.palette;
  std::map<std::string, Rgb> out;
  if (p.kind == PaletteKind::categorical) {
    if (e.palette_loc.line && names.size() > p.colours.size())
      throw InputError(where, too_many(names.size(), p, static_cast<int>(p.colours.size()), "as series colours"),
                       kGroupHint);
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

constexpr DashStyle kDashOrder[] = {DashStyle::solid, DashStyle::long_dash, DashStyle::short_dash, DashStyle::dotted,
                                    DashStyle::dash_dot};
constexpr FillPattern kPatternOrder[] = {FillPattern::plain, FillPattern::hatch, FillPattern::dots,
                                         FillPattern::back_hatch, FillPattern::cross_hatch};

}  // namespace

std::vector<Rgb> series_stops(const Palette& p, const Rgb& paper) {
  std::vector<Rgb> out;
  for (const Rgb& c : p.colours)
    if (meets(contrast_ratio(c, paper), wcag::graphics)) out.push_back(c);
  return out;
}

std::vector<PanelLooks> assign_looks(const PageSpec& spec, const std::vector<PanelData>& panels) {
  const Rgb paper = spec.sheet.press.background.value_or(Rgb{1, 1, 1});
  // Panels that use the same palette share one order of series names.
  std::vector<Effective> eff;
  std::map<const Palette*, std::vector<std::string>> names;
  for (const auto& p : panels) {
    eff.push_back(effective(spec, *p.spec));
    auto& list = names[eff.back().palette];
    // A series given its own colour leaves the palette's colours to the rest.
    auto given = [&](const std::string& n) {
      for (const SeriesLookSpec* l : eff.back().looks)
        if (l->name.value == n && l->colour) return true;
      return false;
    };
    for (const auto& s : p.series)
      if (!s.name.empty() && !given(s.name) && std::find(list.begin(), list.end(), s.name) == list.end())
        list.push_back(s.name);
  }
  std::map<const Palette*, std::map<std::string, Rgb>> coloured;
  std::vector<PanelLooks> out;
  for (std::size_t i = 0; i < panels.size(); ++i) {
    const Effective& e = eff[i];
    const PanelSpec& ps = *panels[i].spec;
    if (!coloured.count(e.palette)) coloured[e.palette] = colour_group(names[e.palette], e, blame(e, ps), paper);
    const auto& colours = coloured[e.palette];
    PanelLooks looks;
    looks.loc = ps.loc;
    looks.palette = e.palette->name;
    for (const auto& s : panels[i].series) {
      SeriesLook l;
      l.loc = blame(e, ps);
      if (s.name.empty()) {
        const Palette& p = *e.palette;
        l.colour = p.kind == PaletteKind::categorical ? p.colours.front()
                   : p.kind == PaletteKind::sequential ? p.colours.back()
                                                        : p.colours.front();
      } else {
        if (auto it = colours.find(s.name); it != colours.end()) l.colour = it->second;
        if (e.patterns) {
          // In the panel's own order, so its first series stays solid and plain.
          const auto k = static_cast<std::size_t>(&s - panels[i].series.data());
          l.dash = kDashOrder[k % std::size(kDashOrder)];
          l.pattern = kPatternOrder[k % std::size(kPatternOrder)];
        }
      }
      for (const SeriesLookSpec* given : e.looks)
        if (given->name.value == s.name) {
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
