#pragma once
/// Just enough of PDF's object syntax (ISO 32000-1 §7.2–7.3) to read and
/// edit the few dictionaries forme changes in a file Cairo wrote: find a
/// key's value, set a key, follow an indirect reference, list an array,
/// and write strings, names and numbers.
///
/// Values are handled as the text they are written as, never parsed into a
/// tree: a long report's structure tree holds tens of thousands of small
/// dictionaries, and forme only ever adds a key to a few of them.
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace forme::pdf {

/// The text of `key`'s value (e.g. "/Catalog", "12 0 R", "<< … >>") in
/// the first dictionary of `text`, or nullopt when the key is absent or
/// `text` holds no well-formed dictionary. `key` includes its slash.
std::optional<std::string_view> dict_value(std::string_view text, std::string_view key);

/// `text` with `key` set to `value` in its first dictionary: any entry for
/// the key removed, the new entry put just inside the opening "<<". Throws
/// std::runtime_error when `text` holds no well-formed dictionary.
std::string dict_with(std::string_view text, std::string_view key, std::string_view value);

/// Where the first value of `text` ends (an offset just past it), after any
/// white space and comments before it; npos when `text` ends before the
/// value does or the value is malformed. An object's "endobj" is found
/// after this, never inside a string that merely contains the word.
std::size_t first_value_end(std::string_view text);

/// The object number of an indirect reference "N G R" (§7.3.10).
std::optional<int> reference(std::string_view value);

/// The items of an array "[ … ]", each as its text; a lone non-array value
/// is a list of one (PDF allows either in /K and /Kids-like places).
std::vector<std::string_view> array_items(std::string_view value);

/// Whether `value` is the name `name` (with its slash).
bool is_name(std::string_view value, std::string_view name);

/// A literal string (§7.3.4.2) of exactly these bytes.
std::string byte_string(std::string_view bytes);

/// A text string (§7.9.2.2): the bytes themselves when they are printable
/// ASCII, which PDFDocEncoding shares, else UTF-16BE with its byte order
/// mark, written in hexadecimal. `utf8` that is not valid UTF-8 has its bad
/// bytes replaced by U+FFFD.
std::string text_string(std::string_view utf8);

/// A name object (§7.3.5): `/` and the bytes, with delimiters, '#',
/// whitespace and bytes outside 0x21–0x7E written as #XX.
std::string name(std::string_view bytes);

/// A real number (§7.3.3) with at most four decimals and no exponent.
std::string number(double v);

}  // namespace forme::pdf
