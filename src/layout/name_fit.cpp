#include "layout/name_fit.h"

#include <algorithm>
#include <cmath>

#include "layout/page_style.h"
#include "text/wrap.h"

namespace forme {

namespace {

int lines_allowed(double height, double line_height, int max_lines) {
  int n = line_height > 0 ? static_cast<int>(std::floor(height / line_height + 1e-9)) : 1;
  if (max_lines > 0) n = std::min(n, max_lines);
  return std::max(1, n);
}

bool fits(const std::vector<ShapedText>& lines, double width, int allowed) {
  if (static_cast<int>(lines.size()) > allowed) return false;
  for (const auto& l : lines)
    if (l.width > width + 1e-9) return false;
  return true;
}

// At the smallest size: the lines that fit, then the rest of the name cut
// to the width with "…".
FittedName shorten(const std::string& name, const std::vector<ShapedText>& lines, const FontRef& font,
                   double size, double width, int allowed) {
  FittedName out;
  out.shortened = true;
  std::size_t consumed = 0;  // bytes of `name` set on whole lines so far
  for (const auto& l : lines) {
    const std::size_t at = name.find(l.utf8, consumed);
    const bool last_room = static_cast<int>(out.lines.size()) + 1 == allowed;
    if (l.width > width + 1e-9 || last_room) {
      // This line and everything after it share the last line.
      std::size_t from = at == std::string::npos ? consumed : at;
      while (from < name.size() && name[from] == ' ') ++from;
      const std::string rest = name.substr(from);
      out.lines.push_back(shorten_text(rest, font, size, width));
      out.shortened = out.lines.back().utf8 != rest;
      return out;
    }
    out.lines.push_back(l);
    if (at != std::string::npos) consumed = at + l.utf8.size();
  }
  out.shortened = false;  // everything fitted after all
  return out;
}

}  // namespace

NameFit fit_names(const std::vector<std::string>& names, const FontRef& font, double size, double min_size,
                  double width, double height, int max_lines) {
  min_size = std::min(min_size, size);
  NameFit fit;
  fit.box_width = width;
  for (double s = size;; s = std::max(min_size, s - 0.5)) {
    const double lead = PageStyle::line_height(font, s);
    const int allowed = lines_allowed(height, lead, max_lines);
    std::vector<std::vector<ShapedText>> wrapped;
    bool all = true;
    for (const auto& n : names) {
      wrapped.push_back(wrap_text(n, font, s, width));
      all = all && fits(wrapped.back(), width, allowed);
    }
    if (all || s <= min_size) {
      fit.size = s;
      fit.line_height = lead;
      for (std::size_t i = 0; i < names.size(); ++i) {
        FittedName f;
        if (fits(wrapped[i], width, allowed)) f.lines = std::move(wrapped[i]);
        else f = shorten(names[i], wrapped[i], font, s, width, allowed);
        f.full = names[i];
        fit.most_lines = std::max(fit.most_lines, static_cast<int>(f.lines.size()));
        for (const auto& l : f.lines) fit.width = std::max(fit.width, l.width);
        fit.names.push_back(std::move(f));
      }
      return fit;
    }
  }
}

NameFit fit_name_row(const std::vector<std::string>& names, const FontRef& font, double size, double min_size,
                     double slot, double gap, int max_lines) {
  NameFit first;
  for (std::size_t k = 1; k <= std::max<std::size_t>(1, names.size()); ++k) {
    std::vector<std::string> shown;
    for (std::size_t i = 0; i < names.size(); i += k) shown.push_back(names[i]);
    const double room = std::max(1.0, slot * static_cast<double>(k) - gap);
    NameFit fit = fit_names(shown, font, size, min_size, room, 1e9, max_lines);
    const bool cut = std::any_of(fit.names.begin(), fit.names.end(), [](const FittedName& n) { return n.shortened; });
    if (k == 1) first = fit;
    if (cut) continue;
    // Spread the shown names back to their places; the rest stay empty.
    std::vector<FittedName> all(names.size());
    for (std::size_t i = 0; i < names.size(); ++i) all[i].full = names[i];
    for (std::size_t j = 0; j < fit.names.size(); ++j) all[j * k] = std::move(fit.names[j]);
    fit.names = std::move(all);
    fit.stride = static_cast<int>(k);
    return fit;
  }
  return first;
}

}  // namespace forme
