// Numbers on the page as the data say, read back by independent tools:
// poppler's pdftotext extracts every number forme printed, and the test
// compares it with the CSV value it came from; pdffonts lists the faces a
// page with negative numbers uses; fontTools reads the bundled faces' minus
// sign. The CSVs here are invented for these tests.
#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <set>
#include <sstream>

#include "support/outside_tools.h"

using namespace forme::test;

namespace {

const std::string kMinus = "\xE2\x88\x92";  // U+2212 MINUS SIGN in UTF-8

// Reads a number as forme writes it: U+2212 for minus, commas between
// thousands, "m×10ⁿ" or "10ⁿ" in superscript digits. NaN if it is not one.
double read_number(const std::string& word) {
  static const std::vector<std::pair<std::string, char>> kSuper = {
      {"⁰", '0'}, {"¹", '1'}, {"²", '2'}, {"³", '3'}, {"⁴", '4'}, {"⁵", '5'},
      {"⁶", '6'}, {"⁷", '7'}, {"⁸", '8'}, {"⁹", '9'}, {"⁻", '-'}};
  std::string s = word;
  bool negative = false;
  if (s.rfind(kMinus, 0) == 0) {
    negative = true;
    s = s.substr(kMinus.size());
  }
  std::string mantissa = "1", power;
  const std::size_t times = s.find("×");
  std::string rest = s;
  if (times != std::string::npos) {
    mantissa = s.substr(0, times);
    rest = s.substr(times + std::string("×").size());
  }
  if (rest.rfind("10", 0) == 0 && rest.size() > 2 && static_cast<unsigned char>(rest[2]) >= 0x80) {
    for (std::size_t i = 2; i < rest.size();) {
      bool found = false;
      for (const auto& [sup, c] : kSuper)
        if (rest.compare(i, sup.size(), sup) == 0) {
          power += c;
          i += sup.size();
          found = true;
          break;
        }
      if (!found) return NAN;
    }
  } else if (times == std::string::npos) {
    mantissa = rest;
  } else {
    return NAN;
  }
  std::erase(mantissa, ',');
  if (mantissa.empty() || mantissa.find_first_not_of("0123456789.") != std::string::npos) return NAN;
  double v = std::stod(mantissa) * (power.empty() ? 1.0 : std::pow(10.0, std::stoi(power)));
  return negative ? -v : v;
}

std::vector<std::string> words_of(const std::string& pdf) {
  std::vector<std::string> out;
  for (const auto& page : pdf_words(pdf))
    for (const auto& w : page.words) out.push_back(w.text);
  return out;
}

struct Rendered {
  TempDir dir;
  std::string pdf;
  std::vector<std::string> words;
};

void render(Rendered& r, const std::string& yaml, const std::vector<std::pair<std::string, std::string>>& csvs) {
  for (const auto& [name, text] : csvs) write_file(r.dir.file(name), text);
  write_file(r.dir.file("page.yaml"), yaml);
  r.pdf = r.dir.file("out.pdf");
  const auto res = run_forme("render '" + r.dir.file("page.yaml") + "' -o '" + r.pdf + "'");
  INFO(res.err);
  REQUIRE(res.exit_code == 0);
  r.words = words_of(r.pdf);
}

}  // namespace

TEST_CASE("the reader parses numbers as forme writes them", "[outside][numbers]") {
  // Worked by hand, so the checks below cannot pass by misreading.
  CHECK(read_number("1,250") == 1250);
  CHECK(read_number(kMinus + "0.67") == -0.67);
  CHECK(read_number("10⁻⁴") == Approx(1e-4));
  CHECK(read_number("7.8×10⁸") == Approx(7.8e8));
  CHECK(std::isnan(read_number("-0.67")));  // a hyphen-minus is not forme's minus
  CHECK(std::isnan(read_number("Basin")));
}

