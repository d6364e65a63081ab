#include "report/contents_page.h"

#include <algorithm>
#include <cmath>

#include "layout/text_items.h"
#include "text/shaped_text.h"

namespace forme {

namespace {

struct Geometry {
  double left, right, top;  ///< content edges, points
  double title_baseline;    ///< baseline of the heading
  double first_row;         ///< baseline of the first row
  double pitch;             ///< baseline to baseline
  std::size_t rows_per_page;
};

Geometry geometry(const ContentsSheet& sheet, const PageStyle& st) {
  Geometry g;
  const Margins& m = sheet.margins;
  g.left = m.left;
  g.right = sheet.width - m.right;
  g.top = m.top;
  const double title = st.title_size();
  g.title_baseline = g.top + st.fonts.bold->ascent_em() * title;
  // A row and a half of white between rows of the contents: loose enough
  // for the eye to follow each to its number (common practice).
  g.pitch = PageStyle::line_height(st.fonts.regular, st.label_size() * 1.1) * 1.5;
  g.first_row = g.title_baseline + st.fonts.bold->descent_em() * title + st.base * 2 +
                st.fonts.regular->ascent_em() * st.label_size() * 1.1;
  const double room = sheet.height - m.bottom - g.first_row;
  g.rows_per_page = std::max<std::size_t>(1, static_cast<std::size_t>(std::floor(room / g.pitch)) + 1);
  return g;
}

}  // namespace

std::size_t contents_page_count(std::size_t rows, const ContentsSheet& sheet, const PageStyle& st) {
  const std::size_t per = geometry(sheet, st).rows_per_page;
  return std::max<std::size_t>(1, (rows + per - 1) / per);
}

std::vector<DisplayPage> contents_pages(const std::string& title, const std::vector<ContentsRow>& rows,
                                        const ContentsSheet& sheet, const PageStyle& st) {
  const Geometry g = geometry(sheet, st);
  const std::size_t count = contents_page_count(rows.size(), sheet, st);
  const double size = st.label_size() * 1.1;
  const double indent = size * 1.5;
  ShapeOptions figures;
  figures.tabular_figures = true;
  std::vector<DisplayPage> pages;
  for (std::size_t p = 0; p < count; ++p) {
    DisplayPage page;
    page.width = sheet.width;
    page.height = sheet.height;
    page.title = title;
    page.add(text_at(shape_text(title, st.fonts.bold, st.title_size()), g.left, g.title_baseline, Align::left,
                     st.ink.text, TextRole::title));
    const std::size_t first = p * g.rows_per_page, last = std::min(rows.size(), first + g.rows_per_page);
    for (std::size_t i = first; i < last; ++i) {
      const ContentsRow& row = rows[i];
      const double baseline = g.first_row + static_cast<double>(i - first) * g.pitch;
      const FontRef& font = row.section ? st.fonts.bold : st.fonts.regular;
      ShapedText number = shape_text(std::to_string(row.page), font, size, figures);
      const double number_left = g.right - number.width;
      const double x = g.left + (row.section ? 0 : indent);
      ShapedText text = shape_text(row.title, font, size);
      const double text_right = x + text.width;
      page.add(text_at(std::move(text), x, baseline, Align::left, st.ink.text,
                       row.section ? TextRole::panel_title : TextRole::note));
      page.add(text_at(std::move(number), g.right, baseline, Align::right, st.ink.text, TextRole::note));
      // A dotted leader from the title to its number guides the eye across.
      const double gap = size * 0.6;
      if (number_left - gap - (text_right + gap) > size * 2) {
        Stroke dots{st.ink.muted, st.rule_width() * 2, {0.01, size * 0.45}, true};
        page.add(PathItem{{{text_right + gap, baseline}, {number_left - gap, baseline}}, false, std::nullopt, dots, std::nullopt, ShapeRole::furniture, {}});
      }
    }
    pages.push_back(std::move(page));
  }
  return pages;
}

}  // namespace forme
