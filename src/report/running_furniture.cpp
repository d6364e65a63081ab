#include "report/running_furniture.h"

#include "layout/text_items.h"
#include "text/shaped_text.h"

namespace forme {

std::string page_n_of_m(std::size_t page, std::size_t pages) {
  return "page " + std::to_string(page) + " of " + std::to_string(pages);
}

namespace {

// One line across the content width: `left` at the content's left edge,
// `right` ending at its right edge, both on `baseline`.
void set_line(DisplayPage& page, const Rect& content, double baseline, const std::string& left, const std::string& right,
              const PageStyle& st) {
  const double size = st.note_size();
  const double x0 = content.x, x1 = content.right();
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

Rect trimmed(const DisplayPage& page) { return page.trim_box.value_or(Rect{0, 0, page.width, page.height}); }

Rect content_box(const DisplayPage& page, const Margins& m) {
  const Rect t = trimmed(page);
  return {t.x + m.left, t.y + m.top, t.w - m.left - m.right, t.h - m.top - m.bottom};
}

double running_text_height(const PageStyle& st) {
  const double size = st.note_size();
  return (st.fonts.regular->ascent_em() - st.fonts.regular->descent_em()) * size;
}

void add_running_text(DisplayPage& page, const Margins& m, const RunningText& text, const PageStyle& st) {
  const double size = st.note_size();
  const double asc = st.fonts.regular->ascent_em() * size, desc = st.fonts.regular->descent_em() * size;
  // Centred in each margin of the trimmed page (the text's box, ascender to
  // descender): the trim box, not the sheet, once the page sits on a press
  // sheet with bleed and marks around it.
  const Rect trim = trimmed(page), content = content_box(page, m);
  const double head = trim.y + m.top / 2 + (asc - desc) / 2;
  const double foot = trim.bottom() - m.bottom / 2 + (asc - desc) / 2;
  if (!text.head.empty() || !text.section.empty()) set_line(page, content, head, text.head, text.section, st);
  set_line(page, content, foot, text.foot, page_n_of_m(text.page, text.pages), st);
}

}  // namespace forme
