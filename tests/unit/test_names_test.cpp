// ctest learns each Catch2 test case by name (catch_discover_tests), and
// CMake lists are separated by ';' (and a '[' ... ']' pair shields what is
// between from splitting): such a name would merge tests into a single
// entry that runs nothing. Keep every name discoverable.
#include <catch2/catch.hpp>

#include <filesystem>
#include <fstream>
#include <regex>
#include <sstream>

TEST_CASE("test case names hold no semicolon or square bracket and start with no dash", "[meta]") {
  static const std::regex name(R"re(TEST_CASE\(\s*"([^"]*)")re");
  int seen = 0;
  for (const auto& e : std::filesystem::recursive_directory_iterator(FORME_TEST_DIR)) {
    if (e.path().extension() != ".cpp") continue;
    std::ifstream in(e.path());
    std::stringstream ss;
    ss << in.rdbuf();
    const std::string text = ss.str();
    for (std::sregex_iterator it(text.begin(), text.end(), name), end; it != end; ++it) {
      ++seen;
      INFO(e.path().string() << ": " << (*it)[1]);
      CHECK((*it)[1].str().find_first_of(";[]") == std::string::npos);
      CHECK((*it)[1].str().rfind('-', 0) != 0);  // a leading '-' reads as an option
    }
  }
  CHECK(seen > 100);
}
