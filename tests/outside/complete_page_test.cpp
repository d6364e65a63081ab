// The complete page: a PDF that carries its document information, a link to
// its source, its limitations, the rows it plots as attached CSV files and,
// when asked, a table of those rows; an SVG that carries a title and a
// description. Every check asks an independent reader:
//  - poppler's pdfdetach (-list, -saveall) and qpdf --list-attachments read
//    the embedded files (ISO 32000-1 §7.11.4 embedded file streams, §7.7.4
//    the /EmbeddedFiles name tree); coreutils' md5sum checks their /CheckSum;
//  - poppler's pdfinfo reads Author, Subject, Keywords (§14.3.3 document
//    information dictionary) and, with -url, the link annotations' URI
//    actions (§12.5.6.5, §12.6.4.7);
//  - qpdf --check reads the whole file structure (§7.5);
//  - poppler's pdftotext reads the footer and the table page's text;
//  - Python's xml.etree (Debian's python3) parses the SVG and reports the
//    root element's first children (SVG 1.1 §5.4 'title' and 'desc').
// The expected CSV is worked out here from the input CSV and the page's
// filters, with its own reader and writer for RFC 4180.
#include <catch2/catch.hpp>

#include <algorithm>
#include <map>
#include <string>
#include <vector>

#include "support/outside_tools.h"

using namespace forme::test;

namespace {

const std::string kDir = std::string(FORME_SOURCE_DIR) + "/tests/pages/complete";
const std::string kPage = kDir + "/page.yaml";

using Row = std::vector<std::string>;

// RFC 4180 §2: fields split by commas, records by line breaks, a quoted
// field may hold commas, line breaks and doubled quotes.
std::vector<Row> parse_csv(const std::string& text) {
  std::vector<Row> rows(1);
  std::string field;
  bool quoted = false;
  for (std::size_t i = 0; i < text.size(); ++i) {
    const char c = text[i];
    if (quoted) {
      if (c == '"' && i + 1 < text.size() && text[i + 1] == '"') field += '"', ++i;
      else if (c == '"') quoted = false;
      else field += c;
    } else if (c == '"') {
      quoted = true;
    } else if (c == ',') {
      rows.back().push_back(field), field.clear();
    } else if (c == '\n' || c == '\r') {
      if (c == '\r' && i + 1 < text.size() && text[i + 1] == '\n') ++i;
      rows.back().push_back(field), field.clear();
      rows.emplace_back();
    } else {
      field += c;
    }
  }
  if (!field.empty() || !rows.back().empty()) rows.back().push_back(field);
  if (rows.back().empty()) rows.pop_back();
  return rows;
}

// RFC 4180 §2 rules 5-7, records ending in CRLF (rule 1).
std::string write_csv(const std::vector<Row>& rows) {
  std::string out;
  for (const auto& r : rows) {
    for (std::size_t i = 0; i < r.size(); ++i) {
      std::string f = r[i];
      if (f.find_first_of(",\"\r\n") != std::string::npos) {
        std::string q = "\"";
        for (char c : f) q += c == '"' ? std::string("\"\"") : std::string(1, c);
        f = q + "\"";
      }
      out += (i ? "," : "") + f;
    }
    out += "\r\n";
  }
  return out;
}

// The rows a panel filtered on `site` plots: the columns it reads (site,
// week, kind, count; not comment), rows whose x and y cells are not empty.
std::string expected_rows(const std::string& site) {
  const auto table = parse_csv(read_file(kDir + "/data/counts.csv"));
  std::vector<Row> out{{"site", "week", "kind", "count"}};
  for (std::size_t r = 1; r < table.size(); ++r) {
    const Row& row = table[r];
    if (row[0] != site || row[1].empty()) continue;
    out.push_back({row[0], row[1], row[2], row[3]});
  }
  return write_csv(out);
}

std::string render(const TempDir& dir, const std::string& name, const std::string& page = kPage) {
  const std::string out = dir.file(name);
  auto r = run("SOURCE_DATE_EPOCH=1709208000 " + std::string(FORME_BINARY) + " render '" + page + "' -o '" + out + "'");
  INFO(r.err);
  REQUIRE(r.exit_code == 0);
  return out;
}

}  // namespace

