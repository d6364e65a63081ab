#include "paint/pdf_syntax.h"

#include <cstdint>
#include <cstdio>
#include <stdexcept>

namespace forme::pdf {

namespace {

constexpr std::size_t npos = std::string_view::npos;
constexpr int kMaxDepth = 64;  // nesting of dictionaries and arrays read here

// White-space characters, ISO 32000-1 §7.2.2 Table 1.
bool is_space(char c) { return c == 0 || c == '\t' || c == '\n' || c == '\f' || c == '\r' || c == ' '; }

// Delimiter characters, §7.2.2 Table 2.
bool is_delimiter(char c) { return std::string_view("()<>[]{}/%").find(c) != npos; }

// Past white space and comments (§7.2.3) from i.
std::size_t skip_space(std::string_view t, std::size_t i) {
  while (i < t.size()) {
    if (is_space(t[i])) ++i;
    else if (t[i] == '%') {
      while (i < t.size() && t[i] != '\n' && t[i] != '\r') ++i;
    } else break;
  }
  return i;
}

// The end of the one token that starts at i, or npos when it is malformed.
// "<<" and ">>" are tokens of their own; a string is one token.
std::size_t token_end(std::string_view t, std::size_t i) {
  if (i >= t.size()) return npos;
  const char c = t[i];
  if (c == '(') {  // literal string: balanced parentheses, backslash escapes (§7.3.4.2)
    int depth = 0;
    for (; i < t.size(); ++i) {
      if (t[i] == '\\') ++i;
      else if (t[i] == '(') ++depth;
      else if (t[i] == ')' && --depth == 0) return i + 1;
    }
    return npos;
  }
  if (c == '<') {
    if (t.compare(i, 2, "<<") == 0) return i + 2;
    const std::size_t close = t.find('>', i);  // hexadecimal string (§7.3.4.3)
    return close == npos ? npos : close + 1;
  }
  if (c == '>') return t.compare(i, 2, ">>") == 0 ? i + 2 : npos;
  if (c == '[' || c == ']' || c == '{' || c == '}') return i + 1;
  if (c == '/') ++i;
  else if (is_delimiter(c)) return npos;  // ')' out of place
  while (i < t.size() && !is_space(t[i]) && !is_delimiter(t[i])) ++i;
  return i;
}

bool is_integer(std::string_view s) {
  std::size_t i = (!s.empty() && (s[0] == '+' || s[0] == '-')) ? 1 : 0;
  if (i == s.size()) return false;
  for (; i < s.size(); ++i)
    if (s[i] < '0' || s[i] > '9') return false;
  return true;
}

std::size_t value_end(std::string_view t, std::size_t i, int depth);

// The end of the dictionary whose "<<" is at i; `entry` sees each key's
// start, its value's start and its value's end.
template <class Entry>
std::size_t dict_end(std::string_view t, std::size_t i, int depth, Entry entry) {
  if (depth > kMaxDepth) return npos;
  i = skip_space(t, i + 2);
  while (i < t.size() && t.compare(i, 2, ">>") != 0) {
    if (t[i] != '/') return npos;
    const std::size_t key = i;
    const std::size_t value = skip_space(t, token_end(t, i));
    const std::size_t end = value_end(t, value, depth + 1);
    if (end == npos) return npos;
    entry(key, value, end);
    i = skip_space(t, end);
  }
  return i < t.size() ? i + 2 : npos;
}

// The end of the one value (an indirect reference counts as one) that
// starts at i, or npos when it is malformed.
std::size_t value_end(std::string_view t, std::size_t i, int depth) {
  if (i >= t.size() || depth > kMaxDepth) return npos;
  if (t.compare(i, 2, "<<") == 0) return dict_end(t, i, depth, [](std::size_t, std::size_t, std::size_t) {});
  if (t[i] == '[') {
    i = skip_space(t, i + 1);
    while (i < t.size() && t[i] != ']') {
      i = value_end(t, i, depth + 1);
      if (i == npos) return npos;
      i = skip_space(t, i);
    }
    return i < t.size() ? i + 1 : npos;
  }
  const std::size_t end = token_end(t, i);
  if (end == npos || end == i) return npos;
  if (is_integer(t.substr(i, end - i))) {  // "N G R" (§7.3.10)
    const std::size_t g = skip_space(t, end);
    const std::size_t g_end = token_end(t, g);
    if (g_end != npos && is_integer(t.substr(g, g_end - g))) {
      const std::size_t r = skip_space(t, g_end);
      if (token_end(t, r) == r + 1 && t[r] == 'R') return r + 1;
    }
  }
  return end;
}

// Where the first dictionary of `text` opens: tokens are skipped (so "<<"
// inside a string does not count) until one is "<<".
std::size_t first_dict(std::string_view t) {
  for (std::size_t i = skip_space(t, 0); i < t.size();) {
    if (t.compare(i, 2, "<<") == 0) return i;
    const std::size_t end = token_end(t, i);
    if (end == npos || end == i) return npos;
    i = skip_space(t, end);
  }
  return npos;
}

struct Entry {
  std::size_t key, value, end;
};

// The entries of the first dictionary of `t`; false when it is malformed.
bool entries_of(std::string_view t, std::size_t& open, std::vector<Entry>& out) {
  open = first_dict(t);
  if (open == npos) return false;
  return dict_end(t, open, 0, [&](std::size_t k, std::size_t v, std::size_t e) { out.push_back({k, v, e}); }) != npos;
}

std::string_view key_at(std::string_view t, const Entry& e) { return t.substr(e.key, token_end(t, e.key) - e.key); }

// Code points of UTF-8, bad bytes as U+FFFD.
std::vector<char32_t> code_points(std::string_view s) {
  std::vector<char32_t> out;
  for (std::size_t i = 0; i < s.size();) {
    const auto b = static_cast<unsigned char>(s[i]);
    const int extra = b < 0x80 ? 0 : (b >> 5) == 0x6 ? 1 : (b >> 4) == 0xE ? 2 : (b >> 3) == 0x1E ? 3 : -1;
    char32_t cp = extra == 0 ? b : extra == 1 ? (b & 0x1F) : extra == 2 ? (b & 0x0F) : (b & 0x07);
    bool ok = extra >= 0 && i + static_cast<std::size_t>(extra) < s.size();
    for (int k = 1; ok && k <= extra; ++k) {
      const auto c = static_cast<unsigned char>(s[i + static_cast<std::size_t>(k)]);
      if ((c >> 6) != 0x2) ok = false;
      else cp = (cp << 6) | (c & 0x3F);
    }
    static constexpr char32_t kLeast[] = {0, 0x80, 0x800, 0x10000};  // overlong forms are invalid
    if (ok && (cp < kLeast[extra] || cp > 0x10FFFF || (cp >= 0xD800 && cp <= 0xDFFF))) ok = false;
    out.push_back(ok ? cp : U'\uFFFD');
    i += ok ? static_cast<std::size_t>(extra) + 1 : 1;
  }
  return out;
}

}  // namespace

std::optional<std::string_view> dict_value(std::string_view text, std::string_view key) {
  std::size_t open = 0;
  std::vector<Entry> entries;
  if (!entries_of(text, open, entries)) return std::nullopt;
  for (const Entry& e : entries)
    if (key_at(text, e) == key) return text.substr(e.value, e.end - e.value);
  return std::nullopt;
}

std::string dict_with(std::string_view text, std::string_view key, std::string_view value) {
  std::size_t open = 0;
  std::vector<Entry> entries;
  if (!entries_of(text, open, entries)) throw std::runtime_error("PDF file: a dictionary forme edits is malformed");
  std::string out(text);
  for (auto e = entries.rbegin(); e != entries.rend(); ++e)
    if (key_at(text, *e) == key) out.erase(e->key, e->end - e->key);
  out.insert(open + 2, " " + std::string(key) + " " + std::string(value));
  return out;
}

std::size_t first_value_end(std::string_view text) {
  const std::size_t i = skip_space(text, 0);
  if (i >= text.size()) return npos;
  return value_end(text, i, 0);
}

std::optional<int> reference(std::string_view value) {
  const std::size_t i = skip_space(value, 0);
  const std::size_t end = value_end(value, i, 0);
  if (end == npos || value[end - 1] != 'R' || skip_space(value, end) != value.size()) return std::nullopt;
  const std::size_t n_end = token_end(value, i);
  if (!is_integer(value.substr(i, n_end - i)) || value[i] == '-') return std::nullopt;
  long n = 0;
  for (std::size_t k = i; k < n_end && n <= 1'000'000'000; ++k)
    if (value[k] >= '0' && value[k] <= '9') n = n * 10 + (value[k] - '0');
  if (n <= 0 || n > 1'000'000'000) return std::nullopt;
  return static_cast<int>(n);
}

std::vector<std::string_view> array_items(std::string_view value) {
  std::vector<std::string_view> items;
  std::size_t i = skip_space(value, 0);
  if (i >= value.size()) return items;
  if (value[i] != '[') {
    const std::size_t end = value_end(value, i, 0);
    if (end != npos) items.push_back(value.substr(i, end - i));
    return items;
  }
  for (i = skip_space(value, i + 1); i < value.size() && value[i] != ']'; i = skip_space(value, i)) {
    const std::size_t end = value_end(value, i, 1);
    if (end == npos) break;
    items.push_back(value.substr(i, end - i));
    i = end;
  }
  return items;
}

bool is_name(std::string_view value, std::string_view name) {
  const std::size_t i = skip_space(value, 0);
  const std::size_t end = token_end(value, i);
  return end != npos && value.substr(i, end - i) == name && skip_space(value, end) == value.size();
}

std::string byte_string(std::string_view bytes) {
  std::string out = "(";
  for (const char c : bytes) {
    const auto b = static_cast<unsigned char>(c);
    if (c == '(' || c == ')' || c == '\\') {
      out += '\\';
      out += c;
    } else if (b < 0x20 || b > 0x7E) {  // octal escape (§7.3.4.2 Table 3)
      char esc[8];
      std::snprintf(esc, sizeof esc, "\\%03o", b);
      out += esc;
    } else out += c;
  }
  return out + ")";
}

std::string text_string(std::string_view utf8) {
  bool ascii = true;
  for (const char c : utf8) ascii = ascii && static_cast<unsigned char>(c) >= 0x20 && static_cast<unsigned char>(c) <= 0x7E;
  if (ascii) return byte_string(utf8);
  std::string out = "<FEFF";
  char unit[8];
  auto put = [&](unsigned u) {
    std::snprintf(unit, sizeof unit, "%04X", u);
    out += unit;
  };
  for (char32_t cp : code_points(utf8)) {
    if (cp < 0x10000) put(static_cast<unsigned>(cp));
    else {  // a surrogate pair (Unicode 15 §3.9, D91)
      cp -= 0x10000;
      put(0xD800 + static_cast<unsigned>(cp >> 10));
      put(0xDC00 + static_cast<unsigned>(cp & 0x3FF));
    }
  }
  return out + ">";
}

std::string name(std::string_view bytes) {
  std::string out = "/";
  for (const char c : bytes) {
    const auto b = static_cast<unsigned char>(c);
    if (b < 0x21 || b > 0x7E || c == '#' || is_delimiter(c)) {
      char esc[4];
      std::snprintf(esc, sizeof esc, "#%02X", b);
      out += esc;
    } else out += c;
  }
  return out;
}

std::string number(double v) {
  char buf[64];
  std::snprintf(buf, sizeof buf, "%.4f", v);
  std::string s = buf;
  while (!s.empty() && s.back() == '0') s.pop_back();
  if (!s.empty() && s.back() == '.') s.pop_back();
  return s == "-0" ? "0" : s;
}

}  // namespace forme::pdf
