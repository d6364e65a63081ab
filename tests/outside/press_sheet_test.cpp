// A page set for a print shop: bleed, crop marks and slug, checked by
// independent readers. Sources:
// - ISO 32000-1 §14.11.2: TrimBox is the finished page, BleedBox the trim
//   plus the bleed, both within the MediaBox (read back by poppler's
//   pdfinfo -box, two decimals);
// - PDF user unit 1/72 in (ISO 32000-1 §8.3.2.3), so pt = mm × 72 / 25.4;
// - ISO 216: A5 is 148 mm × 210 mm;
// - crop marks starting no nearer the trim than the bleed, 6 mm long, and a
//   3 mm bleed: common practice in printers' artwork guides (recalled).
#include <catch2/catch.hpp>

#include <array>
#include <cstdio>
#include <map>
#include <regex>
#include <sstream>

#include "cli/render_job.h"
#include "support/outside_tools.h"
#include "text/font.h"

using namespace forme::test;

namespace {

constexpr double pt(double mm) { return mm * 72 / 25.4; }

const char* kData = "month,visits\n2026-01,120\n2026-02,135\n2026-03,150\n";

std::string page_yaml(const std::string& press) {
  return "sheet: {size: A5, margins: 12mm" + press + "}\n"
         "heading: {title: Harbour ferry visits rose each month}\n"
         "tables: {t: t.csv}\n"
         "panel: {kind: line, table: t, x: month, y: visits, y-title: Visits, y-unit: people}\n"
         "source: \"Source: invented for this test\"\n";
}

void check_box(const PdfBox& b, double x0, double y0, double x1, double y1) {
  CHECK(b.x0 == Approx(x0).margin(0.01));
  CHECK(b.y0 == Approx(y0).margin(0.01));
  CHECK(b.x1 == Approx(x1).margin(0.01));
  CHECK(b.y1 == Approx(y1).margin(0.01));
}

// One pixel of a binary PPM (P6) as pdftoppm writes it.
struct Ppm {
  int w = 0, h = 0;
  std::string bytes;
  std::array<int, 3> at(int x, int y) const {
    const std::size_t i = (static_cast<std::size_t>(y) * static_cast<std::size_t>(w) + static_cast<std::size_t>(x)) * 3;
    return {static_cast<unsigned char>(bytes[i]), static_cast<unsigned char>(bytes[i + 1]),
            static_cast<unsigned char>(bytes[i + 2])};
  }
};

Ppm read_ppm(const std::string& path) {
  std::string all = read_file(path);
  std::istringstream in(all);
  std::string magic;
  int maxval = 0;
  Ppm p;
  in >> magic >> p.w >> p.h >> maxval;
  REQUIRE(magic == "P6");
  in.get();
  p.bytes = all.substr(static_cast<std::size_t>(in.tellg()));
  REQUIRE(p.bytes.size() >= static_cast<std::size_t>(p.w * p.h * 3));
  return p;
}

}  // namespace

TEST_CASE("bleed, crop marks and slug give pdfinfo the MediaBox, BleedBox and TrimBox worked out in millimetres",
          "[outside][press]") {
  REQUIRE(have_tool("pdfinfo"));
  REQUIRE(have_tool("qpdf"));
  TempDir dir;
  write_file(dir.file("t.csv"), kData);
  write_file(dir.file("page.yaml"), page_yaml(", bleed: 3mm, crop-marks: true, slug: Ferry leaflet, background: \"#f4efe4\""));
  auto r = run_forme("render " + dir.file("page.yaml") + " -o " + dir.file("out.pdf"));
  INFO(r.err);
  REQUIRE(r.exit_code == 0);
  // Outside the trim: marks start 3 mm out (= the bleed) and run 6 mm.
  const double out = pt(3 + 6), w = pt(148), h = pt(210), bleed = pt(3);
  auto boxes = pdfinfo_boxes(dir.file("out.pdf"));
  REQUIRE(boxes.count("MediaBox"));
  REQUIRE(boxes.count("TrimBox"));
  REQUIRE(boxes.count("BleedBox"));
  check_box(boxes["MediaBox"], 0, 0, w + 2 * out, h + 2 * out);
  check_box(boxes["TrimBox"], out, out, out + w, out + h);
  check_box(boxes["BleedBox"], out - bleed, out - bleed, out + w + bleed, out + h + bleed);
  auto check = run("qpdf --check '" + dir.file("out.pdf") + "'");
  CHECK(check.exit_code == 0);
  CHECK(check.out.find("No syntax or stream encoding errors found") != std::string::npos);

  // The slug line, as pdftotext finds it (y down from the MediaBox top),
  // lies wholly below the trimmed page and inside the sheet.
  auto pages = pdf_words(dir.file("out.pdf"));
  REQUIRE(pages.size() == 1);
  std::string slug;
  for (const auto& word : pages[0].words) {
    INFO(word.text);
    if (word.y_min <= out + h) {
      // Everything else lies inside the trim.
      CHECK(word.x_min >= out);
      CHECK(word.x_max <= out + w);
      CHECK(word.y_min >= out);
      CHECK(word.y_max <= out + h);
      continue;
    }
    CHECK(word.y_max < h + 2 * out);
    slug += (slug.empty() ? "" : " ") + word.text;
  }
  // Job name, date, page: the date is today's or SOURCE_DATE_EPOCH's.
  INFO(slug);
  CHECK(std::regex_match(slug, std::regex("Ferry leaflet \u00b7 [0-9]{4}-[0-9]{2}-[0-9]{2} \u00b7 page 1 of 1")));
}

