#include "text/language.h"

#include <algorithm>
#include <array>
#include <cctype>
#include <vector>

namespace forme {

namespace {

std::string lower(std::string_view s) {
  std::string out(s);
  for (char& c : out) c = static_cast<char>(std::tolower(static_cast<unsigned char>(c)));
  return out;
}

std::vector<std::string> subtags(std::string_view tag) {
  std::vector<std::string> out;
  std::size_t start = 0;
  for (std::size_t i = 0; i <= tag.size(); ++i)
    if (i == tag.size() || tag[i] == '-') {
      out.push_back(lower(tag.substr(start, i - start)));
      start = i + 1;
    }
  return out;
}

bool all_of(const std::string& s, int (*pred)(int)) {
  return !s.empty() && std::all_of(s.begin(), s.end(), [pred](char c) { return pred(static_cast<unsigned char>(c)) != 0; });
}
bool alpha(const std::string& s, std::size_t lo, std::size_t hi) {
  return s.size() >= lo && s.size() <= hi && all_of(s, std::isalpha);
}
bool alnum(const std::string& s, std::size_t lo, std::size_t hi) {
  return s.size() >= lo && s.size() <= hi && all_of(s, std::isalnum);
}
bool digits(const std::string& s, std::size_t n) { return s.size() == n && all_of(s, std::isdigit); }

// Scripts written right to left (ISO 15924 codes; Unicode's Scripts.txt
// and the bidi class of their letters).
constexpr std::array<std::string_view, 9> kRtlScripts = {"arab", "hebr", "syrc", "thaa", "nkoo", "adlm", "rohg", "samr", "mand"};
// Languages whose usual script is one of those (their IANA
// Suppress-Script or common usage; recalled from memory).
constexpr std::array<std::string_view, 17> kRtlLanguages = {"ar", "he", "iw", "fa", "ur", "yi", "ji", "ps", "sd",
                                                           "ug", "ckb", "dv", "syr", "arc", "prs", "pnb", "azb"};

bool listed(std::string_view s, auto const& list) { return std::find(list.begin(), list.end(), s) != list.end(); }

}  // namespace

std::string language_tag_problem(std::string_view tag) {
  if (tag.empty()) return "the language tag is empty";
  const std::vector<std::string> parts = subtags(tag);
  for (const auto& p : parts) {
    if (p.empty()) return "the language tag has an empty part (two hyphens, or a hyphen at an end)";
    if (p.size() > 8) return "the part '" + p + "' is longer than 8 letters";
    if (!all_of(p, std::isalnum)) return "the part '" + p + "' holds a character other than a letter or digit";
  }
  std::size_t i = 0;
  if (parts[0] == "x") return parts.size() > 1 ? std::string() : "a private-use tag needs a part after 'x-'";
  if (!alpha(parts[0], 2, 8) || parts[0].size() == 4)
    return "the tag must start with a language of 2-3 letters (or 5-8), not '" + parts[0] + "'";
  ++i;
  // extlang: up to three 3-letter parts after a 2-3 letter language.
  for (int k = 0; k < 3 && parts[0].size() <= 3 && i < parts.size() && alpha(parts[i], 3, 3); ++k) ++i;
  if (i < parts.size() && alpha(parts[i], 4, 4)) ++i;                                  // script
  if (i < parts.size() && (alpha(parts[i], 2, 2) || digits(parts[i], 3))) ++i;         // region
  while (i < parts.size() && (alnum(parts[i], 5, 8) || (parts[i].size() == 4 && std::isdigit(static_cast<unsigned char>(parts[i][0])))))
    ++i;  // variants
  while (i < parts.size() && parts[i].size() == 1 && parts[i] != "x") {  // extensions
    const std::string singleton = parts[i++];
    std::size_t n = 0;
    while (i < parts.size() && alnum(parts[i], 2, 8)) ++i, ++n;
    if (n == 0) return "the extension '" + singleton + "-' needs a part of 2-8 letters or digits after it";
  }
  if (i < parts.size() && parts[i] == "x") {
    if (i + 1 == parts.size()) return "a private-use part needs something after 'x-'";
    return {};
  }
  if (i < parts.size()) return "the part '" + parts[i] + "' is not a script (4 letters), region (2 letters or 3 digits) or variant here";
  return {};
}

BaseDirection language_direction(std::string_view tag) {
  if (tag.empty()) return BaseDirection::from_text;
  const std::vector<std::string> parts = subtags(tag);
  for (std::size_t i = 1; i < parts.size() && parts[i].size() != 1; ++i)
    if (alpha(parts[i], 4, 4)) return listed(parts[i], kRtlScripts) ? BaseDirection::right_to_left : BaseDirection::left_to_right;
  return listed(parts[0], kRtlLanguages) ? BaseDirection::right_to_left : BaseDirection::left_to_right;
}

}  // namespace forme