TEST_CASE("a log axis is labelled with exactly its powers of ten", "[outside][numbers][log]") {
  REQUIRE(have_tool("pdftotext"));
  // Invented: a fictional seed bank's spore counts over eleven decades.
  Rendered r;
  render(r,
         "sheet: {size: A5, orientation: landscape, margins: 12mm}\n"
         "heading: {title: Spores per litre}\n"
         "tables: {t: t.csv}\n"
         "panel: {kind: dot, table: t, x: day, y: count, y-scale: log, x-unit: day, y-title: Spores, y-unit: per litre}\n"
         "source: \"Source: invented for this test\"\n",
         {{"t.csv", "day,count\n1,0.0001\n2,0.03\n3,5\n4,870\n5,640000\n6,1000000\n"}});
  std::set<std::string> powers;
  for (const auto& w : r.words)
    if (w.rfind("10", 0) == 0 && w.size() > 2 && static_cast<unsigned char>(w[2]) >= 0x80) powers.insert(w);
  // 10⁻⁴ … 10⁶ thinned to every second decade (at most six labels).
  CHECK(powers == std::set<std::string>{"10⁻⁴", "10⁻²", "10⁰", "10²", "10⁴", "10⁶"});
  for (const auto& w : r.words) CHECK(w.find("0.000") == std::string::npos);  // no padded decimals anywhere
  // The title says "log scale" once, inside the unit's parenthesis.
  const std::string all = [&] {
    std::string s;
    for (const auto& w : r.words) s += w + " ";
    return s;
  }();
  CHECK(all.find("(per litre, log scale)") != std::string::npos);
}

TEST_CASE("negative numbers carry U+2212 from the bundled faces", "[outside][numbers]") {
  REQUIRE(have_tool("pdftotext"));
  // Invented: a fictional canal's monthly water balance, megalitres.
  Rendered r;
  render(r,
         "sheet: {size: A5, orientation: landscape, margins: 12mm}\n"
         "heading: {title: Water balance}\n"
         "tables: {t: t.csv}\n"
         "panel: {kind: line, table: t, x: month, y: balance, x-unit: month, y-unit: megalitres}\n"
         "source: \"Source: invented for this test\"\n",
         {{"t.csv", "month,balance\n1,-0.67\n2,1.48\n3,-2.35\n4,0.05\n"}});
  // The axis runs below zero, so some tick label is negative: each starts
  // with U+2212, and no word is a hyphen-minus before a digit.
  int negatives = 0;
  for (const auto& w : r.words) {
    INFO(w);
    if (w.rfind(kMinus, 0) == 0) {
      ++negatives;
      CHECK(read_number(w) < 0);
    }
    CHECK_FALSE((w.size() > 1 && w[0] == '-' && std::isdigit(static_cast<unsigned char>(w[1]))));
  }
  CHECK(negatives >= 1);
  // The minus comes from the bundled faces: pdffonts lists nothing else.
  REQUIRE(have_tool("pdffonts"));
  const auto fonts = run("pdffonts '" + r.pdf + "'");
  REQUIRE(fonts.exit_code == 0);
  std::istringstream lines(fonts.out);
  std::string line;
  int faces = 0;
  std::getline(lines, line);
  std::getline(lines, line);  // header and rule
  while (std::getline(lines, line)) {
    if (line.empty()) continue;
    ++faces;
    INFO(line);
    CHECK(line.find("+NotoSans-") != std::string::npos);
  }
  CHECK(faces >= 1);
}

TEST_CASE("stacked bar values read back as the CSV holds them", "[outside][numbers]") {
  REQUIRE(have_tool("pdftotext"));
  // Invented: a fictional allotment society's harvest by crop, tonnes. The
  // values are typed with up to three decimals; the axis ticks step by 5 or
  // 10, so values held to the tick step would print 1, 1, 12, 4.
  const char* kCsv =
      "plot,crop,tonnes\n"
      "East,Beans,1.48\nEast,Kale,0.67\nEast,Leeks,12.125\n"
      "West,Beans,3.5\nWest,Kale,2.25\nWest,Leeks,9.875\n";
  Rendered r;
  render(r,
         "sheet: {size: A4, margins: 15mm}\n"
         "heading: {title: Harvest by plot}\n"
         "tables: {t: t.csv}\n"
         "panel: {kind: stacked-bar, table: t, x: plot, y: tonnes, series-by: crop, y-unit: tonnes,"
         " value-labels: true}\n"
         "source: \"Source: invented for this test\"\n",
         {{"t.csv", kCsv}});
  std::multiset<double> printed;
  for (const auto& w : r.words)
    if (double v = read_number(w); !std::isnan(v)) printed.insert(v);
  // Each CSV value, parsed here from the CSV text, is printed exactly.
  std::istringstream rows(kCsv);
  std::string row;
  std::getline(rows, row);  // header
  int values = 0;
  while (std::getline(rows, row)) {
    const double v = std::stod(row.substr(row.rfind(',') + 1));
    INFO(row);
    CHECK(printed.count(v) == 1);
    ++values;
  }
  CHECK(values == 6);
}

