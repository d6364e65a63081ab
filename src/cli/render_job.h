#pragma once
/// The driver: runs the stages of one render in order. Reading this file
/// top to bottom is reading how a page is made.
#include <functional>
#include <map>
#include <optional>
#include <string>
#include <vector>

#include "base/diagnostic.h"
#include "base/limits.h"
#include "data/table.h"
#include "describe/page_spec.h"
#include "layout/page_style.h"
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
  /// Reports: called after each page is painted (pages done, pages in all).
  std::function<void(std::size_t, std::size_t)> progress;
};

struct RenderResult {
  std::vector<Diagnostic> diagnostics;  ///< errors and warnings, in order found
  bool ok = false;
};

/// Renders a page description, or a report description (cli/report_job.h),
/// to a file; never throws for bad input.
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
  /// The margins the pages were laid out with (composed_margins), measured
  /// from each page's trim box: where a report sets its running head and foot.
  Margins margins;
  /// Each series' own name → its place in a categorical palette
  /// (layout/series_looks.h), for a report to keep on later pages.
  std::map<std::string, std::size_t> series_places;
};

/// The margins a page is laid out with: as stated, or the defaults grown
/// with type set larger than 8 pt (posters) so the page keeps its proportions.
Margins composed_margins(const PageSpec& spec, const PageStyle& style);

/// Runs every stage up to painting; `greyscale` (or the page's
/// colours.greyscale) paints every page in grey. Throws InputError.
ComposedDocument compose_document(const std::string& page_path, const std::string& font_dir,
                                  DiagnosticSink& warnings, const Limits& limits = {}, bool greyscale = false);

/// Stage 2 for one table the page names: reads its CSV, reporting a file
/// that cannot be opened where the page names it. Throws InputError.
Table load_table(const TableSource& source, const Limits& limits);

/// The sizes and inks a page is set in, with already opened fonts.
PageStyle style_for_page(const PageSpec& spec, const FontSet& fonts);

/// Wall time spent in each stage, in seconds, summed over the pages of a
/// run (benchmarks read it). `layout` includes the page audits that follow
/// it; `place` is stage 6, the movable text placed against the whole page.
struct StageTimes {
  double read = 0, data = 0, scales = 0, layout = 0, place = 0, paint = 0;
};

/// Stages 2b-6 for a page already read, with its tables loaded (in the
/// order of spec.tables). Throws InputError.
ComposedDocument compose_spec(PageSpec spec, const std::vector<Table>& tables, const FontSet& fonts,
                              DiagnosticSink& warnings, const Limits& limits = {}, StageTimes* times = nullptr,
                              bool greyscale = false);

/// Runs every stage up to painting: the laid-out chart page (tests read its text
/// positions). Throws InputError.
DisplayPage compose_page(const std::string& page_path, const std::string& font_dir, DiagnosticSink& warnings,
                         const Limits& limits = {}, bool greyscale = false);

/// Renders to bytes in memory (tests, fuzzing). Throws InputError.
std::string render_to_bytes(const std::string& page_path, OutputFormat format, const std::string& font_dir,
                            double dpi, DiagnosticSink& warnings, const Limits& limits = {}, bool greyscale = false);

}  // namespace forme
