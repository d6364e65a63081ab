// Which colour, dash and pattern each series wears. Properties are checked
// against the palettes' own stated promises (src/colour/palette.h), not
// against copied colour codes.
#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <set>
#include <tuple>

#include "colour/contrast.h"
#include "colour/convert.h"
#include "colour/palette.h"
#include "layout/series_looks.h"

using namespace forme;

namespace {

Located at(std::string v, int line, int col) { return {std::move(v), SourceLoc{"page.yaml", line, col}}; }

PanelData panel_of(const PanelSpec& spec, std::vector<std::string> names) {
  PanelData d;
  d.spec = &spec;
  d.kind = spec.kind;
  for (auto& n : names) d.series.push_back({std::move(n), {1, 2}, {1, 2}});
  return d;
}

double lightness(const Rgb& c) { return to_oklab(c).l; }

}  // namespace

TEST_CASE("series keep one estuary colour across panels, in order of first appearance", "[looks]") {
  PageSpec page;
  PanelSpec spec;
  std::vector<PanelData> panels{panel_of(spec, {"Ash", "Birch"}), panel_of(spec, {"Cedar", "Ash"})};
  auto looks = assign_looks(page, panels);
  const auto& estuary = default_categorical().colours;
  CHECK(looks[0].series.at("Ash").colour == estuary[0]);
  CHECK(looks[0].series.at("Birch").colour == estuary[1]);
  CHECK(looks[1].series.at("Cedar").colour == estuary[2]);
  CHECK(looks[1].series.at("Ash").colour == estuary[0]);
  CHECK(looks[1].palette == "estuary");
}

TEST_CASE("a sequential palette darkens with the series' numeric order, from stops that reach 3:1 on white", "[looks]") {
  PageSpec page;
  page.colours.palette = at("fjord", 3, 12);
  PanelSpec spec;
  std::vector<PanelData> panels{panel_of(spec, {"2024", "2022", "2023", "2021"})};
  auto looks = assign_looks(page, panels);
  const auto& s = looks[0].series;
  // fjord promises lightness falling at every step (palette.h).
  CHECK(lightness(s.at("2021").colour) > lightness(s.at("2022").colour));
  CHECK(lightness(s.at("2022").colour) > lightness(s.at("2023").colour));
  CHECK(lightness(s.at("2023").colour) > lightness(s.at("2024").colour));
  const auto& fjord = find_palette("fjord")->colours;
  const auto usable = series_stops(*find_palette("fjord"), Rgb{1, 1, 1});
  REQUIRE(usable.size() >= 4);
  CHECK(s.at("2021").colour == usable.front());
  CHECK(s.at("2024").colour == fjord.back());
  // Every class stands out from white at 3:1 (WCAG 2.x SC 1.4.11).
  for (const auto& [name, look] : s) CHECK(meets(contrast_ratio(look.colour, Rgb{1, 1, 1}), wcag::graphics));
  // The stop just paler than the first usable one does not.
  const auto first = std::find(fjord.begin(), fjord.end(), usable.front());
  REQUIRE(first != fjord.begin());
  CHECK_FALSE(meets(contrast_ratio(*(first - 1), Rgb{1, 1, 1}), wcag::graphics));
}

TEST_CASE("a diverging palette puts the stated midpoint in its neutral middle, arms of equal lightness", "[looks]") {
  for (double mid : {0.0, 10.0}) {
    PageSpec page;
    page.colours.palette = at("foreshore", 3, 12);
    if (mid != 0) page.colours.midpoint = mid;
    PanelSpec spec;
    auto name = [&](double d) {
      char buf[16];
      std::snprintf(buf, sizeof buf, "%g", mid + d);
      return std::string(buf);
    };
    std::vector<PanelData> panels{panel_of(spec, {name(-2), name(-1), name(0), name(1), name(2)})};
    auto s = assign_looks(page, panels)[0].series;
    INFO("midpoint " << mid);
    // palette.h: the midpoint is an exact grey (OKLCH C < 0.002) and the arms
    // mirror each other in lightness within 0.01.
    CHECK(to_oklch(s.at(name(0)).colour).c < 0.002);
    CHECK(std::abs(lightness(s.at(name(-1)).colour) - lightness(s.at(name(1)).colour)) < 0.01);
    CHECK(std::abs(lightness(s.at(name(-2)).colour) - lightness(s.at(name(2)).colour)) < 0.01);
    CHECK(s.at(name(-2)).colour == find_palette("foreshore")->colours.front());
    CHECK(s.at(name(2)).colour == find_palette("foreshore")->colours.back());
  }
}

TEST_CASE("one-sided diverging series keep the step size of the fuller arm", "[looks]") {
  PageSpec page;
  page.colours.palette = at("foreshore", 3, 12);
  PanelSpec spec;
  std::vector<PanelData> panels{panel_of(spec, {"-1", "1", "2"})};
  auto s = assign_looks(page, panels)[0].series;
  // Two steps to the right make a 5-class scale; -1 sits one step left.
  auto five = sample_sequential(*find_palette("foreshore"), 5);
  CHECK(s.at("-1").colour == five[1]);
  CHECK(s.at("1").colour == five[3]);
  CHECK(s.at("2").colour == five[4]);
}

