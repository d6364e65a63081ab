// What `cmake --install` puts under a prefix, and the manual page and bash
// completion that go with it: the manual page is clean by mandoc's and
// groff's own checks, the completion script parses and offers exactly
// forme's commands, palettes and starter kinds, and the installed forme
// renders a page with the fonts installed beside it.
#include <catch2/catch.hpp>

#include <algorithm>
#include <filesystem>
#include <set>
#include <sstream>

#include "base/limits.h"
#include "cli/starters.h"
#include "colour/palette.h"
#include "support/outside_tools.h"
#include "text/font.h"

using namespace forme::test;
namespace fs = std::filesystem;

namespace {

const std::string kManPage = std::string(FORME_SOURCE_DIR) + "/doc/forme.1";
const std::string kCompletion = std::string(FORME_SOURCE_DIR) + "/completion/forme.bash";

std::string q(const std::string& s) { return "'" + s + "'"; }

// The words bash offers after typing `line` and pressing tab, with the
// completion script loaded on its own (no bash-completion package).
std::set<std::string> offered(const std::string& line) {
  TempDir dir;
  std::string script = "source " + q(kCompletion) + "\nCOMP_LINE=" + q(line) +
                       "\nread -ra COMP_WORDS <<< \"$COMP_LINE\"\n";
  if (line.back() == ' ') script += "COMP_WORDS+=('')\n";
  script += "COMP_CWORD=$((${#COMP_WORDS[@]} - 1))\n_forme\nprintf '%s\\n' \"${COMPREPLY[@]}\"\n";
  write_file(dir.file("complete.sh"), script);
  auto r = run("cd " + q(dir.path()) + " && bash --norc complete.sh");
  INFO(script << r.err);
  REQUIRE(r.exit_code == 0);
  std::set<std::string> words;
  std::istringstream in(r.out);
  for (std::string w; std::getline(in, w);)
    if (!w.empty() && w[0] != '-') words.insert(w);
  return words;
}

}  // namespace

TEST_CASE("the manual page has no warnings from mandoc -T lint or groff -ww", "[outside][install]") {
  REQUIRE(have_tool("mandoc"));
  auto lint = run("mandoc -T lint " + q(kManPage));
  INFO(lint.out << lint.err);
  CHECK(lint.exit_code == 0);
  CHECK(lint.out.empty());
  REQUIRE(have_tool("groff"));
  auto roff = run("groff -man -ww -z " + q(kManPage));
  CHECK(roff.exit_code == 0);
  CHECK(roff.err.empty());
  // Every command has its own entry.
  const std::string text = read_file(kManPage);
  for (const char* c : {"render", "watch", "check", "contrast", "palette", "schema", "new"})
    CHECK(text.find(std::string(".B ") + c) != std::string::npos);
}

TEST_CASE("the bash completion parses and offers forme's own commands, palettes and starter kinds",
          "[outside][install]") {
  auto syntax = run("bash -n " + q(kCompletion));
  INFO(syntax.err);
  CHECK(syntax.exit_code == 0);

  // Commands: those `forme --help` lists.
  auto help = run_forme("--help");
  std::set<std::string> commands;
  for (const char* c : {"render", "watch", "check", "contrast", "palette", "schema", "new"})
    if (help.out.find(std::string("\n  ") + c + " ") != std::string::npos) commands.insert(c);
  CHECK(commands.size() == 7);
  CHECK(offered("forme ") == commands);
  CHECK(offered("forme pa") == std::set<std::string>{"palette"});

  std::set<std::string> palettes;
  for (const auto& p : forme::all_palettes()) palettes.insert(p.name);
  CHECK(offered("forme palette ") == palettes);

  const auto kinds = forme::starter_kinds();
  CHECK(offered("forme new ") == std::set<std::string>(kinds.begin(), kinds.end()));

  // Limits: the names forme's own table gives --limit.
  std::set<std::string> limits;
  for (const auto& l : forme::limit_names()) limits.insert(std::string(l.name) + "=");
  CHECK(offered("forme render page.yaml --limit ") == limits);
  CHECK(offered("forme check --limit ") == limits);
}

TEST_CASE("cmake --install puts forme, its manual, completion and fonts under the prefix, and it renders",
          "[outside][install]") {
  TempDir prefix;
  const std::string build = fs::path(FORME_BINARY).parent_path().string();
  auto install = run("cmake --install " + q(build) + " --prefix " + q(prefix.path()));
  INFO(install.out << install.err);
  REQUIRE(install.exit_code == 0);
  const fs::path p = prefix.path();
  CHECK(fs::exists(p / "bin/forme"));
  CHECK(fs::exists(p / "share/man/man1/forme.1"));
  CHECK(fs::exists(p / "share/bash-completion/completions/forme"));
  CHECK(fs::exists(p / "share/forme/fonts/NotoSans-Regular.ttf"));
  CHECK(read_file((p / "share/man/man1/forme.1").string()) == read_file(kManPage));

  // The installed executable looks for fonts beside itself first.
  CHECK(fs::path(forme::find_font_dir((p / "bin/forme").string())) == p / "share/forme/fonts");

  // And it works without the source tree: a starter from inside the
  // binary, rendered with the installed fonts (pdffonts: embedded).
  const std::string forme = q((p / "bin/forme").string());
  auto made = run(forme + " new figure " + q(prefix.file("fig")));
  INFO(made.err);
  REQUIRE(made.exit_code == 0);
  auto render = run(forme + " render " + q(prefix.file("fig/page.yaml")) + " -o " + q(prefix.file("fig.pdf")));
  INFO(render.err);
  CHECK(render.exit_code == 0);
  REQUIRE(have_tool("pdffonts"));
  auto fonts = run("pdffonts " + q(prefix.file("fig.pdf")));
  CHECK(fonts.out.find("NotoSans") != std::string::npos);
  auto man = run("MANWIDTH=80 man -l " + q((p / "share/man/man1/forme.1").string()));
  CHECK(man.exit_code == 0);
  CHECK(man.out.find("forme new") != std::string::npos);
}
