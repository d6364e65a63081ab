// Colour values in page descriptions: accepted forms and the exact error
// text a writer sees (the caller adds file:line:col).
#include <catch2/catch.hpp>

#include "colour/convert.h"
#include "colour/palette.h"
#include "colour/parse.h"

using namespace forme;

namespace {
std::string hex_of(std::string_view text) {
  ParsedColour p = parse_colour(text);
  INFO(text << ": " << p.error);
  REQUIRE(p.colour.has_value());
  CHECK(p.error.empty());
  return to_hex(*p.colour);
}
}  // namespace

TEST_CASE("hex colours, short and long, either case", "[colour]") {
  CHECK(hex_of("#1e2228") == "#1e2228");
  CHECK(hex_of("#ABCDEF") == "#abcdef");
  CHECK(hex_of("#f80") == "#ff8800");
  CHECK(hex_of("  #000  ") == "#000000");
}

TEST_CASE("oklch() with L as a fraction or a percentage", "[colour]") {
  std::string expected = to_hex(from_oklch({0.52, 0.12, 255}));
  CHECK(hex_of("oklch(0.52 0.12 255)") == expected);
  CHECK(hex_of("oklch(52% 0.12 255)") == expected);
  CHECK(hex_of("OKLCH(0.52 0.12 255deg)") == expected);
  CHECK(hex_of("oklch( 0.52   0.12 -105 )") == expected);  // hue wraps round
  CHECK(hex_of("oklch(1 0 0)") == "#ffffff");
  // Out of gamut: chroma is reduced at the same L and hue, never rejected.
  CHECK(hex_of("oklch(0.7 0.4 150)") == to_hex(from_oklch({0.7, 0.4, 150})));
}

TEST_CASE("palette colours and inks by name", "[colour]") {
  CHECK(hex_of("estuary.1") == to_hex(find_palette("estuary")->colours[0]));
  CHECK(hex_of("fjord.9") == to_hex(find_palette("fjord")->colours[8]));
  CHECK(hex_of("ink.text") == to_hex(ink::text));
  CHECK(hex_of("ink.grid") == to_hex(ink::grid));
}

TEST_CASE("colour errors say what is wrong", "[colour]") {
  struct Case {
    std::string_view text, error, hint;
  };
  const Case cases[] = {
      {"", "empty colour",
       "write '#rrggbb', 'oklch(L C H)' or a palette colour such as 'estuary.1'"},
      {"#12", "'#12' is not a colour: a hex colour has 3 or 6 digits after '#', found 2", ""},
      {"#12345g", "'#12345g' is not a colour: 'g' is not a hex digit (0-9, a-f)", ""},
      {"oklch(0.5 0.1 200", "'oklch(0.5 0.1 200' is not a colour: 'oklch(' needs a closing ')'",
       "write it as oklch(L C H), e.g. oklch(0.52 0.12 255)"},
      {"oklch(0.5, 0.1, 200)",
       "'oklch(0.5, 0.1, 200)' is not a colour: separate the three oklch numbers with spaces, "
       "not commas",
       ""},
      {"oklch(0.5 0.1)",
       "'oklch(0.5 0.1)' is not a colour: oklch takes 3 numbers (lightness, chroma, hue), found 2",
       "e.g. oklch(0.52 0.12 255) or oklch(52% 0.12 255)"},
      {"oklch(52 0.1 200)",
       "'oklch(52 0.1 200)': lightness '52' is out of range; write 0 to 1, or 0% to 100%", ""},
      {"oklch(0.5 -0.1 200)", "'oklch(0.5 -0.1 200)': chroma '-0.1' is negative",
       "to turn the hue round, add 180 to the hue instead"},
      {"oklch(0.5 0.1 north)", "'oklch(0.5 0.1 north)': hue 'north' is not a number of degrees",
       ""},
      {"oklch(half 0.1 200)", "'oklch(half 0.1 200)': lightness 'half' is not a number", ""},
      {"oklch(0.5 0.1 nan)", "'oklch(0.5 0.1 nan)': hue 'nan' is not a number of degrees", ""},
      {"estuary", "'estuary' is a palette, not one colour: name one of its colours, "
                  "'estuary.1' to 'estuary.8'",
       ""},
      {"estuary.9", "'estuary.9': palette 'estuary' has colours 1 to 8", ""},
      {"estuary.first", "'estuary.first': after 'estuary.' comes a colour number, 1 to 8", ""},
      {"estaury.2", "'estaury.2' is not a colour or a palette name", "did you mean 'estuary'?"},
      {"red", "'red' is not a colour or a palette name",
       "write '#rrggbb', 'oklch(L C H)' or a palette colour such as 'estuary.1'"},
      {"ink.txt", "'ink.txt' is not a colour: there is no ink called 'txt'",
       "did you mean 'text'?"},
  };
  for (const Case& c : cases) {
    INFO("input: " << c.text);
    ParsedColour p = parse_colour(c.text);
    CHECK_FALSE(p.colour.has_value());
    CHECK(p.error == c.error);
    CHECK(p.hint == c.hint);
  }
}
