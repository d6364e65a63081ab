// Series keep their identity, and reports are laid out with the geometry
// they are printed with. Independent readers check what forme wrote:
//  - mupdf's `mutool draw -F trace` lists every text run with its fill
//    colour, so the colour each series' name is painted in can be read
//    back on every panel and page;
//  - poppler's `pdfinfo -box` gives each page's TrimBox (ISO 32000-1
//    §14.11.2) and `pdftotext -bbox` every word's box, so every word can be
//    checked to lie inside the trim and the running head and foot to line
//    up with the content's edges;
//  - poppler's `pdftoppm` paints each page, read back pixel by pixel, to
//    check that a `--greyscale` report holds no colour.
// The pages are tests/pages/stress/identity-report-bleed (invented data).
#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <map>
#include <set>
#include <sstream>
#include <string>
#include <vector>

#include "support/outside_tools.h"

using namespace forme::test;

namespace {

const std::string kDir = std::string(FORME_SOURCE_DIR) + "/tests/pages/stress/identity-report-bleed";

std::string render(const TempDir& dir, const std::string& extra = {}) {
  const std::string out = dir.file("r.pdf");
  auto r = run_forme("render " + extra + " '" + kDir + "/report.yaml' -o '" + out + "'");
  INFO(r.err);
  REQUIRE(r.exit_code == 0);
  return out;
}

int page_count(const std::string& pdf) {
  auto r = run("pdfinfo '" + pdf + "'");
  REQUIRE(r.exit_code == 0);
  return std::stoi(r.out.substr(r.out.find("Pages:") + 6));
}

// One page's box as pdfinfo prints it (PDF space, y up).
PdfBox page_box(const std::string& pdf, int page, const std::string& name) {
  auto r = run("pdfinfo -box -f " + std::to_string(page) + " -l " + std::to_string(page) + " '" + pdf + "'");
  REQUIRE(r.exit_code == 0);
  std::istringstream in(r.out);
  std::string line;
  while (std::getline(in, line)) {
    const auto at = line.find(name + ":");
    if (at == std::string::npos) continue;
    std::istringstream v(line.substr(line.find(':', at) + 1));
    PdfBox b;
    v >> b.x0 >> b.y0 >> b.x1 >> b.y1;
    return b;
  }
  FAIL("pdfinfo shows no " << name << " for page " << page);
  return {};
}

// Every text run's colour by its text (spaces dropped), from mutool's trace.
std::map<std::string, std::set<std::string>> text_colours(const std::string& pdf, int page) {
  auto r = run("mutool draw -F trace -o - '" + pdf + "' " + std::to_string(page) +
               " 2>/dev/null | /usr/bin/python3 -c 'import sys,re\n"
               "colour=None; text=\"\"\n"
               "for line in sys.stdin:\n"
               "  m=re.search(r\"<fill_text .*?color=\\\"([^\\\"]*)\\\"\",line)\n"
               "  if m: colour=m.group(1); text=\"\"; continue\n"
               "  g=re.search(r\"<g unicode=\\\"([^\\\"]*)\\\"\",line)\n"
               "  if g and colour is not None: text+=g.group(1); continue\n"
               "  if \"</fill_text>\" in line and colour is not None:\n"
               "    print(colour+\"\\t\"+text.replace(\" \",\"\")); colour=None\n'");
  REQUIRE(r.exit_code == 0);
  std::map<std::string, std::set<std::string>> out;
  std::istringstream in(r.out);
  std::string line;
  while (std::getline(in, line)) {
    const auto tab = line.find('\t');
    if (tab != std::string::npos) out[line.substr(tab + 1)].insert(line.substr(0, tab));
  }
  return out;
}

std::string without_spaces(std::string s) {
  s.erase(std::remove(s.begin(), s.end(), ' '), s.end());
  return s;
}

// The routes of the invented boardings table (its second column).
std::vector<std::string> routes() {
  std::istringstream in(read_file(kDir + "/data/boardings.csv"));
  std::string line;
  std::getline(in, line);
  std::set<std::string> seen;
  std::vector<std::string> out;
  while (std::getline(in, line)) {
    const auto q0 = line.find('"'), q1 = line.find('"', q0 + 1);
    if (q0 == std::string::npos) continue;
    const std::string r = line.substr(q0 + 1, q1 - q0 - 1);
    if (seen.insert(r).second) out.push_back(r);
  }
  return out;
}

}  // namespace

