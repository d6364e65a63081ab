#include "describe/suggest.h"

#include <algorithm>
#include <cctype>

namespace forme {

std::size_t edit_distance(std::string_view a, std::string_view b) {
  auto lower = [](char c) { return static_cast<char>(std::tolower(static_cast<unsigned char>(c))); };
  const std::size_t n = a.size(), m = b.size();
  std::vector<std::size_t> prev2(m + 1), prev(m + 1), cur(m + 1);
  for (std::size_t j = 0; j <= m; ++j) prev[j] = j;
  for (std::size_t i = 1; i <= n; ++i) {
    cur[0] = i;
    for (std::size_t j = 1; j <= m; ++j) {
      std::size_t cost = lower(a[i - 1]) == lower(b[j - 1]) ? 0 : 1;
      cur[j] = std::min({prev[j] + 1, cur[j - 1] + 1, prev[j - 1] + cost});
      if (i > 1 && j > 1 && lower(a[i - 1]) == lower(b[j - 2]) && lower(a[i - 2]) == lower(b[j - 1]))
        cur[j] = std::min(cur[j], prev2[j - 2] + 1);
    }
    prev2.swap(prev);
    prev.swap(cur);
  }
  return prev[m];
}

std::optional<std::string> nearest(std::string_view word, const std::vector<std::string>& candidates) {
  std::optional<std::string> best;
  std::size_t best_d = std::max<std::size_t>(1, word.size() / 3) + 1;
  for (const auto& c : candidates) {
    std::size_t d = edit_distance(word, c);
    if (d < best_d) {
      best_d = d;
      best = c;
    }
  }
  return best;
}

}  // namespace forme
