// PDF object syntax as forme reads and writes it.
// - Names: ISO 32000-1 §7.3.5 and its Table 4 examples (recalled from
//   memory: "Adobe Green" is /Adobe#20Green, "paired()parentheses" is
//   /paired#28#29parentheses, "The_Key_of_F#_Minor" is /The_Key_of_F#23_Minor).
// - Literal strings: §7.3.4.2 (balanced parentheses; \( \) \\ and \ddd).
// - Text strings: §7.9.2.2, UTF-16BE with the byte order mark FE FF; the
//   UTF-16BE bytes are compared with glibc's iconv, an independent encoder.
// - Dictionaries and references: §7.3.7, §7.3.10; comments §7.2.3.
#include "paint/pdf_syntax.h"

#include <catch2/catch.hpp>
#include <cctype>
#include <cstdio>
#include <string>

#include "support/outside_tools.h"

using namespace forme::pdf;

namespace {

// Cairo 1.16 writes a page like this, a comment inside the dictionary.
constexpr const char* kPage =
    "\n<< /Type /Page % 1\n   /Parent 1 0 R\n   /MediaBox [ 0 0 841.889764 595.275591 ]\n"
    "   /Contents 16 0 R\n   /Group <<\n      /Type /Group\n      /S /Transparency\n   >>\n"
    "   /Resources 15 0 R\n   /StructParents 0\n>>\n";

// The UTF-16BE bytes iconv makes of `utf8`, as upper-case hexadecimal.
std::string iconv_utf16be(const std::string& utf8) {
  forme::test::TempDir dir;
  forme::test::write_file(dir.file("in.txt"), utf8);
  auto r = forme::test::run("iconv -f UTF-8 -t UTF-16BE '" + dir.file("in.txt") + "' | od -An -tx1 -v");
  REQUIRE(r.exit_code == 0);
  std::string hex;
  for (char c : r.out)
    if (std::isxdigit(static_cast<unsigned char>(c))) hex += static_cast<char>(std::toupper(static_cast<unsigned char>(c)));
  return hex;
}

}  // namespace

TEST_CASE("dict_value finds a key's whole value, past comments, nested dictionaries and longer keys",
          "[paint][pdf]") {
  CHECK(dict_value(kPage, "/Parent") == "1 0 R");
  CHECK(dict_value(kPage, "/MediaBox") == "[ 0 0 841.889764 595.275591 ]");
  CHECK(dict_value(kPage, "/Group")->substr(0, 2) == "<<");
  CHECK(dict_value(kPage, "/Group")->back() == '>');
  CHECK(dict_value(kPage, "/Type") == "/Page");          // the comment after it is not part of it
  CHECK(dict_value(kPage, "/S") == std::nullopt);         // only in the nested dictionary
  CHECK(dict_value(kPage, "/StructParents") == "0");
  CHECK(dict_value(kPage, "/Struct") == std::nullopt);  // a key is a whole name
  // A string that looks like a dictionary's end or a key is one value.
  CHECK(dict_value("<< /T (a >> /B \\) ( nested ) c) /B 2 >>", "/B") == "2");
  CHECK(dict_value("<< /T <3E3E> /B /N >>", "/B") == "/N");
}