TEST_CASE("mutool reads one colour for each route's name on every page and panel, through a difference",
          "[outside][identity]") {
  REQUIRE(have_tool("mutool"));
  TempDir dir;
  const std::string pdf = render(dir);
  const int pages = page_count(pdf);
  std::map<std::string, std::set<std::string>> colours;  // route → colours its name is painted in
  std::map<std::string, int> pages_named;
  for (int p = 1; p <= pages; ++p) {
    const auto runs = text_colours(pdf, p);
    for (const std::string& route : routes()) {
      const std::string name = without_spaces(route);
      bool here = false;
      for (const auto& [text, inks] : runs)
        // The name itself, or the name a difference gives it ("Quay − Mill Race").
        if (text == name || text.rfind(name + "\u2212", 0) == 0) {
          colours[route].insert(inks.begin(), inks.end());
          here = true;
        }
      pages_named[route] += here;
    }
  }
  REQUIRE(routes().size() == 8);
  for (const std::string& route : routes()) {
    INFO(route);
    // Every route is named on the all-routes page and on its depot's page.
    CHECK(pages_named[route] >= 2);
    CHECK(colours[route].size() == 1);
  }
  // Gasworks Quay is named on three pages, once as a difference.
  CHECK(pages_named["Gasworks Quay"] == 3);
}

TEST_CASE("every word of a report with bleed lies inside the TrimBox, head and foot on the content's edges",
          "[outside][identity][report]") {
  REQUIRE(have_tool("pdfinfo"));
  TempDir dir;
  const std::string pdf = render(dir);
  const auto words = pdf_words(pdf);
  REQUIRE(words.size() == static_cast<std::size_t>(page_count(pdf)));
  for (std::size_t i = 0; i < words.size(); ++i) {
    const int page = static_cast<int>(i) + 1;
    INFO("page " << page);
    const PdfBox media = page_box(pdf, page, "MediaBox"), trim = page_box(pdf, page, "TrimBox");
    // The page sits on a press sheet: 3 mm of bleed and crop marks around it.
    REQUIRE(trim.x0 > media.x0 + 8.5);
    // pdftotext measures y down from the top of the MediaBox.
    const double left = trim.x0, right = trim.x1, top = media.y1 - trim.y1, bottom = media.y1 - trim.y0;
    for (const PdfWord& w : words[i].words) {
      INFO(w.text);
      CHECK(w.x_min >= left - 0.01);
      CHECK(w.x_max <= right + 0.01);
      CHECK(w.y_min >= top - 0.01);
      CHECK(w.y_max <= bottom + 0.01);
    }
    // The head is the topmost row of words, the foot the lowest (each a
    // left part and a right part).
    const auto& ws = words[i].words;
    REQUIRE(ws.size() >= 3);
    double top_row = 1e9, bottom_row = -1e9;
    for (const PdfWord& w : ws) top_row = std::min(top_row, w.y_min), bottom_row = std::max(bottom_row, w.y_max);
    PdfWord head{"", 1e9, 0, -1e9, 0}, foot{"", 1e9, 0, -1e9, 0};
    for (const PdfWord& w : ws)
      for (auto [row, on] : {std::pair{&head, w.y_min < top_row + 2}, std::pair{&foot, w.y_max > bottom_row - 2}})
        if (on) row->text += w.text + " ", row->x_min = std::min(row->x_min, w.x_min), row->x_max = std::max(row->x_max, w.x_max);
    // Content edges: page 7 states 22 mm margins; the others take the
    // default margins, equal on every side, where the heading begins.
    double content_left = 0;
    if (page == 7) {
      content_left = left + 22 / 25.4 * 72;
    } else {
      // The heading title's first word: the tallest word on the page.
      content_left = std::max_element(ws.begin(), ws.end(), [](const PdfWord& a, const PdfWord& b) {
                       return a.y_max - a.y_min < b.y_max - b.y_min;
                     })->x_min;
    }
    const double content_right = right - (content_left - left);
    INFO("head: " << head.text << " foot: " << foot.text);
    CHECK(foot.x_min == Approx(content_left).margin(0.5));
    CHECK(foot.x_max == Approx(content_right).margin(0.5));
    if (page > 1) {  // the cover carries only the foot
      CHECK(head.text.find("Quillmere Tramways") != std::string::npos);
      CHECK(head.x_min == Approx(content_left).margin(0.5));
      CHECK(head.x_max == Approx(content_right).margin(0.5));
    }
    CHECK(foot.text.find("page " + std::to_string(page) + " of ") != std::string::npos);
  }
}

