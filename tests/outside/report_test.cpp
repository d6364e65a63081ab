// A report: many pages in one PDF. Independent readers check what a reader
// of the file sees:
//  - poppler's pdfinfo counts the pages;
//  - qpdf --json (qpdf's JSON format, version 2) lists the page labels
//    (ISO 32000-1 §12.4.2: /S /D decimal, /St the first number) and the outline (§12.3.3: each bookmark's title and the
//    page its destination opens, counted from 1);
//  - poppler's pdftotext reads "page N of M" on every page, the repeated
//    pages' titles with the value filled in, and the contents;
//  - qpdf --check reads the whole file structure (§7.5).
// What is expected is worked out here from the test report's inputs: the
// stations are the distinct values of hours.csv's first column, sorted as
// the report asks.
#include <catch2/catch.hpp>

#include <algorithm>
#include <map>
#include <set>
#include <sstream>
#include <string>
#include <vector>

#include "support/outside_tools.h"

using namespace forme::test;

namespace {

const std::string kDir = std::string(FORME_SOURCE_DIR) + "/tests/pages/report";
const std::string kReport = kDir + "/report.yaml";

std::vector<std::string> stations_sorted() {
  std::istringstream in(read_file(kDir + "/hours.csv"));
  std::string line;
  std::getline(in, line);  // header
  std::set<std::string> names;
  while (std::getline(in, line))
    if (!line.empty()) names.insert(line.substr(0, line.find(',')));
  return {names.begin(), names.end()};
}

std::string render_report(const TempDir& dir, const std::string& name, const std::string& env = {}) {
  const std::string out = dir.file(name);
  auto r = run(env + " " + FORME_BINARY + " render '" + kReport + "' -o '" + out + "'");
  INFO(r.err);
  REQUIRE(r.exit_code == 0);
  return out;
}

int pdfinfo_pages(const std::string& pdf) {
  auto r = run("pdfinfo '" + pdf + "'");
  REQUIRE(r.exit_code == 0);
  const auto at = r.out.find("Pages:");
  REQUIRE(at != std::string::npos);
  return std::stoi(r.out.substr(at + 6));
}

std::vector<std::string> lines_of(const std::string& s) {
  std::vector<std::string> out;
  std::istringstream in(s);
  std::string l;
  while (std::getline(in, l)) out.push_back(l);
  return out;
}

std::string page_text(const std::string& pdf, int page) {
  auto r = run("pdftotext -layout -f " + std::to_string(page) + " -l " + std::to_string(page) + " '" + pdf + "' -");
  REQUIRE(r.exit_code == 0);
  return r.out;
}

// Contents (1 page: 10 rows fit on one A4 page), the overview, one page per
// station, the rain chart and its table page (12 rows fit on one page).
std::string page_n_of_m_text(std::size_t n, std::size_t m) {
  return "page " + std::to_string(n) + " of " + std::to_string(m);
}

int expected_pages() { return 1 + 1 + static_cast<int>(stations_sorted().size()) + 2; }

}  // namespace

TEST_CASE("a report is one PDF with a page per station and pdfinfo counts them", "[outside][report]") {
  REQUIRE(have_tool("pdfinfo"));
  TempDir dir;
  const std::string pdf = render_report(dir, "r.pdf");
  CHECK(pdfinfo_pages(pdf) == expected_pages());
  auto check = run("qpdf --check '" + pdf + "'");
  INFO(check.out << check.err);
  CHECK(check.exit_code == 0);
  CHECK(check.out.find("No syntax or stream encoding errors found") != std::string::npos);
}

TEST_CASE("pdftotext finds page N of M on every page of a report", "[outside][report]") {
  TempDir dir;
  const std::string pdf = render_report(dir, "r.pdf");
  const int m = expected_pages();
  for (int n = 1; n <= m; ++n) {
    INFO("page " << n);
    CHECK(page_text(pdf, n).find("page " + std::to_string(n) + " of " + std::to_string(m)) != std::string::npos);
  }
}

TEST_CASE("repeated pages carry their value in the title, in sorted order", "[outside][report]") {
  TempDir dir;
  const std::string pdf = render_report(dir, "r.pdf");
  const auto stations = stations_sorted();
  REQUIRE(stations.size() == 5);
  for (std::size_t i = 0; i < stations.size(); ++i) {
    INFO(stations[i]);
    // Contents is page 1, the overview page 2; stations from page 3.
    const std::string text = page_text(pdf, 3 + static_cast<int>(i));
    CHECK(text.find(stations[i] + " pumping station") != std::string::npos);
    // The running head names the section through $(section).
    CHECK(text.find("Harrow Fen Drainage Board (fictional) - Stations") != std::string::npos);
  }
  // Each station page shows only its own station's two pumps.
  CHECK(page_text(pdf, 3).find("North pump") != std::string::npos);
}