TEST_CASE("the PDF carries each panel's plotted rows as CSV files that pdfdetach and qpdf list and extract",
          "[outside][complete]") {
  REQUIRE(have_tool("pdfdetach"));
  REQUIRE(have_tool("qpdf"));
  TempDir dir;
  const std::string pdf = render(dir, "page.pdf");

  auto list = run("pdfdetach -list '" + pdf + "'");
  REQUIRE(list.exit_code == 0);
  CHECK(list.out.find("2 embedded files") != std::string::npos);
  CHECK(list.out.find("counts-upper-north.csv") != std::string::npos);
  CHECK(list.out.find("counts-south.csv") != std::string::npos);
  auto qlist = run("qpdf --list-attachments '" + pdf + "'");
  REQUIRE(qlist.exit_code == 0);
  CHECK(qlist.out.find("counts-upper-north.csv") != std::string::npos);
  CHECK(qlist.out.find("counts-south.csv") != std::string::npos);

  auto save = run("cd '" + dir.file("") + "' && pdfdetach -saveall '" + pdf + "'");
  REQUIRE(save.exit_code == 0);
  // The quoted site name keeps its quotes; the row with no count is a gap on
  // the page and stays in the attached rows as written, so readers see it.
  const std::string north = expected_rows("North, upper");
  CHECK(north.find("\"North, upper\",2,beetle,") != std::string::npos);
  CHECK(read_file(dir.file("counts-upper-north.csv")) == north);
  CHECK(read_file(dir.file("counts-south.csv")) == expected_rows("South"));
  // Each file's /Params holds its size and MD5 (ISO 32000-1 §7.11.4.2 Table
  // 45), here as coreutils' md5sum computes it of the extracted bytes.
  const std::string bytes = read_file(pdf);
  for (const char* name : {"counts-upper-north.csv", "counts-south.csv"}) {
    auto sum = run("md5sum '" + dir.file(name) + "'");
    REQUIRE(sum.exit_code == 0);
    const std::string size = std::to_string(read_file(dir.file(name)).size());
    INFO(name);
    CHECK(bytes.find("/Size " + size + " /CheckSum <" + sum.out.substr(0, 32) + ">") != std::string::npos);
  }

  auto check = run("qpdf --check '" + pdf + "'");
  INFO(check.out << check.err);
  CHECK(check.exit_code == 0);
  CHECK(check.out.find("No syntax or stream encoding errors found") != std::string::npos);
}

TEST_CASE("data attach false leaves the PDF without embedded files", "[outside][complete]") {
  REQUIRE(have_tool("pdfdetach"));
  TempDir dir;
  write_file(dir.file("page.yaml"), "data: {attach: false}\ntables: {counts: '" + kDir + "/data/counts.csv'}\n"
                                    "panel: {kind: line, x: week, y: count, series-by: kind, where: {site: South},"
                                    " y-unit: insects per trap}\nsource: test\n");
  const std::string pdf = render(dir, "bare.pdf", dir.file("page.yaml"));
  auto list = run("pdfdetach -list '" + pdf + "'");
  REQUIRE(list.exit_code == 0);
  CHECK(list.out.find("0 embedded files") != std::string::npos);
}

TEST_CASE("pdfinfo reads author, subject and keywords, and the source line's links", "[outside][complete]") {
  REQUIRE(have_tool("pdfinfo"));
  TempDir dir;
  const std::string pdf = render(dir, "page.pdf");
  auto info = run("pdfinfo '" + pdf + "'");
  REQUIRE(info.exit_code == 0);
  CHECK(info.out.find("Title:           Light-trap catches rose each week at the upper north site") != std::string::npos);
  CHECK(info.out.find("Author:          Pellow Moor volunteers") != std::string::npos);
  CHECK(info.out.find("Subject:         Weekly light-trap catches at two sites") != std::string::npos);
  CHECK(info.out.find("Keywords:        moths, beetles, light traps") != std::string::npos);
  CHECK(info.out.find("Pages:           2") != std::string::npos);  // the chart, then the table page

  // Three link annotations on page 1: the source line (to the first
  // address), then each address printed under it.
  auto urls = run("pdfinfo -url '" + pdf + "'");
  REQUIRE(urls.exit_code == 0);
  auto count = [&](const std::string& s) {
    std::size_t n = 0;
    for (auto at = urls.out.find(s); at != std::string::npos; at = urls.out.find(s, at + 1)) ++n;
    return n;
  };
  CHECK(count("   1  Annotation    https://survey.pellow.example/traps\n") == 2);
  CHECK(count("   1  Annotation    mailto:warden@pellow.example\n") == 1);
  CHECK(count("   2  Annotation") == 0);
}