TEST_CASE("crop marks lie outside the trim and the bleed, and the background runs into the bleed", "[outside][press]") {
  REQUIRE(have_tool("pdftoppm"));
  TempDir dir;
  write_file(dir.file("t.csv"), kData);
  write_file(dir.file("page.yaml"), page_yaml(", bleed: 3mm, crop-marks: true, background: \"#f4efe4\""));
  const double out = pt(9), w = pt(148), h = pt(210), bleed = pt(3);

  // The display list: eight hairlines, each wholly at least the bleed away from the trim.
  forme::DiagnosticSink sink;
  const auto doc = forme::compose_document(dir.file("page.yaml"), forme::find_font_dir(FORME_BINARY), sink);
  const forme::DisplayPage& page = doc.pages.front();
  REQUIRE(page.trim_box);
  const forme::Rect trim = *page.trim_box;
  int marks = 0;
  for (const auto& item : page.items) {
    const auto* p = std::get_if<forme::PathItem>(&item);
    if (!p || !p->stroke) continue;
    // Butt caps end where the path ends, so the ends bound the ink along
    // the mark; its half width lies across it, along the trim's edge line.
    bool outside = true;
    for (const auto& q : p->points) {
      const double dx = std::max(trim.left() - q.x, q.x - trim.right());
      const double dy = std::max(trim.top() - q.y, q.y - trim.bottom());
      outside = outside && std::max(dx, dy) >= bleed - 1e-9;
    }
    if (!outside) continue;
    ++marks;
    // A mark continues an edge of the trim outwards: it is horizontal at
    // the top or bottom edge's y, or vertical at the left or right edge's x.
    const auto& a = p->points.front();
    const auto& b = p->points.back();
    const bool on_edge = (a.y == b.y && (a.y == trim.top() || a.y == trim.bottom())) ||
                         (a.x == b.x && (a.x == trim.left() || a.x == trim.right()));
    CHECK(on_edge);
  }
  CHECK(marks == 8);

  // Rasterised by poppler at 72 dpi (1 px = 1 pt): the background colour
  // inside the bleed, white paper between the bleed and the marks.
  auto r = run_forme("render " + dir.file("page.yaml") + " -o " + dir.file("out.pdf"));
  REQUIRE(r.exit_code == 0);
  REQUIRE(run("pdftoppm -r 72 '" + dir.file("out.pdf") + "' " + dir.file("raster")).exit_code == 0);
  Ppm img = read_ppm(dir.file("raster-1.ppm"));
  CHECK(img.w == Approx(w + 2 * out).margin(1));
  const int mid_y = static_cast<int>(out + h / 2);
  const auto in_bleed = img.at(static_cast<int>(out - bleed / 2), mid_y);
  CHECK(in_bleed == std::array<int, 3>{0xf4, 0xef, 0xe4});
  const auto beyond = img.at(static_cast<int>(out - bleed - 2), mid_y);
  CHECK(beyond == std::array<int, 3>{255, 255, 255});
}

TEST_CASE("a page without print-shop keys keeps its sheet as MediaBox and writes no TrimBox", "[outside][press]") {
  TempDir dir;
  write_file(dir.file("t.csv"), kData);
  write_file(dir.file("page.yaml"), page_yaml(""));
  REQUIRE(run_forme("render " + dir.file("page.yaml") + " -o " + dir.file("out.pdf")).exit_code == 0);
  auto boxes = pdfinfo_boxes(dir.file("out.pdf"));
  check_box(boxes["MediaBox"], 0, 0, pt(148), pt(210));
  // pdfinfo prints a TrimBox always: absent from the file, it is the CropBox
  // and so the MediaBox (ISO 32000-1 §14.11.2).
  check_box(boxes["TrimBox"], 0, 0, pt(148), pt(210));
  auto objects = run("qpdf --json '" + dir.file("out.pdf") + "'");
  REQUIRE(objects.exit_code == 0);
  CHECK(objects.out.find("/MediaBox") != std::string::npos);
  CHECK(objects.out.find("/TrimBox") == std::string::npos);
  CHECK(objects.out.find("/BleedBox") == std::string::npos);
}
