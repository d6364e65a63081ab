#pragma once
/// Line break opportunities by the Unicode line breaking algorithm
/// (UAX #14), for any UTF-8 text a user can write.
///
/// The rules come from libunibreak, whose Debian 12 build (1.1) predates
/// several of them and aborts the process on some characters: a regional
/// indicator (one letter of a flag) fails an assertion, and U+FFFF is read
/// as the end of the text. This file is the only caller of libunibreak. It
/// hands the library a copy of the text in which every character the
/// library cannot handle is replaced by a stand-in of the class UAX #14
/// gives it (regional indicators and the emoji the library's data predates
/// become an ideograph; U+FFFF and bytes that are not UTF-8 become U+FFFD),
/// then applies the rules the library lacks on the real characters:
///   LB9   after a combining mark, the break its base would have;
///   LB8a  no break after ZERO WIDTH JOINER (emoji sequences stay whole);
///   LB30a regional indicators pair up into flags, no break inside a pair;
///   LB30b no break between an emoji modifier base and its skin tone.
#include <string_view>
#include <vector>

namespace forme {

/// What may happen after a byte of the text.
enum class LineBreak : char {
  must,    ///< a mandatory break (after a line feed, and at the end)
  allow,   ///< a line may end here
  none,    ///< no break here
  inside,  ///< inside a character's UTF-8 bytes
};

/// One entry per byte of `utf8`: what may follow it. Never fails and never
/// reaches a library assertion, whatever the bytes.
std::vector<LineBreak> line_breaks(std::string_view utf8);

}  // namespace forme
