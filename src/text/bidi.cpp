#include "text/bidi.h"

#include <fribidi.h>

#include <algorithm>
#include <numeric>

namespace forme {

std::vector<int> bidi_levels(const std::u32string& line, BaseDirection base) {
  const auto n = static_cast<FriBidiStrIndex>(line.size());
  std::vector<int> out(line.size(), 0);
  if (line.empty()) return out;
  std::vector<FriBidiChar> chars(line.begin(), line.end());
  std::vector<FriBidiCharType> types(line.size());
  std::vector<FriBidiBracketType> brackets(line.size());
  std::vector<FriBidiLevel> levels(line.size());
  fribidi_get_bidi_types(chars.data(), n, types.data());
  fribidi_get_bracket_types(chars.data(), n, types.data(), brackets.data());
  FriBidiParType direction = base == BaseDirection::left_to_right   ? FRIBIDI_PAR_LTR
                             : base == BaseDirection::right_to_left ? FRIBIDI_PAR_RTL
                                                                    : FRIBIDI_PAR_ON;  // ON: from the first strong character
  if (fribidi_get_par_embedding_levels_ex(types.data(), brackets.data(), n, &direction, levels.data()) == 0)
    return out;  // FriBidi could not allocate: keep the logical order
  std::copy(levels.begin(), levels.end(), out.begin());
  return out;
}

std::vector<std::size_t> visual_order(const std::vector<int>& levels) {
  std::vector<std::size_t> order(levels.size());
  std::iota(order.begin(), order.end(), std::size_t{0});
  if (levels.empty()) return order;
  const int highest = *std::max_element(levels.begin(), levels.end());
  int lowest_odd = highest + 1;
  for (int l : levels)
    if (l % 2 == 1) lowest_odd = std::min(lowest_odd, l);
  // L2: from the highest level down to the lowest odd level, reverse every
  // maximal sequence of runs at that level or higher.
  for (int level = highest; level >= lowest_odd; --level) {
    std::size_t i = 0;
    while (i < order.size()) {
      if (levels[order[i]] < level) {
        ++i;
        continue;
      }
      std::size_t j = i;
      while (j < order.size() && levels[order[j]] >= level) ++j;
      std::reverse(order.begin() + static_cast<long>(i), order.begin() + static_cast<long>(j));
      i = j;
    }
  }
  return order;
}

}  // namespace forme
