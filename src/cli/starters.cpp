#include "cli/starters.h"

#include <algorithm>
#include <filesystem>
#include <fstream>
#include <random>
#include <system_error>

namespace forme {

namespace fs = std::filesystem;

std::vector<std::string> starter_kinds() {
  std::vector<std::string> kinds;
  for (const auto& f : starter_files())
    if (std::find(kinds.begin(), kinds.end(), f.kind) == kinds.end()) kinds.emplace_back(f.kind);
  std::sort(kinds.begin(), kinds.end());
  return kinds;
}

namespace {

[[noreturn]] void fail(const std::string& dir, std::string message, std::string hint = {}) {
  throw InputError(SourceLoc{dir, 0, 0}, std::move(message), std::move(hint));
}

// A fresh folder beside `target`, on the same file system so it can be
// renamed into place.
fs::path make_temp_sibling(const fs::path& target) {
  std::random_device rd;
  for (int attempt = 0; attempt < 100; ++attempt) {
    fs::path p = target;
    p += ".forme-new-" + std::to_string(rd() % 1000000);
    std::error_code ec;
    if (fs::create_directory(p, ec)) return p;
    if (ec) fail(target.string(), "cannot create a folder beside it: " + ec.message());
  }
  fail(target.string(), "cannot create a temporary folder beside it");
}

}  // namespace

void write_starter(const std::string& kind, const std::string& dir) {
  const auto kinds = starter_kinds();
  if (std::find(kinds.begin(), kinds.end(), kind) == kinds.end()) {
    std::string list;
    for (std::size_t i = 0; i < kinds.size(); ++i) list += (i ? ", " : "") + kinds[i];
    fail(kind, "no starter of this kind", "the kinds are " + list);
  }
  const fs::path target = fs::path(dir).lexically_normal();
  std::error_code ec;
  if (fs::exists(target, ec)) {
    if (!fs::is_directory(target, ec)) fail(dir, "a file of this name exists", "name a new folder");
    if (!fs::is_empty(target, ec)) fail(dir, "folder is not empty", "name a new or empty folder; forme new never overwrites files");
  }
  fs::path parent = target.parent_path();
  if (parent.empty()) parent = ".";
  if (!fs::is_directory(parent, ec)) fail(dir, "the folder it would go in, " + parent.string() + ", does not exist");

  const fs::path temp = make_temp_sibling(target);
  try {
    for (const auto& f : starter_files()) {
      if (f.kind != kind) continue;
      const fs::path out = temp / fs::path(std::string(f.path));
      fs::create_directories(out.parent_path());
      std::ofstream os(out, std::ios::binary);
      os.write(f.contents.data(), static_cast<std::streamsize>(f.contents.size()));
      os.close();
      if (!os) fail(dir, "cannot write " + std::string(f.path));
    }
    // rename(2) replaces an empty folder and refuses a non-empty one, so a
    // folder filled meanwhile by someone else is never overwritten.
    fs::rename(temp, target);
  } catch (const fs::filesystem_error& e) {
    fs::remove_all(temp, ec);
    fail(dir, std::string("cannot write the starter: ") + e.code().message());
  } catch (...) {
    fs::remove_all(temp, ec);
    throw;
  }
}

}  // namespace forme
