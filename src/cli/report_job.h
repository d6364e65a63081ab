#pragma once
/// The report driver: a report description → one PDF of many pages. It
/// plans every page (report/), numbers them, sets the contents, then
/// composes later pages on a second thread while earlier ones are painted, adding the
/// running head and foot, bookmarks and page labels. The pages are painted
/// in order whatever the threads do, so the file is the same byte for byte.
#include <cstddef>
#include <cstdint>
#include <functional>
#include <optional>
#include <ostream>
#include <string>

#include "base/diagnostic.h"
#include "base/limits.h"
#include "cli/render_job.h"
#include "paint/display_list.h"

namespace forme {

struct ReportRunOptions {
  std::string font_dir;
  Limits limits;
  /// Compose the next page while painting this one (two threads).
  bool overlap = true;
  /// Paint every page in grey, the cover and contents too (`--greyscale`).
  bool greyscale = false;
  /// Called after each page is painted: pages done, pages in all.
  std::function<void(std::size_t done, std::size_t total)> progress;
  /// The document's date (seconds since 1970, UTC); nullopt = now.
  std::optional<std::int64_t> creation_time;
  /// When set, receives each stage's wall time (benchmarks).
  StageTimes* times = nullptr;
  /// When set, sees each page just before it is painted (benchmarks keep
  /// them to time painting alone).
  std::function<void(const DisplayPage&)> painting;
};

/// Renders the report at `path` as one PDF written to `out` when it is
/// finished. Warnings go to `sink`; throws InputError for the first error
/// (already in `sink` when found by a stage that collects).
void render_report(const std::string& path, DiagnosticSink& sink, const ReportRunOptions& options, std::ostream& out);

/// Reads the report and composes every page without painting, so that each
/// page's findings land in `sink` (each repeated finding once): what
/// `forme check` does for a report. Throws InputError for the first error.
void check_report(const std::string& path, DiagnosticSink& sink, const Limits& limits, const std::string& font_dir,
                  bool greyscale);

/// As render_report, into memory (tests, benchmarks).
std::string render_report_to_bytes(const std::string& path, DiagnosticSink& sink, const ReportRunOptions& options);

}  // namespace forme
