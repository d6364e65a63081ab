// Language tags and the direction they give a line (text/language.h,
// text/bidi.h). Well-formed and ill-formed tags are the examples of RFC
// 5646 Appendix A ("Examples of Language Tags (Informative)"); directions
// of scripts from Unicode's bidi classes (Hebrew letters R, Arabic AL,
// Latin L); rule P3 and HL1 from UAX #9 §3.3.1 and §4.3.
#include <catch2/catch.hpp>

#include "text/bidi.h"
#include "text/font.h"
#include "text/language.h"
#include "text/shaped_text.h"

using namespace forme;

TEST_CASE("the tags of RFC 5646 Appendix A are well formed", "[text][language]") {
  for (const char* tag : {"de", "fr", "ja", "zh-Hant", "zh-Hans", "sr-Cyrl", "sr-Latn", "zh-cmn-Hans-CN", "cmn-Hans-CN",
                          "zh-yue-HK", "yue-HK", "zh-Hans-CN", "sr-Latn-RS", "sl-rozaj", "sl-rozaj-biske", "sl-nedis",
                          "de-CH-1901", "sl-IT-nedis", "hy-Latn-IT-arevela", "de-DE", "en-US", "es-419",
                          "de-CH-x-phonebk", "az-Arab-x-AZE-derbend", "x-whatever", "qaa-Qaaa-QM-x-southern",
                          "de-Qaaa", "sr-Latn-QM", "sr-Qaaa-RS", "en-US-u-islamcal", "zh-CN-a-myext-x-private",
                          "en-a-myext-b-another", "EN-gb", "he", "ar-EG",
                          "english"}) {  // 5-8 letters: the shape of a registered language (RFC 5646 §2.2.1), kept
    INFO(tag);
    CHECK(language_tag_problem(tag).empty());
  }
}

TEST_CASE("ill-formed tags are refused with the part at fault", "[text][language]") {
  // RFC 5646 Appendix A: "de-419-DE" (two region tags), "a-DE" (a
  // single-character subtag in primary position).
  CHECK(language_tag_problem("de-419-DE").find("'de'") != std::string::npos);
  CHECK_FALSE(language_tag_problem("a-DE").empty());
  // Underscores (a common slip: "en_GB") and empty parts are not BCP 47.
  CHECK(language_tag_problem("en_GB").find("'en_gb'") != std::string::npos);
  CHECK_FALSE(language_tag_problem("en--GB").empty());
  CHECK_FALSE(language_tag_problem("en-").empty());
  CHECK_FALSE(language_tag_problem("").empty());
  CHECK_FALSE(language_tag_problem("en-GB-x").empty());
  CHECK_FALSE(language_tag_problem("en-u").empty());
  CHECK_FALSE(language_tag_problem("toolongname").empty());
}

TEST_CASE("a language's direction comes from its script subtag, else its usual script", "[text][language]") {
  CHECK(language_direction("he") == BaseDirection::right_to_left);
  CHECK(language_direction("ar-EG") == BaseDirection::right_to_left);
  CHECK(language_direction("fa-IR") == BaseDirection::right_to_left);
  CHECK(language_direction("ur") == BaseDirection::right_to_left);
  CHECK(language_direction("en-GB") == BaseDirection::left_to_right);
  CHECK(language_direction("az-Arab") == BaseDirection::right_to_left);   // Azerbaijani in Arabic script
  CHECK(language_direction("ku-Latn") == BaseDirection::left_to_right);
  CHECK(language_direction("ar-Latn") == BaseDirection::left_to_right);   // romanised Arabic
  CHECK(language_direction("") == BaseDirection::from_text);
}

TEST_CASE("a stated base direction replaces the first strong character's", "[text][bidi]") {
  // "ירושלים leads": the first strong character is Hebrew (R), so by P2-P3
  // the paragraph is right to left and the Latin letters sit at level 2;
  // stated left to right (HL1), the Latin letters are at level 0 and the
  // Hebrew at level 1.
  const std::u32string line = U"\u05D9\u05E8\u05D5\u05E9\u05DC\u05D9\u05DD leads";
  const auto from_text = bidi_levels(line);
  const auto ltr = bidi_levels(line, BaseDirection::left_to_right);
  CHECK(from_text.back() == 2);
  CHECK(from_text.front() == 1);
  CHECK(ltr.back() == 0);
  CHECK(ltr.front() == 1);
  CHECK(bidi_levels(U"Alderbrook", BaseDirection::right_to_left).front() == 2);
}

TEST_CASE("shaped in a stated direction, the Hebrew name comes first on the line and the width is unchanged",
          "[text][bidi]") {
  static FontSet fonts = open_bundled_fonts(find_font_dir(FORME_BINARY));
  const std::string text = "\u05D9\u05E8\u05D5\u05E9\u05DC\u05D9\u05DD leads the list";
  ShapeOptions ltr;
  ltr.direction = BaseDirection::left_to_right;
  const ShapedText a = shape_text(text, fonts.bold, 12), b = shape_text(text, fonts.bold, 12, ltr);
  REQUIRE(a.runs.size() >= 2);
  REQUIRE(b.runs.size() >= 2);
  CHECK_FALSE(a.runs.front().rtl);  // right-to-left paragraph: the English is set first, at the left
  CHECK(b.runs.front().rtl);        // left-to-right paragraph: the Hebrew name leads
  CHECK(b.width == Approx(a.width).margin(0.01));
  CHECK(b.options.direction == BaseDirection::left_to_right);
}
