// The bad-input catalogue: every folder tests/bad/NNN-name/ holds a page
// (page.yaml and any CSV files), optionally args.txt (the command line after
// the program name; default "render page.yaml -o out.pdf"), and
// expected.txt: the exit code on line 1 and the exact first line of
// standard error on line 2 (empty for a clean success).
//
// Each case runs in a copy of its folder with relative paths, so messages
// are stable. Before the run an out.pdf with known bytes is put there; a
// failed run must leave it byte-identical (output is all or nothing) and no
// run may leave a temporary ".*.tmp-*" file. Exit codes are forme's own
// contract (README: 0 success, 1 description or data error, 2 usage error).
// Folders listed in tests/bad/KNOWN-GAPS.md record behaviour forme should
// have but does not yet; they are skipped, and a check below fails if one of
// them starts passing, so the list cannot go stale.
#include <catch2/catch.hpp>

#include <algorithm>
#include <filesystem>
#include <fstream>
#include <regex>
#include <set>
#include <sstream>
#include <string>
#include <vector>

#include "support/outside_tools.h"

namespace fs = std::filesystem;
using namespace forme::test;

namespace {

const std::string kOldBytes = "%PDF-1.4\n% an earlier good output that must survive a failed run\n";

std::vector<std::string> case_folders() {
  std::vector<std::string> out;
  for (const auto& e : fs::directory_iterator(std::string(FORME_TEST_DIR) + "/bad"))
    if (e.is_directory() && std::regex_match(e.path().filename().string(), std::regex("[0-9]{3}-[a-z0-9-]+")))
      out.push_back(e.path().filename().string());
  std::sort(out.begin(), out.end());
  return out;
}

std::set<std::string> known_gaps() {
  std::set<std::string> out;
  std::ifstream in(std::string(FORME_TEST_DIR) + "/bad/KNOWN-GAPS.md");
  std::string line;
  static const std::regex item(R"(- ([0-9]{3}-[a-z0-9-]+):.*)");
  std::smatch m;
  while (std::getline(in, line))
    if (std::regex_match(line, m, item)) out.insert(m[1]);
  return out;
}

std::string first_line(const std::string& s) { return s.substr(0, s.find('\n')); }

std::string trim(std::string s) {
  while (!s.empty() && (s.back() == '\n' || s.back() == '\r' || s.back() == ' ')) s.pop_back();
  return s;
}

struct Outcome {
  int exit_code = -1;
  std::string first_err;
  bool output_kept = false;   // out.pdf still holds kOldBytes
  bool output_is_pdf = false; // out.pdf was replaced by a PDF
  std::vector<std::string> leftovers;  // temporary files left behind
};

Outcome run_case(const std::string& name) {
  const fs::path src = fs::path(FORME_TEST_DIR) / "bad" / name;
  TempDir tmp;
  fs::copy(src, tmp.path(), fs::copy_options::recursive);
  fs::remove(fs::path(tmp.path()) / "expected.txt");
  write_file(tmp.file("out.pdf"), kOldBytes);
  std::string args = "render page.yaml -o out.pdf";
  if (fs::exists(src / "args.txt")) args = trim(read_file((src / "args.txt").string()));
  CommandResult r = run("cd '" + tmp.path() + "' && timeout 60 " + std::string(FORME_BINARY) + " " + args);
  Outcome o;
  o.exit_code = r.exit_code;
  o.first_err = first_line(r.err);
  const std::string now = read_file(tmp.file("out.pdf"));
  o.output_kept = now == kOldBytes;
  o.output_is_pdf = now.rfind("%PDF-", 0) == 0 && now != kOldBytes;
  for (const auto& e : fs::recursive_directory_iterator(tmp.path()))
    if (e.path().filename().string().find(".tmp-") != std::string::npos) o.leftovers.push_back(e.path().string());
  return o;
}

}  // namespace

TEST_CASE("the bad-input catalogue holds at least fifty cases, each with its expectation", "[bad]") {
  auto cases = case_folders();
  CHECK(cases.size() >= 50);
  for (const auto& c : cases) {
    INFO(c);
    CHECK(fs::exists(fs::path(FORME_TEST_DIR) / "bad" / c / "expected.txt"));
  }
  for (const auto& gap : known_gaps()) {
    INFO("KNOWN-GAPS.md names " << gap);
    CHECK(std::find(cases.begin(), cases.end(), gap) != cases.end());
  }
}

TEST_CASE("every bad input gets its exact error and exit code, and never half an output", "[bad]") {
  const auto gaps = known_gaps();
  for (const auto& name : case_folders()) {
    std::istringstream exp(read_file(std::string(FORME_TEST_DIR) + "/bad/" + name + "/expected.txt"));
    std::string code_line, want_err;
    std::getline(exp, code_line);
    std::getline(exp, want_err);
    const int want_code = std::stoi(code_line);
    Outcome o = run_case(name);
    const bool as_expected = o.exit_code == want_code && o.first_err == want_err;
    if (gaps.count(name)) {
      // A listed gap that now behaves as recorded should leave the list.
      INFO(name << " is listed in KNOWN-GAPS.md but now passes; remove it from the list");
      CHECK_FALSE(as_expected);
      continue;
    }
    INFO("case " << name);
    CHECK(o.exit_code == want_code);
    CHECK(o.first_err == want_err);
    CHECK(o.leftovers.empty());
    if (want_code == 0)
      CHECK(o.output_is_pdf);
    else
      CHECK(o.output_kept);
  }
}
