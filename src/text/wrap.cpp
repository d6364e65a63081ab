#include "text/wrap.h"

#include <linebreak.h>

#include <mutex>

namespace forme {

namespace {

void init_unibreak_once() {
  static std::once_flag once;
  std::call_once(once, [] { init_linebreak(); });
}

std::string trim_trailing_space(std::string s) {
  while (!s.empty() && (s.back() == ' ' || s.back() == '\n' || s.back() == '\r' || s.back() == '\t')) s.pop_back();
  return s;
}

}  // namespace

std::vector<ShapedText> wrap_text(const std::string& utf8, const FontRef& font, double size, double width,
                                  const ShapeOptions& options) {
  init_unibreak_once();
  std::vector<char> brks(utf8.size());
  if (!utf8.empty())
    set_linebreaks_utf8(reinterpret_cast<const utf8_t*>(utf8.data()), utf8.size(), "en", brks.data());

  // Candidate break positions: byte offsets just after a break opportunity.
  std::vector<ShapedText> lines;
  std::size_t line_start = 0, last_fit = 0;
  for (std::size_t i = 0; i < utf8.size(); ++i) {
    const char b = brks[i];
    const bool end = i + 1 == utf8.size();
    if (b != LINEBREAK_MUSTBREAK && b != LINEBREAK_ALLOWBREAK && !end) continue;
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
    if (b == LINEBREAK_MUSTBREAK && !end) {
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

}  // namespace forme
