#include "cli/render_job.h"

#include <time.h>

#include <cerrno>
#include <chrono>

#include <cstdlib>
#include <ctime>
#include <filesystem>
#include <limits>
#include <optional>
#include <span>
#include <sstream>

#include "audit/missing_glyphs.h"
#include "audit/colour_audit.h"
#include "audit/page_audit.h"
#include "axes/axis.h"
#include "cli/report_job.h"
#include "cli/signal_cleanup.h"
#include "colour/palette.h"
#include "data/csv_reader.h"
#include "describe/read_page.h"
#include "layout/content_height.h"
#include "layout/layout_page.h"
#include "layout/page_style.h"
#include "layout/page_language.h"
#include "layout/press_sheet.h"
#include "layout/series_looks.h"
#include "paint/atomic_file.h"
#include "paint/greyscale.h"
#include "paint/pdf_dates.h"
#include "layout/data_table_page.h"
#include "report/read_report.h"
#include "series/plotted_rows.h"
#include "series/select_series.h"
#include "summary/describe_chart.h"

namespace forme {

PageStyle style_for_page(const PageSpec& spec, const FontSet& fonts) {
  PageStyle st;
  st.fonts = fonts;
  const TypeSpec& t = spec.type;
  if (spec.type_size > 0) st.base = spec.type_size;
  else if (t.reading_distance_cm > 0) st.base = base_size_for_distance(t.reading_distance_cm);
  else if (t.job != Job::none) st.base = base_size_for_distance(reading_distance_cm(t.job));
  else st.base = base_size_for_sheet(spec.sheet.width, spec.sheet.height);
  st.steps = type_steps(t.job);
  st.stated = t;
  st.ink = Inks{ink::text, ink::muted, ink::rule, ink::grid, spec.sheet.press.background.value_or(Rgb{1, 1, 1})};
  st.series = default_categorical().colours;
  return st;
}

Margins composed_margins(const PageSpec& spec, const PageStyle& style) {
  // Default margins grow with type set larger than 8 pt (posters), so the
  // page keeps its proportions; margins the page states stay as stated.
  Margins m = spec.sheet.margins;
  if (spec.sheet.margins_stated || style.base <= 8) return m;
  const double k = style.base / 8;
  return {m.top * k, m.right * k, m.bottom * k, m.left * k};
}

Table load_table(const TableSource& src, const Limits& limits) {
  CsvOptions o;
  o.declared = src.declared;
  o.missing = src.missing;
  o.max_bytes = limits.table_bytes;
  try {
    Table t = read_csv(src.path, src.display_path, o);
    t.name = src.name;
    return t;
  } catch (const InputError& e) {
    // A file that cannot be opened is best reported where the page names it.
    if (e.diagnostic().loc.line == 0) {
      Diagnostic d = e.diagnostic();
      d.message = "table '" + src.name + "' (" + src.display_path + "): " + d.message;
      d.loc = src.loc;
      throw InputError(d);
    }
    throw;
  }
}

namespace {

std::vector<Table> load_tables(const PageSpec& spec, const Limits& limits) {
  std::vector<Table> tables;
  for (const auto& src : spec.tables) tables.push_back(load_table(src, limits));
  return tables;
}

DocumentInfo document_info(const PageSpec& spec, const std::vector<PlottedRows>& plotted) {
  DocumentInfo info;
  info.title = spec.title;
  info.author = spec.document.author;
  info.subject = spec.document.subject;
  info.keywords = spec.document.keywords;
  info.language = spec.language.value;
  if (spec.data.attach)
    for (const auto& p : plotted) info.attachments.push_back({p.file_name, p.description, "text/csv", p.csv});
  return info;
}

// Clears the signal handler's temporary path however the render ends.
struct CleanupPathScope {
  CleanupPathScope() = default;
  CleanupPathScope(const CleanupPathScope&) = delete;
  CleanupPathScope& operator=(const CleanupPathScope&) = delete;
  ~CleanupPathScope() { set_cleanup_path(nullptr); }
};

// Test-only pause between writing and committing (see render_job.h).
void pause_for_tests() {
  const char* ms = std::getenv("FORME_TEST_PAUSE_BEFORE_COMMIT_MS");
  if (!ms) return;
  long v = std::strtol(ms, nullptr, 10);
  if (v <= 0 || v > 600'000) return;
  struct timespec t {v / 1000, (v % 1000) * 1'000'000};
  while (::nanosleep(&t, &t) != 0 && errno == EINTR) {
  }
}

}  // namespace

ComposedDocument compose_document(const std::string& page_path, const std::string& font_dir, DiagnosticSink& sink,
                                  const Limits& limits, bool greyscale) {
  std::vector<Diagnostic> errors;
  std::optional<PageSpec> spec = read_page(page_path, errors, limits);  // 1. read description
  if (!spec) {
    for (auto& e : errors) sink.report(e);
    throw InputError(errors.front());
  }
  std::vector<Table> tables = load_tables(*spec, limits);                   // 2. load data
  return compose_spec(std::move(*spec), tables, open_bundled_fonts(font_dir), sink, limits, nullptr, greyscale);
}

ComposedDocument compose_spec(PageSpec spec, const std::vector<Table>& tables, const FontSet& fonts,
                              DiagnosticSink& sink, const Limits& limits, StageTimes* times, bool greyscale) {
  auto t0 = std::chrono::steady_clock::now();
  // Adds the time since the last call to `stage` (when timing is asked for).
  auto lap = [&](double StageTimes::*stage) {
    if (!times) return;
    const auto now = std::chrono::steady_clock::now();
    times->*stage += std::chrono::duration<double>(now - t0).count();
    t0 = now;
  };
  std::vector<PanelData> panels = select_series(spec, tables, sink, limits);
  std::vector<PanelAxes> axes = resolve_axes(panels, spec.grid, sink); // 3. resolve scales
  audit_page(spec, panels, axes, sink);
  lap(&StageTimes::scales);
  PageStyle style = style_for_page(spec, fonts);                    // 4. measure text (fonts)
  spec.sheet.margins = composed_margins(spec, style);
  if (spec.sheet.height_from_content) spec.sheet.height = content_height(spec, panels, axes, style);
  ComposedDocument doc;
  doc.margins = spec.sheet.margins;
  LaidOutPage laid = lay_out_boxes(spec, panels, axes, style, sink);  // 5. lay out boxes
  lap(&StageTimes::layout);
  place_movable_text(laid.movables, style, laid.page, sink);          // 6. place labels
  apply_page_language(laid.page, spec.language.value);              // lines of mixed direction read in the page's
  lap(&StageTimes::place);
  doc.pages.push_back(std::move(laid.page));
  audit_layout(spec, doc.pages.front(), sink, limits);
  audit_missing_glyphs(spec, doc.pages.front(), sink);
  greyscale = greyscale || spec.greyscale;  // for black-and-white printing
  if (greyscale) doc.pages.front() = in_greyscale(std::move(doc.pages.front()));
  audit_colours(spec, panels, laid.looks, doc.pages.front(), greyscale, sink);
  lap(&StageTimes::layout);
  for (const auto& d : sink.items())
    if (d.severity == Severity::error) throw InputError(d);  // reported already; stops the write
  // What travels with the chart: the rows plotted, the page in words.
  // Gathered only when something carries them: a million-row table costs
  // a second to write out again.
  const std::vector<PlottedRows> plotted =
      spec.data.attach || spec.data.table_page ? plotted_rows(spec, panels, tables) : std::vector<PlottedRows>{};
  if (spec.data.table_page)
    for (auto& p : data_table_pages(spec, plotted, style)) doc.pages.push_back(std::move(p));
  // Table pages are read like the chart: nothing off the sheet, nothing
  // over anything. Their cells are not labels, so the label limit is not theirs.
  Limits table_limits = limits;
  table_limits.labels = std::numeric_limits<std::size_t>::max();
  for (std::size_t i = 1; i < doc.pages.size(); ++i) audit_layout(spec, doc.pages[i], sink, table_limits);
  if (doc.pages.size() > limits.pages)
    throw InputError(spec.loc,
                     "the document would have " + std::to_string(doc.pages.size()) + " pages, more than the " +
                         std::to_string(limits.pages) + " one document may hold",
                     "filter the rows set in the table pages, or raise the limit with '--limit pages=N'");
  // The palette place each series took, which a report keeps on later pages.
  for (std::size_t i = 0; i < laid.looks.size() && i < panels.size(); ++i)
    for (const auto& [name, look] : laid.looks[i].series)
      if (look.place) doc.series_places.emplace(series_identity(name, *panels[i].spec), *look.place);
  doc.info = document_info(spec, plotted);
  doc.info.description = describe_chart(spec, panels, axes);
  // Each panel in words, for the tagged PDF's figure alternate text.
  auto& figures = doc.pages.front().figures;
  for (std::size_t i = 0; i < figures.size() && i < panels.size(); ++i)
    figures[i].alt = describe_chart(spec, std::span(panels).subspan(i, 1), std::span(axes).subspan(i, 1));
  // Last, the press sheet around each trimmed page: bleed, marks, slug.
  const PressSpec& press = spec.sheet.press;
  const long long today = parse_source_date_epoch(std::getenv("SOURCE_DATE_EPOCH")).value_or(std::time(nullptr));
  for (std::size_t i = 0; i < doc.pages.size(); ++i) {
    const std::string slug = press.slug.empty() ? std::string() : slug_line(press.slug, today, i + 1, doc.pages.size());
    doc.pages[i] = to_press_sheet(std::move(doc.pages[i]), press, style, slug);
    // The press sheet's paper colour and marks print in grey too.
    if (greyscale) doc.pages[i] = in_greyscale(std::move(doc.pages[i]));
  }
  lap(&StageTimes::layout);
  return doc;
}

DisplayPage compose_page(const std::string& page_path, const std::string& font_dir, DiagnosticSink& sink,
                         const Limits& limits, bool greyscale) {
  return std::move(compose_document(page_path, font_dir, sink, limits, greyscale).pages.front());
}

std::string render_to_bytes(const std::string& page_path, OutputFormat format, const std::string& font_dir,
                            double dpi, DiagnosticSink& warnings, const Limits& limits, bool greyscale) {
  ComposedDocument doc = compose_document(page_path, font_dir, warnings, limits, greyscale);
  std::ostringstream out;
  PaintOptions po;
  po.dpi = dpi;
  po.info = std::move(doc.info);
  // Reproducible output: a build may pin the document date (reproducible-builds.org SOURCE_DATE_EPOCH).
  po.info.creation_time = parse_source_date_epoch(std::getenv("SOURCE_DATE_EPOCH"));
  auto painter = make_painter(format, out, po);                     // 7. paint
  // SVG and PNG hold one page: the chart.
  const std::size_t pages = format == OutputFormat::pdf ? doc.pages.size() : 1;
  for (std::size_t i = 0; i < pages; ++i) painter->paint(doc.pages[i]);
  painter->finish();
  return std::move(out).str();
}

namespace {

// Runs `work`, turning every failure into a diagnostic in `sink`: the one
// place where errors become values for the command line.
template <class Work>
bool collect(DiagnosticSink& sink, const std::string& page_path, Work&& work) {
  try {
    work();
    return true;
  } catch (const InputError& e) {
    if (!sink.has_errors()) sink.report(e.diagnostic());
  } catch (const std::exception& e) {
    sink.report({Severity::error, SourceLoc{page_path}, std::string("internal error: ") + e.what(),
                 "this is a bug in forme; please report it with the page description"});
  }
  return false;
}

}  // namespace

RenderResult check_file(const std::string& page_path, const std::string& font_dir, const Limits& limits,
                        bool greyscale) {
  RenderResult r;
  DiagnosticSink sink;
  r.ok = collect(sink, page_path, [&] {
    if (is_report_description(page_path)) check_report(page_path, sink, limits, font_dir, greyscale);
    else compose_page(page_path, font_dir, sink, limits, greyscale);
  });
  r.diagnostics = sink.items();
  return r;
}

RenderResult render_file(const RenderOptions& o) {
  RenderResult r;
  DiagnosticSink sink;
  r.ok = collect(sink, o.page_path, [&] {
    auto format = format_for_path(o.output_path);
    if (!format)
      throw InputError(SourceLoc{o.output_path}, "unknown output type", "name the output .pdf, .svg or .png");
    std::error_code ec;
    if (std::filesystem::equivalent(o.output_path, o.page_path, ec))
      throw InputError(SourceLoc{o.output_path}, "output would overwrite the page description");
    CleanupPathScope forget_temp;
    std::optional<AtomicFile> file;
    auto open_output = [&] {
      SignalBlock no_signals_until_registered;
      file.emplace(o.output_path);
      set_cleanup_path(file->temp_path().c_str());
    };
    if (is_report_description(o.page_path)) {
      if (*format != OutputFormat::pdf)
        throw InputError(SourceLoc{o.output_path}, "a report is written as one PDF of many pages",
                         "name the output .pdf");
      ReportRunOptions ro;
      ro.font_dir = o.font_dir;
      ro.limits = o.limits;
      ro.progress = o.progress;
      ro.greyscale = o.greyscale;
      ro.creation_time = parse_source_date_epoch(std::getenv("SOURCE_DATE_EPOCH"));
      // Straight into the output's temporary file: a report of any length
      // is never held in memory whole.
      open_output();
      render_report(o.page_path, sink, ro, file->stream());
    } else {
      const std::string bytes = render_to_bytes(o.page_path, *format, o.font_dir, o.dpi, sink, o.limits, o.greyscale);
      open_output();
      file->write(bytes);
    }
    pause_for_tests();
    file->commit();
  });
  r.diagnostics = sink.items();
  return r;
}

}  // namespace forme