TEST_CASE("a report rendered with --greyscale paints every page in grey, as pdftoppm draws it",
          "[outside][identity][report]") {
  REQUIRE(have_tool("pdftoppm"));
  // Largest |R-G|, |G-B| over every pixel of every page, read from PPM files.
  auto colourfulness = [](const std::string& pdf, const TempDir& dir) {
    auto r = run("pdftoppm -r 24 '" + pdf + "' '" + dir.file("p") + "' && /usr/bin/python3 -c 'import sys,glob\n"
                 "worst=0\n"
                 "for f in glob.glob(sys.argv[1]+\"*.ppm\"):\n"
                 "  d=open(f,\"rb\").read(); parts=d.split(maxsplit=4); px=parts[4]\n"
                 "  for k in range(0,len(px)-2,3):\n"
                 "    worst=max(worst,abs(px[k]-px[k+1]),abs(px[k+1]-px[k+2]))\n"
                 "print(worst)' '" + dir.file("p") + "'");
    REQUIRE(r.exit_code == 0);
    return std::stoi(r.out);
  };
  TempDir grey_dir, colour_dir;
  const std::string grey = render(grey_dir, "--greyscale");
  // Anti-aliasing mixes grey with grey: every pixel stays R = G = B (±1 for rounding).
  CHECK(colourfulness(grey, grey_dir) <= 1);
  // The same report without the option is in colour, so the check can fail.
  CHECK(colourfulness(render(colour_dir), colour_dir) > 40);
}

TEST_CASE("twenty line series give one colour-pair finding, not one per pair", "[outside][identity][colour]") {
  TempDir dir;
  std::ostringstream csv;
  csv << "year,stop,riders\n";
  for (int s = 0; s < 20; ++s)
    for (int y = 2020; y <= 2026; ++y) csv << y << ",Stop " << char('A' + s) << "," << 100 + s * 3 + (y - 2020) << "\n";
  write_file(dir.file("t.csv"), csv.str());
  // patterns: true lets 40 series take distinct looks; many pairs still
  // share a dash and differ too little in colour for some readers.
  write_file(dir.file("page.yaml"),
             "heading: {title: Twenty stops}\n"
             "tables: {t: t.csv}\n"
             "colours: {patterns: true}\n"
             "panel: {kind: line, table: t, x: year, y: riders, series-by: stop, y-unit: riders}\n"
             "source: \"Source: invented for this test\"\n");
  auto r = run_forme("check '" + dir.file("page.yaml") + "'");
  INFO(r.err);
  std::size_t findings = 0, at = 0;
  while ((at = r.err.find("hard to tell apart", at)) != std::string::npos) ++findings, ++at;
  CHECK(findings == 1);
  CHECK(r.err.find("pairs of series in panel 1 are hard to tell apart") != std::string::npos);
  // More than one pair, told as a count among the series named.
  const auto pairs = r.err.find(" pairs of series in panel 1");
  REQUIRE(pairs != std::string::npos);
  const auto count_at = r.err.rfind(' ', pairs - 1) + 1;
  CHECK(std::stoi(r.err.substr(count_at, pairs - count_at)) > 1);
  CHECK(r.err.find(" more: CIEDE2000 difference as low as ") != std::string::npos);
}

TEST_CASE("a report page whose margins cannot hold the running head is a located error, and no file", "[outside][identity][report]") {
  TempDir dir;
  write_file(dir.file("t.csv"), "month,riders\n2026-01,10\n2026-02,12\n2026-03,11\n");
  write_file(dir.file("report.yaml"),
             "title: Narrow margins\n"
             "sections:\n"
             "  - title: One\n"
             "    pages:\n"
             "      - page:\n"
             "          sheet: {size: A5, margins: 4mm, bleed: 3mm}\n"
             "          type: {size: 12pt}\n"
             "          heading: {title: Riders}\n"
             "          tables: {t: t.csv}\n"
             "          panel: {kind: line, table: t, x: month, y: riders, y-unit: riders}\n"
             "          source: \"Source: invented for this test\"\n");
  auto r = run_forme("render '" + dir.file("report.yaml") + "' -o '" + dir.file("r.pdf") + "'");
  CHECK(r.exit_code == 1);
  const std::string first = r.err.substr(0, r.err.find('\n'));
  // Located at the page's sheet (line 6, where `sheet:` starts its value).
  CHECK(first.find("report.yaml:6:") != std::string::npos);
  CHECK(first.find("error: a report's running head and foot need ") != std::string::npos);
  // 4 mm = 4 / 25.4 × 72 pt = 11.3 pt (the millimetre and the PostScript point).
  CHECK(first.find("but the top margin is 11.3 pt") != std::string::npos);
  CHECK(r.err.find("hint: give the sheet larger margins") != std::string::npos);
  CHECK_FALSE(run("test -e '" + dir.file("r.pdf") + "'").exit_code == 0);
}
