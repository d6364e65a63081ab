// Figures for a journal page: one or two columns wide, as tall as the chart
// needs or as a stated proportion, checked by independent readers.
// Sources:
// - column widths 89 mm and 178 mm: common practice (journals' artwork
//   instructions mostly ask for 85-90 mm and 170-180 mm; they differ);
// - PDF user unit 1/72 in (ISO 32000-1 §8.3.2.3): pt = mm × 72 / 25.4;
// - PNG image width and height: the IHDR chunk's first two 4-byte
//   big-endian fields (ISO/IEC 15948 §11.2.2);
// - SVG width/height with the unit "pt" (SVG 1.1 §7.10).
#include <catch2/catch.hpp>

#include <regex>
#include <sstream>

#include "cli/render_job.h"
#include "support/outside_tools.h"
#include "text/font.h"

using namespace forme::test;

namespace {

constexpr double pt(double mm) { return mm * 72 / 25.4; }

const char* kData = "depth_cm,flux\n5,41\n10,36\n15,30\n20,22\n25,18\n30,11\n";

std::string page_yaml(const std::string& sheet) {
  return "sheet: {" + sheet + "}\n"
         "tables: {t: t.csv}\n"
         "panel: {kind: dot, table: t, x: depth_cm, y: flux, x-title: Water table, x-unit: cm, "
         "y-title: Methane flux, y-unit: mg per m² per day}\n";
}

std::pair<double, double> media_box(const std::string& pdf) {
  const PdfBox box = pdfinfo_boxes(pdf).at("MediaBox");
  return {box.width(), box.height()};
}

std::pair<long, long> png_size(const std::string& path) {
  const std::string b = read_file(path);
  REQUIRE(b.size() > 24);
  REQUIRE(b.compare(1, 3, "PNG") == 0);
  REQUIRE(b.compare(12, 4, "IHDR") == 0);
  auto be32 = [&](std::size_t at) {
    long v = 0;
    for (std::size_t i = 0; i < 4; ++i) v = v * 256 + static_cast<unsigned char>(b[at + i]);
    return v;
  };
  return {be32(16), be32(20)};
}

std::string render(const TempDir& dir, const std::string& out, const std::string& extra = "") {
  auto r = run_forme("render " + dir.file("page.yaml") + " -o " + dir.file(out) + extra);
  INFO(r.err);
  REQUIRE(r.exit_code == 0);
  return dir.file(out);
}

}  // namespace

TEST_CASE("a single-column figure is 89 mm wide to 0.01 pt and as tall as its chart needs", "[outside][figure]") {
  REQUIRE(have_tool("pdfinfo"));
  REQUIRE(have_tool("pdffonts"));
  TempDir dir;
  write_file(dir.file("t.csv"), kData);
  write_file(dir.file("page.yaml"), page_yaml("size: single-column"));
  const std::string pdf = render(dir, "fig.pdf");
  auto [w, h] = media_box(pdf);
  CHECK(w == Approx(pt(89)).margin(0.01));
  // Height from content: the plot area is 0.62 times as tall as it is wide
  // (the reciprocal of the golden ratio, a common default proportion).
  forme::DiagnosticSink sink;
  const auto page = forme::compose_page(dir.file("page.yaml"), forme::find_font_dir(FORME_BINARY), sink);
  REQUIRE(page.plot_areas.size() == 1);
  CHECK(page.plot_areas[0].h / page.plot_areas[0].w == Approx(0.618).margin(0.002));
  CHECK(page.height == Approx(h).margin(0.01));
  CHECK(h < w);
  // No heading or footer unless the page asks: every text is an axis label or title.
  for (const auto& item : page.items)
    if (const auto* t = std::get_if<forme::TextItem>(&item)) {
      INFO(t->text.utf8);
      CHECK((t->role == forme::TextRole::tick_label || t->role == forme::TextRole::axis_title));
    }
  // pdffonts: every font embedded ("emb" column yes).
  auto fonts = run("pdffonts '" + pdf + "'");
  std::istringstream rows(fonts.out);
  std::string row;
  std::getline(rows, row);
  std::getline(rows, row);
  int n = 0;
  while (std::getline(rows, row))
    if (!row.empty()) {
      ++n;
      CHECK(row.find(" yes yes ") != std::string::npos);
    }
  CHECK(n > 0);
}

TEST_CASE("a double-column figure takes its height from a stated proportion, and an explicit height wins",
          "[outside][figure]") {
  TempDir dir;
  write_file(dir.file("t.csv"), kData);
  write_file(dir.file("page.yaml"), page_yaml("size: double-column, height-ratio: 0.5"));
  auto [w, h] = media_box(render(dir, "a.pdf"));
  CHECK(w == Approx(pt(178)).margin(0.01));
  CHECK(h == Approx(pt(89)).margin(0.01));
  write_file(dir.file("page.yaml"), page_yaml("size: single-column, height: 60mm"));
  auto [w2, h2] = media_box(render(dir, "b.pdf"));
  CHECK(w2 == Approx(pt(89)).margin(0.01));
  CHECK(h2 == Approx(pt(60)).margin(0.01));
}

TEST_CASE("a column figure as SVG keeps its width in points and as a 600 dpi PNG has the pixels worked out",
          "[outside][figure]") {
  TempDir dir;
  write_file(dir.file("t.csv"), kData);
  write_file(dir.file("page.yaml"), page_yaml("size: single-column, height: 60mm"));
  const std::string svg = read_file(render(dir, "fig.svg"));
  std::smatch m;
  REQUIRE(std::regex_search(svg, m, std::regex(R"re(<svg[^>]*\swidth="([0-9.]+)pt"\s+height="([0-9.]+)pt")re")));
  CHECK(std::stod(m[1]) == Approx(pt(89)).margin(0.01));
  CHECK(std::stod(m[2]) == Approx(pt(60)).margin(0.01));
  // 89 mm = 3.504 in → 2102.4 px at 600 dpi; 60 mm → 1417.3 px (rounded).
  auto [pw, ph] = png_size(render(dir, "fig.png", " --dpi 600"));
  CHECK(pw == 2102);
  CHECK(ph == 1417);
}