TEST_CASE("the contents page lists sections and pages with their page numbers", "[outside][report]") {
  TempDir dir;
  const std::string pdf = render_report(dir, "r.pdf");
  const auto stations = stations_sorted();
  std::vector<std::string> lines = lines_of(page_text(pdf, 1));
  auto row_number = [&](const std::string& title) {
    for (const auto& l : lines)
      if (l.find(title) != std::string::npos) {
        // The page number is the last word of the row (pdftotext -layout).
        const auto end = l.find_last_not_of(' ');
        const auto start = l.find_last_of(' ', end);
        return std::stoi(l.substr(start + 1, end - start));
      }
    FAIL("no contents row for " << title);
    return -1;
  };
  CHECK(row_number("All stations") == 2);
  for (std::size_t i = 0; i < stations.size(); ++i) CHECK(row_number("Station " + stations[i]) == 3 + static_cast<int>(i));
  CHECK(row_number("Rain at the fen gauge") == 3 + static_cast<int>(stations.size()));
}

TEST_CASE("qpdf reads one decimal page-label range from 1, the number each page prints in its foot", "[outside][report]") {
  REQUIRE(have_tool("qpdf"));
  TempDir dir;
  const std::string pdf = render_report(dir, "r.pdf");
  // One line per label range: index, style, first number (§12.4.2: an
  // absent /St means 1).
  auto r = run("qpdf --json=2 --json-key=pagelabels '" + pdf +
               "' | /usr/bin/python3 -c 'import json,sys\n"
               "for p in json.load(sys.stdin)[\"pagelabels\"]:\n"
               "  print(p[\"index\"], p[\"label\"].get(\"/S\"), p[\"label\"].get(\"/St\", 1))'");
  INFO(r.err);
  REQUIRE(r.exit_code == 0);
  // The contents page prints "page 1 of M" (checked above), so its label is 1.
  CHECK(lines_of(r.out) == std::vector<std::string>{"0 /D 1"});
}

TEST_CASE("qpdf reads a bookmark per section and page, each opening its page", "[outside][report]") {
  TempDir dir;
  const std::string pdf = render_report(dir, "r.pdf");
  auto r = run("qpdf --json=2 --json-key=outlines '" + pdf +
               "' | /usr/bin/python3 -c 'import json,sys\n"
               "def walk(items, depth):\n"
               "  for o in items:\n"
               "    print(depth, o[\"destpageposfrom1\"], o[\"title\"])\n"
               "    walk(o[\"kids\"], depth + 1)\n"
               "walk(json.load(sys.stdin)[\"outlines\"], 0)'");
  INFO(r.err);
  REQUIRE(r.exit_code == 0);
  std::vector<std::string> want{"0 1 Contents", "0 2 Overview", "1 2 All stations", "0 3 Stations"};
  const auto stations = stations_sorted();
  for (std::size_t i = 0; i < stations.size(); ++i)
    want.push_back("1 " + std::to_string(3 + i) + " Station " + stations[i]);
  const std::string rain = std::to_string(3 + stations.size());
  want.push_back("0 " + rain + " Rainfall");
  want.push_back("1 " + rain + " Rain at the fen gauge");
  CHECK(lines_of(r.out) == want);
}

TEST_CASE("a report rendered twice with SOURCE_DATE_EPOCH is byte-identical", "[outside][report][reproducible]") {
  TempDir dir;
  const std::string a = render_report(dir, "a.pdf", "SOURCE_DATE_EPOCH=1709208000");
  const std::string b = render_report(dir, "b.pdf", "SOURCE_DATE_EPOCH=1709208000");
  const std::string bytes = read_file(a);
  REQUIRE(bytes.size() > 10000);
  CHECK(bytes == read_file(b));
  // pdfinfo reads the pinned date (2024-02-29T12:00:00Z).
  auto info = run("TZ=UTC pdfinfo '" + a + "'");
  CHECK(info.out.find("Feb 29 12:00:00 2024") != std::string::npos);
}

TEST_CASE("a report's additions are one incremental update after Cairo's file, which qpdf reads whole", "[outside][report]") {
  TempDir dir;
  const std::string bytes = read_file(render_report(dir, "r.pdf", "SOURCE_DATE_EPOCH=1709208000"));
  // ISO 32000-1 §7.5.6: the update's trailer has /Prev, the byte offset of
  // the previous cross-reference section, which starts with "xref" (§7.5.4).
  const std::size_t trailer = bytes.rfind("trailer");
  REQUIRE(trailer != std::string::npos);
  const std::size_t prev = bytes.find("/Prev ", trailer);
  REQUIRE(prev != std::string::npos);
  const std::size_t offset = std::stoul(bytes.substr(prev + 6, 20));
  REQUIRE(offset < trailer);
  CHECK(bytes.compare(offset, 4, "xref") == 0);
  CHECK(bytes.find("%%EOF", offset) < trailer);  // Cairo's own file ends before the update
  // qpdf follows both sections; pdfinfo reads the date the update sets.
  auto check = run("qpdf --check '" + dir.file("r.pdf") + "'");
  INFO(check.out << check.err);
  CHECK(check.exit_code == 0);
  auto info = run("TZ=UTC pdfinfo '" + dir.file("r.pdf") + "'");
  CHECK(info.out.find("Feb 29 12:00:00 2024") != std::string::npos);
}

