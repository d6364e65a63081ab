// `forme check` finds every problem in a deliberately misleading page, at
// the place in the description where it is, and is silent on every page
// under layouts/.
#include <catch2/catch.hpp>

#include "support/outside_tools.h"

using namespace forme::test;

TEST_CASE("forme check lists every problem of the misleading page, located", "[outside][check]") {
  auto r = run("cd " + std::string(FORME_SOURCE_DIR) + "/tests/pages/misleading && " + FORME_BINARY + " check page.yaml");
  CHECK(r.exit_code == 1);  // the cut bar axis is an error
  const char* expected[] = {
      "page.yaml:19:23: error: no row of table 'calls' has district = 'Northholm', so panel 2 is empty",
      "page.yaml:25:12: error: bars must start at zero, so the axis cannot begin at 10",
      "page.yaml:1:1: warning: the page has no source line",
      "page.yaml:6:28: warning: panels do not share one scale",
      "page.yaml:12:16: warning: 8 series in one panel are more than a reader can follow",
      "page.yaml:8:5: warning: the value axis has no unit",
  };
  for (const char* line : expected) {
    INFO(r.err);
    CHECK(r.err.find(std::string(line) + "\n") != std::string::npos);
  }
}

TEST_CASE("forme check is silent on every layout page, even with --strict", "[outside][check]") {
  for (const auto& page : layout_pages()) {
    auto r = run_forme("check --strict '" + page + "'");
    INFO(page << "\n" << r.err);
    CHECK(r.exit_code == 0);
    CHECK(r.err.find("warning") == std::string::npos);
  }
}

TEST_CASE("the strict flag turns warnings into a failing exit code, and render prints the same warnings", "[outside][check]") {
  TempDir dir;
  write_file(dir.file("t.csv"), "x,y\n1,2\n2,3\n");
  write_file(dir.file("page.yaml"), "tables: {t: t.csv}\npanel: {kind: line, table: t, x: x, y: y}\n");
  auto lax = run("cd " + dir.path() + " && " + FORME_BINARY + " check page.yaml");
  auto strict = run("cd " + dir.path() + " && " + FORME_BINARY + " check --strict page.yaml");
  CHECK(lax.exit_code == 0);
  CHECK(strict.exit_code == 1);
  CHECK(lax.err.find("page.yaml:1:1: warning: the page has no source line") != std::string::npos);
  auto render = run("cd " + dir.path() + " && " + FORME_BINARY + " render page.yaml -o out.pdf");
  CHECK(render.exit_code == 0);
  CHECK(render.err.find("page.yaml:1:1: warning: the page has no source line") != std::string::npos);
}

TEST_CASE("forme check reads a report, composes each page and reports a repeated page's finding once, located", "[outside][check][report]") {
  TempDir dir;
  write_file(dir.file("sites.csv"), "site,week,litres\nAsh,1,4\nAsh,2,5\nBirch,1,6\nBirch,2,7\n");
  // No unit on the value axis: a warning on every repeated page.
  write_file(dir.file("page.yaml"),
             "tables: {sites: sites.csv}\n"
             "heading: {title: Litres at $(site)}\n"
             "panel: {kind: line, table: sites, x: week, y: litres}\n"
             "source: \"Source: invented for this test\"\n");
  write_file(dir.file("report.yaml"),
             "title: Sites\ncontents: false\nsections:\n"
             "  - title: Sites\n    pages:\n      - page: page.yaml\n        one-page-per: {table: sites, column: site}\n");
  auto lax = run("cd " + dir.path() + " && " + FORME_BINARY + " check report.yaml");
  INFO(lax.err);
  CHECK(lax.exit_code == 0);
  const std::string warning = "page.yaml:3:8: warning: the value axis has no unit";
  const std::size_t first = lax.err.find(warning);
  CHECK(first != std::string::npos);
  CHECK(lax.err.find(warning, first + 1) == std::string::npos);  // two pages, one finding
  auto strict = run("cd " + dir.path() + " && " + FORME_BINARY + " check --strict report.yaml");
  CHECK(strict.exit_code == 1);
  // --limit takes one NAME=N: the description after it is still read as the page.
  auto limited = run("cd " + dir.path() + " && " + FORME_BINARY + " check --limit pages=10 report.yaml");
  INFO(limited.err);
  CHECK(limited.exit_code == 0);
}

TEST_CASE("forme contrast prints the WCAG ratio: #767676 on white passes 4.5:1, #777777 fails", "[outside][colour]") {
  // Worked values from check-values.md §2c: 4.542225 and 4.478089.
  auto pass = run_forme("contrast '#767676' '#ffffff'");
  CHECK(pass.exit_code == 0);
  CHECK(pass.out.find("contrast 4.54:1") != std::string::npos);
  CHECK(pass.out.find("text (4.5:1)            pass") != std::string::npos);
  auto fail = run_forme("contrast '#777777' '#ffffff'");
  CHECK(fail.out.find("contrast 4.48:1") != std::string::npos);
  CHECK(fail.out.find("text (4.5:1)            fail") != std::string::npos);
  auto bad = run_forme("contrast '#77777' '#ffffff'");
  CHECK(bad.exit_code == 1);
}
