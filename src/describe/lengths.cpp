#include "describe/lengths.h"

#include <cctype>
#include <charconv>
#include <cmath>

#include "base/geometry.h"

namespace forme {

namespace {
std::string_view trim(std::string_view s) {
  while (!s.empty() && std::isspace(static_cast<unsigned char>(s.front()))) s.remove_prefix(1);
  while (!s.empty() && std::isspace(static_cast<unsigned char>(s.back()))) s.remove_suffix(1);
  return s;
}
bool iequals(std::string_view a, std::string_view b) {
  if (a.size() != b.size()) return false;
  for (std::size_t i = 0; i < a.size(); ++i)
    if (std::tolower(static_cast<unsigned char>(a[i])) != std::tolower(static_cast<unsigned char>(b[i])))
      return false;
  return true;
}
}  // namespace

std::optional<double> parse_length(std::string_view text) {
  text = trim(text);
  double v = 0;
  auto [end, ec] = std::from_chars(text.data(), text.data() + text.size(), v);
  if (ec != std::errc() || !std::isfinite(v)) return std::nullopt;
  std::string_view unit = trim(std::string_view(end, static_cast<std::size_t>(text.data() + text.size() - end)));
  double k = 0;
  if (unit == "pt") k = 1;
  else if (unit == "mm") k = kPointsPerInch / kMillimetresPerInch;
  else if (unit == "cm") k = 10 * kPointsPerInch / kMillimetresPerInch;
  else if (unit == "in") k = kPointsPerInch;
  else return std::nullopt;
  return v * k;
}

const std::vector<SheetSize>& sheet_sizes() {
  // ISO 216:2007 A and B series (mm); US sizes from their inch definitions
  // (Letter 8.5 × 11 in, Legal 8.5 × 14 in, Tabloid 11 × 17 in).
  static const std::vector<SheetSize> sizes = {
      {"A0", 841, 1189}, {"A1", 594, 841}, {"A2", 420, 594}, {"A3", 297, 420},
      {"A4", 210, 297},  {"A5", 148, 210}, {"A6", 105, 148},
      {"B0", 1000, 1414}, {"B1", 707, 1000}, {"B2", 500, 707}, {"B3", 353, 500},
      {"B4", 250, 353},  {"B5", 176, 250}, {"B6", 125, 176},
      {"letter", 215.9, 279.4}, {"legal", 215.9, 355.6}, {"tabloid", 279.4, 431.8},
  };
  return sizes;
}

std::optional<SheetSize> find_sheet_size(std::string_view name) {
  name = trim(name);
  for (const auto& s : sheet_sizes())
    if (iequals(s.name, name)) return s;
  return std::nullopt;
}

std::optional<double> column_width_mm(std::string_view name) {
  if (name == "single-column") return 89.0;
  if (name == "double-column") return 178.0;
  return std::nullopt;
}

std::optional<std::pair<double, double>> parse_custom_size(std::string_view text) {
  auto x = text.find_first_of("x×");
  if (x == std::string_view::npos) return std::nullopt;
  // '×' is two bytes in UTF-8; find_first_of matched its first byte or 'x'.
  std::size_t skip = static_cast<unsigned char>(text[x]) == 'x' ? 1 : 2;
  auto w = parse_length(text.substr(0, x));
  auto h = parse_length(text.substr(x + skip));
  if (!w || !h) return std::nullopt;
  return std::make_pair(*w, *h);
}

}  // namespace forme
