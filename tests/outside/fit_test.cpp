// Layout adapts instead of overflowing: pages with names, titles and
// grids too big for their sheet are rendered and read back by independent
// tools. poppler's `pdfinfo -box` gives the TrimBox and `pdftotext -bbox`
// every word's box; the outside audit (../shared/tools/page_audit.py:
// poppler, mupdf and Ghostscript) looks for collisions, text off the trim
// and text over marks. Errors for what cannot fit are pinned exactly.
#include <catch2/catch.hpp>

#include <algorithm>
#include <fstream>
#include <regex>
#include <set>
#include <sstream>

#include "support/outside_tools.h"

using namespace forme::test;

namespace {

const std::string kStress = std::string(FORME_SOURCE_DIR) + "/tests/pages/stress/";
const std::vector<std::string> kPages = {"fit-hbar-a5", "fit-upright-a6", "fit-journal-names", "fit-poster-names"};

}  // namespace

TEST_CASE("every word of the fit stress pages lies inside the trim box and no two words overlap", "[outside][fit]") {
  REQUIRE(have_tool("pdftotext"));
  REQUIRE(have_tool("pdfinfo"));
  for (const auto& name : kPages) {
    INFO("page " << name);
    TempDir dir;
    const std::string pdf = dir.file("p.pdf");
    auto r = run_forme("render '" + kStress + name + "/page.yaml' -o " + pdf);
    INFO(r.err);
    REQUIRE(r.exit_code == 0);
    const PdfBox trim = pdfinfo_boxes(pdf).at("TrimBox");
    auto pages = pdf_words(pdf);
    REQUIRE(pages.size() == 1);
    // pdftotext measures y down from the top of the media box; the trim
    // box is given y up (ISO 32000-1 §14.11.2), so it is turned over here.
    const double page_h = pages[0].height;
    for (const auto& w : pages[0].words) {
      INFO("word '" << w.text << "' at " << w.x_min << "," << w.y_min << " – " << w.x_max << "," << w.y_max);
      CHECK(w.x_min >= trim.x0 - 0.01);
      CHECK(w.x_max <= trim.x1 + 0.01);
      CHECK(w.y_min >= page_h - trim.y1 - 0.01);
      CHECK(w.y_max <= page_h - trim.y0 + 0.01);
    }
    CHECK(overlapping_words(pages[0].words) == std::vector<std::string>{});
  }
}

TEST_CASE("the outside audit finds nothing on the fit stress pages", "[outside][fit]") {
  REQUIRE(have_tool("pdftotext"));
  for (const auto& name : kPages) {
    INFO("page " << name);
    TempDir dir;
    const std::string pdf = dir.file("p.pdf");
    REQUIRE(run_forme("render '" + kStress + name + "/page.yaml' -o " + pdf).exit_code == 0);
    auto a = run("/usr/bin/python3 '" + std::string(FORME_SOURCE_DIR) + "/../shared/tools/page_audit.py' " + pdf);
    INFO(a.out << a.err);
    CHECK(a.out.find("collisions=0 off_page=0 over_marks=0") != std::string::npos);
  }
}
