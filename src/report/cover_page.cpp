#include "report/cover_page.h"

#include "layout/text_items.h"
#include "text/wrap.h"

namespace forme {

DisplayPage cover_page(const std::string& title, const std::vector<std::string>& lines, const ContentsSheet& sheet,
                       const PageStyle& st) {
  DisplayPage page;
  page.width = sheet.width;
  page.height = sheet.height;
  page.title = title;
  const Margins& m = sheet.margins;
  const double measure = sheet.width - m.left - m.right;
  // The title starts a third of the way down the content area, where the eye
  // lands on a cover (common practice), set at twice the page title's size.
  double y = m.top + (sheet.height - m.top - m.bottom) / 3;
  const double size = st.title_size() * 1.6;
  for (auto& line : wrap_text(title, st.fonts.bold, size, measure * 0.8)) {
    y += line.ascent;
    page.add(text_at(line, m.left, y, Align::left, st.ink.text, TextRole::title));
    y += line.descent;
  }
  y += st.base * 2;
  const double sub = st.standfirst_size() * 1.2;
  for (const auto& text : lines)
    for (auto& line : wrap_text(text, st.fonts.regular, sub, measure * 0.8)) {
      y += line.ascent;
      page.add(text_at(line, m.left, y, Align::left, st.ink.muted, TextRole::standfirst));
      y += line.descent + sub * 0.3;
    }
  return page;
}

}  // namespace forme