TEST_CASE("more series than palette colours is one error at the series-by key, named palette or not", "[looks]") {
  PanelSpec spec;
  spec.series_by = at("kind", 9, 14);
  std::vector<PanelData> panels{panel_of(spec, {"a", "b", "c", "d", "e", "f", "g", "h", "i"})};
  std::vector<Diagnostic> told;
  for (bool named : {false, true}) {
    PageSpec page;
    if (named) page.colours.palette = at("estuary", 4, 12);
    try {
      assign_looks(page, panels);
      FAIL("no error");
    } catch (const InputError& e) {
      told.push_back(e.diagnostic());
    }
  }
  REQUIRE(told.size() == 2);
  for (const Diagnostic& d : told) {
    CHECK(d.loc.line == 9);
    CHECK(d.loc.col == 14);
    // estuary has eight colours (palette.h); pinned text.
    CHECK(d.message == "9 series but palette 'estuary' has 8 colours: beyond 8, series would share a colour");
    CHECK(d.hint.find("'grid: {one-panel-per: kind}'") != std::string::npos);
    CHECK(d.hint.find("highlight one series") != std::string::npos);
    CHECK(d.hint.find("'colours: {patterns: true}' (up to 40 series)") != std::string::npos);
  }
  CHECK(told[0].hint == told[1].hint);
  // Eight series fit, named or not.
  std::vector<PanelData> eight{panel_of(spec, {"a", "b", "c", "d", "e", "f", "g", "h"})};
  CHECK_NOTHROW(assign_looks(PageSpec{}, eight));
  // Series counted over the whole page: two panels of five different names.
  std::vector<PanelData> two{panel_of(spec, {"a", "b", "c", "d", "e"}), panel_of(spec, {"f", "g", "h", "i", "j"})};
  CHECK_THROWS_WITH(assign_looks(PageSpec{}, two), Catch::Contains("error: 10 series but palette 'estuary'"));
}

TEST_CASE("with patterns, eight colours and five dashes tell 40 series apart, and no more", "[looks]") {
  PageSpec page;
  page.colours.patterns = true;
  PanelSpec spec;
  spec.series_by = at("route", 5, 3);
  std::vector<std::string> names;
  for (int i = 0; i < 40; ++i) names.push_back("r" + std::to_string(i));
  auto s = assign_looks(page, {panel_of(spec, names)})[0].series;
  std::set<std::pair<std::tuple<double, double, double>, int>> looks;
  for (const auto& [name, look] : s)
    looks.insert({{look.colour.r, look.colour.g, look.colour.b}, static_cast<int>(look.dash)});
  CHECK(looks.size() == 40);  // lcm(8, 5): every (colour, dash) pair once
  names.push_back("r40");
  CHECK_THROWS_WITH(assign_looks(page, {panel_of(spec, names)}),
                    Catch::Contains("41 series but palette 'estuary' has 8 colours and 5 dashes, 40 distinct looks: beyond 40, series would share a look"));
}

TEST_CASE("a series renamed by a difference keeps its own colour and dash on every panel", "[looks]") {
  PageSpec page;
  page.colours.patterns = true;
  PanelSpec plain, less;
  less.transform.kind = TransformSpec::Kind::difference;
  less.transform.minus = at("Mill", 8, 20);
  std::vector<PanelData> panels{panel_of(plain, {"Mill", "Quay", "Kiln"}),
                                panel_of(less, {"Quay \u2212 Mill", "Kiln \u2212 Mill"})};
  auto looks = assign_looks(page, panels);
  for (const char* n : {"Quay", "Kiln"}) {
    INFO(n);
    const auto& a = looks[0].series.at(n);
    const auto& b = looks[1].series.at(std::string(n) + " \u2212 Mill");
    CHECK(a.colour == b.colour);
    CHECK(a.dash == b.dash);
  }
  CHECK(series_identity("Quay \u2212 Mill", less) == "Quay");
  CHECK(series_identity("Quay \u2212 Mill", plain) == "Quay \u2212 Mill");
  // A panel showing only a later series gives it the page's dash, not its own first.
  std::vector<PanelData> apart{panel_of(plain, {"Mill", "Quay"}), panel_of(plain, {"Quay"})};
  auto l2 = assign_looks(page, apart);
  CHECK(l2[1].series.at("Quay").dash == l2[0].series.at("Quay").dash);
  CHECK(l2[1].series.at("Quay").dash != DashStyle::solid);
}

