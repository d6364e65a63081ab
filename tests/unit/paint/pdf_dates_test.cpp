// PDF dates and SOURCE_DATE_EPOCH.
// - Date form: ISO 32000-1 §7.9.4, `D:YYYYMMDDHHmmSS` then `Z` for UTC.
// - Seconds since the epoch: the closed formula of POSIX.1-2017 (XBD §4.16,
//   "Seconds Since the Epoch"), evaluated here independently of the code's
//   gmtime_r.
// - Accepted values: the reproducible-builds.org SOURCE_DATE_EPOCH
//   specification (an integer as `date +%s` prints it; a malformed value
//   should stop the run, recalled from memory).
#include "paint/pdf_dates.h"

#include <catch2/catch.hpp>
#include <cstdint>
#include <random>
#include <string>

#include "base/diagnostic.h"

using forme::parse_source_date_epoch;
using forme::pdf_date_utc;

namespace {

/// POSIX.1-2017 XBD §4.16 with tm_year = years since 1900, tm_yday 0-based.
std::int64_t posix_seconds(std::int64_t year, int month, int day, int h, int m, int s) {
  static const int kDaysBefore[] = {0, 31, 59, 90, 120, 151, 181, 212, 243, 273, 304, 334};
  const bool leap = (year % 4 == 0 && year % 100 != 0) || year % 400 == 0;  // Gregorian rule
  const std::int64_t yday = kDaysBefore[month - 1] + (leap && month > 2 ? 1 : 0) + day - 1;
  const std::int64_t y = year - 1900;
  return s + m * 60 + h * 3600 + yday * 86400 + (y - 70) * 31536000 + ((y - 69) / 4) * 86400 -
         ((y - 1) / 100) * 86400 + ((y + 299) / 400) * 86400;
}

/// Reads `D:YYYYMMDDHHmmSSZ` back into seconds with the formula above.
std::int64_t seconds_of(const std::string& d) {
  REQUIRE(d.size() == 17);
  REQUIRE(d.substr(0, 2) == "D:");
  REQUIRE(d.back() == 'Z');
  auto f = [&](std::size_t at, std::size_t n) { return std::stoi(d.substr(at, n)); };
  return posix_seconds(f(2, 4), f(6, 2), f(8, 2), f(10, 2), f(12, 2), f(14, 2));
}

}  // namespace

TEST_CASE("PDF dates have the ISO 32000-1 form in UTC", "[paint][pdf-date]") {
  CHECK(pdf_date_utc(0) == "D:19700101000000Z");
  // 2000 is a leap year (divisible by 400); 951782400 s is its 29 February,
  // by the POSIX formula.
  REQUIRE(posix_seconds(2000, 2, 29, 0, 0, 0) == 951782400);
  CHECK(pdf_date_utc(951782400) == "D:20000229000000Z");
  CHECK(pdf_date_utc(951782400 - 1) == "D:20000228235959Z");
  CHECK(pdf_date_utc(forme::kLastPdfDateSecond) == "D:99991231235959Z");
  CHECK_THROWS_AS(pdf_date_utc(-1), std::out_of_range);
  CHECK_THROWS_AS(pdf_date_utc(forme::kLastPdfDateSecond + 1), std::out_of_range);
}

TEST_CASE("PDF dates agree with the POSIX seconds-since-the-epoch formula", "[paint][pdf-date]") {
  std::mt19937_64 rng(20240229);
  std::uniform_int_distribution<std::int64_t> any(0, forme::kLastPdfDateSecond);
  for (int i = 0; i < 2000; ++i) {
    const std::int64_t t = any(rng);
    INFO(t);
    CHECK(seconds_of(pdf_date_utc(t)) == t);
  }
}

TEST_CASE("SOURCE_DATE_EPOCH: unset, digits, and refusals", "[paint][pdf-date]") {
  CHECK_FALSE(parse_source_date_epoch(nullptr).has_value());
  CHECK(parse_source_date_epoch("0") == std::int64_t{0});
  CHECK(parse_source_date_epoch("1709208000") == std::int64_t{1709208000});
  CHECK(parse_source_date_epoch("253402300799") == forme::kLastPdfDateSecond);
  for (const char* bad : {"", "-1", "+5", "12.5", " 1", "1 ", "1e9", "0x10", "now", "253402300800",
                          "99999999999999999999999"}) {
    INFO("'" << bad << "'");
    try {
      parse_source_date_epoch(bad);
      FAIL("accepted");
    } catch (const forme::InputError& e) {
      CHECK(e.diagnostic().loc.file == "SOURCE_DATE_EPOCH");
      CHECK_FALSE(e.diagnostic().message.empty());
    }
  }
}