TEST_CASE("line values close together keep their digits, and power-of-ten bar values their mantissas",
          "[outside][numbers]") {
  REQUIRE(have_tool("pdftotext"));
  // Invented: two fictional lock gauges; litres passed in three reaches.
  Rendered r;
  render(r,
         "sheet: {size: A4, orientation: landscape, margins: 12mm}\n"
         "heading: {title: Gauges and litres}\n"
         "tables: {g: g.csv, m: m.csv}\n"
         "grid: {columns: 2}\n"
         "panels:\n"
         "  - {kind: line, table: g, x: month, y: height, series-by: lock, y-unit: m, x-unit: month,"
         " value-labels: extremes}\n"
         "  - {kind: horizontal-bar, table: m, x: litres, y: reach, x-unit: litres, x-format: power-of-ten,"
         " value-labels: true}\n"
         "source: \"Source: invented for this test\"\n",
         {{"g.csv", "month,lock,height\n1,Upper,61.0\n2,Upper,61.66\n3,Upper,61.21\n"
                    "1,Tail,1.48\n2,Tail,0.67\n3,Tail,0.9\n"},
          {"m.csv", "reach,litres\nSummit pound,3.4e9\nLong level,1.25e9\nBasin,0.78e9\n"}});
  const std::set<std::string> words(r.words.begin(), r.words.end());
  // The extremes of each lock, each as the CSV holds it (61.0 is 61).
  for (const char* v : {"61", "61.66", "1.48", "0.67"}) {
    INFO(v);
    CHECK(words.count(v) == 1);
  }
  // Each bar value against its own power, mantissa in [1, 10).
  for (const char* v : {"3.4×10⁹", "1.25×10⁹", "7.8×10⁸"}) {
    INFO(v);
    CHECK(words.count(v) == 1);
  }
}

TEST_CASE("the bundled faces' minus sign is a figure wide (fontTools)", "[outside][numbers][fonts]") {
  // fontTools (Debian's python3-fonttools) reads the cmap and hmtx tables.
  TempDir dir;
  write_file(dir.file("q.py"),
             "import sys, glob\n"
             "from fontTools.ttLib import TTFont\n"
             "for path in sorted(glob.glob(sys.argv[1] + '/NotoSans-*.ttf')):\n"
             "    f = TTFont(path); cmap = f.getBestCmap(); hmtx = f['hmtx']\n"
             "    minus = cmap.get(0x2212)\n"
             "    figures = {hmtx[cmap[c]][0] for c in range(0x30, 0x3A)}\n"
             "    glyf = f['glyf'][minus] if minus else None\n"
             "    print(path.split('/')[-1], minus is not None, hmtx[minus][0] if minus else -1, len(figures),\n"
             "          min(figures), glyf.numberOfContours if glyf else 0)\n");
  const auto r = run("/usr/bin/python3 " + dir.file("q.py") + " '" FORME_SOURCE_DIR "/fonts'");
  INFO(r.err);
  REQUIRE(r.exit_code == 0);
  std::istringstream in(r.out);
  std::string name, has;
  int advance = 0, kinds = 0, figure = 0, contours = 0, faces = 0;
  while (in >> name >> has >> advance >> kinds >> figure >> contours) {
    INFO(name);
    ++faces;
    CHECK(has == "True");
    CHECK(kinds == 1);           // the digits are tabular: one width
    CHECK(advance == figure);    // the minus takes a digit's room
    CHECK(contours == 1);        // one bar
  }
  CHECK(faces == 3);
}
