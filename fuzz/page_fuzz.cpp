// Fuzzes the whole pipeline: one input holds a page description and a CSV
// table separated by a line "=====". They are written to a temporary folder
// (the description names the table "t.csv") and rendered to an in-memory
// PDF. An InputError is a correct refusal; anything else is a bug.
#include <unistd.h>

#include <cstddef>
#include <cstdint>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <string>

#include "base/diagnostic.h"
#include "cli/render_job.h"
#include "paint/painter.h"

namespace {

const std::string& work_dir() {
  static const std::string dir = [] {
    std::string pattern = (std::filesystem::temp_directory_path() / "forme-page-fuzz-XXXXXX").string();
    if (!::mkdtemp(pattern.data())) std::abort();
    return pattern;
  }();
  return dir;
}

void write(const std::string& path, const std::string& text) { std::ofstream(path, std::ios::binary) << text; }

}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  if (size > 64 * 1024) return 0;
  const std::string in(reinterpret_cast<const char*>(data), size);
  const std::string sep = "\n=====\n";
  const std::size_t at = in.find(sep);
  const std::string yaml = in.substr(0, at);
  const std::string csv = at == std::string::npos ? std::string() : in.substr(at + sep.size());
  const std::string page = work_dir() + "/page.yaml";
  write(page, yaml);
  write(work_dir() + "/t.csv", csv);
  forme::Limits limits;
  limits.description_bytes = 64 * 1024;
  forme::DiagnosticSink warnings;
  try {
    (void)forme::render_to_bytes(page, forme::OutputFormat::pdf, FORME_SOURCE_FONT_DIR, 72, warnings, limits);
  } catch (const forme::InputError&) {
  }
  return 0;
}
