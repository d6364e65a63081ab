#include "text/wrap.h"

#include "text/line_breaks.h"

namespace forme {

namespace {

std::string trim_trailing_space(std::string s) {
  while (!s.empty() && (s.back() == ' ' || s.back() == '\n' || s.back() == '\r' || s.back() == '\t')) s.pop_back();
  return s;
}

}  // namespace

std::vector<ShapedText> wrap_text(const std::string& utf8, const FontRef& font, double size, double width,
                                  const ShapeOptions& options) {
  const std::vector<LineBreak> brks = line_breaks(utf8);

  // Candidate break positions: byte offsets just after a break opportunity.
  std::vector<ShapedText> lines;
  std::size_t line_start = 0, last_fit = 0;
  for (std::size_t i = 0; i < utf8.size(); ++i) {
    const LineBreak b = brks[i];
    const bool end = i + 1 == utf8.size();
    if (b != LineBreak::must && b != LineBreak::allow && !end) continue;
    const std::size_t cut = i + 1;
    std::string candidate = trim_trailing_space(utf8.substr(line_start, cut - line_start));
    const bool fits = shape_text(candidate, font, size, options).width <= width;
    if (!fits && last_fit > line_start) {
      lines.push_back(shape_text(trim_trailing_space(utf8.substr(line_start, last_fit - line_start)), font, size, options));
      line_start = last_fit;
      // Re-examine this opportunity against the new line.
      candidate = trim_trailing_space(utf8.substr(line_start, cut - line_start));
    }
    last_fit = cut;
    if (b == LineBreak::must && !end) {
      lines.push_back(shape_text(candidate, font, size, options));
      line_start = last_fit = cut;
    }
  }
  if (line_start < utf8.size()) {
    std::string rest = trim_trailing_space(utf8.substr(line_start));
    if (!rest.empty()) lines.push_back(shape_text(rest, font, size, options));
  }
  return lines;
}

namespace {

// Byte offsets just after each break opportunity (and the end of the text).
std::vector<std::size_t> break_ends(const std::string& utf8) {
  std::vector<std::size_t> ends;
  if (utf8.empty()) return ends;
  const std::vector<LineBreak> brks = line_breaks(utf8);
  for (std::size_t i = 0; i < utf8.size(); ++i)
    if (brks[i] == LineBreak::must || brks[i] == LineBreak::allow || i + 1 == utf8.size())
      ends.push_back(i + 1);
  if (ends.back() != utf8.size()) ends.push_back(utf8.size());
  return ends;
}

bool continuation_byte(char c) { return (static_cast<unsigned char>(c) & 0xC0) == 0x80; }

}  // namespace

WidestWord widest_word(const std::string& utf8, const FontRef& font, double size, const ShapeOptions& options) {
  WidestWord out;
  std::size_t start = 0;
  for (std::size_t end : break_ends(utf8)) {
    std::string word = trim_trailing_space(utf8.substr(start, end - start));
    start = end;
    if (word.empty()) continue;
    const double w = shape_text(word, font, size, options).width;
    if (w > out.width) out = {std::move(word), w};
  }
  return out;
}

ShapedText shorten_text(const std::string& utf8, const FontRef& font, double size, double width,
                        const ShapeOptions& options) {
  ShapedText whole = shape_text(utf8, font, size, options);
  if (whole.width <= width) return whole;
  static const std::string ellipsis = "\u2026";  // HORIZONTAL ELLIPSIS
  // Longest start ending at a break opportunity (the last one is the end).
  const std::vector<std::size_t> ends = break_ends(utf8);
  for (std::size_t k = ends.size(); k-- > 1;) {
    std::string head = trim_trailing_space(utf8.substr(0, ends[k - 1]));
    if (head.empty()) continue;
    ShapedText t = shape_text(head + ellipsis, font, size, options);
    if (t.width <= width) return t;
  }
  // Not even the first word fits: cut it between characters (never inside
  // one's UTF-8 bytes).
  for (std::size_t cut = utf8.size(); cut > 0; --cut) {
    if (cut < utf8.size() && continuation_byte(utf8[cut])) continue;
    ShapedText t = shape_text(trim_trailing_space(utf8.substr(0, cut)) + ellipsis, font, size, options);
    if (t.width <= width) return t;
  }
  return shape_text(ellipsis, font, size, options);
}

}  // namespace forme
