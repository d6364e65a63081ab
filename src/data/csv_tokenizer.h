#pragma once
/// Splits CSV text into records of fields (RFC 4180 §2), one record at a time.
///
/// - Fields are separated by commas; a record ends at a line break outside
///   quotes: CRLF, LF or a lone CR, or at the end of the text (the last
///   record needs no line break).
/// - A field that starts with `"` is quoted: it runs to the next `"` that is
///   not doubled; `""` inside stands for one `"`. Commas and line breaks
///   inside are kept; each embedded line break (CRLF, LF or CR) is stored as
///   a single "\n", so CRLF and LF files give identical text.
/// - After a closing quote only a comma, a line break or the end may follow.
///   A `"` inside an unquoted field is refused.
/// - A leading UTF-8 byte-order mark is skipped. The text must be valid UTF-8
///   (no overlong forms, surrogates or code points past U+10FFFF) without NUL
///   bytes.
/// - Lines that are entirely empty (outside quotes) are skipped; an empty
///   value in a one-column table is written `""`.
///
/// Positions: lines are 1-based and counted by every line break (inside
/// quotes too); columns are 1-based characters (code points) from the line
/// start. A field's position is that of its first character (the opening
/// quote for quoted fields). Every problem throws `InputError` at the
/// offending position. One pass, linear in the input size.
#include <cstddef>
#include <string>
#include <string_view>
#include <vector>

namespace forme::csv {

struct Field {
  std::string text;  ///< unquoted text
  int line = 0;
  int col = 0;
  bool quoted = false;
};

struct Record {
  std::vector<Field> fields;
  int line = 0;  ///< line of the record's first character
};

class Tokenizer {
 public:
  /// `content` must outlive the tokenizer; `display_path` names it in messages.
  Tokenizer(std::string_view content, std::string display_path);

  /// Reads the next record into `out` (its previous fields are discarded).
  /// Returns false, leaving `out` empty, when no record is left.
  bool next(Record& out);

 private:
  bool at_end() const { return pos_ >= text_.size(); }
  bool at_line_break() const;
  void skip_line_break();
  /// Byte length of the valid UTF-8 character at pos_; throws otherwise.
  std::size_t char_length() const;
  void step_char(std::size_t length);
  void read_unquoted(Field& f);
  void read_quoted(Field& f);
  [[noreturn]] void fail(int line, int col, std::string message, std::string hint = {}) const;

  std::string_view text_;
  std::string path_;
  std::size_t pos_ = 0;
  int line_ = 1;
  int col_ = 1;
};

}  // namespace forme::csv
