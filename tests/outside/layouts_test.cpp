// Every page under layouts/ renders, and independent tools find it sound:
// fonts embedded and subset (poppler's pdffonts), file structure clean
// (qpdf --check), no two text lines overlapping (poppler's
// pdftotext -bbox-layout), no text under 6 pt (common practice minimum for
// print), document title in the metadata (pdfinfo).
#include <catch2/catch.hpp>

#include <filesystem>
#include <sstream>

#include "cli/render_job.h"
#include "support/outside_tools.h"
#include "text/font.h"

using namespace forme::test;

namespace {

std::string render(const std::string& page, const TempDir& dir) {
  std::string out = dir.file(std::filesystem::path(page).stem().string() + ".pdf");
  auto r = run_forme("render '" + page + "' -o '" + out + "'");
  INFO(r.err);
  REQUIRE(r.exit_code == 0);
  return out;
}

}  // namespace

TEST_CASE("every layout renders with embedded subset fonts and a clean PDF structure", "[outside][layouts]") {
  REQUIRE(have_tool("pdffonts"));
  REQUIRE(have_tool("qpdf"));
  TempDir dir;
  auto pages = layout_pages();
  REQUIRE(!pages.empty());
  for (const auto& page : pages) {
    INFO(page);
    std::string pdf = render(page, dir);
    // pdffonts: columns "emb sub uni"; every font row must say yes yes.
    auto fonts = run("pdffonts '" + pdf + "'");
    REQUIRE(fonts.exit_code == 0);
    std::istringstream rows(fonts.out);
    std::string row;
    int font_rows = 0;
    std::getline(rows, row);  // header
    std::getline(rows, row);  // rule
    while (std::getline(rows, row)) {
      if (row.empty()) continue;
      ++font_rows;
      INFO(row);
      // The name of an embedded subset carries a six-letter tag ("ABCDEF+").
      CHECK(row.find('+') == 6);
      CHECK(row.find(" yes yes ") != std::string::npos);
    }
    CHECK(font_rows > 0);
    // qpdf --check exits 0 and reports no errors for a sound file.
    auto check = run("qpdf --check '" + pdf + "'");
    CHECK(check.exit_code == 0);
    CHECK(check.out.find("No syntax or stream encoding errors found") != std::string::npos);
  }
}

TEST_CASE("no two text lines overlap on any layout page, as pdftotext -bbox-layout sees them", "[outside][layouts]") {
  REQUIRE(have_tool("pdftotext"));
  TempDir dir;
  for (const auto& page : layout_pages()) {
    INFO(page);
    std::string pdf = render(page, dir);
    for (const auto& p : pdf_lines(pdf)) {
      REQUIRE(!p.words.empty());
      // Boxes that share only an edge do not overlap; allow 0.01 pt of rounding.
      CHECK(overlapping_words(p.words, 0.01) == std::vector<std::string>{});
    }
  }
}

TEST_CASE("no layout page sets text below 6 pt, and each carries its title as PDF metadata", "[outside][layouts]") {
  TempDir dir;
  const std::string fonts = forme::find_font_dir(FORME_BINARY);
  for (const auto& page : layout_pages()) {
    INFO(page);
    forme::DiagnosticSink sink;
    forme::DisplayPage composed = forme::compose_page(page, fonts, sink);
    int texts = 0;
    for (const auto& item : composed.items)
      if (const auto* t = std::get_if<forme::TextItem>(&item)) {
        ++texts;
        INFO(t->text.utf8);
        CHECK(t->text.size >= 6.0);  // common practice: 6 pt is the smallest legible print size
      }
    CHECK(texts > 0);
    std::string pdf = render(page, dir);
    auto info = run("pdfinfo '" + pdf + "'");
    CHECK(info.out.find("Title:           " + composed.title) != std::string::npos);
  }
}