TEST_CASE("dict_value and dict_with refuse malformed text without reading past it", "[paint][pdf]") {
  for (const char* bad : {"", "<<", "<< /A (unclosed >>", "<< /A [ 1 2 >>", "<< A 1 >>", "<< /A ) >>", "(<< /A 1 >>"}) {
    INFO(bad);
    CHECK(dict_value(bad, "/A") == std::nullopt);
    CHECK_THROWS(dict_with(bad, "/A", "1"));
  }
  std::string deep;
  for (int i = 0; i < 10'000; ++i) deep += "<< /A ";
  CHECK(dict_value(deep, "/A") == std::nullopt);  // no stack overflow
}

TEST_CASE("dict_with replaces a key's entry instead of adding a second one", "[paint][pdf]") {
  const std::string info = "<< /Producer (cairo) /CreationDate (20240229120000Z) >>";
  const std::string dated = dict_with(info, "/CreationDate", "(D:20240229120000Z)");
  CHECK(dict_value(dated, "/CreationDate") == "(D:20240229120000Z)");
  CHECK(dated.find("(20240229120000Z)") == std::string::npos);
  CHECK(dict_value(dated, "/Producer") == "(cairo)");
  const std::string page = dict_with(kPage, "/TrimBox", "[ 1 2 3 4 ]");
  CHECK(dict_value(page, "/TrimBox") == "[ 1 2 3 4 ]");
  CHECK(dict_value(page, "/Contents") == "16 0 R");
  CHECK(dict_value(page, "/StructParents") == "0");
}

TEST_CASE("references and arrays are read as whole values", "[paint][pdf]") {
  CHECK(reference("12 0 R") == 12);
  CHECK(reference(" 7 0 R\n") == 7);
  CHECK(reference("12") == std::nullopt);
  CHECK(reference("[ 12 0 R ]") == std::nullopt);
  CHECK(reference("-3 0 R") == std::nullopt);
  CHECK(reference("0 0 R") == std::nullopt);  // object 0 is never in use (§7.5.4)
  const auto items = array_items("[ 3 0 R /Name (a ] b) [ 1 2 ] << /K 4 0 R >> 12 ]");
  REQUIRE(items.size() == 6);
  CHECK(items[0] == "3 0 R");
  CHECK(items[2] == "(a ] b)");
  CHECK(items[3] == "[ 1 2 ]");
  CHECK(items[5] == "12");
  CHECK(array_items("5 0 R") == std::vector<std::string_view>{"5 0 R"});
  CHECK(is_name(" /Figure ", "/Figure"));
  CHECK_FALSE(is_name("/FigureX", "/Figure"));
}

TEST_CASE("names, strings and numbers are written as ISO 32000-1 spells them", "[paint][pdf]") {
  CHECK(name("Adobe Green") == "/Adobe#20Green");
  CHECK(name("paired()parentheses") == "/paired#28#29parentheses");
  CHECK(name("The_Key_of_F#_Minor") == "/The_Key_of_F#23_Minor");
  CHECK(name("text/csv") == "/text#2Fcsv");
  CHECK(byte_string("a (b) \\ c") == "(a \\(b\\) \\\\ c)");
  CHECK(byte_string(std::string("tab\there\n", 9)) == "(tab\\011here\\012)");
  CHECK(text_string("Reservoirs 2026") == "(Reservoirs 2026)");
  CHECK(number(12) == "12");
  CHECK(number(0.5) == "0.5");
  CHECK(number(841.889764) == "841.8898");
  CHECK(number(-0.00001) == "0");
}

TEST_CASE("text strings outside ASCII are UTF-16BE with a byte order mark, as iconv encodes them", "[paint][pdf]") {
  REQUIRE(forme::test::have_tool("iconv"));
  for (const std::string s : {"Lac de la décharge", "\xE5\x8F\x8C\xE6\xB8\xAF", "cargo \xF0\x9F\x9A\xA2 ferry",
                              "Spannungsabfall \xE2\x88\x92 3 %"}) {
    INFO(s);
    CHECK(text_string(s) == "<FEFF" + iconv_utf16be(s) + ">");
  }
  // A supplementary character becomes a surrogate pair (U+10437 is D801 DC37,
  // the Unicode Standard's worked example, recalled from memory).
  CHECK(text_string("\xF0\x90\x90\xB7") == "<FEFFD801DC37>");
  // A stray continuation byte and a truncated sequence become U+FFFD.
  CHECK(text_string("a\x80z\xE2\x88") == "<FEFF0061FFFD007AFFFDFFFD>");
}
