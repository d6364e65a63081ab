#include "paint/pdf_file_reader.h"

#include <cctype>
#include <cstdlib>
#include <stdexcept>
#include <string_view>

#include "paint/pdf_syntax.h"

namespace forme::pdf {

namespace {

constexpr std::size_t kEntryBytes = 20;            // §7.5.4: "nnnnnnnnnn ggggg n" and a two-byte end of line
constexpr std::size_t kLargestObject = 1u << 20;  // the dictionaries read here are far smaller

[[noreturn]] void fail(const std::string& what) { throw std::runtime_error("PDF file: " + what); }

void seek(std::FILE* f, long at) {
  if (std::fseek(f, at, SEEK_SET) != 0) fail("cannot seek in Cairo's output");
}

// Reads up to `n` bytes from the current position.
std::string read(std::FILE* f, std::size_t n) {
  std::string s(n, '\0');
  s.resize(std::fread(s.data(), 1, n, f));
  return s;
}

bool starts_with_word(std::string_view line, std::string_view word) {
  return line.substr(0, word.size()) == word;
}

// One line, without its end-of-line characters.
std::string read_line(std::FILE* f) {
  std::string line;
  for (int c = std::fgetc(f); c != EOF && c != '\n'; c = std::fgetc(f))
    if (c != '\r') line += static_cast<char>(c);
  return line;
}

long parse_long(std::string_view digits) {
  long v = 0;
  std::size_t n = 0;
  for (char c : digits) {
    if (!std::isdigit(static_cast<unsigned char>(c))) break;
    if (v > 100'000'000'000L) fail("a number in the cross-reference table is too large");
    v = v * 10 + (c - '0');
    ++n;
  }
  if (n == 0) fail("the cross-reference table is malformed");
  return v;
}

}  // namespace

FileReader::FileReader(std::FILE* file) : file_(file) {
  if (std::fseek(file_, 0, SEEK_END) != 0) fail("cannot seek in Cairo's output");
  const long length = std::ftell(file_);
  const long tail_at = length > 1024 ? length - 1024 : 0;
  seek(file_, tail_at);
  const std::string tail = read(file_, static_cast<std::size_t>(length - tail_at));
  const std::size_t key = tail.rfind("startxref");
  if (key == std::string::npos) fail("Cairo's output has no startxref");
  std::size_t i = key + 9;
  while (i < tail.size() && std::isspace(static_cast<unsigned char>(tail[i]))) ++i;
  xref_at_ = parse_long(std::string_view(tail).substr(i));
  if (xref_at_ >= length) fail("Cairo's startxref points past the end of the file");

  seek(file_, xref_at_);
  if (read_line(file_).rfind("xref", 0) != 0) fail("Cairo's output has no classic cross-reference table");
  std::string rest;
  for (;;) {
    const std::string line = read_line(file_);
    if (starts_with_word(line, "trailer")) {
      rest = line.substr(7) + "\n";  // the dictionary may start on the same line
      break;
    }
    if (line.empty() && std::feof(file_)) fail("the cross-reference table has no trailer");
    const std::size_t space = line.find(' ');
    if (space == std::string::npos) fail("the cross-reference table is malformed");
    Subsection s;
    s.first = static_cast<int>(parse_long(line));
    s.count = static_cast<int>(parse_long(std::string_view(line).substr(space + 1)));
    s.entries_at = std::ftell(file_);
    subsections_.push_back(s);
    seek(file_, s.entries_at + static_cast<long>(kEntryBytes) * s.count);
  }
  rest += read(file_, 64 * 1024);
  const std::size_t end = rest.find("startxref");
  if (end == std::string::npos) fail("the trailer is not followed by startxref");
  trailer_ = rest.substr(0, end);
  const auto size = dict_value(trailer_, "/Size");
  if (!size) fail("the trailer has no /Size");
  size_ = static_cast<int>(parse_long(*size));
}

std::string FileReader::object(int number) const {
  const std::string what = "object " + std::to_string(number);
  for (const Subsection& s : subsections_) {
    if (number < s.first || number >= s.first + s.count) continue;
    seek(file_, s.entries_at + static_cast<long>(kEntryBytes) * (number - s.first));
    const std::string entry = read(file_, kEntryBytes);
    if (entry.size() < 18 || entry[17] != 'n') fail(what + " is not in use");
    seek(file_, parse_long(entry.substr(0, 10)));
    const std::string header = std::to_string(number) + " ";
    std::string text;
    while (text.size() < kLargestObject) {
      const std::string block = read(file_, 4096);
      if (block.empty()) break;
      text += block;
      const std::size_t obj = text.find("obj");
      if (obj == std::string::npos) continue;
      if (text.compare(0, header.size(), header) != 0) fail(what + " is not where the cross-reference table says");
      // The value first, then "endobj" after it: a string in the value may
      // hold the word itself (a title such as "endobj notes").
      const std::string_view body = std::string_view(text).substr(obj + 3);
      const std::size_t value = first_value_end(body);
      if (value == std::string_view::npos) continue;  // not all read yet (or malformed: read on to the limit)
      const std::size_t end = body.find("endobj", value);
      if (end == std::string_view::npos) continue;
      return std::string(body.substr(0, end));
    }
    fail(what + " has no endobj");
  }
  fail(what + " is not in the cross-reference table");
}

}  // namespace forme::pdf
