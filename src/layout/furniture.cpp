#include "layout/furniture.h"

#include <algorithm>
#include <cmath>

#include "layout/text_items.h"
#include "text/wrap.h"

namespace forme {

namespace {

// A long word in a message: its start, enough to recognise it.
std::string word_start(const std::string& w) {
  if (w.size() <= 24) return w;
  std::size_t cut = 24;
  while (cut > 0 && (static_cast<unsigned char>(w[cut]) & 0xC0) == 0x80) --cut;
  return w.substr(0, cut) + "\u2026";
}

std::string points(double v) { return std::to_string(static_cast<int>(std::lround(v))); }

}  // namespace

std::vector<ShapedText> wrap_within(const std::string& text, const FontRef& font, double size, double min_size,
                                    double width, const std::string& what, const SourceLoc& loc) {
  min_size = std::min(min_size, size);
  for (double s = size;; s = std::max(min_size, s - 0.5)) {
    const WidestWord w = widest_word(text, font, s);
    if (w.width <= width + 1e-9) return wrap_text(text, font, s, width);
    if (s <= min_size)
      throw InputError(loc,
                       what + "'s word '" + word_start(w.text) + "' is " + points(w.width) + " pt wide even at " +
                           points(s) + " pt type, wider than the " + points(width) + " pt it has",
                       "break the word with a space or hyphen, or use a wider sheet or a smaller type size");
  }
}

double set_heading(const PageSpec& spec, const std::string& standfirst, const PageStyle& st, const Rect& content,
                   DisplayPage& page) {
  double y = content.y;
  bool any = false;
  if (!spec.title.empty()) {
    const double size = st.title_size();
    const double lead = PageStyle::line_height(st.fonts.bold, size);
    for (auto& line : wrap_within(spec.title, st.fonts.bold, size, st.min_size(), content.w, "the title", spec.heading_loc)) {
      page.add(text_at(line, content.x, y + line.ascent, Align::left, st.ink.text, TextRole::title));
      y += lead;
    }
    any = true;
  }
  if (!standfirst.empty()) {
    const double size = st.standfirst_size();
    y += any ? size * 0.2 : 0;
    // A measure of about 80 characters reads comfortably (common practice).
    const double measure = std::min(content.w, size * 0.5 * 80);
    const double lead = PageStyle::line_height(st.fonts.regular, size);
    for (auto& line : wrap_within(standfirst, st.fonts.regular, size, st.min_size(), measure, "the standfirst",
                                  spec.heading_loc)) {
      page.add(text_at(line, content.x, y + line.ascent, Align::left, st.ink.muted, TextRole::standfirst));
      y += lead;
    }
    any = true;
  }
  if (any) y += st.base * 1.6;
  return y - content.y;
}

double set_footer(const PageSpec& spec, const PageStyle& st, const Rect& content, DisplayPage& page,
                  const std::vector<std::string>& extra_notes) {
  const double size = st.note_size();
  std::vector<std::pair<ShapedText, TextRole>> lines;
  auto add = [&](const std::string& text, TextRole role, const FontRef& font) {
    const std::string what = role == TextRole::source ? "the source line" : "a note";
    for (auto& l : wrap_within(text, font, size, st.min_size(), content.w, what, spec.footer_loc))
      lines.emplace_back(std::move(l), role);
  };
  for (const auto& n : spec.notes) add(n, TextRole::note, st.fonts.regular);
  for (const auto& n : extra_notes) add(n, TextRole::note, st.fonts.regular);
  if (!spec.limitations.empty()) add("Limitations: " + spec.limitations, TextRole::note, st.fonts.regular);
  // The source line links to the first address; every address is also
  // printed under it, linked to itself, so a printed page still gives it.
  std::vector<std::string> uri_of(lines.size());
  auto add_linked = [&](const std::string& text, const std::string& uri) {
    add(text, TextRole::source, st.fonts.regular);
    uri_of.resize(lines.size(), uri);
  };
  const std::string first_link = spec.source_links.empty() ? std::string() : spec.source_links.front().value;
  if (!spec.source.empty()) add_linked(spec.source, first_link);
  for (const auto& l : spec.source_links) add_linked(l.value, l.value);
  if (lines.empty()) return 0;
  const double leading = PageStyle::line_height(st.fonts.regular, size);
  const double height = leading * static_cast<double>(lines.size());
  double y = content.bottom() - height;
  // A hairline separates the footer from the charts above it.
  PathItem rule;
  rule.points = {{content.x, y - st.base * 0.6}, {content.right(), y - st.base * 0.6}};
  rule.stroke = Stroke{st.ink.grid, st.rule_width(), {}, false};
  page.add(std::move(rule));
  for (std::size_t i = 0; i < lines.size(); ++i) {
    auto& [line, role] = lines[i];
    TextItem item = text_at(line, content.x, y + line.ascent, Align::left, st.ink.muted, role);
    if (!uri_of[i].empty()) page.links.push_back(LinkArea{item.box(), uri_of[i]});
    page.add(std::move(item));
    y += leading;
  }
  return height + st.base * 1.6;
}

}  // namespace forme
