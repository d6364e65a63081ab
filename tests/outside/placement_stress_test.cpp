// Label placement on crowded pages (tests/pages/stress/place-*): line ends
// within three units, bar values either side of zero under a reference
// line and a callout, bars far too narrow for their values, and three
// hundred named points with a trend line. Independent readers judge the
// PDF: poppler's pdftotext -bbox gives every word's box (no two may
// overlap, and the numbers printed are compared with the CSV), and the
// outside audit (../shared/tools/page_audit.py: poppler, mupdf and
// Ghostscript) must find no collision, nothing off the trim and no text
// over a mark. What forme leaves out it must say, at the row or key.
#include <catch2/catch.hpp>

#include <cmath>
#include <fstream>
#include <regex>
#include <set>
#include <string>
#include <vector>

#include "support/outside_tools.h"

using namespace forme::test;

namespace {

const std::string kStress = std::string(FORME_SOURCE_DIR) + "/tests/pages/stress/";
const std::vector<std::string> kPages = {"place-line-ends", "place-bar-values", "place-narrow-bars", "place-scatter"};

// The last field of each data row of a CSV, as a number.
std::vector<double> last_column(const std::string& path) {
  std::ifstream in(path);
  std::string line;
  std::getline(in, line);
  std::vector<double> out;
  while (std::getline(in, line)) out.push_back(std::stod(line.substr(line.rfind(',') + 1)));
  return out;
}

// A printed number read back: group commas dropped, U+2212 as a minus.
bool as_number(std::string s, double& v) {
  for (auto at = s.find("\u2212"); at != std::string::npos; at = s.find("\u2212")) s.replace(at, 3, "-");
  s.erase(std::remove(s.begin(), s.end(), ','), s.end());
  static const std::regex number("-?[0-9]+(\\.[0-9]+)?");
  if (!std::regex_match(s, number)) return false;
  v = std::stod(s);
  return true;
}

std::vector<double> printed_numbers(const std::vector<PdfWord>& words) {
  std::vector<double> out;
  for (const auto& w : words)
    if (double v; as_number(w.text, v)) out.push_back(v);
  return out;
}

bool printed(const std::vector<double>& numbers, double v, double within) {
  return std::any_of(numbers.begin(), numbers.end(), [&](double p) { return std::abs(p - v) <= within; });
}

std::size_t count(const std::string& text, const std::string& what) {
  std::size_t n = 0;
  for (auto at = text.find(what); at != std::string::npos; at = text.find(what, at + 1)) ++n;
  return n;
}

}  // namespace

TEST_CASE("placement stress pages: no two words overlap and the outside audit finds nothing", "[outside][placement]") {
  REQUIRE(have_tool("pdftotext"));
  for (const auto& name : kPages) {
    INFO("page " << name);
    TempDir dir;
    const std::string pdf = dir.file("p.pdf");
    auto r = run_forme("render '" + kStress + name + "/page.yaml' -o " + pdf);
    INFO(r.err);
    REQUIRE(r.exit_code == 0);
    const auto pages = pdf_words(pdf);
    REQUIRE(pages.size() == 1);
    CHECK(overlapping_words(pages[0].words) == std::vector<std::string>{});
    auto a = run("/usr/bin/python3 '" + std::string(FORME_SOURCE_DIR) + "/../shared/tools/page_audit.py' " + pdf);
    INFO(a.out << a.err);
    CHECK(a.out.find("collisions=0 off_page=0 over_marks=0") != std::string::npos);
  }
}

TEST_CASE("crowded line ends: every series' last value is printed, as the CSV holds it", "[outside][placement]") {
  REQUIRE(have_tool("pdftotext"));
  TempDir dir;
  const std::string pdf = dir.file("p.pdf");
  REQUIRE(run_forme("render '" + kStress + "place-line-ends/page.yaml' -o " + pdf).exit_code == 0);
  const auto numbers = printed_numbers(pdf_words(pdf).at(0).words);
  // 14 years per crossing in the CSV; the last of each block is its end.
  const auto v = last_column(kStress + "place-line-ends/data/crossings.csv");
  REQUIRE(v.size() == 8 * 14);
  for (std::size_t k = 13; k < v.size(); k += 14) {
    INFO("last value " << v[k]);
    CHECK(printed(numbers, v[k], 0.005));
  }
}

TEST_CASE("bar values either side of zero: each printed as the CSV holds it, or forme says why not",
          "[outside][placement]") {
  REQUIRE(have_tool("pdftotext"));
  TempDir dir;
  const std::string pdf = dir.file("p.pdf");
  auto r = run_forme("render '" + kStress + "place-bar-values/page.yaml' -o " + pdf);
  REQUIRE(r.exit_code == 0);
  const auto words = pdf_words(pdf).at(0).words;
  const auto numbers = printed_numbers(words);
  for (double v : last_column(kStress + "place-bar-values/data/surplus.csv")) {
    INFO("value " << v << "\n" << r.err);
    CHECK((printed(numbers, v, 0.005) || r.err.find("left out") != std::string::npos));
  }
  // The reference label is on the page, or a located warning says it is not.
  std::string all;
  for (const auto& w : words) all += w.text + " ";
  const bool drawn = all.find("Target surplus set by the trustees") != std::string::npos;
  const bool said = r.err.find("page.yaml:14:16: warning: the label 'Target surplus set by the trustees' is left out") !=
                    std::string::npos;
  CHECK(drawn != said);
  CHECK(all.find("The new quay opened") != std::string::npos);  // the callout found room clear of the bars
}

TEST_CASE("bars too narrow for their values: none is printed, and each panel says so once at the key",
          "[outside][placement]") {
  REQUIRE(have_tool("pdftotext"));
  TempDir dir;
  const std::string pdf = dir.file("p.pdf");
  auto r = run_forme("render '" + kStress + "place-narrow-bars/page.yaml' -o " + pdf);
  REQUIRE(r.exit_code == 0);
  const auto numbers = printed_numbers(pdf_words(pdf).at(0).words);
  for (double v : last_column(kStress + "place-narrow-bars/data/parcels.csv")) {
    INFO("value " << v);
    CHECK_FALSE(printed(numbers, v, 0.5));
  }
  // Six panels, one warning each, at the value-labels key (line 8, col 93).
  CHECK(count(r.err, "page.yaml:8:93: warning: value labels left out") == 6);
}

TEST_CASE("three hundred named points: each name is printed or reported at its CSV row", "[outside][placement]") {
  REQUIRE(have_tool("pdftotext"));
  TempDir dir;
  const std::string pdf = dir.file("p.pdf");
  auto r = run_forme("render '" + kStress + "place-scatter/page.yaml' -o " + pdf);
  REQUIRE(r.exit_code == 0);
  const auto pages = pdf_words(pdf);
  std::multiset<std::string> words;
  for (const auto& w : pages.at(0).words) words.insert(w.text);
  int shown = 0, reported = 0;
  for (int i = 1; i <= 300; ++i) {
    // "Allotment N" is on CSV line N + 1; pdftotext reads it as two words.
    const std::string row = "data/allotments.csv:" + std::to_string(i + 1) + ":1: warning: point name 'Allotment " +
                            std::to_string(i) + "' left out";
    const bool said = r.err.find(row) != std::string::npos;
    reported += said ? 1 : 0;
    shown += said ? 0 : 1;
  }
  CHECK(static_cast<int>(words.count("Allotment")) == shown);
  CHECK(shown + reported == 300);
  CHECK(shown >= 60);  // a fair share still finds room clear of every dot and the trend line
}
