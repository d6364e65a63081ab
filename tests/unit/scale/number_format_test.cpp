// Number formatting for labels. Every expected string below was written out
// by hand from the number and the rule, not produced by running forme.
#include <catch2/catch.hpp>

#include <limits>

#include "scale/number_format.h"

using forme::decimals_for_step;
using forme::format_number;
using forme::NumberFormat;
using Style = NumberFormat::Style;

namespace {

NumberFormat style(Style s, int decimals = -1) {
  NumberFormat f;
  f.style = s;
  f.decimals = decimals;
  return f;
}

std::string plain(double v, int decimals = -1) { return format_number(v, style(Style::plain, decimals)); }
std::string si(double v, int decimals = -1) { return format_number(v, style(Style::si, decimals)); }

const std::string kMinus = "\xE2\x88\x92";  // U+2212 MINUS SIGN in UTF-8

}  // namespace

TEST_CASE("plain numbers group thousands and print the shortest exact decimal", "[scale][format]") {
  CHECK(plain(12345.6) == "12,345.6");
  CHECK(plain(1234567) == "1,234,567");
  CHECK(plain(999) == "999");
  CHECK(plain(1000) == "1,000");
  CHECK(plain(100000) == "100,000");
  CHECK(plain(0) == "0");
  CHECK(plain(0.1) == "0.1");
  CHECK(plain(0.000123) == "0.000123");
  CHECK(plain(2.5) == "2.5");
  // The double nearest 0.1 + 0.2 is not the double nearest 0.3; shortest
  // exact keeps every digit that tells them apart.
  CHECK(plain(0.1 + 0.2) == "0.30000000000000004");
  CHECK(plain(1e21) == "1,000,000,000,000,000,000,000");
}

TEST_CASE("fixed decimals always print, rounding half away from zero", "[scale][format]") {
  CHECK(plain(3, 2) == "3.00");
  CHECK(plain(12345.678, 1) == "12,345.7");
  CHECK(plain(2.5, 0) == "3");
  CHECK(plain(0.125, 2) == "0.13");
  // 1.005 is stored as 1.00499999999999989…; rounding the number as written
  // gives 1.01.
  CHECK(plain(1.005, 2) == "1.01");
  CHECK(plain(999.96, 1) == "1,000.0");
  CHECK(plain(9.999, 2) == "10.00");
  CHECK(plain(0.0004, 3) == "0.000");
  CHECK(plain(0.0005, 3) == "0.001");
  CHECK(plain(1234.5, 0) == "1,235");
}

TEST_CASE("negatives use U+2212, and nothing prints as minus zero", "[scale][format]") {
  CHECK(plain(-5) == kMinus + "5");
  CHECK(plain(-12345.6) == kMinus + "12,345.6");
  CHECK(plain(-0.0) == "0");
  CHECK(plain(-0.0, 2) == "0.00");
  CHECK(plain(-0.04, 1) == "0.0");
  CHECK(plain(-0.05, 1) == kMinus + "0.1");
  CHECK(plain(-2.5, 0) == kMinus + "3");
  CHECK(si(-1500) == kMinus + "1.5k");
  CHECK(format_number(-0.001, style(Style::fraction_percent, 0)) == "0%");
}

TEST_CASE("separators, grouping switch, prefix and suffix", "[scale][format]") {
  NumberFormat f;
  f.thousands = false;
  CHECK(format_number(12345.6, f) == "12345.6");
  f.thousands = true;
  f.group_separator = "\u2009";  // thin space
  f.decimal_separator = ",";
  CHECK(format_number(12345.6, f) == "12\u2009345,6");
  NumberFormat money;
  money.prefix = "£";
  money.suffix = " t";
  money.decimals = 1;
  CHECK(format_number(-1234.5, money) == kMinus + "£1,234.5 t");
  CHECK(format_number(0, money) == "£0.0 t");
}

