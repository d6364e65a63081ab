#include "report/running_furniture.h"

#include "layout/text_items.h"
#include "text/shaped_text.h"

namespace forme {

std::string page_n_of_m(std::size_t page, std::size_t pages) {
  return "page " + std::to_string(page) + " of " + std::to_string(pages);
}

namespace {

// One line across the content width: `left` at the left margin, `right`
// ending at the right margin, both on `baseline`.
void set_line(DisplayPage& page, const Margins& m, double baseline, const std::string& left, const std::string& right,
              const PageStyle& st) {
  const double size = st.note_size();
  const double x0 = m.left, x1 = page.width - m.right;
  ShapeOptions figures;
  figures.tabular_figures = true;
  ShapedText r = shape_text(right, st.fonts.regular, size, figures);
  const double gap = size * 2;
  if (!left.empty()) {
    ShapedText l = shape_text(left, st.fonts.regular, size);
    if (l.width + gap + (right.empty() ? 0 : r.width) <= x1 - x0)
      page.add(text_at(std::move(l), x0, baseline, Align::left, st.ink.muted, TextRole::note));
  }
  if (!right.empty()) page.add(text_at(std::move(r), x1, baseline, Align::right, st.ink.muted, TextRole::note));
}

}  // namespace

void add_running_text(DisplayPage& page, const Margins& m, const RunningText& text, const PageStyle& st) {
  const double size = st.note_size();
  const double asc = st.fonts.regular->ascent_em() * size, desc = st.fonts.regular->descent_em() * size;
  // Centred in each margin (the text's box, ascender to descender).
  const double head = m.top / 2 + (asc - desc) / 2;
  const double foot = page.height - m.bottom / 2 + (asc - desc) / 2;
  if (!text.head.empty() || !text.section.empty()) set_line(page, m, head, text.head, text.section, st);
  set_line(page, m, foot, text.foot, page_n_of_m(text.page, text.pages), st);
}

}  // namespace forme
