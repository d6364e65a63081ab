#pragma once
/// Physical lengths and named sheet sizes.
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace forme {

/// Parses "18mm", "1.5cm", "0.25in", "9pt" (also "18 mm") into points
/// (1 pt = 1/72 in, 1 in = 25.4 mm). A bare number is refused: the unit is
/// part of the value.
std::optional<double> parse_length(std::string_view text);

struct SheetSize {
  std::string name;
  double width_mm = 0, height_mm = 0;  ///< portrait
};

/// ISO 216 A0–A6 and B0–B6, US Letter, Legal and Tabloid.
const std::vector<SheetSize>& sheet_sizes();

/// Looks a size up by name, case-insensitively ("a4", "Letter").
std::optional<SheetSize> find_sheet_size(std::string_view name);

/// Width of a journal figure size, in millimetres: "single-column" 89,
/// "double-column" 178 (common practice; journals' instructions differ,
/// mostly 85-90 mm and 170-180 mm). nullopt for other names.
std::optional<double> column_width_mm(std::string_view name);

/// Parses a custom size "WIDTH x HEIGHT" with units ("120mm x 80mm").
std::optional<std::pair<double, double>> parse_custom_size(std::string_view text);

}  // namespace forme
