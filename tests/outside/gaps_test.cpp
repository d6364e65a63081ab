// Gaps drawn honestly, read back by tools forme does not control: mupdf's
// `mutool draw -F trace` lists every stroked and filled path of the PDF, so
// the line pieces and bars on the page can be counted against the gaps in
// the CSV, counted here independently of forme; poppler's pdftotext finds
// the note that says where the data have no value.
#include <catch2/catch.hpp>

#include <algorithm>
#include <map>
#include <regex>
#include <set>
#include <sstream>
#include <string>

#include "support/outside_tools.h"

using namespace forme::test;

namespace {

struct PathCounts {
  std::map<std::string, int> strokes;  ///< by colour: stroked paths of the page's widest line width
  std::map<std::string, int> fills;    ///< by colour: filled paths
};

// Paths from mutool's trace: data lines are the page's widest strokes
// (forme draws grid, axes and leaders thinner).
PathCounts count_paths(const std::string& pdf, const TempDir& dir) {
  const std::string trace = dir.file("trace.xml");
  REQUIRE(run("mutool draw -F trace -o '" + trace + "' '" + pdf + "' 2>/dev/null").exit_code == 0);
  std::istringstream in(read_file(trace));
  static const std::regex stroke(R"re(<stroke_path linewidth="([^"]*)".*? color="([^"]*)")re");
  static const std::regex fill(R"re(<fill_path .*? color="([^"]*)")re");
  std::vector<std::pair<double, std::string>> strokes;
  PathCounts out;
  std::string line;
  std::smatch m;
  while (std::getline(in, line)) {
    if (std::regex_search(line, m, stroke)) strokes.push_back({std::stod(m[1]), m[2]});
    else if (std::regex_search(line, m, fill)) ++out.fills[m[1]];
  }
  double widest = 0;
  for (const auto& s : strokes) widest = std::max(widest, s.first);
  for (const auto& s : strokes)
    if (s.first == widest) ++out.strokes[s.second];
  return out;
}

}  // namespace

TEST_CASE("a line with gaps is drawn as one piece per run of values, a lone value as a dot", "[outside][gaps]") {
  REQUIRE(have_tool("mutool"));
  REQUIRE(have_tool("pdftotext"));
  TempDir dir;
  // One series, yearly 2010..2022: 2013 empty, 2015 a declared marker, 2019 no row at all.
  // Runs of values: 2010-2012, 2014 alone, 2016-2018, 2020-2022.
  const std::map<int, std::string> cells = {{2010, "5"},  {2011, "6"},  {2012, "7"},  {2013, ""},
                                            {2014, "8"},  {2015, "NA"}, {2016, "9"},  {2017, "8"},
                                            {2018, "10"}, {2020, "11"}, {2021, "12"}, {2022, "12.5"}};
  std::string csv = "year,tonnes\n";
  for (const auto& [y, v] : cells) csv += std::to_string(y) + "," + v + "\n";
  write_file(dir.file("t.csv"), csv);
  write_file(dir.file("page.yaml"),
             "tables: {t: {file: t.csv, missing: [NA]}}\n"
             "heading: {title: Invented tonnage}\n"
             "panel: {kind: line, table: t, x: year, y: tonnes, y-unit: tonnes}\n"
             "source: \"Source: invented for this test\"\n");
  // The runs counted from the CSV: a value starts a new run unless the year before has one.
  int lines = 0, dots = 0, run_length = 0;
  for (int y = 2010; y <= 2023; ++y) {
    const auto it = cells.find(y);
    const bool has = it != cells.end() && it->second != "" && it->second != "NA";
    if (has) ++run_length;
    else {
      if (run_length == 1) ++dots;
      if (run_length > 1) ++lines;
      run_length = 0;
    }
  }
  REQUIRE(lines == 3);
  REQUIRE(dots == 1);

  const std::string pdf = dir.file("out.pdf");
  const auto r = run("cd '" + dir.path() + "' && " + FORME_BINARY + " render page.yaml -o out.pdf");
  INFO(r.err);
  REQUIRE(r.exit_code == 0);
  const PathCounts paths = count_paths(pdf, dir);
  REQUIRE(paths.strokes.size() == 1);  // one series, one colour
  const std::string colour = paths.strokes.begin()->first;
  CHECK(paths.strokes.at(colour) == lines);
  CHECK((paths.fills.count(colour) ? paths.fills.at(colour) : 0) == dots);

  // pdftotext (poppler) finds the note on the page, joined onto one line.
  const auto text = run("pdftotext -raw '" + pdf + "' -");
  std::string flat = text.out;
  std::replace(flat.begin(), flat.end(), '\n', ' ');
  CHECK(flat.find("No data for tonnes in 2013, 2015 and 2019.") != std::string::npos);
}

TEST_CASE("a bar with no value leaves its slot empty and the note names it", "[outside][gaps]") {
  REQUIRE(have_tool("mutool"));
  REQUIRE(have_tool("pdftotext"));
  const std::string page = std::string(FORME_SOURCE_DIR) + "/tests/pages/stress/gaps-bars/page.yaml";
  TempDir dir;
  const std::string pdf = dir.file("out.pdf");
  REQUIRE(run_forme("render '" + page + "' -o '" + pdf + "'").exit_code == 0);
  // Counted from the stress page's CSVs: 6 branches, 2 without a value; 11 month rows, 1 empty.
  const int bars = (6 - 2) + (11 - 1);
  int most = 0;
  for (const auto& [colour, n] : count_paths(pdf, dir).fills) most = std::max(most, n);
  CHECK(most == bars);  // the one bar colour: one filled rectangle per value, none for a gap

  const auto text = run("pdftotext -raw '" + pdf + "' -");
  std::string flat = text.out;
  std::replace(flat.begin(), flat.end(), '\n', ' ');
  // The empty slot keeps its name on the axis, and the note says why it is empty.
  CHECK(flat.find("Corran Street") != std::string::npos);
  CHECK(flat.find("at Corran Street and Eastfield.") != std::string::npos);
  CHECK(flat.find("in May 2023 and August 2023.") != std::string::npos);
}

TEST_CASE("the attached rows list the rows with a gap too", "[outside][gaps]") {
  REQUIRE(have_tool("qpdf"));
  TempDir dir;
  write_file(dir.file("t.csv"), "year,tonnes\n2010,5\n2011,\n2012,7\n2013,8\n");
  write_file(dir.file("page.yaml"),
             "tables: {t: t.csv}\n"
             "heading: {title: Invented tonnage}\n"
             "panel: {kind: line, table: t, x: year, y: tonnes, y-unit: tonnes}\n"
             "data: {attach: true}\n"
             "source: \"Source: invented for this test\"\n");
  const auto r = run("cd '" + dir.path() + "' && " + FORME_BINARY + " render page.yaml -o out.pdf");
  INFO(r.err);
  REQUIRE(r.exit_code == 0);
  // qpdf lists and extracts the embedded files.
  const auto list = run("qpdf --list-attachments '" + dir.file("out.pdf") + "'");
  REQUIRE(list.exit_code == 0);
  const std::string name = list.out.substr(0, list.out.find(' '));
  const auto shown = run("qpdf --show-attachment='" + name + "' '" + dir.file("out.pdf") + "'");
  INFO(shown.out);
  CHECK(shown.out.find("2011,\r\n") != std::string::npos);
  CHECK(shown.out.find("2013,8\r\n") != std::string::npos);
}
