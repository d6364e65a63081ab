// Value labels on line panels: the chosen points of every series (last,
// highest, lowest or both extremes) carry their values, each beside its
// own point, and none touches other text. The expected points are worked
// out here from the CSV, not from forme's choice; poppler's pdftotext
// reads the finished PDF to confirm every value is printed text and that no
// two words overlap.
#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <map>
#include <set>
#include <string>
#include <vector>

#include "cli/render_job.h"
#include "layout/marks/line_values.h"
#include "support/outside_tools.h"
#include "text/font.h"

using namespace forme::test;

namespace {

// Three invented ferry routes over twelve weeks; 'Isle run' reaches its
// highest value twice (weeks 3 and 9): the first is the one labelled.
const char* kData =
    "route,week,sailings\n"
    "Harbour line,1,40\nHarbour line,2,44\nHarbour line,3,47\nHarbour line,4,45\nHarbour line,5,41\n"
    "Harbour line,6,38\nHarbour line,7,35\nHarbour line,8,33\nHarbour line,9,36\nHarbour line,10,39\n"
    "Harbour line,11,42\nHarbour line,12,43\n"
    "Isle run,1,20\nIsle run,2,24\nIsle run,3,29\nIsle run,4,26\nIsle run,5,22\nIsle run,6,18\n"
    "Isle run,7,15\nIsle run,8,21\nIsle run,9,29\nIsle run,10,25\nIsle run,11,23\nIsle run,12,22\n"
    "Night boat,1,6\nNight boat,2,7\nNight boat,3,5\nNight boat,4,4\nNight boat,5,8\nNight boat,6,9\n"
    "Night boat,7,11\nNight boat,8,10\nNight boat,9,12\nNight boat,10,9\nNight boat,11,7\nNight boat,12,8\n";

std::string page(const std::string& rule) {
  return "sheet: {size: A5, orientation: landscape, margins: 12mm}\n"
         "heading: {title: Sailings by route}\n"
         "tables: {t: t.csv}\n"
         "panel: {kind: line, table: t, x: week, y: sailings, series-by: route, x-unit: week,"
         " y-unit: sailings, value-labels: " + rule + "}\n"
         "source: \"Source: invented for this test\"\n";
}

// week → sailings for each route, read from the CSV text here.
std::map<std::string, std::vector<std::pair<int, int>>> routes() {
  std::map<std::string, std::vector<std::pair<int, int>>> out;
  std::string text = kData;
  std::size_t at = text.find('\n') + 1;
  while (at < text.size()) {
    const std::size_t end = text.find('\n', at);
    const std::string row = text.substr(at, end - at);
    const std::size_t a = row.find(','), b = row.find(',', a + 1);
    out[row.substr(0, a)].push_back({std::stoi(row.substr(a + 1, b - a - 1)), std::stoi(row.substr(b + 1))});
    at = end + 1;
  }
  return out;
}

// The (week, value) pairs a rule should label, by its definition.
std::vector<std::pair<int, int>> expected(const std::string& rule) {
  std::vector<std::pair<int, int>> out;
  for (const auto& [name, pts] : routes()) {
    auto hi = pts.begin(), lo = pts.begin();
    for (auto p = pts.begin(); p != pts.end(); ++p) {
      if (p->second > hi->second) hi = p;  // strict: the first of equal highs
      if (p->second < lo->second) lo = p;
    }
    if (rule == "last" || rule == "true") out.push_back(pts.back());
    if (rule == "highest" || rule == "extremes") out.push_back(*hi);
    if (rule == "lowest" || rule == "extremes") out.push_back(*lo);
  }
  return out;
}

}  // namespace

