// Colour and access, checked from outside:
//  - `forme check` on a page whose colours fail some readers lists each
//    finding at the description's line:col (pinned), and the same page with
//    dashes and patterns loses the series findings;
//  - a greyscale render holds no colour: poppler's pdftoppm rasterises it
//    and every pixel has R = G = B (read by Debian's python3), while the
//    normal render of the same page does not;
//  - the PDF is tagged: poppler's pdfinfo reports "Tagged: yes", qpdf
//    --check finds no damage, pdfinfo -url still lists the source links,
//    and qpdf's QDF form shows one /Figure structure element per panel,
//    each with /Alt text (ISO 32000-1 §14.8, §14.9.3);
//  - the palette sheet names every palette and every vision (pdftotext).
#include <catch2/catch.hpp>

#include <regex>

#include "support/outside_tools.h"

using namespace forme::test;

namespace {

const std::string kPoor = std::string(FORME_SOURCE_DIR) + "/tests/pages/poor-colours";

// Fraction of pixels whose channels differ by more than 2 (of 255) in a
// pdftoppm raster of `pdf` (PPM P6, read by python3).
double coloured_share(const std::string& pdf, const TempDir& dir) {
  auto r = run("pdftoppm -r 30 -singlefile '" + pdf + "' '" + dir.file("raster") + "' && /usr/bin/python3 -c \"\n"
               "import sys\n"
               "d=open(sys.argv[1],'rb').read()\n"
               "parts=d.split(maxsplit=4)\n"
               "w,h=int(parts[1]),int(parts[2])\n"
               "px=parts[4][-w*h*3:]\n"
               "n=sum(1 for i in range(0,len(px),3) if max(px[i:i+3])-min(px[i:i+3])>2)\n"
               "print(n/(w*h))\n\" '" + dir.file("raster.ppm") + "'");
  REQUIRE(r.exit_code == 0);
  return std::stod(r.out);
}

}  // namespace

TEST_CASE("forme check lists the colour findings of the poor-colours page, located", "[outside][colour]") {
  auto r = run("cd " + kPoor + " && " + FORME_BINARY + " check --strict page.yaml");
  INFO(r.err);
  CHECK(r.exit_code == 1);
  const char* expected[] = {
      // A series colour written for a series no panel shows: a typo.
      "page.yaml:33:9: warning: no panel shows a series called 'Evenning'",
      // #f4e9a0 on white: WCAG 2.x SC 1.4.11 asks 3:1 of graphics.
      "page.yaml:13:12: warning: series 'Night' stands out from the paper at only 1.23:1, below the 3:1 that WCAG 2.x "
      "SC 1.4.11 asks of graphics",
      // A red and a green of one lightness: apart for normal vision, not
      // under simulated deutan vision (Machado 2009) or in greyscale.
      "page.yaml:12:12: warning: series 'North' and 'South' in panel 1 are hard to tell apart (deutan, greyscale): "
      "CIEDE2000 difference 2.6, below 10 (common practice)",
  };
  for (const char* line : expected) CHECK(r.err.find(std::string(line) + "\n") != std::string::npos);
  // The bar panel's two series carry fill patterns, so their colours are
  // not compared; its values are written beyond the patterned bars.
  CHECK(r.err.find("'Day' and 'Evening'") == std::string::npos);
  CHECK(r.err.find("reads at") == std::string::npos);
}

TEST_CASE("a greyscale render holds no colour, and the normal render does", "[outside][colour]") {
  REQUIRE(have_tool("pdftoppm"));
  TempDir dir;
  const std::string page = std::string(FORME_SOURCE_DIR) + "/layouts/prices/page.yaml";
  REQUIRE(run_forme("render '" + page + "' -o " + dir.file("colour.pdf")).exit_code == 0);
  REQUIRE(run_forme("render --greyscale '" + page + "' -o " + dir.file("grey.pdf")).exit_code == 0);
  CHECK(coloured_share(dir.file("colour.pdf"), dir) > 0.001);
  CHECK(coloured_share(dir.file("grey.pdf"), dir) == 0.0);
}