TEST_CASE("percent styles", "[scale][format]") {
  CHECK(format_number(12.5, style(Style::percent)) == "12.5%");
  CHECK(format_number(100, style(Style::percent)) == "100%");
  CHECK(format_number(0.125, style(Style::fraction_percent)) == "12.5%");
  // 0.07 × 100 is 7.000000000000001 in binary; the decimal point moves instead.
  CHECK(format_number(0.07, style(Style::fraction_percent)) == "7%");
  CHECK(format_number(0.0005, style(Style::fraction_percent)) == "0.05%");
  CHECK(format_number(12.3456, style(Style::fraction_percent)) == "1,234.56%");
  CHECK(format_number(0.12345, style(Style::fraction_percent, 1)) == "12.3%");
  CHECK(format_number(0.5, style(Style::fraction_percent, 1)) == "50.0%");
  CHECK(format_number(-0.25, style(Style::fraction_percent)) == kMinus + "25%");
}

TEST_CASE("SI prefixes keep the mantissa below 1000", "[scale][format]") {
  CHECK(si(0) == "0");
  CHECK(si(1) == "1");
  CHECK(si(999) == "999");
  CHECK(si(1000) == "1k");
  CHECK(si(12300) == "12.3k");
  CHECK(si(4.5e6) == "4.5M");
  CHECK(si(1.2e9) == "1.2G");
  CHECK(si(7e12) == "7T");
  CHECK(si(2.5e15) == "2,500T");  // no prefix beyond tera
  CHECK(si(0.5) == "500m");
  CHECK(si(0.0123) == "12.3m");
  CHECK(si(4.5e-6) == "4.5µ");
  CHECK(si(4.5e-9) == "0.0045µ");  // no prefix below micro
  // Rounding that reaches 1000 moves up a prefix.
  CHECK(si(999960, 1) == "1.0M");
  CHECK(si(999940, 1) == "999.9k");
  CHECK(si(999.7, 0) == "1k");
  CHECK(si(1500, 2) == "1.50k");
  // Rounding to zero leaves no prefix.
  CHECK(si(1e-9, 0) == "0");
}

TEST_CASE("non-finite values", "[scale][format]") {
  const double inf = std::numeric_limits<double>::infinity();
  CHECK(plain(std::numeric_limits<double>::quiet_NaN()) == "NaN");
  CHECK(plain(inf) == "∞");
  CHECK(plain(-inf) == kMinus + "∞");
  CHECK(format_number(inf, style(Style::percent)) == "∞");
}

TEST_CASE("decimals_for_step shows each tick of the step exactly", "[scale][format]") {
  CHECK(decimals_for_step(1) == 0);
  CHECK(decimals_for_step(100) == 0);
  CHECK(decimals_for_step(2.5) == 1);
  CHECK(decimals_for_step(0.1) == 1);
  CHECK(decimals_for_step(0.2) == 1);
  CHECK(decimals_for_step(0.25) == 2);
  CHECK(decimals_for_step(0.125) == 3);
  CHECK(decimals_for_step(0.002) == 3);
  CHECK(decimals_for_step(1e-5) == 5);
  CHECK(decimals_for_step(5e-7) == 7);
  CHECK(decimals_for_step(2.5e6) == 0);
  // A step computed in binary arithmetic still counts as its decimal.
  CHECK(decimals_for_step(0.1 + 0.2) == 1);
  // No short exact decimal: two significant digits.
  CHECK(decimals_for_step(1.0 / 3) == 2);
  CHECK(decimals_for_step(100.0 / 3) == 0);
  CHECK(decimals_for_step(0) == 0);
  CHECK(decimals_for_step(-1) == 0);
  CHECK(decimals_for_step(std::numeric_limits<double>::quiet_NaN()) == 0);
  CHECK(decimals_for_step(std::numeric_limits<double>::infinity()) == 0);
}

