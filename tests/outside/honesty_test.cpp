// Pages that could mislead are refused or say what they do.
#include <catch2/catch.hpp>

#include "support/outside_tools.h"

using namespace forme::test;

namespace {

const char* kCsv = "region,year,value\nNorth,2021,40\nNorth,2022,44\nSouth,2021,400\nSouth,2022,380\n";

std::pair<int, std::string> render_page(const TempDir& dir, const std::string& yaml) {
  write_file(dir.file("t.csv"), kCsv);
  write_file(dir.file("page.yaml"), yaml);
  auto r = run("cd " + dir.path() + " && " + FORME_BINARY + " render page.yaml -o out.pdf");
  return {r.exit_code, r.err.substr(0, r.err.find('\n'))};
}

}  // namespace

TEST_CASE("bars asked to start above zero are refused at the y-min value", "[outside][honesty]") {
  TempDir dir;
  auto [code, first] = render_page(dir,
      "tables: {t: t.csv}\n"
      "panel: {kind: vertical-bar, table: t, x: region, y: value, y-min: 30}\n");
  CHECK(code == 1);
  CHECK(first == "page.yaml:2:67: error: bars must start at zero, so the axis cannot begin at 30");
}

TEST_CASE("a log scale over data with zero or negatives is refused", "[outside][honesty]") {
  TempDir dir;
  write_file(dir.file("z.csv"), "x,y\n1,0\n2,5\n");
  auto [code, first] = render_page(dir,
      "tables: {t: z.csv}\n"
      "panel: {kind: line, table: t, x: x, y: y, y-scale: log}\n");
  CHECK(code == 1);
  CHECK(first == "page.yaml:2:52: error: a logarithmic scale needs strictly positive data, and this axis has values ≤ 0");
}

TEST_CASE("a second value axis is refused with an explanation", "[outside][honesty]") {
  TempDir dir;
  auto [code, first] = render_page(dir,
      "tables: {t: t.csv}\n"
      "panel: {kind: line, table: t, x: year, y: value, y-right: value}\n");
  CHECK(code == 1);
  CHECK(first == "page.yaml:2:59: error: 'panel.y-right' is not available");
}

TEST_CASE("free scales put a note on the page, found by pdftotext", "[outside][honesty]") {
  TempDir dir;
  auto [code, first] = render_page(dir,
      "tables: {t: t.csv}\n"
      "grid: {one-panel-per: region, scales: free-y}\n"
      "panel: {kind: line, table: t, x: year, y: value}\n");
  REQUIRE(code == 0);
  auto text = run("pdftotext '" + dir.file("out.pdf") + "' -");
  CHECK(text.out.find("Scales differ between panels") != std::string::npos);

  // The same page on a shared scale carries no such note.
  std::tie(code, first) = render_page(dir,
      "tables: {t: t.csv}\n"
      "grid: {one-panel-per: region}\n"
      "panel: {kind: line, table: t, x: year, y: value}\n");
  REQUIRE(code == 0);
  text = run("pdftotext '" + dir.file("out.pdf") + "' -");
  CHECK(text.out.find("Scales differ") == std::string::npos);
}

TEST_CASE("an index transform is stated on the axis and in the standfirst", "[outside][honesty]") {
  TempDir dir;
  auto [code, first] = render_page(dir,
      "heading: {title: T, standfirst: Output by region.}\n"
      "tables: {t: t.csv}\n"
      "panel: {kind: line, table: t, x: year, y: value, series-by: region, transform: {kind: index, base: '2021'}}\n");
  REQUIRE(code == 0);
  auto text = run("pdftotext -raw '" + dir.file("out.pdf") + "' -");
  CHECK(text.out.find("Index, 2021 = 100") != std::string::npos);
  CHECK(text.out.find("Output by region. Values are indexed to 2021 = 100.") != std::string::npos);
}
