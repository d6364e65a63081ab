// Text beyond Latin in the data: Greek and Cyrillic from the bundled Noto
// Sans, Hebrew, Arabic and Chinese from installed fonts found through
// fontconfig, right-to-left names ordered by the Unicode Bidirectional
// Algorithm (UAX #9). Checked by independent readers:
// - poppler's pdftotext returns each name in logical (typed) order;
// - poppler's pdffonts lists the fallback families, embedded;
// - no glyph in the shaping result is glyph 0, .notdef (OpenType spec,
//   "Glyph 0: the .notdef glyph");
// - a character no font has is a located warning.
// The place names are invented.
#include <catch2/catch.hpp>

#include <set>
#include <sstream>

#include "cli/render_job.h"
#include "support/outside_tools.h"
#include "text/font.h"

using namespace forme::test;

namespace {

const std::vector<std::string> kNames = {
    "Λιμνοχώρι",      // Greek
    "Березовка",      // Cyrillic
    "כפר הדקל",       // Hebrew, right to left
    "وادي النخيل",    // Arabic, right to left and joined
    "青河镇",          // Chinese
    "Eastmere",       // Latin
};

std::string table_csv(const std::vector<std::string>& names) {
  std::string csv = "town,visitors\n";
  int v = 120;
  for (const auto& n : names) csv += "\"" + n + "\"," + std::to_string(v += 35) + "\n";
  return csv;
}

const char* kPage =
    "sheet: {size: A5, margins: 12mm}\n"
    "heading: {title: Visitors by town}\n"
    "tables: {t: t.csv}\n"
    "panel: {kind: horizontal-bar, table: t, x: visitors, y: town, x-title: Visitors, x-unit: people}\n"
    "source: \"Source: invented for this test\"\n";

}  // namespace

TEST_CASE("names in six scripts come back from pdftotext in logical order, from embedded fallback fonts",
          "[outside][scripts]") {
  REQUIRE(have_tool("pdftotext"));
  REQUIRE(have_tool("pdffonts"));
  TempDir dir;
  write_file(dir.file("t.csv"), table_csv(kNames));
  write_file(dir.file("page.yaml"), kPage);
  auto r = run_forme("render " + dir.file("page.yaml") + " -o " + dir.file("out.pdf"));
  INFO(r.err);
  REQUIRE(r.exit_code == 0);
  CHECK(r.err.empty());  // no character was left without a font

  auto text = run("pdftotext '" + dir.file("out.pdf") + "' -");
  REQUIRE(text.exit_code == 0);
  // poppler wraps a right-to-left line in embedding marks (U+202B ... U+202C,
  // UTF-8 E2 80 AB / E2 80 AC); the text between them is what is compared.
  std::string plain = text.out;
  for (const std::string mark : {"\u202B", "\u202C"})
    for (auto at = plain.find(mark); at != std::string::npos; at = plain.find(mark)) plain.erase(at, mark.size());
  INFO(plain);
  for (const auto& n : kNames) {
    INFO(n);
    CHECK(plain.find(n) != std::string::npos);
  }
  // Embedded fallback families: Noto Sans Hebrew, Noto Sans Arabic (or
  // Noto Naskh/Kufi Arabic), Noto Sans CJK; all embedded as subsets.
  auto fonts = run("pdffonts '" + dir.file("out.pdf") + "'");
  INFO(fonts.out);
  CHECK(fonts.out.find("Hebrew") != std::string::npos);
  CHECK(fonts.out.find("Arabic") != std::string::npos);
  CHECK(fonts.out.find("CJK") != std::string::npos);
  std::istringstream rows(fonts.out);
  std::string row;
  std::getline(rows, row);
  std::getline(rows, row);
  while (std::getline(rows, row))
    if (!row.empty()) CHECK(row.find(" yes yes ") != std::string::npos);
}

TEST_CASE("no glyph of a mixed-script page is .notdef, and right-to-left runs are set right to left",
          "[outside][scripts]") {
  TempDir dir;
  write_file(dir.file("t.csv"), table_csv(kNames));
  write_file(dir.file("page.yaml"), kPage);
  forme::DiagnosticSink sink;
  const auto doc = forme::compose_document(dir.file("page.yaml"), forme::find_font_dir(FORME_BINARY), sink);
  std::set<std::string> families;
  int found = 0;
  for (const auto& item : doc.pages.front().items) {
    const auto* t = std::get_if<forme::TextItem>(&item);
    if (!t) continue;
    for (const auto& g : t->text.glyphs) CHECK(g.index != 0);
    CHECK(t->text.missing.empty());
    for (const auto& run : t->text.runs) families.insert(run.font->family());
    if (t->text.utf8 == "כפר הדקל") {
      ++found;
      // Visual order: the first word's glyphs (its bytes come first) sit
      // to the right of the second word's.
      REQUIRE(!t->text.glyphs.empty());
      CHECK(t->text.rtl);
      CHECK(t->text.glyphs.front().cluster > t->text.glyphs.back().cluster);
    }
  }
  CHECK(found == 1);
  INFO(families.size());
  CHECK(families.count("Noto Sans") == 1);
  CHECK(families.size() >= 4);  // Noto Sans + Hebrew + Arabic + CJK families
}

TEST_CASE("a character no installed font has is a warning located in the table", "[outside][scripts]") {
  TempDir dir;
  // U+0378 is unassigned in Unicode: no font maps it.
  write_file(dir.file("t.csv"), table_csv({"Eastmere", "Westmere\xCD\xB8"}));
  write_file(dir.file("page.yaml"), kPage);
  auto r = run_forme("render " + dir.file("page.yaml") + " -o " + dir.file("out.pdf"));
  CHECK(r.exit_code == 0);
  INFO(r.err);
  CHECK(r.err.find("t.csv:3:10: warning: no installed font can draw U+0378") != std::string::npos);
}
