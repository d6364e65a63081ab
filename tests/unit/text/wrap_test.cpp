// Line breaking (text/wrap.h). Break opportunities follow UAX #14
// (Unicode Standard Annex #14, Unicode Line Breaking Algorithm): breaks
// after spaces (LB18), after a hyphen before letters (LB21 forbids a break
// before it, not after), none inside a word; recalled from the annex's rules.
#include <catch2/catch.hpp>

#include "text/font.h"
#include "text/wrap.h"

using namespace forme;

namespace {

FontRef regular() {
  static FontSet fonts = open_bundled_fonts(find_font_dir(FORME_BINARY));
  return fonts.regular;
}

}  // namespace

TEST_CASE("the widest word is the widest run UAX #14 allows no break in", "[text][wrap]") {
  const WidestWord w = widest_word("a tiny AVeryLongUnbreakableWord and more", regular(), 10);
  CHECK(w.text == "AVeryLongUnbreakableWord");
  CHECK(w.width == Approx(shape_text("AVeryLongUnbreakableWord", regular(), 10).width));
}

TEST_CASE("a hyphen is a break opportunity after it, so hyphenated parts are words of their own", "[text][wrap]") {
  const WidestWord w = widest_word("St Aldhelm's-by-the-Water", regular(), 10);
  CHECK(w.text == "Aldhelm's-");
}

TEST_CASE("shortened text is the longest start at a break that fits, then an ellipsis", "[text][wrap]") {
  const std::string s = "Northern Uplands and Coastal Fringe";
  const double w = shape_text("Northern Uplands\u2026", regular(), 8).width + 0.5;
  const ShapedText t = shorten_text(s, regular(), 8, w);
  CHECK(t.utf8 == "Northern Uplands\u2026");
  CHECK(t.width <= w);
}

TEST_CASE("text that fits is not shortened", "[text][wrap]") {
  const ShapedText t = shorten_text("Lower Marsh", regular(), 8, 500);
  CHECK(t.utf8 == "Lower Marsh");
}

TEST_CASE("wrapped lines keep every word and stay within the width", "[text][wrap]") {
  const std::string s = "Megalitres a day lost between treatment works and customer meters";
  const double w = 80;
  std::string joined;
  for (const auto& l : wrap_text(s, regular(), 8, w)) {
    CHECK(l.width <= w);
    joined += (joined.empty() ? "" : " ") + l.utf8;
  }
  CHECK(joined == s);
}