TEST_CASE("an unwritable TMPDIR is a located error that leaves the earlier PDF as it was", "[outside][report][errors]") {
  TempDir dir;
  const std::string out = dir.file("r.pdf");
  write_file(out, "earlier");
  auto r = run("TMPDIR=" + dir.file("missing") + " " + FORME_BINARY + " render -q '" + kReport + "' -o '" + out + "'");
  CHECK(r.exit_code == 1);
  CHECK(r.err.find(dir.file("missing") + ": error: cannot create a temporary file for the PDF") == 0);
  CHECK(read_file(out) == "earlier");
}

TEST_CASE("every report under layouts renders with no two lines of text overlapping on any page", "[outside][report]") {
  const auto reports = layout_reports();
  REQUIRE(!reports.empty());
  for (const auto& report : reports) {
    INFO(report);
    TempDir dir;
    const std::string pdf = dir.file("r.pdf");
    auto r = run_forme("render -q '" + report + "' -o '" + pdf + "'");
    INFO(r.err);
    REQUIRE(r.exit_code == 0);
    const auto pages = pdf_lines(pdf);
    REQUIRE(pages.size() >= 14);
    for (std::size_t p = 0; p < pages.size(); ++p) {
      const auto& lines = pages[p].words;
      // Boxes as poppler measures them; touching edges are not an overlap.
      for (std::size_t i = 0; i < lines.size(); ++i)
        for (std::size_t j = i + 1; j < lines.size(); ++j) {
          const auto& a = lines[i];
          const auto& b = lines[j];
          const bool overlap = a.x_min < b.x_max - 0.01 && b.x_min < a.x_max - 0.01 && a.y_min < b.y_max - 0.01 &&
                               b.y_min < a.y_max - 0.01;
          INFO("page " << p + 1 << ": '" << a.text << "' and '" << b.text << "'");
          CHECK(!overlap);
        }
      const std::string foot = page_n_of_m_text(p + 1, pages.size());
      bool found = false;
      for (const auto& l : lines) found = found || l.text.find(foot) != std::string::npos;
      INFO("page " << p + 1 << " lacks '" << foot << "'");
      CHECK(found);
    }
    auto check = run("qpdf --check '" + pdf + "'");
    CHECK(check.exit_code == 0);
  }
}

TEST_CASE("a report carries each page's plotted rows, named by page, as pdfdetach extracts them",
          "[outside][report][complete]") {
  REQUIRE(have_tool("pdfdetach"));
  TempDir dir;
  const std::string pdf = render_report(dir, "r.pdf");
  const auto stations = stations_sorted();
  // The overview has a panel per station, each station page one panel, and
  // the rain chart one: ISO 32000-1 §7.11.4 embedded files, one per panel.
  auto list = run("pdfdetach -list '" + pdf + "'");
  REQUIRE(list.exit_code == 0);
  CHECK(list.out.find(std::to_string(2 * stations.size() + 1) + " embedded files") != std::string::npos);
  auto save = run("cd '" + dir.path() + "' && pdfdetach -saveall '" + pdf + "'");
  REQUIRE(save.exit_code == 0);

  // Station k is on page 3 + k (after the contents and the overview). Its
  // file holds exactly that station's (pump, month, hours) rows of hours.csv.
  std::istringstream in(read_file(kDir + "/hours.csv"));
  std::string line;
  std::getline(in, line);
  std::map<std::string, std::multiset<std::string>> rows_by_station;
  while (std::getline(in, line)) {
    if (line.empty()) continue;
    const std::size_t comma = line.find(',');
    rows_by_station[line.substr(0, comma)].insert(line.substr(comma + 1));
  }
  for (std::size_t k = 0; k < stations.size(); ++k) {
    const std::string file = dir.file("page-" + std::to_string(3 + k) + "-hours-panel-1.csv");
    INFO(file);
    auto got = lines_of(read_file(file));
    for (auto& l : got)  // RFC 4180 ends records with CRLF
      if (!l.empty() && l.back() == '\r') l.pop_back();
    REQUIRE(!got.empty());
    // Columns as the file names them, so their order is the file's business.
    const auto header = got.front();
    std::vector<std::string> names;
    std::istringstream h(header);
    for (std::string c; std::getline(h, c, ',');) names.push_back(c);
    auto column = [&](const std::string& n) {
      return static_cast<std::size_t>(std::find(names.begin(), names.end(), n) - names.begin());
    };
    const std::size_t pump = column("pump"), month = column("month"), hours = column("hours");
    REQUIRE(std::max({pump, month, hours}) < names.size());
    std::multiset<std::string> seen;
    for (std::size_t r = 1; r < got.size(); ++r) {
      std::vector<std::string> cells;
      std::istringstream c(got[r]);
      for (std::string cell; std::getline(c, cell, ',');) cells.push_back(cell);
      if (cells.size() < names.size()) continue;
      seen.insert(cells[pump] + "," + cells[month] + "," + cells[hours]);
    }
    CHECK(seen == rows_by_station[stations[k]]);
  }
}
