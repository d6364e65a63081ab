#pragma once
/// The driver: runs the stages of one render in order. Reading this file
/// top to bottom is reading how a page is made.
#include <optional>
#include <string>
#include <vector>

#include "base/diagnostic.h"
#include "base/limits.h"
#include "paint/display_list.h"
#include "paint/painter.h"

namespace forme {

struct RenderOptions {
  std::string page_path;
  std::string output_path;
  double dpi = 150;
  std::string font_dir;  ///< bundled fonts folder
  Limits limits;         ///< what one run accepts (base/limits.h)
  bool greyscale = false;  ///< paint in grey for black-and-white printing (as the page's colours.greyscale)
};

struct RenderResult {
  std::vector<Diagnostic> diagnostics;  ///< errors and warnings, in order found
  bool ok = false;
};

/// Renders a page description to a file; never throws for bad input.
/// While the temporary output file exists its path is registered with
/// cli/signal_cleanup.h, so an interrupted run leaves nothing behind.
///
/// Test-only: when the environment variable FORME_TEST_PAUSE_BEFORE_COMMIT_MS
/// holds a number of milliseconds, the run sleeps that long after writing
/// the temporary file and before renaming it into place, so tests can
/// interrupt it at that moment. It is not part of the user interface.
RenderResult render_file(const RenderOptions& options);

/// Runs every stage up to painting and reports every finding (errors and
/// warnings) without writing anything: `forme check`.
RenderResult check_file(const std::string& page_path, const std::string& font_dir, const Limits& limits = {},
                        bool greyscale = false);

/// Everything one render paints: the chart page, then any data table
/// pages, and the document information (metadata, description, attachments).
struct ComposedDocument {
  std::vector<DisplayPage> pages;
  DocumentInfo info;
};

/// Runs every stage up to painting; `greyscale` (or the page's
/// colours.greyscale) paints every page in grey. Throws InputError.
ComposedDocument compose_document(const std::string& page_path, const std::string& font_dir,
                                  DiagnosticSink& warnings, const Limits& limits = {}, bool greyscale = false);

/// Runs every stage up to painting: the laid-out chart page (tests read its text
/// positions). Throws InputError.
DisplayPage compose_page(const std::string& page_path, const std::string& font_dir, DiagnosticSink& warnings,
                         const Limits& limits = {}, bool greyscale = false);

/// Renders to bytes in memory (tests, fuzzing). Throws InputError.
std::string render_to_bytes(const std::string& page_path, OutputFormat format, const std::string& font_dir,
                            double dpi, DiagnosticSink& warnings, const Limits& limits = {}, bool greyscale = false);

}  // namespace forme
