// Live preview: `forme watch` renders, renders again when a data file the
// page reads changes, and on an invalid edit prints a located error and
// keeps running, leaving the last good output in place. The scenario runs
// the real executable in the background from a shell script, with a
// timeout on every wait; md5sum (coreutils) tells whether the file changed
// and poppler's pdftotext reads what the new output shows.
#include <catch2/catch.hpp>

#include <map>
#include <sstream>
#include <string>

#include "support/outside_tools.h"

using namespace forme::test;

namespace {

// key=value words of the script's last line.
std::map<std::string, std::string> fields(const std::string& out) {
  std::map<std::string, std::string> m;
  std::string last = out.substr(out.rfind('\n', out.size() - 2) + 1);
  std::istringstream words(last);
  std::string w;
  while (words >> w) {
    const auto eq = w.find('=');
    if (eq != std::string::npos) m[w.substr(0, eq)] = w.substr(eq + 1);
  }
  return m;
}

}  // namespace

TEST_CASE("watch renders again when a data file changes and survives an invalid edit", "[outside][watch]") {
  REQUIRE(have_tool("pdftotext"));
  TempDir dir;
  write_file(dir.file("t.csv"), "month,visits\n2026-01,120\n2026-02,135\n2026-03,150\n");
  write_file(dir.file("page.yaml"),
             "heading: {title: Harbour ferry visits}\n"
             "tables: {t: t.csv}\n"
             "panel: {kind: line, table: t, x: month, y: visits, y-title: Visits, y-unit: people}\n"
             "source: \"Source: invented for this test\"\n");
  const std::string script = std::string("cd '") + dir.path() + "' || exit 1\n" +
      FORME_BINARY + " watch page.yaml -o out.pdf > out.log 2> err.log &\n"
      "pid=$!\n"
      "wait_for() { for i in $(seq 150); do eval \"$1\" && return 0; sleep 0.1; done; return 1; }\n"
      "wait_for '[ -s out.pdf ]' || { kill $pid; echo first=none; exit 0; }\n"
      "first=$(md5sum < out.pdf)\n"
      "printf '2026-04,410\\n' >> t.csv\n"
      "wait_for '[ \"$(md5sum < out.pdf)\" != \"$first\" ]'\n"
      "second=$(md5sum < out.pdf)\n"
      "pdftotext out.pdf - | grep -q 400 && shows=yes || shows=no\n"
      "printf 'heading: {title: [unclosed\\n' > page.yaml\n"
      "wait_for 'grep -q \"error:\" err.log'\n"
      "sleep 0.3\n"
      "kill -0 $pid 2>/dev/null && alive=yes || alive=no\n"
      "after=$(md5sum < out.pdf)\n"
      "kill $pid; wait $pid 2>/dev/null\n"
      "grep -m1 'error:' err.log\n"
      "echo changed=$([ \"$first\" != \"$second\" ] && echo yes || echo no) shows=$shows alive=$alive "
      "kept=$([ \"$after\" = \"$second\" ] && echo yes || echo no)\n";
  write_file(dir.file("scenario.sh"), script);
  auto r = run("timeout 60 bash '" + dir.file("scenario.sh") + "'");
  INFO(r.out << r.err);
  REQUIRE(r.exit_code == 0);
  auto f = fields(r.out);
  CHECK(f["changed"] == "yes");  // the new row made a new file
  CHECK(f["shows"] == "yes");    // and the axis now reaches 400 (the new value is 410)
  CHECK(f["alive"] == "yes");    // the invalid edit did not stop the watch
  CHECK(f["kept"] == "yes");     // nor replace the last good output
  // The error names the file, line and column of the flow list left open
  // (the parser finds it open at the end of the file).
  CHECK(r.out.find("page.yaml:2:1: error: '[' is never closed with ']'") != std::string::npos);
}
