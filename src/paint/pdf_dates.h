#pragma once
/// Dates for the PDF document information dictionary, and the
/// SOURCE_DATE_EPOCH variable that pins them for reproducible output.
#include <cstdint>
#include <optional>
#include <string>

namespace forme {

/// Latest instant a four-digit PDF year can hold: 9999-12-31T23:59:59Z.
inline constexpr std::int64_t kLastPdfDateSecond = 253402300799;

/// The PDF date string for an instant in UTC, `D:YYYYMMDDHHmmSSZ`
/// (ISO 32000-1 §7.9.4). `unix_seconds` counts from 1970-01-01T00:00:00Z and
/// must lie in [0, kLastPdfDateSecond]; std::out_of_range otherwise.
std::string pdf_date_utc(std::int64_t unix_seconds);

/// Reads a SOURCE_DATE_EPOCH value: nullopt for nullptr (the variable is
/// unset), the seconds for a string of decimal digits up to
/// kLastPdfDateSecond, and InputError for anything else, so a mistyped value
/// stops the run rather than silently dating the file now.
std::optional<std::int64_t> parse_source_date_epoch(const char* value);

}  // namespace forme
