// Strings spooled to an unnamed temporary file come back whole and in order.
#include "paint/temp_spool.h"

#include <catch2/catch.hpp>
#include <stdexcept>
#include <string>

using forme::TextSpool;

TEST_CASE("a text spool gives back every string it was given, in order, bytes intact", "[paint]") {
  TextSpool spool;
  const std::string binary("a\0b\xff\n", 5);
  const std::string long_text(100'000, 'x');
  for (const std::string& s : {std::string("first"), std::string(), binary, long_text}) spool.push(s);
  CHECK(spool.size() == 4);
  for (int pass = 0; pass < 2; ++pass) {  // read back twice: rewind starts over
    spool.rewind();
    CHECK(spool.next() == "first");
    CHECK(spool.next().empty());
    CHECK(spool.next() == binary);
    CHECK(spool.next() == long_text);
    CHECK_THROWS_AS(spool.next(), std::runtime_error);
  }
}

TEST_CASE("an empty text spool makes no file and reads nothing", "[paint]") {
  TextSpool spool;
  spool.rewind();
  CHECK(spool.size() == 0);
  CHECK_THROWS_AS(spool.next(), std::runtime_error);
}
