#include "colour/audit.h"

#include <algorithm>

#include "colour/cvd.h"
#include "colour/difference.h"

namespace forme {

std::string_view to_string(Vision v) {
  switch (v) {
    case Vision::normal: return "normal vision";
    case Vision::protan: return "protan";
    case Vision::deutan: return "deutan";
    case Vision::tritan: return "tritan";
    case Vision::greyscale: return "greyscale";
  }
  return "?";
}

Rgb as_seen(const Rgb& c, Vision v) {
  switch (v) {
    case Vision::normal: return c;
    case Vision::protan: return simulate_machado(c, Deficiency::protan);
    case Vision::deutan: return simulate_machado(c, Deficiency::deutan);
    case Vision::tritan: return simulate_machado(c, Deficiency::tritan);
    case Vision::greyscale: return to_greyscale(c);
  }
  return c;
}

std::vector<PairFinding> pairs_by_difference(const std::vector<Rgb>& colours, Vision v) {
  std::vector<Lab> seen;
  seen.reserve(colours.size());
  for (const Rgb& c : colours) seen.push_back(to_lab(as_seen(c, v)));
  std::vector<PairFinding> pairs;
  for (std::size_t i = 0; i < seen.size(); ++i) {
    for (std::size_t j = i + 1; j < seen.size(); ++j) {
      pairs.push_back({v, i, j, ciede2000(seen[i], seen[j])});
    }
  }
  std::stable_sort(pairs.begin(), pairs.end(), [](const PairFinding& a, const PairFinding& b) {
    return a.delta_e < b.delta_e;
  });
  return pairs;
}

std::optional<PairFinding> closest_pair(const std::vector<Rgb>& colours, Vision v) {
  std::vector<PairFinding> pairs = pairs_by_difference(colours, v);
  if (pairs.empty()) return std::nullopt;
  return pairs.front();
}

std::vector<PairFinding> worst_pairs(const std::vector<Rgb>& colours) {
  std::vector<PairFinding> worst;
  for (Vision v : all_visions) {
    if (auto p = closest_pair(colours, v)) worst.push_back(*p);
  }
  return worst;
}

}  // namespace forme
