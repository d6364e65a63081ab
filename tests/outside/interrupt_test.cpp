// An interrupted render leaves no temporary file and the earlier output
// intact. The test-only pause FORME_TEST_PAUSE_BEFORE_COMMIT_MS (see
// cli/render_job.h) holds the run at the moment the temporary file exists,
// so the signal lands there every time instead of by luck.
#include <catch2/catch.hpp>

#include <signal.h>
#include <sys/wait.h>
#include <unistd.h>

#include <chrono>
#include <filesystem>
#include <string>
#include <thread>
#include <vector>

#include "support/outside_tools.h"

namespace fs = std::filesystem;
using namespace forme::test;

namespace {

std::vector<std::string> temp_files(const std::string& dir) {
  std::vector<std::string> out;
  for (const auto& e : fs::directory_iterator(dir))
    if (e.path().filename().string().find(".tmp-") != std::string::npos) out.push_back(e.path().string());
  return out;
}

// Starts forme in `dir` with the pause set; returns its process id.
pid_t start_paused_render(const std::string& dir) {
  std::string binary = FORME_BINARY;
  std::vector<std::string> env_s = {"FORME_TEST_PAUSE_BEFORE_COMMIT_MS=20000", "PATH=/usr/bin:/bin"};
  std::vector<char*> env;
  for (auto& s : env_s) env.push_back(s.data());
  env.push_back(nullptr);
  pid_t pid = ::fork();
  if (pid == 0) {
    if (::chdir(dir.c_str()) != 0) ::_exit(127);
    ::execle(binary.c_str(), binary.c_str(), "render", "page.yaml", "-o", "out.pdf", static_cast<char*>(nullptr),
             env.data());
    ::_exit(127);
  }
  return pid;
}

}  // namespace

TEST_CASE("SIGINT or SIGTERM during a render removes the temporary file and keeps the old output", "[signals]") {
  for (int sig : {SIGTERM, SIGINT}) {
    INFO("signal " << sig);
    TempDir tmp;
    write_file(tmp.file("t.csv"), "day,value\n2024-01-01,3\n2024-01-02,5\n2024-01-03,4\n");
    write_file(tmp.file("page.yaml"),
               "sheet: {size: A5}\ntables: {t: t.csv}\npanel: {kind: line, table: t, x: day, y: value}\n");
    const std::string old_bytes = "%PDF-1.4\n% the earlier output\n";
    write_file(tmp.file("out.pdf"), old_bytes);

    pid_t pid = start_paused_render(tmp.path());
    REQUIRE(pid > 0);
    // Wait (at most 30 s) for the temporary file: the render is then paused
    // between writing it and renaming it into place.
    auto deadline = std::chrono::steady_clock::now() + std::chrono::seconds(30);
    while (temp_files(tmp.path()).empty() && std::chrono::steady_clock::now() < deadline)
      std::this_thread::sleep_for(std::chrono::milliseconds(10));
    const bool seen = !temp_files(tmp.path()).empty();
    ::kill(pid, sig);
    int status = 0;
    ::waitpid(pid, &status, 0);
    REQUIRE(seen);  // otherwise the test did not interrupt anything
    // The process died of the signal itself (re-raised with the default action).
    CHECK(WIFSIGNALED(status));
    if (WIFSIGNALED(status)) CHECK(WTERMSIG(status) == sig);
    CHECK(temp_files(tmp.path()).empty());
    CHECK(read_file(tmp.file("out.pdf")) == old_bytes);
  }
}

TEST_CASE("without a signal the paused render completes and replaces the output", "[signals]") {
  TempDir tmp;
  write_file(tmp.file("t.csv"), "day,value\n2024-01-01,3\n2024-01-02,5\n");
  write_file(tmp.file("page.yaml"),
             "sheet: {size: A5}\ntables: {t: t.csv}\npanel: {kind: line, table: t, x: day, y: value}\n");
  write_file(tmp.file("out.pdf"), "old");
  auto r = run("cd '" + tmp.path() + "' && FORME_TEST_PAUSE_BEFORE_COMMIT_MS=50 " + FORME_BINARY +
               " render page.yaml -o out.pdf");
  CHECK(r.exit_code == 0);
  CHECK(read_file(tmp.file("out.pdf")).rfind("%PDF-", 0) == 0);
  CHECK(temp_files(tmp.path()).empty());
}
