#include "cli/report_job.h"

#include <chrono>
#include <cstdlib>
#include <ctime>
#include <map>
#include <sstream>

#include "base/fixed_decimals.h"
#include "base/lookahead.h"
#include "cli/render_job.h"
#include "layout/press_sheet.h"
#include "paint/greyscale.h"
#include "paint/pdf_dates.h"
#include "paint/painter.h"
#include "report/contents_page.h"
#include "report/cover_page.h"
#include "report/read_report.h"
#include "report/report_plan.h"
#include "report/running_furniture.h"
#include "report/table_cache.h"
#include "text/font.h"

namespace forme {

namespace {

// A page composed, with its description and what its stages found.
struct Composed {
  PageSpec spec;
  ComposedDocument doc;
  DiagnosticSink found;
};

// Where each planned page lands: its first page (0-based) and how many.
struct Placement {
  std::size_t first = 0, count = 1;
};

// A repeated page repeats its warnings; each is reported once.
void merge(DiagnosticSink& into, const DiagnosticSink& from) {
  for (const auto& d : from.items()) {
    bool seen = false;
    for (const auto& e : into.items())
      seen = seen || (e.loc.file == d.loc.file && e.loc.line == d.loc.line && e.loc.col == d.loc.col &&
                      e.message == d.message && e.severity == d.severity);
    if (!seen) into.report(d);
  }
}

std::vector<ContentsRow> contents_rows(const ReportSpec& report, const std::vector<PlannedPage>& plan,
                                       const std::vector<Placement>& at) {
  std::vector<ContentsRow> rows;
  for (std::size_t i = 0; i < plan.size(); ++i) {
    if (i == 0 || plan[i].section != plan[i - 1].section)
      rows.push_back({report.sections[plan[i].section].title, true, at[i].first + 1});
    rows.push_back({plan[i].title, false, at[i].first + 1});
  }
  return rows;
}

std::vector<OutlineEntry> outline(const ReportSpec& report, const std::vector<PlannedPage>& plan,
                                  const std::vector<Placement>& at, std::size_t front_pages, std::size_t contents_pages) {
  std::vector<OutlineEntry> out;
  if (contents_pages > 0) out.push_back({report.contents_title, front_pages - contents_pages, -1});
  int section = -1;
  for (std::size_t i = 0; i < plan.size(); ++i) {
    if (i == 0 || plan[i].section != plan[i - 1].section) {
      out.push_back({report.sections[plan[i].section].title, at[i].first, -1});
      section = static_cast<int>(out.size()) - 1;
    }
    out.push_back({plan[i].title, at[i].first, section});
  }
  return out;
}

// A series keeps the palette place it first took on every later page of
// the report, so one name wears one colour throughout.
void keep_places(std::map<std::string, std::size_t>& places, const ComposedDocument& doc) {
  for (const auto& [name, place] : doc.series_places) places.emplace(name, place);
}

// Every page, cover and contents too, labelled in figures from 1: the foot
// prints "page N of M" on each, so the label a reader's page box shows is
// the number printed on the page.
std::vector<PageLabelRange> page_labels() { return {{0, PageNumberStyle::decimal, 1}}; }

// The running head and foot sit in the top and bottom margins; a margin
// that cannot hold a line of them is an error, not a head cut by the trim
// or set over the content.
void check_running_room(const PageSpec& spec, const Margins& m, const PageStyle& style) {
  const double need = running_text_height(style) * 1.5;  // the line and a little white each side
  const double room = std::min(m.top, m.bottom);
  if (room >= need) return;
  const std::string which = m.top <= m.bottom ? "top" : "bottom";
  throw InputError(spec.sheet.loc.line ? spec.sheet.loc : spec.loc,
                   "a report's running head and foot need " + fixed(need, 1) + " pt of top and bottom margin at this type size, but the " +
                       which + " margin is " + fixed(room, 1) + " pt",
                   "give the sheet larger margins (e.g. 'margins: 15mm'), or set the page in a smaller type size");
}

void check_running_room(const PageSpec& spec, const FontSet& fonts) {
  const PageStyle style = style_for_page(spec, fonts);
  check_running_room(spec, composed_margins(spec, style), style);
}

// `n` with leading zeros to as many digits as `largest`, so file names
// sort in page order.
std::string padded(std::size_t n, std::size_t largest) {
  std::string digits = std::to_string(n);
  const std::size_t width = std::to_string(largest).size();
  return std::string(width > digits.size() ? width - digits.size() : 0, '0') + digits;
}

// The report description, read with its pages; every error goes to `sink`
// and the first is thrown.
ReportSpec read_report_or_throw(const std::string& path, DiagnosticSink& sink, const Limits& limits) {
  std::vector<Diagnostic> errors;
  std::optional<ReportSpec> report = read_report(path, errors, limits);
  if (!report) {
    for (auto& e : errors) sink.report(e);
    throw InputError(errors.front());
  }
  return std::move(*report);
}

}  // namespace

void check_report(const std::string& path, DiagnosticSink& sink, const Limits& limits, const std::string& font_dir,
                  bool greyscale) {
  const ReportSpec report = read_report_or_throw(path, sink, limits);
  TableCache cache([&](const TableSource& s) { return load_table(s, limits); });
  std::vector<PlannedPage> plan = plan_report(report, cache, limits);
  const FontSet fonts = open_bundled_fonts(font_dir);
  std::map<std::string, std::size_t> places;  // as render_report keeps them
  for (auto& page : plan) {
    DiagnosticSink found;
    std::vector<Table> tables = take_tables(page, cache);
    try {
      PageSpec spec = planned_spec(report, page, limits);
      check_running_room(spec, fonts);
      spec.colours.kept = places;
      keep_places(places, compose_spec(std::move(spec), tables, fonts, found, limits, nullptr, greyscale));
    } catch (...) {
      merge(sink, found);  // the findings before the error, then the error itself
      throw;
    }
    merge(sink, found);
  }
}

std::string render_report_to_bytes(const std::string& path, DiagnosticSink& sink, const ReportRunOptions& o) {
  std::ostringstream out;
  render_report(path, sink, o, out);
  return std::move(out).str();
}

void render_report(const std::string& path, DiagnosticSink& sink, const ReportRunOptions& o, std::ostream& out) {
  StageTimes ignored;
  StageTimes& times = o.times ? *o.times : ignored;
  auto since = [](std::chrono::steady_clock::time_point t0) {
    return std::chrono::duration<double>(std::chrono::steady_clock::now() - t0).count();
  };
  auto t0 = std::chrono::steady_clock::now();
  const ReportSpec report = read_report_or_throw(path, sink, o.limits);  // 1. read the report and its pages
  TableCache cache([&](const TableSource& s) { return load_table(s, o.limits); });
  std::vector<PlannedPage> plan = plan_report(report, cache, o.limits);  // every page, placeholders filled
  const FontSet fonts = open_bundled_fonts(o.font_dir);
  times.read += since(t0);

  // Series' palette places, kept from page to page. Pages followed by table
  // pages take theirs first; after that only the composing thread uses it.
  std::map<std::string, std::size_t> places;
  // A page followed by table pages is composed now, to count them.
  std::map<std::size_t, Composed> early;  // by plan index; few pages have table pages
  std::vector<Placement> at(plan.size());
  for (std::size_t i = 0; i < plan.size(); ++i) {
    if (!plan[i].table_page) continue;
    Composed& c = early[i];
    t0 = std::chrono::steady_clock::now();
    c.spec = planned_spec(report, plan[i], o.limits);
    check_running_room(c.spec, fonts);
    std::vector<Table> tables = take_tables(plan[i], cache);
    times.data += since(t0);
    c.spec.colours.kept = places;
    c.doc = compose_spec(c.spec, tables, fonts, c.found, o.limits, &times, o.greyscale);
    keep_places(places, c.doc);
    at[i].count = c.doc.pages.size();
  }

  // Number the pages: contents first, then every page in order.
  const PageSpec first_spec = planned_spec(report, plan.front(), o.limits);
  const PageStyle contents_style = style_for_page(first_spec, fonts);
  // The cover and contents take the first page's sheet, margins (as it is
  // laid out with them) and press sheet, so they cut and read like it.
  const Margins front_margins = composed_margins(first_spec, contents_style);
  check_running_room(first_spec, front_margins, contents_style);
  const ContentsSheet sheet{first_spec.sheet.width, first_spec.sheet.height, front_margins};
  std::size_t contents = 0;
  if (report.contents) {
    const std::size_t rows = contents_rows(report, plan, at).size();
    contents = contents_page_count(rows, sheet, contents_style);
  }
  const std::size_t front = (report.cover ? 1 : 0) + contents;  // pages before the first planned page
  std::size_t total = front;
  for (std::size_t i = 0; i < plan.size(); ++i) {
    at[i].first = total;
    total += at[i].count;
  }

  PaintOptions po;
  po.info.title = report.title;
  po.info.author = report.document.author;
  po.info.subject = report.document.subject;
  po.info.keywords = report.document.keywords;
  po.info.language = report.language.value;
  po.info.creation_time = o.creation_time;
  po.info.outline = outline(report, plan, at, front, contents);
  po.info.page_labels = page_labels();
  auto painter = make_painter(OutputFormat::pdf, out, po);

  std::size_t done = 0;
  // The cover carries only the foot: its title is the head.
  auto paint = [&](DisplayPage& page, const Margins& margins, const PageStyle& style, const std::string& section,
                   bool head = true) {
    const PlaceholderValues values{{"section", section}};
    RunningText text;
    if (head) {
      text.head = report.running_head.empty() ? report.title : fill_placeholders(report.running_head.value, values);
      text.section = section;
    }
    text.foot = fill_placeholders(report.running_foot.value, values);
    text.page = done + 1;
    text.pages = total;
    add_running_text(page, margins, text, style);
    if (o.greyscale) page = in_greyscale(std::move(page));  // the running text and the front pages too
    if (o.painting) o.painting(page);
    const auto p0 = std::chrono::steady_clock::now();
    painter->paint(page);                                              // 7. paint
    times.paint += since(p0);
    ++done;
    if (o.progress) o.progress(done, total);
  };

  const long long today = parse_source_date_epoch(std::getenv("SOURCE_DATE_EPOCH")).value_or(std::time(nullptr));
  auto on_press_sheet = [&](DisplayPage page) {
    const PressSpec& press = first_spec.sheet.press;
    const std::string slug = press.slug.empty() ? std::string() : slug_line(press.slug, today, done + 1, total);
    return to_press_sheet(std::move(page), press, contents_style, slug);
  };
  if (report.cover) {
    DisplayPage page = on_press_sheet(cover_page(report.cover_title.empty() ? report.title : report.cover_title,
                                                 report.cover_lines, sheet, contents_style));
    paint(page, sheet.margins, contents_style, "", false);
  }
  if (contents > 0)
    for (auto& page : contents_pages(report.contents_title, contents_rows(report, plan, at), sheet, contents_style)) {
      page = on_press_sheet(std::move(page));
      paint(page, sheet.margins, contents_style, report.contents_title);
    }

  // Later pages are composed on a second thread while earlier ones are
  // painted. Only that thread builds descriptions and uses the table cache
  // once painting starts.
  auto compose = [&](std::size_t i) {
    if (auto e = early.find(i); e != early.end()) return std::move(e->second);
    Composed c;
    const auto r0 = std::chrono::steady_clock::now();
    c.spec = planned_spec(report, plan[i], o.limits);                  // 1b. the page's description
    check_running_room(c.spec, fonts);
    times.read += since(r0);
    const auto d0 = std::chrono::steady_clock::now();
    std::vector<Table> tables = take_tables(plan[i], cache);           // 2. load data
    times.data += since(d0);
    c.spec.colours.kept = places;
    c.doc = compose_spec(c.spec, tables, fonts, c.found, o.limits, &times, o.greyscale);  // 2b-6. series, scales, layout, labels
    keep_places(places, c.doc);
    return c;
  };
  // Two pages ahead evens out pages that take longer to compose than to
  // paint, and keeps memory to a few pages whatever the report's length.
  Lookahead<Composed> composed(plan.size(), 2, compose, o.overlap);
  for (std::size_t i = 0; i < plan.size(); ++i) {
    Composed c = composed.next();
    merge(sink, c.found);
    // Each page's plotted rows travel with the report, named by the page
    // they belong to (panels of repeated pages share titles).
    const std::string page_number = padded(at[i].first + 1, total);
    for (EmbeddedFile& f : c.doc.info.attachments) {
      f.name = "page-" + page_number + "-" + f.name;
      f.description = "Page " + std::to_string(at[i].first + 1) + ": " + f.description;
      painter->attach(f);
    }
    const PageStyle style = style_for_page(c.spec, fonts);
    for (auto& page : c.doc.pages)
      paint(page, c.doc.margins, style, report.sections[plan[i].section].title);
  }
  const auto f0 = std::chrono::steady_clock::now();
  painter->finish();
  times.paint += since(f0);
}

}  // namespace forme
