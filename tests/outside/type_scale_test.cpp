// Type sized for the job a page does, read back from what was drawn.
// The ranges are common practice, not a standard:
// - a journal figure sets its text at 7-9 pt at printed size (most
//   journals' artwork instructions ask for about this);
// - a briefing page read at arm's length, 8-11 pt;
// - a report page, labels at least 7 pt;
// - a poster read from 1-2 m, several times print size: at least 18 pt.
// The base-size rule is forme's own: 8 pt at 40 cm, in proportion to the
// reading distance (a constant visual angle). pdftotext -bbox measures the
// drawn text independently of the layout's record: a word's box is the
// font's ascent plus descent, 1.362 em for Noto Sans (hhea 1069 + 293 of
// 1000 units, read with fontTools).
#include <catch2/catch.hpp>

#include <algorithm>
#include <map>

#include "cli/render_job.h"
#include "support/outside_tools.h"
#include "text/font.h"

using namespace forme::test;

namespace {

struct Range {
  double smallest, largest;
};

std::pair<double, double> size_range(const forme::DisplayPage& page) {
  double lo = 1e9, hi = 0;
  for (const auto& item : page.items)
    if (const auto* t = std::get_if<forme::TextItem>(&item)) {
      lo = std::min(lo, t->text.size);
      hi = std::max(hi, t->text.size);
    }
  return {lo, hi};
}

std::string q(const std::string& s) { return "'" + s + "'"; }

}  // namespace

TEST_CASE("each starter's text stays within its job's range, by the layout and by pdftotext", "[outside][type]") {
  const std::map<std::string, Range> ranges = {
      {"figure", {7, 9}}, {"briefing", {8, 11}}, {"report", {7, 24}}, {"poster", {18, 200}}};
  TempDir dir;
  const std::string fonts = forme::find_font_dir(FORME_BINARY);
  for (const auto& [kind, range] : ranges) {
    INFO(kind);
    const std::string folder = dir.file(kind);
    REQUIRE(run_forme("new " + kind + " " + q(folder)).exit_code == 0);
    forme::DiagnosticSink sink;
    const auto page = forme::compose_page(folder + "/page.yaml", fonts, sink);
    auto [lo, hi] = size_range(page);
    CHECK(lo >= range.smallest);
    CHECK(hi <= range.largest);
    REQUIRE(run_forme("render " + q(folder + "/page.yaml") + " -o " + q(folder + "/out.pdf")).exit_code == 0);
    double word_lo = 1e9, word_hi = 0;
    for (const auto& p : pdf_words(folder + "/out.pdf"))
      for (const auto& w : p.words) {
        const double size = (w.y_max - w.y_min) / 1.362;
        word_lo = std::min(word_lo, size);
        word_hi = std::max(word_hi, size);
      }
    CHECK(word_lo >= range.smallest - 0.05);
    CHECK(word_hi <= range.largest + 0.05);
  }
}

TEST_CASE("the reading distance sets the base size, and stated sizes win over the job's", "[outside][type]") {
  TempDir dir;
  write_file(dir.file("t.csv"), "year,count\n2024,12\n2025,15\n2026,19\n");
  auto compose = [&](const std::string& type, const std::string& marks = "") {
    write_file(dir.file("page.yaml"), "sheet: {size: A1}\nheading: {title: Counts rose}\ntables: {t: t.csv}\n"
                                      "panel: {kind: line, table: t, x: year, y: count, y-title: Count, y-unit: nests}\n"
                                      "source: invented for this test\n" + type + marks);
    forme::DiagnosticSink sink;
    return forme::compose_page(dir.file("page.yaml"), forme::find_font_dir(FORME_BINARY), sink);
  };
  auto tick_size = [](const forme::DisplayPage& page) {
    for (const auto& item : page.items)
      if (const auto* t = std::get_if<forme::TextItem>(&item); t && t->role == forme::TextRole::tick_label)
        return t->text.size;
    return 0.0;
  };
  // 8 pt × 200 cm / 40 cm = 40 pt.
  CHECK(tick_size(compose("type: {reading-distance: 200cm}\n")) ==
        Approx(40));
  // Poster: read from 1 m, 20 pt.
  CHECK(tick_size(compose("type: {job: poster}\n")) == Approx(20));
  // Every size stated by the page wins.
  const auto page = compose("type: {job: poster, size: 16pt, title-size: 50pt, note-size: 12pt}\n",
                            "marks: {line-width: 3pt, rule-width: 0.5pt}\n");
  CHECK(tick_size(page) == Approx(16));
  double title = 0, note = 0, widest_stroke = 0;
  for (const auto& item : page.items) {
    if (const auto* t = std::get_if<forme::TextItem>(&item)) {
      if (t->role == forme::TextRole::title) title = t->text.size;
      if (t->role == forme::TextRole::source) note = t->text.size;
    }
    if (const auto* p = std::get_if<forme::PathItem>(&item); p && p->stroke)
      widest_stroke = std::max(widest_stroke, p->stroke->width);
  }
  CHECK(title == Approx(50));
  CHECK(note == Approx(12));
  CHECK(widest_stroke == Approx(3));
}
