#include "paint/pdf_dates.h"

#include <time.h>

#include <cstdio>
#include <stdexcept>

#include "base/diagnostic.h"

namespace forme {

std::string pdf_date_utc(std::int64_t unix_seconds) {
  if (unix_seconds < 0 || unix_seconds > kLastPdfDateSecond)
    throw std::out_of_range("PDF date outside 1970-01-01 .. 9999-12-31");
  const auto t = static_cast<time_t>(unix_seconds);
  struct tm u {};
  if (!gmtime_r(&t, &u)) throw std::out_of_range("PDF date: gmtime_r failed");
  char buf[64];  // room for any int the compiler can imagine in each field
  std::snprintf(buf, sizeof buf, "D:%04d%02d%02d%02d%02d%02dZ", u.tm_year + 1900, u.tm_mon + 1, u.tm_mday,
                u.tm_hour, u.tm_min, u.tm_sec);
  return buf;
}

std::optional<std::int64_t> parse_source_date_epoch(const char* value) {
  if (!value) return std::nullopt;
  const std::string v = value;
  auto refuse = [&]() -> InputError {
    return InputError(SourceLoc{"SOURCE_DATE_EPOCH"},
                      "'" + v + "' is not a whole number of seconds since 1970-01-01 00:00:00 UTC",
                      "set it to the output of `date +%s`, or unset it to date the file now");
  };
  // Digits only, as `date +%s` prints them; 12 digits already exceed the last
  // PDF year, so stopping at 13 keeps the sum from overflowing.
  if (v.empty() || v.size() > 13) throw refuse();
  std::int64_t s = 0;
  for (char c : v) {
    if (c < '0' || c > '9') throw refuse();
    s = s * 10 + (c - '0');
  }
  if (s > kLastPdfDateSecond)
    throw InputError(SourceLoc{"SOURCE_DATE_EPOCH"}, "'" + v + "' lies after 9999-12-31, the last date a PDF can hold");
  return s;
}

}  // namespace forme
