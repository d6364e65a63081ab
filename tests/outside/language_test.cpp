// A page's language and right-to-left text, read back by independent tools:
//  - qpdf --json reads the catalog's /Lang (ISO 32000-1 §14.9.2.1: the
//    natural language of the document, a BCP 47 tag as a text string);
//  - poppler's pdftotext and mupdf's `mutool draw -F txt` extract the
//    Hebrew and Arabic names in logical order (the order they are typed in,
//    Unicode §2.2 "Logical Order"), which is how the CSV holds them;
//  - pdftotext -bbox gives the glyph boxes of "ירושלים leads the list…"
//    on an en-GB page: left to right (UAX #9 HL1: the language states the
//    paragraph direction), so the Hebrew name is the leftmost word and
//    "leads" follows it;
//  - a tag of the wrong shape (RFC 5646 §2.1) is a located error and no
//    file is written.
#include <catch2/catch.hpp>

#include <algorithm>
#include <filesystem>
#include <string>

#include "support/outside_tools.h"

using namespace forme::test;

namespace {

const std::string kDir = std::string(FORME_SOURCE_DIR) + "/tests/pages/stress/language-mixed";

std::string render(const TempDir& dir, const std::string& name, const std::string& page = kDir + "/page.yaml") {
  const auto r = run_forme("render " + page + " -o " + dir.file(name));
  INFO(r.err);
  REQUIRE(r.exit_code == 0);
  return dir.file(name);
}

// The branch names as the CSV holds them (logical order).
std::vector<std::string> branch_names() {
  std::vector<std::string> names;
  const std::string csv = read_file(kDir + "/data/visits.csv");
  std::size_t at = csv.find('\n') + 1;
  while (at < csv.size()) {
    const std::size_t end = csv.find('\n', at);
    const std::string line = csv.substr(at, end - at);
    if (!line.empty()) names.push_back(line.substr(0, line.find(',')));
    if (end == std::string::npos) break;
    at = end + 1;
  }
  return names;
}

// Extracted text with Arabic presentation forms folded back to their
// letters (Unicode compatibility decomposition, NFKC, done by Python's
// unicodedata) and poppler's embedding marks (U+202B, U+202C) dropped.
std::string normalised(const std::string& text_file) {
  const auto r = run("/usr/bin/python3 -c \"import sys, unicodedata; t = open(sys.argv[1], encoding='utf-8').read(); "
                     "t = unicodedata.normalize('NFKC', t).replace('\\u202b', '').replace('\\u202c', ''); "
                     "print(' '.join(t.split()))\" '" + text_file + "'");
  REQUIRE(r.exit_code == 0);
  return r.out;
}

bool one_word(const std::string& s) { return s.find(' ') == std::string::npos; }

}  // namespace

TEST_CASE("the page's language is the PDF catalog's /Lang", "[outside][language]") {
  REQUIRE(have_tool("qpdf"));
  TempDir dir;
  const std::string pdf = render(dir, "page.pdf");
  // qpdf 11's JSON (version 2): objects under qpdf[1], each {"value": …}; strings as "u:…".
  const auto r = run("qpdf --json --json-key=qpdf '" + pdf + "' | /usr/bin/python3 -c \"import json, sys; "
                     "o = json.load(sys.stdin)['qpdf'][1]; "
                     "print([v['value'].get('/Lang') for v in o.values() if isinstance(v, dict) and "
                     "isinstance(v.get('value'), dict) and v['value'].get('/Type') == '/Catalog'])\"");
  INFO(r.err);
  REQUIRE(r.exit_code == 0);
  CHECK(r.out == "['u:en-GB']\n");
}

TEST_CASE("right-to-left names are extracted in logical order by poppler and mupdf", "[outside][language]") {
  REQUIRE(have_tool("pdftotext"));
  REQUIRE(have_tool("mutool"));
  TempDir dir;
  const std::string pdf = render(dir, "page.pdf");
  REQUIRE(run("pdftotext '" + pdf + "' '" + dir.file("poppler.txt") + "'").exit_code == 0);
  REQUIRE(run("mutool draw -F txt -o '" + dir.file("mupdf.txt") + "' '" + pdf + "' 2>/dev/null").exit_code == 0);
  const std::string poppler = normalised(dir.file("poppler.txt")), mupdf = normalised(dir.file("mupdf.txt"));
  for (const std::string& name : branch_names()) {
    INFO(name);
    CHECK(poppler.find(name) != std::string::npos);
    // mupdf 1.21 sets the words of a several-word right-to-left run in
    // visual order (measured); single words it reads as written.
    if (one_word(name)) CHECK(mupdf.find(name) != std::string::npos);
  }
  // The title on its line, Hebrew name first, as written.
  CHECK(mupdf.find("\u05D9\u05E8\u05D5\u05E9\u05DC\u05D9\u05DD leads the list of branch reading rooms") != std::string::npos);
}

