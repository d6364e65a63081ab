// Sheet sizes as an independent PDF reader sees them.
// Sources: ISO 216 (A and B series in millimetres); US Letter 8.5 × 11 in,
// Legal 8.5 × 14 in, Tabloid 11 × 17 in; PDF's default user unit is 1/72 inch
// (ISO 32000-1 §8.3.2.3), so points = mm × 72 / 25.4. Values as listed in
// ../shared/refs/check-values.md §6 (mm: V2).
#include <catch2/catch.hpp>


#include "support/outside_tools.h"

using namespace forme::test;

namespace {

const char* kData = "name,value\nalpha,3\nbeta,5\n";

std::string page_yaml(const std::string& size, const std::string& orientation) {
  return "sheet: {size: \"" + size + "\", orientation: " + orientation + ", margins: 10mm}\n"
         "tables: {t: t.csv}\n"
         "panel: {kind: horizontal-bar, table: t, x: value, y: name}\n";
}

struct Box {
  double w = 0, h = 0;
};

Box pdfinfo_mediabox(const std::string& pdf) {
  const PdfBox box = pdfinfo_boxes(pdf).at("MediaBox");
  return {box.width(), box.height()};
}

}  // namespace

TEST_CASE("rendered sheets have the ISO 216 and US sizes, measured by pdfinfo and pdftotext", "[outside][sheet]") {
  REQUIRE(have_tool("pdfinfo"));
  struct Case {
    const char* name;
    double w_mm, h_mm;
  };
  // ISO 216 A0–A6, B0–B6 (mm, portrait); US sizes from their inch definitions.
  const Case cases[] = {
      {"A0", 841, 1189}, {"A1", 594, 841}, {"A2", 420, 594}, {"A3", 297, 420}, {"A4", 210, 297},
      {"A5", 148, 210}, {"A6", 105, 148}, {"B0", 1000, 1414}, {"B1", 707, 1000}, {"B2", 500, 707},
      {"B3", 353, 500}, {"B4", 250, 353}, {"B5", 176, 250}, {"B6", 125, 176},
      {"letter", 8.5 * 25.4, 11 * 25.4}, {"legal", 8.5 * 25.4, 14 * 25.4}, {"tabloid", 11 * 25.4, 17 * 25.4},
  };
  TempDir dir;
  write_file(dir.file("t.csv"), kData);
  for (const auto& c : cases) {
    for (const char* orientation : {"portrait", "landscape"}) {
      INFO(c.name << " " << orientation);
      write_file(dir.file("page.yaml"), page_yaml(c.name, orientation));
      auto r = run_forme("render " + dir.file("page.yaml") + " -o " + dir.file("out.pdf"));
      REQUIRE(r.exit_code == 0);
      double w = c.w_mm * 72 / 25.4, h = c.h_mm * 72 / 25.4;
      if (std::string(orientation) == "landscape") std::swap(w, h);
      Box box = pdfinfo_mediabox(dir.file("out.pdf"));
      CHECK(box.w == Approx(w).margin(0.01));
      CHECK(box.h == Approx(h).margin(0.01));
      // pdftotext prints the page size with six decimals.
      auto pages = pdf_words(dir.file("out.pdf"));
      REQUIRE(pages.size() == 1);
      CHECK(pages[0].width == Approx(w).margin(0.01));
      CHECK(pages[0].height == Approx(h).margin(0.01));
    }
  }
}

TEST_CASE("custom sheet sizes accept mm, cm, in and pt", "[outside][sheet]") {
  TempDir dir;
  write_file(dir.file("t.csv"), kData);
  // 1 in = 25.4 mm = 2.54 cm = 72 pt (definition of the inch and of the PDF point).
  const std::pair<const char*, double> sizes[] = {
      {"254mm x 127mm", 720}, {"25.4cm x 12.7cm", 720}, {"10in x 5in", 720}, {"720pt x 360pt", 720}};
  for (auto [size, expect_w] : sizes) {
    INFO(size);
    write_file(dir.file("page.yaml"), page_yaml(size, "landscape"));
    REQUIRE(run_forme("render " + dir.file("page.yaml") + " -o " + dir.file("out.pdf")).exit_code == 0);
    Box box = pdfinfo_mediabox(dir.file("out.pdf"));
    CHECK(box.w == Approx(expect_w).margin(0.01));
    CHECK(box.h == Approx(expect_w / 2).margin(0.01));
  }
}