TEST_CASE("power of ten writes every value against one stated power", "[scale][format]") {
  NumberFormat f;
  f.style = Style::power_of_ten;
  f.exponent = 308;
  f.decimals = 1;
  // 1.5e308 = 1.5 × 10^308, written with superscript digits (U+00B3, U+2070, U+2078).
  CHECK(format_number(1.5e308, f) == "1.5×10³⁰⁸");
  CHECK(format_number(5e307, f) == "0.5×10³⁰⁸");
  CHECK(format_number(-1e308, f) == "\u22121.0×10³⁰⁸");
  CHECK(format_number(0.0, f) == "0.0");  // zero needs no power
  f.exponent = -6;
  f.decimals = 0;
  // 2.5e-6 rounds half away from zero to 3 × 10^-6 (superscript minus U+207B).
  CHECK(format_number(2.5e-6, f) == "3×10⁻⁶");
}

TEST_CASE("axes choose a power of ten only for very large or very small values", "[scale][format]") {
  using forme::automatic_format;
  // forme's own thresholds: plain digits below 10^15 and down to 10^-5.
  CHECK(automatic_format(9e14, 1e14).style == Style::plain);
  CHECK(automatic_format(1e-5, 2e-6).style == Style::plain);
  const NumberFormat big = automatic_format(1.5e308, 5e307);
  CHECK(big.style == Style::power_of_ten);
  CHECK(big.exponent == 308);
  CHECK(big.decimals == 1);  // a step of 0.5 × 10^308 needs one decimal
  const NumberFormat small = automatic_format(4e-7, 1e-7);
  CHECK(small.exponent == -7);
  CHECK(small.decimals == 0);
  CHECK(automatic_format(1e3, 1e2, true).exponent == 3);  // asked for by the author
}

