#include "paint/pdf_creation_date.h"

#include <cctype>
#include <cstdio>
#include <stdexcept>
#include <vector>

namespace forme {

namespace {

[[noreturn]] void refuse(const std::string& why) {
  throw std::runtime_error("PDF creation date: " + why);
}

bool is_space(char c) {
  // PDF white-space characters (ISO 32000-1 §7.2.2, Table 1).
  return c == ' ' || c == '\n' || c == '\r' || c == '\t' || c == '\f' || c == '\0';
}

std::size_t skip_space(const std::string& s, std::size_t i) {
  while (i < s.size() && is_space(s[i])) ++i;
  return i;
}

/// Reads an unsigned decimal at i; advances i past it.
std::size_t read_number(const std::string& s, std::size_t& i) {
  if (i >= s.size() || !std::isdigit(static_cast<unsigned char>(s[i]))) refuse("expected a number");
  std::size_t v = 0;
  while (i < s.size() && std::isdigit(static_cast<unsigned char>(s[i]))) {
    if (v > (std::size_t{1} << 50)) refuse("number too large");
    v = v * 10 + static_cast<std::size_t>(s[i++] - '0');
  }
  return v;
}

/// One in-use cross-reference entry: where its 10-digit offset field sits
/// and the object number it belongs to.
struct XrefEntry {
  std::size_t object = 0;
  std::size_t field = 0;   ///< position of the offset digits in the file
  std::size_t offset = 0;  ///< the byte offset they hold
};

struct Xref {
  std::size_t start = 0;  ///< where the `xref` keyword sits
  std::vector<XrefEntry> used;
  std::size_t trailer = 0;  ///< where the `trailer` keyword sits
};

Xref read_xref(const std::string& pdf) {
  const std::size_t sx = pdf.rfind("startxref");
  if (sx == std::string::npos) refuse("no startxref");
  std::size_t i = skip_space(pdf, sx + 9);
  Xref x;
  x.start = read_number(pdf, i);
  if (pdf.compare(x.start, 4, "xref") != 0) refuse("startxref does not point at a cross-reference table");
  i = skip_space(pdf, x.start + 4);
  while (pdf.compare(i, 7, "trailer") != 0) {
    const std::size_t first = read_number(pdf, i);
    i = skip_space(pdf, i);
    const std::size_t count = read_number(pdf, i);
    i = skip_space(pdf, i);
    for (std::size_t k = 0; k < count; ++k, i += 20) {
      // "nnnnnnnnnn ggggg n" + two-character end of line (§7.5.4).
      if (i + 20 > pdf.size() || pdf[i + 10] != ' ' || pdf[i + 16] != ' ') refuse("malformed cross-reference entry");
      if (pdf[i + 17] == 'n') {
        std::size_t j = i;
        const std::size_t off = read_number(pdf, j);
        if (j != i + 10) refuse("cross-reference offset is not 10 digits");
        x.used.push_back({first + k, i, off});
      } else if (pdf[i + 17] != 'f') {
        refuse("cross-reference entry neither in use nor free");
      }
    }
    i = skip_space(pdf, i);
    if (i >= pdf.size()) refuse("cross-reference table without trailer");
  }
  x.trailer = i;
  return x;
}

/// The object number the trailer's /Info entry refers to.
std::size_t info_object(const std::string& pdf, const Xref& x) {
  const std::size_t end = pdf.find(">>", x.trailer);
  const std::string_view dict(pdf.data() + x.trailer, (end == std::string::npos ? pdf.size() : end) - x.trailer);
  if (dict.find("/Prev") != std::string_view::npos) refuse("incremental updates are not handled");
  const std::size_t at = dict.find("/Info");
  if (at == std::string_view::npos) refuse("the trailer names no information dictionary");
  std::size_t i = skip_space(pdf, x.trailer + at + 5);
  return read_number(pdf, i);
}

}  // namespace

std::string set_pdf_creation_date(std::string pdf, std::string_view date) {
  for (char c : date)
    if (c == '(' || c == ')' || c == '\\' || static_cast<unsigned char>(c) < 0x20)
      refuse("the date must be plain text");
  Xref x = read_xref(pdf);
  const std::size_t info = info_object(pdf, x);
  const XrefEntry* entry = nullptr;
  for (const auto& e : x.used)
    if (e.object == info) entry = &e;
  if (!entry) refuse("the information dictionary is not in the cross-reference table");

  // The dictionary body: from "N G obj" to "endobj".
  std::size_t i = entry->offset;
  if (read_number(pdf, i) != info) refuse("cross-reference offset does not point at the information dictionary");
  const std::size_t obj_end = pdf.find("endobj", i);
  const std::size_t open_dict = pdf.find("<<", i);
  if (obj_end == std::string::npos || open_dict == std::string::npos || open_dict > obj_end)
    refuse("the information dictionary is not a dictionary");

  const std::string value = "(" + std::string(date) + ")";
  std::size_t edit_at = 0, erase = 0;
  std::string insert;
  const std::size_t key = pdf.find("/CreationDate", open_dict);
  if (key != std::string::npos && key < obj_end) {
    std::size_t open = skip_space(pdf, key + 13);
    if (open >= obj_end || pdf[open] != '(') refuse("/CreationDate is not a literal string");
    // Find the closing parenthesis: balanced pairs and backslash escapes (§7.3.4.2).
    std::size_t close = open + 1;
    for (int depth = 1; depth > 0; ++close) {
      if (close >= obj_end) refuse("unterminated /CreationDate string");
      if (pdf[close] == '\\') ++close;
      else if (pdf[close] == '(') ++depth;
      else if (pdf[close] == ')') --depth;
    }
    edit_at = open;
    erase = close - open;
    insert = value;
  } else {
    edit_at = open_dict + 2;
    insert = " /CreationDate " + value;
  }
  const auto delta = static_cast<std::ptrdiff_t>(insert.size()) - static_cast<std::ptrdiff_t>(erase);

  // Shift offsets of objects behind the edit. The fields keep their width.
  for (const auto& e : x.used) {
    if (e.offset <= edit_at) continue;
    const auto moved = static_cast<std::size_t>(static_cast<std::ptrdiff_t>(e.offset) + delta);
    char digits[16];
    std::snprintf(digits, sizeof digits, "%010zu", moved);
    if (moved > 9'999'999'999ULL) refuse("offset does not fit 10 digits");
    pdf.replace(e.field, 10, digits, 10);
  }
  pdf.replace(edit_at, erase, insert);

  // startxref holds the table's new position; its digit count may change.
  const std::size_t new_start =
      x.start > edit_at ? static_cast<std::size_t>(static_cast<std::ptrdiff_t>(x.start) + delta) : x.start;
  const std::size_t sx = pdf.rfind("startxref");
  std::size_t num = skip_space(pdf, sx + 9), num_end = num;
  read_number(pdf, num_end);
  pdf.replace(num, num_end - num, std::to_string(new_start));
  return pdf;
}

}  // namespace forme
