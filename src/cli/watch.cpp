#include "cli/watch.h"

#include <poll.h>
#include <sys/inotify.h>
#include <unistd.h>

#include <filesystem>
#include <iostream>
#include <map>
#include <set>

#include "describe/read_page.h"
#include "report/read_report.h"

namespace forme {

namespace {

namespace fs = std::filesystem;

// Table files a page description names, read from the tree (no placeholders).
void add_tables(const YamlDocument& page, std::vector<std::string>& out) {
  const YAML::Node tables = page.root["tables"];
  if (!tables.IsMap()) return;
  const fs::path base = fs::path(page.file).parent_path();
  for (auto it = tables.begin(); it != tables.end(); ++it) {
    const YAML::Node t = it->second;
    const YAML::Node file = t.IsMap() ? t["file"] : t;
    if (!file.IsScalar() || file.Scalar().find("$(") != std::string::npos) continue;
    const fs::path p(file.Scalar());
    out.push_back((p.is_absolute() || base.empty() ? p : base / p).string());
  }
}

void print(const std::vector<Diagnostic>& ds) {
  for (const auto& d : ds)
    if (d.severity == Severity::error) std::cerr << format_diagnostic(d) << '\n';
  for (const auto& d : ds)
    if (d.severity != Severity::error) std::cerr << format_diagnostic(d) << '\n';
}

}  // namespace

std::vector<std::string> files_read_by(const std::string& path, const Limits& limits) {
  std::vector<std::string> out{path};
  try {
    if (is_report_description(path)) {
      std::vector<Diagnostic> errors;
      if (auto report = read_report(path, errors, limits)) {
        for (const auto& section : report->sections)
          for (const auto& entry : section.pages) {
            if (entry.page.file != report->file) out.push_back(entry.page.file);
            add_tables(entry.page, out);
          }
      }
    } else {
      add_tables(load_yaml_file(path, limits), out);
    }
  } catch (const std::exception&) {
    // An unreadable description is still watched; its files are found once it reads.
  }
  return out;
}

int watch_and_render(RenderOptions options) {
  const int fd = inotify_init1(IN_CLOEXEC | IN_NONBLOCK);
  if (fd < 0) {
    std::cerr << "forme: error: cannot watch files (inotify unavailable)\n";
    return 1;
  }
  std::map<int, fs::path> folders;  // watch descriptor → folder
  std::set<std::string> watched;    // absolute paths of the files read
  auto rewatch = [&] {
    for (const auto& [wd, folder] : folders) inotify_rm_watch(fd, wd);
    folders.clear();
    watched.clear();
    for (const auto& f : files_read_by(options.page_path, options.limits)) {
      const fs::path abs = fs::absolute(f).lexically_normal();
      watched.insert(abs.string());
      const fs::path folder = abs.parent_path();
      const int wd = inotify_add_watch(fd, folder.c_str(),
                                       IN_CLOSE_WRITE | IN_MOVED_TO | IN_CREATE | IN_DELETE | IN_MODIFY);
      if (wd >= 0) folders[wd] = folder;
    }
  };
  auto render = [&] {
    RenderResult r = render_file(options);
    print(r.diagnostics);
    if (r.ok) std::cout << "wrote " << options.output_path << std::endl;
    else std::cerr << "forme: not written; watching for the next change" << std::endl;
  };

  rewatch();
  render();
  alignas(inotify_event) char buffer[16 * 1024];
  for (;;) {
    pollfd p{fd, POLLIN, 0};
    if (::poll(&p, 1, -1) <= 0) continue;
    // Gather events until the folders have been quiet for 100 ms: an editor's
    // save is often several writes and a rename.
    bool relevant = false;
    do {
      for (;;) {
        const ssize_t n = ::read(fd, buffer, sizeof buffer);
        if (n <= 0) break;
        for (ssize_t i = 0; i < n;) {
          const auto* e = reinterpret_cast<const inotify_event*>(buffer + i);
          if (e->len > 0 && folders.count(e->wd))
            relevant = relevant || watched.count((folders[e->wd] / e->name).string()) > 0;
          i += static_cast<ssize_t>(sizeof(inotify_event) + e->len);
        }
      }
    } while (::poll(&p, 1, 100) > 0);
    if (!relevant) continue;
    rewatch();  // the description may now name other files
    render();
  }
}

}  // namespace forme
