#include "layout/data_table_page.h"

#include <algorithm>

#include "layout/text_items.h"
#include "text/shaped_text.h"
#include "text/wrap.h"

namespace forme {

namespace {

struct ShapedTable {
  ShapedText heading;
  std::vector<ShapedText> header;
  std::vector<std::vector<ShapedText>> rows;
  std::vector<double> widths;  ///< per column
  std::vector<bool> numeric;
  double width = 0;
};

ShapedTable shape_table(const PlottedRows& t, const PageStyle& st, double gap) {
  ShapedTable s;
  const double size = st.note_size();
  s.heading = shape_text(t.description, st.fonts.bold, size);
  s.numeric = t.numeric;
  s.widths.assign(t.columns.size(), 0);
  for (std::size_t c = 0; c < t.columns.size(); ++c) {
    s.header.push_back(shape_text(t.columns[c], st.fonts.bold, size));
    s.widths[c] = s.header.back().width;
  }
  ShapeOptions figures;
  figures.tabular_figures = true;
  for (const auto& row : t.cells) {
    auto& shaped = s.rows.emplace_back();
    for (std::size_t c = 0; c < row.size(); ++c) {
      shaped.push_back(shape_text(row[c], st.fonts.regular, size, t.numeric[c] ? figures : ShapeOptions{}));
      s.widths[c] = std::max(s.widths[c], shaped.back().width);
    }
  }
  for (double w : s.widths) s.width += w;
  s.width += gap * static_cast<double>(s.widths.empty() ? 0 : s.widths.size() - 1);
  return s;
}

// Lines go top to bottom in flow columns, flow columns across the sheet,
// and on to a new page when the last column is full.
class Flow {
 public:
  Flow(const PageSpec& spec, const PageStyle& st, double column_width, double gap)
      : spec_(spec), st_(st), column_w_(column_width), gap_(gap) {
    const Margins& m = spec.sheet.margins;
    content_ = {m.left, m.top, spec.sheet.width - m.left - m.right, spec.sheet.height - m.top - m.bottom};
    columns_ = std::max(1, static_cast<int>((content_.w + gap_) / (column_w_ + gap_)));
    line_ = PageStyle::line_height(st.fonts.regular, st.note_size());
  }

  double line() const { return line_; }
  double x() const { return content_.x + column_ * (column_w_ + gap_); }
  double y() const { return y_; }
  DisplayPage& page() { return pages_.back(); }

  /// Makes room for `h` points in the current flow column, moving on if
  /// needed. Returns true when it moved to a new column or page.
  bool need(double h) {
    if (pages_.empty()) return new_page(), true;
    if (y_ + h <= content_.bottom() || y_ == top_) return false;
    if (++column_ >= columns_) return new_page(), true;
    y_ = top_;
    return true;
  }
  void down(double h) { y_ += h; }
  std::vector<DisplayPage> done() { return std::move(pages_); }

 private:
  void new_page() {
    DisplayPage p;
    p.width = spec_.sheet.width;
    p.height = spec_.sheet.height;
    p.title = spec_.title;
    // Each page opens with what it holds, across the full measure.
    const std::string text = spec_.title.empty() ? "Data plotted" : "Data plotted: " + spec_.title;
    const double size = st_.panel_title_size(), lead = PageStyle::line_height(st_.fonts.bold, size);
    double y = content_.y;
    for (auto& l : wrap_text(text, st_.fonts.bold, size, content_.w)) {
      const double baseline = y + l.ascent;
      p.add(text_at(std::move(l), content_.x, baseline, Align::left, st_.ink.text, TextRole::title));
      y += lead;
    }
    top_ = y + st_.base;
    pages_.push_back(std::move(p));
    column_ = 0;
    y_ = top_;
  }

  const PageSpec& spec_;
  const PageStyle& st_;
  Rect content_;
  double column_w_, gap_, line_ = 0;
  int columns_ = 1, column_ = 0;
  double y_ = 0, top_ = 0;
  std::vector<DisplayPage> pages_;
};

void set_heading_and_header(Flow& f, const ShapedTable& t, bool continued, const PageStyle& st, double gap) {
  ShapedText h = continued ? shape_text(t.heading.utf8 + " (continued)", t.heading.font, t.heading.size) : t.heading;
  f.page().add(text_at(std::move(h), f.x(), f.y() + t.heading.ascent, Align::left, st.ink.text, TextRole::panel_title));
  f.down(f.line());
  double x = f.x();
  for (std::size_t c = 0; c < t.header.size(); ++c) {
    const bool right = t.numeric[c];
    f.page().add(text_at(t.header[c], right ? x + t.widths[c] : x, f.y() + t.header[c].ascent,
                         right ? Align::right : Align::left, st.ink.text, TextRole::axis_title));
    x += t.widths[c] + gap;
  }
  f.down(f.line());
  // A hairline under the header row.
  PathItem rule;
  rule.points = {{f.x(), f.y() + st.base * 0.1}, {f.x() + t.width, f.y() + st.base * 0.1}};
  rule.stroke = Stroke{st.ink.rule, st.rule_width(), {}, false};
  f.page().add(std::move(rule));
  f.down(st.base * 0.25);
}

}  // namespace

std::vector<DisplayPage> data_table_pages(const PageSpec& spec, const std::vector<PlottedRows>& tables,
                                          const PageStyle& st) {
  if (tables.empty()) return {};
  const double gap = st.base * 1.2;  // between a table's columns
  std::vector<ShapedTable> shaped;
  double widest = 0;
  for (const auto& t : tables) {
    shaped.push_back(shape_table(t, st, gap));
    widest = std::max({widest, shaped.back().width, shaped.back().heading.width + shaped.back().heading.size * 4});
  }
  Flow flow(spec, st, widest, gap * 2.5);
  for (const ShapedTable& t : shaped) {
    // A table starts where its heading, header and first row fit together.
    flow.need(flow.line() * 3 + st.base * 0.25);
    set_heading_and_header(flow, t, false, st, gap);
    for (const auto& row : t.rows) {
      if (flow.need(flow.line())) set_heading_and_header(flow, t, true, st, gap);
      double x = flow.x();
      for (std::size_t c = 0; c < row.size(); ++c) {
        const bool right = t.numeric[c];
        flow.page().add(text_at(row[c], right ? x + t.widths[c] : x, flow.y() + row[c].ascent,
                                right ? Align::right : Align::left, st.ink.text, TextRole::note));
        x += t.widths[c] + gap;
      }
      flow.down(flow.line());
    }
    flow.down(flow.line());
  }
  return flow.done();
}

}  // namespace forme
