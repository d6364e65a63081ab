// `forme new KIND DIR`: each starter is written byte for byte from
// starters/, renders at once, passes `forme check --strict`, sets its text
// no smaller than its job needs, and never overwrites a folder in use.
#include <catch2/catch.hpp>

#include <algorithm>
#include <filesystem>
#include <map>

#include "cli/render_job.h"
#include "cli/starters.h"
#include "support/outside_tools.h"
#include "text/font.h"

using namespace forme::test;
namespace fs = std::filesystem;

namespace {

// The smallest text each job may carry, in points. All are common practice,
// not a standard:
// - briefing, report: 7 pt, the usual floor for chart labels in printed
//   A4 reports read at arm's length;
// - poster: 14 pt, so tick labels and notes stay legible from a metre or
//   two (posters are commonly set at least twice the size of print);
// - figure: 6 pt at final printed size, the floor most journals' artwork
//   instructions state (they range from 5 to 7 pt).
const std::map<std::string, double> kMinimumSize = {
    {"briefing", 7.0}, {"report", 7.0}, {"poster", 14.0}, {"figure", 6.0}};

std::string q(const std::string& s) { return "'" + s + "'"; }

std::vector<std::string> files_under(const fs::path& root) {
  std::vector<std::string> out;
  for (const auto& e : fs::recursive_directory_iterator(root))
    if (e.is_regular_file()) out.push_back(fs::relative(e.path(), root).generic_string());
  std::sort(out.begin(), out.end());
  return out;
}

}  // namespace

TEST_CASE("the starter kinds are briefing, figure, poster and report", "[outside][starters]") {
  CHECK(forme::starter_kinds() == std::vector<std::string>{"briefing", "figure", "poster", "report"});
}

TEST_CASE("forme new writes each starter exactly as it is in starters/", "[outside][starters]") {
  TempDir dir;
  for (const auto& [kind, _] : kMinimumSize) {
    INFO(kind);
    const std::string out = dir.file(kind);
    auto r = run_forme("new " + kind + " " + q(out));
    INFO(r.err);
    REQUIRE(r.exit_code == 0);
    const fs::path source = fs::path(FORME_SOURCE_DIR) / "starters" / kind;
    const auto written = files_under(out);
    CHECK(written == files_under(source));
    CHECK(std::find(written.begin(), written.end(), "page.yaml") != written.end());
    for (const auto& f : written) CHECK(read_file(out + "/" + f) == read_file((source / f).string()));
  }
}

TEST_CASE("every starter renders, passes check --strict and keeps its text at its job's minimum size",
          "[outside][starters]") {
  TempDir dir;
  const std::string fonts = forme::find_font_dir(FORME_BINARY);
  for (const auto& [kind, minimum] : kMinimumSize) {
    INFO(kind);
    const std::string folder = dir.file(kind);
    REQUIRE(run_forme("new " + kind + " " + q(folder)).exit_code == 0);
    const std::string page = folder + "/page.yaml";

    auto render = run_forme("render " + q(page) + " -o " + q(folder + "/out.pdf"));
    INFO(render.err);
    CHECK(render.exit_code == 0);
    CHECK(render.err.empty());
    auto strict = run_forme("check --strict " + q(page));
    INFO(strict.err);
    CHECK(strict.exit_code == 0);

    forme::DiagnosticSink sink;
    const forme::DisplayPage composed = forme::compose_page(page, fonts, sink);
    double smallest = 1e9;
    int texts = 0;
    for (const auto& item : composed.items)
      if (const auto* t = std::get_if<forme::TextItem>(&item)) {
        ++texts;
        smallest = std::min(smallest, t->text.size);
      }
    CHECK(texts > 5);
    CHECK(smallest >= minimum);
  }
}

TEST_CASE("the poster is an A2 sheet and the figure one journal column wide, as pdfinfo reads them",
          "[outside][starters]") {
  TempDir dir;
  REQUIRE(have_tool("pdfinfo"));
  auto size_of = [&](const std::string& kind) {
    REQUIRE(run_forme("new " + kind + " " + q(dir.file(kind))).exit_code == 0);
    REQUIRE(run_forme("render " + q(dir.file(kind) + "/page.yaml") + " -o " + q(dir.file(kind + ".pdf"))).exit_code == 0);
    auto info = run("pdfinfo " + q(dir.file(kind + ".pdf")));
    double w = 0, h = 0;
    const auto at = info.out.find("Page size:");
    REQUIRE(at != std::string::npos);
    REQUIRE(std::sscanf(info.out.c_str() + at, "Page size: %lf x %lf", &w, &h) == 2);
    return std::make_pair(w, h);
  };
  // ISO 216: A2 is 420 mm x 594 mm; 1 pt = 25.4/72 mm.
  auto [pw, ph] = size_of("poster");
  CHECK(pw == Approx(420 / 25.4 * 72).margin(0.5));
  CHECK(ph == Approx(594 / 25.4 * 72).margin(0.5));
  // 89 mm, common practice for a single journal column.
  auto [fw, fh] = size_of("figure");
  CHECK(fw == Approx(89 / 25.4 * 72).margin(0.5));
  CHECK(fh < fw);
}

TEST_CASE("forme new refuses a folder that is not empty and leaves it as it was", "[outside][starters]") {
  TempDir dir;
  const std::string folder = dir.file("taken");
  fs::create_directory(folder);
  write_file(folder + "/page.yaml", "mine\n");
  auto r = run_forme("new report " + q(folder));
  CHECK(r.exit_code == 1);
  CHECK(r.err.rfind(folder + ": error: folder is not empty\n", 0) == 0);
  CHECK(read_file(folder + "/page.yaml") == "mine\n");
  CHECK(files_under(folder) == std::vector<std::string>{"page.yaml"});
  // Nothing is left beside it either.
  CHECK(files_under(dir.path()) == std::vector<std::string>{"taken/page.yaml"});
}

TEST_CASE("forme new fills an empty folder, and refuses an unknown kind as a usage error", "[outside][starters]") {
  TempDir dir;
  fs::create_directory(dir.file("empty"));
  auto ok = run_forme("new figure " + q(dir.file("empty")));
  CHECK(ok.exit_code == 0);
  CHECK(fs::exists(dir.file("empty/page.yaml")));
  auto bad = run_forme("new leaflet " + q(dir.file("other")));
  CHECK(bad.exit_code == 2);
  CHECK(!fs::exists(dir.file("other")));
  auto missing_parent = run_forme("new figure " + q(dir.file("no/such/place")));
  CHECK(missing_parent.exit_code == 1);
  CHECK(missing_parent.err.find("does not exist") != std::string::npos);
}