TEST_CASE("a report's kept places hold a series' colour, and new names take unused ones", "[looks]") {
  PanelSpec spec;
  PageSpec first;
  auto one = assign_looks(first, {panel_of(spec, {"Ash", "Birch", "Cedar"})})[0].series;
  PageSpec later;
  for (const auto& [name, look] : one) later.colours.kept.emplace(name, *look.place);
  // Cedar alone, then Cedar beside a newcomer: Cedar keeps its colour; the
  // newcomer takes the first colour no earlier page gave.
  auto two = assign_looks(later, {panel_of(spec, {"Cedar", "Dune"})})[0].series;
  const auto& estuary = default_categorical().colours;
  CHECK(two.at("Cedar").colour == one.at("Cedar").colour);
  CHECK(two.at("Dune").colour == estuary[3]);
  // Without a report's places, page order decides: Cedar first.
  auto alone = assign_looks(PageSpec{}, {panel_of(spec, {"Cedar", "Dune"})})[0].series;
  CHECK(alone.at("Cedar").colour == estuary[0]);
}

TEST_CASE("graded palettes keep their own limits, told at the palette", "[looks]") {
  PageSpec page;
  PanelSpec spec;
  page.colours.palette = at("heath", 4, 12);
  const std::size_t most = series_stops(*find_palette("heath"), Rgb{1, 1, 1}).size();
  std::vector<std::string> many;
  for (std::size_t i = 0; i <= most; ++i) many.push_back(std::to_string(i));
  std::vector<PanelData> over{panel_of(spec, many)};
  CHECK_THROWS_WITH(assign_looks(page, over), Catch::Contains("keeps distinct as series that stand out from the paper (at most " +
                                                              std::to_string(most) + ")"));
  many.pop_back();
  std::vector<PanelData> enough{panel_of(spec, many)};
  CHECK_NOTHROW(assign_looks(page, enough));
  page.colours.palette = at("foreshore", 4, 12);
  std::vector<PanelData> arm{panel_of(spec, {"1", "2", "3", "4", "5"})};
  CHECK_THROWS_WITH(assign_looks(page, arm), Catch::Contains("at most 4 on each side"));
  std::vector<PanelData> words{panel_of(spec, {"up", "down"})};
  CHECK_THROWS_WITH(assign_looks(page, words), Catch::Contains("must be named by numbers; 'up' is not one"));
}

TEST_CASE("explicit series colours override the palette and are located where written", "[looks]") {
  PageSpec page;
  SeriesLookSpec given;
  given.name = at("Birch", 7, 5);
  given.colour = rgb8(0x12, 0x34, 0x56);
  given.colour_loc = {"page.yaml", 7, 12};
  page.colours.series.push_back(given);
  PanelSpec spec;
  SeriesLookSpec dashed;
  dashed.name = at("Ash", 9, 5);
  dashed.colour_loc = dashed.name.loc;
  dashed.dash = DashStyle::dotted;
  spec.colours.series.push_back(dashed);
  std::vector<PanelData> panels{panel_of(spec, {"Ash", "Birch"})};
  auto s = assign_looks(page, panels)[0].series;
  CHECK(s.at("Birch").colour == rgb8(0x12, 0x34, 0x56));
  CHECK(s.at("Birch").loc.line == 7);
  CHECK(s.at("Birch").loc.col == 12);
  CHECK(s.at("Ash").colour == default_categorical().colours[0]);
  CHECK(s.at("Ash").dash == DashStyle::dotted);
  CHECK(s.at("Birch").dash == DashStyle::solid);
}

TEST_CASE("patterns hand out different dashes and fill patterns in series order", "[looks]") {
  PageSpec page;
  page.colours.patterns = true;
  PanelSpec spec;
  std::vector<PanelData> panels{panel_of(spec, {"a", "b", "c", "d", "e"})};
  auto s = assign_looks(page, panels)[0].series;
  std::set<DashStyle> dashes;
  std::set<FillPattern> fills;
  for (const auto& [name, look] : s) dashes.insert(look.dash), fills.insert(look.pattern);
  CHECK(dashes.size() == 5);
  CHECK(fills.size() == 5);
  CHECK(s.at("a").dash == DashStyle::solid);
  CHECK(s.at("a").pattern == FillPattern::plain);
}

TEST_CASE("dash lengths scale with the line width and are empty only for solid", "[looks]") {
  CHECK(dash_lengths(DashStyle::solid, 1).empty());
  for (DashStyle d : {DashStyle::long_dash, DashStyle::short_dash, DashStyle::dotted, DashStyle::dash_dot}) {
    auto one = dash_lengths(d, 1), two = dash_lengths(d, 2);
    REQUIRE(one.size() % 2 == 0);
    for (std::size_t i = 0; i < one.size(); ++i) CHECK(two[i] == Approx(2 * one[i]));
  }
}

TEST_CASE("hatch ink is whichever of paper and text ink stands out more from the fill", "[looks]") {
  auto dark = hatch_for(FillPattern::hatch, rgb8(0x20, 0x30, 0x60), 8);
  auto light = hatch_for(FillPattern::dots, rgb8(0xf0, 0xe0, 0xa0), 8);
  REQUIRE(dark);
  REQUIRE(light);
  CHECK(dark->ink == Rgb{1, 1, 1});
  CHECK(light->ink == ink::text);
  CHECK(light->kind == Hatch::Kind::dots);
  CHECK_FALSE(hatch_for(FillPattern::plain, rgb8(0, 0, 0), 8));
}
