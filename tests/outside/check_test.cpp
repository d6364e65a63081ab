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
      "page.yaml:19:23: warning: no row of table 'calls' has district = 'Northholm', so panel 2 is empty",
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
