#include "data/csv_tokenizer.h"

#include <climits>
#include <cstdio>

#include "base/diagnostic.h"

namespace forme::csv {

namespace {

void count_up(int& v) {
  if (v < INT_MAX) ++v;
}

unsigned char byte(std::string_view s, std::size_t i) { return static_cast<unsigned char>(s[i]); }

bool is_continuation(std::string_view s, std::size_t i, unsigned char lo = 0x80, unsigned char hi = 0xBF) {
  if (i >= s.size()) return false;
  const unsigned char b = byte(s, i);
  return b >= lo && b <= hi;
}

/// Length of the well-formed UTF-8 sequence at s[i] (Unicode Table 3-7), 0 if ill-formed.
std::size_t utf8_length(std::string_view s, std::size_t i) {
  const unsigned char b = byte(s, i);
  if (b < 0x80) return 1;
  if (b >= 0xC2 && b <= 0xDF) return is_continuation(s, i + 1) ? 2 : 0;
  if (b >= 0xE0 && b <= 0xEF) {
    const unsigned char lo = b == 0xE0 ? 0xA0 : 0x80;  // no overlong forms
    const unsigned char hi = b == 0xED ? 0x9F : 0xBF;  // no surrogates
    return is_continuation(s, i + 1, lo, hi) && is_continuation(s, i + 2) ? 3 : 0;
  }
  if (b >= 0xF0 && b <= 0xF4) {
    const unsigned char lo = b == 0xF0 ? 0x90 : 0x80;  // no overlong forms
    const unsigned char hi = b == 0xF4 ? 0x8F : 0xBF;  // nothing past U+10FFFF
    return is_continuation(s, i + 1, lo, hi) && is_continuation(s, i + 2) &&
                   is_continuation(s, i + 3)
               ? 4
               : 0;
  }
  return 0;
}

std::string hex_byte(unsigned char b) {
  char buf[8];
  std::snprintf(buf, sizeof buf, "0x%02X", static_cast<unsigned>(b));
  return buf;
}

}  // namespace

Tokenizer::Tokenizer(std::string_view content, std::string display_path)
    : text_(content), path_(std::move(display_path)) {
  if (text_.size() >= 3 && byte(text_, 0) == 0xEF && byte(text_, 1) == 0xBB && byte(text_, 2) == 0xBF)
    pos_ = 3;
}

void Tokenizer::fail(int line, int col, std::string message, std::string hint) const {
  throw InputError(SourceLoc{path_, line, col}, std::move(message), std::move(hint));
}

bool Tokenizer::at_line_break() const {
  return !at_end() && (text_[pos_] == '\n' || text_[pos_] == '\r');
}

void Tokenizer::skip_line_break() {
  if (text_[pos_] == '\r' && pos_ + 1 < text_.size() && text_[pos_ + 1] == '\n') ++pos_;
  ++pos_;
  count_up(line_);
  col_ = 1;
}

std::size_t Tokenizer::char_length() const {
  const unsigned char b = byte(text_, pos_);
  if (b == 0)
    fail(line_, col_, "NUL byte at byte offset " + std::to_string(pos_),
         "the file may be UTF-16 or binary; save it as UTF-8 text");
  const std::size_t n = utf8_length(text_, pos_);
  if (n == 0) {
    std::string hint = "save the file with UTF-8 encoding";
    if (pos_ == 0 && text_.size() >= 2 &&
        ((b == 0xFF && byte(text_, 1) == 0xFE) || (b == 0xFE && byte(text_, 1) == 0xFF)))
      hint = "the file starts with a UTF-16 byte-order mark; save it as UTF-8";
    fail(line_, col_, "invalid UTF-8 at byte offset " + std::to_string(pos_) + " (byte " + hex_byte(b) + ")",
         std::move(hint));
  }
  return n;
}

void Tokenizer::step_char(std::size_t length) {
  pos_ += length;
  count_up(col_);
}

bool Tokenizer::next(Record& out) {
  out.fields.clear();
  out.line = 0;
  while (at_line_break()) skip_line_break();  // blank lines
  if (at_end()) return false;
  out.line = line_;
  for (;;) {
    Field& f = out.fields.emplace_back();
    f.line = line_;
    f.col = col_;
    if (!at_end() && text_[pos_] == '"')
      read_quoted(f);
    else
      read_unquoted(f);
    if (at_end()) return true;
    if (at_line_break()) {
      skip_line_break();
      return true;
    }
    step_char(1);  // the comma
  }
}

void Tokenizer::read_unquoted(Field& f) {
  const std::size_t start = pos_;
  bool blank_so_far = true;
  while (!at_end()) {
    const char c = text_[pos_];
    if (c == ',' || c == '\n' || c == '\r') break;
    if (c == '"') {
      fail(line_, col_, "quote character inside an unquoted field",
           blank_so_far && pos_ > start
               ? "a quoted field must start right after the comma; remove the blanks before the quote"
               : "enclose the whole field in double quotes and double each quote inside it");
    }
    if (c != ' ' && c != '\t') blank_so_far = false;
    step_char(char_length());
  }
  f.text.assign(text_.substr(start, pos_ - start));
}

void Tokenizer::read_quoted(Field& f) {
  f.quoted = true;
  const int open_line = line_;
  const int open_col = col_;
  step_char(1);  // the opening quote
  std::size_t run = pos_;  // start of the text not yet copied into f.text
  for (;;) {
    if (at_end())
      fail(open_line, open_col, "quoted field is not closed: no closing quote before the end of the file",
           "a quote inside a quoted field is written as two quotes (\"\")");
    const char c = text_[pos_];
    if (c == '"') {
      f.text.append(text_.substr(run, pos_ - run));
      if (pos_ + 1 < text_.size() && text_[pos_ + 1] == '"') {
        f.text.push_back('"');
        step_char(1);
        step_char(1);
        run = pos_;
        continue;
      }
      step_char(1);  // the closing quote
      break;
    }
    if (c == '\n' || c == '\r') {
      f.text.append(text_.substr(run, pos_ - run));
      f.text.push_back('\n');
      skip_line_break();
      run = pos_;
      continue;
    }
    step_char(char_length());
  }
  if (!at_end() && text_[pos_] != ',' && !at_line_break())
    fail(line_, col_, "text after the closing quote of a quoted field",
         "a quote inside a quoted field is written as two quotes (\"\")");
}

}  // namespace forme::csv