// Value labels show each value as the data hold it: every significant digit
// of a value with at most six (a value someone typed), three of one with
// more (a computed value; three is common practice for labels read at a
// glance), integer digits always kept. The old rule (always three) wrote
// 1.48 and 0.67 as "1.5" and "0.67" beside a 1-decimal axis, and cut typed
// data (46.449 → "46.4"); it is replaced deliberately. Expected strings
// worked by hand from the rule.
TEST_CASE("format_value writes a label's value as the data hold it", "[scale][format]") {
  using forme::format_value;
  NumberFormat plain;
  CHECK(format_value(46.449, plain) == "46.449");
  CHECK(format_value(47, plain) == "47");
  CHECK(format_value(1234.5, plain) == "1,234.5");
  CHECK(format_value(46449, plain) == "46,449");
  CHECK(format_value(0.04567, plain) == "0.04567");
  CHECK(format_value(1.48, plain) == "1.48");
  CHECK(format_value(-0.67, plain) == kMinus + "0.67");  // minus sign U+2212
  CHECK(format_value(0, plain) == "0");
  // Computed: 100 × 103/99 = 104.0404…, seventeen digits → three, whole digits kept.
  CHECK(format_value(100.0 * 103 / 99, plain) == "104");
  CHECK(format_value(0.1 + 0.2, plain) == "0.3");       // 0.30000000000000004 → three digits → 0.3
  CHECK(format_value(-2.0 / 3, plain) == kMinus + "0.667");
  CHECK(format_value(1234567.891, plain) == "1,234,568");  // ten digits: computed-looking, whole digits kept
  NumberFormat si;
  si.style = Style::si;
  // SI is asked-for compactness: three significant digits (common practice),
  // the prefix chosen after rounding (999,960 → 1.00M → "1M").
  CHECK(format_value(46449, si) == "46.4k");
  CHECK(format_value(999'960, si) == "1M");
  CHECK(format_value(0.04567, si) == "45.7m");
  CHECK(format_value(2'500, si) == "2.5k");  // fewer digits than three stay as held
  NumberFormat share;
  share.style = Style::fraction_percent;
  CHECK(format_value(0.125, share) == "12.5%");
  NumberFormat pct;
  pct.style = Style::percent;
  CHECK(format_value(12.345, pct) == "12.345%");
  NumberFormat fixed;
  fixed.decimals = 2;
  CHECK(format_value(46.449, fixed) == "46.45");  // the author's decimals win
}

// Value labels written against a power of ten take each value's own power,
// mantissa in [1, 10): 0.78e9 is 7.8 × 10^8 (worked by hand).
TEST_CASE("power-of-ten value labels: right mantissa, right exponent", "[scale][format]") {
  NumberFormat axis;
  axis.style = Style::power_of_ten;
  axis.exponent = 9;  // the axis's shared power is not the labels'
  const NumberFormat f = forme::value_format({3.4e9, 1.25e9, 0.78e9}, axis);
  CHECK(format_number(3.4e9, f) == "3.4×10⁹");
  CHECK(format_number(1.25e9, f) == "1.25×10⁹");
  CHECK(format_number(0.78e9, f) == "7.8×10⁸");
  CHECK(format_number(-4.5e-7, f) == kMinus + "4.5×10⁻⁷");
  CHECK(format_number(0, f) == "0");
  // Rounding that carries into the next power moves the power: 9.996e8 to
  // three significant digits is 1.00e9, written 1×10⁹ (no trailing zeros).
  NumberFormat three = f;
  three.significant = 3;
  CHECK(format_number(9.996e8, three) == "1×10⁹");
}

// The old power-of-ten tick writing "31,622,800.000×10⁰" came from a log
// axis; a linear axis asked for powers writes one shared power with the
// mantissa digits its step needs (worked by hand: step 0.5 × 10^9 → 1 decimal).
TEST_CASE("shared power of ten: mantissas to the step's digits", "[scale][format]") {
  NumberFormat f = forme::automatic_format(3.5e9, 5e8, true);
  CHECK(f.exponent == 9);
  CHECK(f.decimals == 1);
  CHECK(format_number(3.5e9, f) == "3.5×10⁹");
  CHECK(format_number(1e9, f) == "1.0×10⁹");
}

// Labels of one panel must tell different values apart (worked by hand).
TEST_CASE("value_format adds digits until different values print differently", "[scale][format]") {
  NumberFormat plain;
  // Typed values: each keeps its own digits; the shared count is the most held (4).
  const NumberFormat typed = forme::value_format({61.0, 61.66, 1.48, 0.67}, plain);
  CHECK(format_number(61.0, typed) == "61");
  CHECK(format_number(61.66, typed) == "61.66");
  CHECK(format_number(1.48, typed) == "1.48");
  CHECK(format_number(0.67, typed) == "0.67");
  // Computed values that agree to four digits (104, 103.5) get a fifth, shortest.
  const double a = 1034.0 / 9.99, b = 1034.4 / 9.99;  // 103.50…, 103.54…
  const NumberFormat computed = forme::value_format({a, b}, plain);
  CHECK(format_number(a, computed) == "103.5");
  CHECK(format_number(b, computed) == "103.54");
  // Equal values may print alike.
  const NumberFormat same = forme::value_format({2.0 / 3, 2.0 / 3}, plain);
  CHECK(format_number(2.0 / 3, same) == "0.667");
}

TEST_CASE("significant digits never drop digits left of the point", "[scale][format]") {
  NumberFormat f;
  f.significant = 2;
  CHECK(format_number(1234.5, f) == "1,235");  // worked by hand
  CHECK(format_number(0.012345, f) == "0.012");
  CHECK(format_number(9.96, f) == "10");
  f.style = Style::si;
  CHECK(format_number(46449, f) == "46k");
  CHECK(format_number(999'600, f) == "1M");  // 999.6k → 1000k carries to the next prefix
}

TEST_CASE("powers of ten in superscript digits", "[scale][format]") {
  // Superscript digits U+2070, U+00B9, U+00B2, U+00B3, U+2074…U+2079; minus U+207B.
  CHECK(forme::power_of_ten_text(6) == "10⁶");
  CHECK(forme::power_of_ten_text(-4) == "10⁻⁴");
  CHECK(forme::power_of_ten_text(0) == "10⁰");
  CHECK(forme::power_of_ten_text(-10) == "10⁻¹⁰");
}
