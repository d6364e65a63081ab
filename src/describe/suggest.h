#pragma once
/// "Did you mean …?" for misspelt keys and names.
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace forme {

/// Optimal-string-alignment edit distance (Damerau–Levenshtein with
/// adjacent transpositions), case-insensitive.
std::size_t edit_distance(std::string_view a, std::string_view b);

/// The candidate nearest to `word`, if it is near enough to be a likely
/// typo: distance ≤ max(1, len/3).
std::optional<std::string> nearest(std::string_view word, const std::vector<std::string>& candidates);

}  // namespace forme
