#include "paint/svg_ids.h"

#include <array>
#include <map>

namespace forme {

namespace {

bool is_digit(char c) { return c >= '0' && c <= '9'; }

}  // namespace

std::string renumber_svg_ids(std::string_view svg) {
  constexpr std::array<std::string_view, 2> kFamilies = {"surface", "image"};
  std::array<std::map<std::string_view, int>, 2> numbers;
  std::string out;
  out.reserve(svg.size());
  std::size_t i = 0;
  while (i < svg.size()) {
    // An id is introduced by `id="` and referred to by `#`.
    std::size_t at = std::string_view::npos;
    if (svg[i] == '#') at = i + 1;
    else if (svg.compare(i, 4, "id=\"") == 0) at = i + 4;
    if (at == std::string_view::npos) {
      out += svg[i++];
      continue;
    }
    out.append(svg.substr(i, at - i));
    i = at;
    for (std::size_t f = 0; f < kFamilies.size(); ++f) {
      const auto name = kFamilies[f];
      if (svg.compare(at, name.size(), name) != 0) continue;
      std::size_t end = at + name.size();
      while (end < svg.size() && is_digit(svg[end])) ++end;
      // Only a whole id: the digits end at a quote or parenthesis.
      if (end == at + name.size() || end >= svg.size() || (svg[end] != '"' && svg[end] != ')')) continue;
      auto [it, fresh] = numbers[f].try_emplace(svg.substr(at + name.size(), end - at - name.size()),
                                                static_cast<int>(numbers[f].size()) + 1);
      (void)fresh;
      out.append(name);
      out.append(std::to_string(it->second));
      i = end;
      break;
    }
  }
  return out;
}

}  // namespace forme