TEST_CASE("the footer prints the limitations and the addresses, and the table page holds every plotted row",
          "[outside][complete]") {
  REQUIRE(have_tool("pdftotext"));
  TempDir dir;
  const std::string pdf = render(dir, "page.pdf");
  const auto pages = pdf_lines(pdf);
  REQUIRE(pages.size() == 2);
  auto has_line = [&](std::size_t page, const std::string& text) {
    for (const auto& w : pages[page].words)
      if (w.text == text) return true;
    return false;
  };
  CHECK(has_line(0, "Limitations: Traps were emptied by different volunteers each week."));
  CHECK(has_line(0, "https://survey.pellow.example/traps"));
  CHECK(has_line(0, "mailto:warden@pellow.example"));
  CHECK(has_line(1, "Rows of table 'counts' plotted in panel 'Upper north'"));
  CHECK(has_line(1, "Rows of table 'counts' plotted in panel 'South'"));

  // Every plotted count appears on the table page, in a word of its own,
  // right-aligned: the counts of one table share their right edge.
  const auto words = pdf_words(pdf);
  std::map<std::string, std::vector<double>> right_edges;
  for (const auto& w : words[1].words) right_edges[w.text].push_back(w.x_max);
  for (const char* v : {"14", "6", "17", "21", "8", "9", "11", "12", "4"}) {
    INFO(v);
    CHECK(right_edges.count(v) == 1);
  }
  CHECK(right_edges["14"].front() == Approx(right_edges["21"].front()).margin(0.05));
}

TEST_CASE("the SVG starts with a title and a generated description of the chart", "[outside][complete]") {
  TempDir dir;
  const std::string svg = render(dir, "page.svg");
  // xml.etree: the file is well-formed XML and the root's first children are title, desc.
  auto r = run("/usr/bin/python3 -c \"import sys, xml.etree.ElementTree as E; r = E.parse(sys.argv[1]).getroot(); "
               "k = list(r); print(k[0].tag.split('}')[1]); print(k[0].text); print(k[1].tag.split('}')[1]); "
               "print(k[1].text)\" '" + svg + "'");
  INFO(r.err);
  REQUIRE(r.exit_code == 0);
  CHECK(r.out.find("title\nLight-trap catches rose each week at the upper north site\ndesc\n") == 0);
  // The description says what was drawn: kind, value, series, panels, rows.
  CHECK(r.out.find("Line chart of Caught (insects per trap) by week.") != std::string::npos);
  CHECK(r.out.find("2 series: moth, beetle.") != std::string::npos);
  CHECK(r.out.find("2 panels, on one shared scale.") != std::string::npos);
  CHECK(r.out.find("Panel 'Upper north': 5 rows, Caught (insects per trap) from 6 to 21.") != std::string::npos);
  CHECK(r.out.find("Panel 'South': 4 rows, Caught (insects per trap) from 4 to 12.") != std::string::npos);
}

TEST_CASE("the complete page is byte-reproducible with SOURCE_DATE_EPOCH", "[outside][complete][reproducible]") {
  // reproducible-builds.org SOURCE_DATE_EPOCH: same inputs, same bytes.
  TempDir dir;
  for (const char* ext : {".pdf", ".svg"}) {
    INFO(ext);
    const std::string a = render(dir, std::string("a") + ext), b = render(dir, std::string("b") + ext);
    CHECK(read_file(a) == read_file(b));
  }
}

TEST_CASE("a source link without a scheme is refused where it is written", "[outside][complete]") {
  TempDir dir;
  write_file(dir.file("page.yaml"), "tables: {counts: '" + kDir + "/data/counts.csv'}\n"
                                    "panel: {kind: line, x: week, y: count}\n"
                                    "source-link: survey.pellow.example/traps\n");
  auto r = run_forme("render '" + dir.file("page.yaml") + "' -o '" + dir.file("x.pdf") + "'");
  CHECK(r.exit_code == 1);
  // RFC 3986 §3: a URI begins with its scheme and ':'.
  CHECK(r.err.find(dir.file("page.yaml") + ":3:14: error: 'survey.pellow.example/traps' is not a link a PDF reader "
                   "can follow") == 0);
}

TEST_CASE("a title that holds the word endobj still gives a sound PDF with that title", "[outside][complete]") {
  // Found by page_fuzz: forme's reader took the word inside the title's
  // string for the end of the document information object.
  REQUIRE(have_tool("pdfinfo"));
  TempDir dir;
  write_file(dir.file("t.csv"), "day,value\n2024-01-01,3\n2024-01-02,5\n");
  write_file(dir.file("page.yaml"), "heading: {title: Notes endobj and more}\ntables: {t: t.csv}\n"
                                    "panel: {kind: line, x: day, y: value, y-unit: tonnes}\nsource: test\n");
  const std::string pdf = render(dir, "endobj.pdf", dir.file("page.yaml"));
  auto info = run("pdfinfo '" + pdf + "'");
  REQUIRE(info.exit_code == 0);
  CHECK(info.out.find("Notes endobj and more") != std::string::npos);
  CHECK(info.out.find("CreationDate:") != std::string::npos);
  auto check = run("qpdf --check '" + pdf + "'");
  INFO(check.out << check.err);
  CHECK(check.exit_code == 0);
}