TEST_CASE("a Hebrew name leading an English title on an en-GB page is set left to right", "[outside][language]") {
  REQUIRE(have_tool("pdftotext"));
  TempDir dir;
  const std::string pdf = render(dir, "page.pdf");
  const auto pages = pdf_words(pdf);
  REQUIRE(!pages.empty());
  // The title's line: the words with the baseline of "leads".
  const auto& words = pages[0].words;
  auto leads = std::find_if(words.begin(), words.end(), [](const PdfWord& w) { return w.text == "leads"; });
  auto rooms = std::find_if(words.begin(), words.end(), [](const PdfWord& w) { return w.text == "rooms"; });
  REQUIRE(leads != words.end());
  REQUIRE(rooms != words.end());
  double hebrew_right = -1, hebrew_left = 1e9;
  for (const auto& w : words) {
    if (std::abs(w.y_max - leads->y_max) > 1) continue;
    const unsigned char c0 = static_cast<unsigned char>(w.text[0]);
    if (c0 == 0xD7) {  // UTF-8 lead byte of U+05C0-U+05FF: Hebrew letters
      hebrew_right = std::max(hebrew_right, w.x_max);
      hebrew_left = std::min(hebrew_left, w.x_min);
    }
  }
  REQUIRE(hebrew_right > 0);
  CHECK(hebrew_right <= leads->x_min);         // the name comes before "leads" on the line
  CHECK(leads->x_max < rooms->x_min);          // and the English runs on to the right
  CHECK(hebrew_left < leads->x_min - 30);      // a whole word's width, not a stray letter
}

TEST_CASE("a right-to-left page language sets a mixed line right to left", "[outside][language]") {
  REQUIRE(have_tool("pdftotext"));
  TempDir dir;
  std::filesystem::copy(kDir + "/data", dir.file("data"));
  std::string page = read_file(kDir + "/page.yaml");
  page.replace(page.find("language: en-GB"), 15, "language: he");
  write_file(dir.file("page.yaml"), page);
  const std::string pdf = render(dir, "page.pdf", dir.file("page.yaml"));
  const auto words = pdf_words(pdf)[0].words;
  auto leads = std::find_if(words.begin(), words.end(), [](const PdfWord& w) { return w.text == "leads"; });
  REQUIRE(leads != words.end());
  for (const auto& w : words)
    if (std::abs(w.y_max - leads->y_max) <= 1 && static_cast<unsigned char>(w.text[0]) == 0xD7)
      CHECK(w.x_min >= leads->x_max);  // UAX #9: in a right-to-left paragraph the Hebrew name is at the right
}

TEST_CASE("a language tag of the wrong shape is a located error and writes nothing", "[outside][language]") {
  TempDir dir;
  std::filesystem::copy(kDir + "/data", dir.file("data"));
  std::string page = read_file(kDir + "/page.yaml");
  page.replace(page.find("language: en-GB"), 15, "language: en_GB");
  write_file(dir.file("page.yaml"), page);
  const auto r = run_forme("render " + dir.file("page.yaml") + " -o " + dir.file("out.pdf"));
  CHECK(r.exit_code != 0);
  CHECK(r.err.find(dir.file("page.yaml") + ":4:11: error: 'en_GB' is not a language tag") != std::string::npos);
  CHECK(r.err.find("hint: write a BCP 47 tag") != std::string::npos);
  CHECK_FALSE(std::filesystem::exists(dir.file("out.pdf")));
}

TEST_CASE("a report's language is its PDF's /Lang, and a bad one is located in the report", "[outside][language]") {
  REQUIRE(have_tool("qpdf"));
  TempDir dir;
  const std::string src = std::string(FORME_SOURCE_DIR) + "/layouts/monthly-report";
  std::filesystem::copy(src, dir.file("report"), std::filesystem::copy_options::recursive);
  const std::string report = dir.file("report/report.yaml");
  std::string text = read_file(report);
  const std::size_t line2 = text.find('\n', text.find('\n') + 1) + 1;  // after the two comment lines
  text.insert(line2, "language: en-GB\n");
  write_file(report, text);
  auto r = run_forme("render " + report + " -o " + dir.file("report.pdf"));
  INFO(r.err);
  REQUIRE(r.exit_code == 0);
  // ISO 32000-1 §14.9.2.1, read by qpdf 11's JSON (version 2).
  const auto j = run("qpdf --json --json-key=qpdf '" + dir.file("report.pdf") + "' | /usr/bin/python3 -c \"import json, sys; "
                     "o = json.load(sys.stdin)['qpdf'][1]; "
                     "print([v['value'].get('/Lang') for v in o.values() if isinstance(v, dict) and "
                     "isinstance(v.get('value'), dict) and v['value'].get('/Type') == '/Catalog'])\"");
  REQUIRE(j.exit_code == 0);
  CHECK(j.out == "['u:en-GB']\n");

  text.replace(text.find("language: en-GB"), 15, "language: en-GB-");
  write_file(report, text);
  r = run_forme("render " + report + " -o " + dir.file("bad.pdf"));
  CHECK(r.exit_code != 0);
  CHECK(r.err.find(report + ":3:11: error: 'en-GB-' is not a language tag") != std::string::npos);
  CHECK_FALSE(std::filesystem::exists(dir.file("bad.pdf")));
}