TEST_CASE("in greyscale, series must differ in lightness unless dashes separate them", "[outside][colour]") {
  TempDir dir;
  // Four lines in estuary: its second and fourth colours share a lightness
  // tier (palette.h), so they merge on a black-and-white print.
  write_file(dir.file("t.csv"), "day,value,kind\n1,2,a\n2,3,a\n1,4,b\n2,5,b\n1,6,c\n2,7,c\n1,8,d\n2,9,d\n");
  const std::string base =
      "heading: {title: Four lines}\ntables: {t: t.csv}\nsource: \"Source: invented for this test\"\n"
      "panel: {kind: line, table: t, x: day, y: value, series-by: kind, y-unit: tonnes}\n";
  write_file(dir.file("plain.yaml"), base);
  write_file(dir.file("dashed.yaml"), base + "colours: {patterns: true}\n");
  auto colour = run("cd " + dir.path() + " && " + FORME_BINARY + " check --strict plain.yaml");
  auto grey = run("cd " + dir.path() + " && " + FORME_BINARY + " check --strict --greyscale plain.yaml");
  auto dashed = run("cd " + dir.path() + " && " + FORME_BINARY + " check --strict --greyscale dashed.yaml");
  INFO(colour.err << grey.err << dashed.err);
  CHECK(grey.exit_code == 1);
  CHECK(grey.err.find("series 'b' and 'd' in panel 1 are hard to tell apart (greyscale)") != std::string::npos);
  CHECK(dashed.exit_code == 0);
  CHECK(dashed.err.find("warning") == std::string::npos);
}

TEST_CASE("PDF output is tagged, sound, keeps its links and gives each panel a figure with alternate text",
          "[outside][colour][tagged]") {
  REQUIRE(have_tool("pdfinfo"));
  REQUIRE(have_tool("qpdf"));
  TempDir dir;
  const std::string page = std::string(FORME_SOURCE_DIR) + "/tests/pages/complete/page.yaml";
  REQUIRE(run_forme("render '" + page + "' -o " + dir.file("p.pdf")).exit_code == 0);
  auto info = run("pdfinfo " + dir.file("p.pdf"));
  CHECK(std::regex_search(info.out, std::regex(R"(Tagged:\s+yes)")));
  auto check = run("qpdf --check " + dir.file("p.pdf"));
  INFO(check.out << check.err);
  CHECK(check.exit_code == 0);
  CHECK(check.out.find("No syntax or stream encoding errors found") != std::string::npos);
  auto urls = run("pdfinfo -url " + dir.file("p.pdf"));
  CHECK(urls.out.find("https://") != std::string::npos);
  // QDF form: every object written out uncompressed, one per block.
  REQUIRE(run("qpdf --qdf --object-streams=disable " + dir.file("p.pdf") + " " + dir.file("q.pdf")).exit_code == 0);
  const std::string qdf = read_file(dir.file("q.pdf"));
  const auto count = [&](const std::string& pattern) {
    std::regex re(pattern);
    return std::distance(std::sregex_iterator(qdf.begin(), qdf.end(), re), std::sregex_iterator());
  };
  CHECK(count(R"(/S /Figure)") >= 1);
  CHECK(count(R"(/S /Figure)") == count(R"(/Alt \()") + count(R"(/Alt <)"));
  CHECK(count(R"(/S /H1)") >= 1);  // the title of each page
  CHECK(count(R"(/S /P\b)") >= 1);
}

TEST_CASE("the palette sheet names every palette and every simulated vision", "[outside][colour]") {
  REQUIRE(have_tool("pdftotext"));
  TempDir dir;
  auto r = run_forme("palette --sheet " + dir.file("sheet.pdf"));
  INFO(r.err);
  REQUIRE(r.exit_code == 0);
  auto text = run("pdftotext -layout " + dir.file("sheet.pdf") + " -").out;
  for (const char* name : {"estuary", "fjord", "heath", "foreshore"}) CHECK(text.find(name) != std::string::npos);
  for (const char* v : {"normal vision", "protan", "deutan", "tritan", "greyscale"}) CHECK(text.find(v) != std::string::npos);
  CHECK(text.find("FAILS") == std::string::npos);
  CHECK(text.find("meets every promise") != std::string::npos);
}
