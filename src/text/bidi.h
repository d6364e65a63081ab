#pragma once
/// Right-to-left text in visual order: the Unicode Bidirectional Algorithm
/// (UAX #9) through GNU FriBidi, which resolves an embedding level for each
/// character of a line; runs are then reversed by rule L2.
#include <string>
#include <vector>

namespace forme {

/// A paragraph's base direction: from its first strong character (UAX #9
/// rules P2, P3), or stated (by the page's language, rule HL1).
enum class BaseDirection { from_text, left_to_right, right_to_left };

/// Embedding level of each character of one line (even: left to right,
/// odd: right to left). With `base` from_text the paragraph direction comes
/// from the first strong character and a line with none is left to right;
/// otherwise `base` is the paragraph direction.
std::vector<int> bidi_levels(const std::u32string& line, BaseDirection base = BaseDirection::from_text);

/// Rule L2 over runs: given each run's level in logical order, the order
/// in which to set them from left to right (indices into `levels`).
std::vector<std::size_t> visual_order(const std::vector<int>& levels);

}  // namespace forme
