// Text is real text at the place layout put it: poppler's pdftotext -bbox
// finds the title, axis titles and every tick label as words, and their
// boxes agree with the layout's own record within 0.5 pt.
#include <catch2/catch.hpp>

#include <cmath>

#include "cli/render_job.h"
#include "support/outside_tools.h"
#include "text/font.h"

using namespace forme::test;

namespace {

// The first word of a text item, and where layout put its left edge.
std::string first_word(const std::string& s) { return s.substr(0, s.find(' ')); }

}  // namespace

TEST_CASE("pdftotext finds title, axis titles and tick labels where layout placed them", "[outside][text]") {
  REQUIRE(have_tool("pdftotext"));
  const std::string page = std::string(FORME_SOURCE_DIR) + "/layouts/reservoirs/page.yaml";
  forme::DiagnosticSink sink;
  auto composed = forme::compose_page(page, forme::find_font_dir(FORME_BINARY), sink);
  TempDir dir;
  auto r = run_forme("render '" + page + "' -o " + dir.file("p.pdf"));
  REQUIRE(r.exit_code == 0);
  auto pages = pdf_words(dir.file("p.pdf"));
  REQUIRE(pages.size() == 1);
  const auto& words = pages[0].words;

  int checked = 0;
  for (const auto& item : composed.items) {
    const auto* t = std::get_if<forme::TextItem>(&item);
    if (!t) continue;
    using forme::TextRole;
    if (t->role != TextRole::title && t->role != TextRole::axis_title && t->role != TextRole::tick_label) continue;
    const std::string w = first_word(t->text.utf8);
    const forme::Rect box = t->box();
    // The word whose left edge is nearest the item's left edge.
    const PdfWord* best = nullptr;
    double best_d = 1e9;
    for (const auto& pw : words)
      if (pw.text == w) {
        double d = std::hypot(pw.x_min - box.x, pw.y_min - box.y);
        if (d < best_d) best_d = d, best = &pw;
      }
    INFO("text '" << t->text.utf8 << "' laid out at " << box.x << "," << box.y);
    REQUIRE(best != nullptr);
    CHECK(best->x_min == Approx(box.x).margin(0.5));
    CHECK(best->y_min == Approx(box.y).margin(0.5));
    CHECK(best->y_max == Approx(box.bottom()).margin(0.5));
    if (w == t->text.utf8) CHECK(best->x_max == Approx(box.right()).margin(0.5));
    ++checked;
  }
  // Title, the two y axis titles, and every tick label of the demo page: six
  // values on each labelled axis, and every second month under each bottom
  // panel, since twelve do not fit at the job's sizes (33 when this was
  // written; a regression floor, not a standard).
  CHECK(checked >= 30);
}