TEST_CASE("line value labels: each chosen point carries its value, beside its own dot", "[outside][values]") {
  for (const char* r : {"true", "last", "highest", "lowest", "extremes"}) {
    const std::string rule = r;
    INFO(rule);
    TempDir dir;
    write_file(dir.file("t.csv"), kData);
    write_file(dir.file("page.yaml"), page(rule));
    forme::DiagnosticSink sink;
    const forme::DisplayPage p = forme::compose_page(dir.file("page.yaml"), forme::find_font_dir(FORME_BINARY), sink);
    CHECK(sink.items().empty());

    std::vector<const forme::TextItem*> values;
    std::vector<forme::Point> dots;
    for (const auto& item : p.items) {
      if (const auto* t = std::get_if<forme::TextItem>(&item); t && t->role == forme::TextRole::value_label)
        values.push_back(t);
      if (const auto* c = std::get_if<forme::CircleItem>(&item)) dots.push_back(c->centre);
    }
    const auto want = expected(rule);
    REQUIRE(values.size() == want.size());
    REQUIRE(dots.size() == want.size());
    // The dots stand in the order of the points, x rising with the week
    // within a route; each value is the nearest text to its own dot.
    std::multiset<std::string> texts, wanted;
    for (const auto* v : values) texts.insert(v->text.utf8);
    for (const auto& w : want) wanted.insert(std::to_string(w.second));
    CHECK(texts == wanted);
    if (rule == "last" || rule == "true") {
      // A last value follows its line's end name on the same baseline, a
      // space after it (line_values.h), so name and value read as a pair.
      std::vector<const forme::TextItem*> names;
      for (const auto& item : p.items)
        if (const auto* t = std::get_if<forme::TextItem>(&item); t && t->role == forme::TextRole::series_label)
          names.push_back(t);
      REQUIRE(names.size() == want.size());
      for (const auto* v : values) {
        INFO("value " << v->text.utf8);
        const bool follows = std::any_of(names.begin(), names.end(), [&](const forme::TextItem* n) {
          const double space = v->box().left() - n->box().right();
          return std::abs(n->origin.y - v->origin.y) < 0.01 && space > 0 && space < 6;
        });
        CHECK(follows);
      }
      continue;
    }
    for (const forme::Point& d : dots) {
      double nearest = 1e9;
      for (const auto* v : values) {
        const forme::Rect b = v->box();
        const double dx = std::max({b.left() - d.x, 0.0, d.x - b.right()});
        const double dy = std::max({b.top() - d.y, 0.0, d.y - b.bottom()});
        nearest = std::min(nearest, std::hypot(dx, dy));
      }
      CHECK(nearest < 12.0);  // within a few millimetres: read as belonging to the dot
    }
  }
}

TEST_CASE("line value labels are printed text that overlaps no other word", "[outside][values]") {
  REQUIRE(have_tool("pdftotext"));
  TempDir dir;
  write_file(dir.file("t.csv"), kData);
  write_file(dir.file("page.yaml"), page("extremes"));
  auto r = run_forme("render '" + dir.file("page.yaml") + "' -o '" + dir.file("out.pdf") + "'");
  INFO(r.err);
  REQUIRE(r.exit_code == 0);
  const auto pages = pdf_words(dir.file("out.pdf"));
  REQUIRE(pages.size() == 1);
  const auto& words = pages[0].words;
  for (const auto& w : expected("extremes")) {
    const std::string v = std::to_string(w.second);
    CHECK(std::count_if(words.begin(), words.end(), [&](const PdfWord& x) { return x.text == v; }) >= 1);
  }
  for (std::size_t i = 0; i < words.size(); ++i)
    for (std::size_t j = i + 1; j < words.size(); ++j) {
      const auto& a = words[i];
      const auto& b = words[j];
      const bool overlap = a.x_min < b.x_max && b.x_min < a.x_max && a.y_min < b.y_max && b.y_min < a.y_max;
      INFO(a.text << " / " << b.text);
      CHECK_FALSE(overlap);
    }
}

TEST_CASE("line_value_points picks by definition: first of equal extremes, one point when they coincide",
          "[values]") {
  using V = forme::PanelSpec::LineValues;
  const std::vector<double> y = {3, 7, 1, 7, 1, 4};
  CHECK(forme::line_value_points(y, V::last) == std::vector<std::size_t>{5});
  CHECK(forme::line_value_points(y, V::highest) == std::vector<std::size_t>{1});
  CHECK(forme::line_value_points(y, V::lowest) == std::vector<std::size_t>{2});
  CHECK(forme::line_value_points(y, V::extremes) == std::vector<std::size_t>{1, 2});
  CHECK(forme::line_value_points({5}, V::extremes) == std::vector<std::size_t>{0});
  CHECK(forme::line_value_points({}, V::last).empty());
}
