// `forme-bench report --pages N`: one report of N pages rendered to one PDF,
// the way a monthly report is rebuilt. The report repeats one page
// description for each of N report units (one-page-per); each page is a
// 3 × 2 grid of line panels (one panel per district, via one-panel-per),
// each panel with four scenario lines of 120 monthly points, a direct
// label at each line's end, each line's highest month marked with its
// value (24 value labels a page, placed clear of all other text) and a
// callout on a band of months (six per page). The plotted rows are not
// attached unless --attach is given. Each unit's data are its own CSV
// file, named through a placeholder, so memory does not grow with the page
// count.
// The data are invented, seeded per unit, and written into a temporary
// folder before any timing starts. Prints one line:
//   pages=N wall_s=… pages_per_s=… peak_mb=… kb_per_page=…
//     read_s=… data_s=… scales_s=… layout_s=… place_s=… paint_s=…
//     paint_only_s=… total_over_paint_only=…
// wall_s: the whole report, end to end (two threads: page k+1 is composed
// while page k is painted, so the stage times add up to more than wall_s);
// peak_mb: the peak resident set (getrusage) at the end of that run;
// read_s … paint_s: wall time in each stage, summed over pages (layout_s
// includes the page audits; place_s is the movable text placed last);
// paint_only_s: painting the same, already composed pages again into a new
// PDF, nothing else; total_over_paint_only: wall_s / paint_only_s.
#include <CLI/CLI.hpp>
#include <chrono>
#include <cmath>
#include <cstdint>
#include <cstdio>
#include <filesystem>
#include <fstream>
#include <random>
#include <sstream>
#include <string>
#include <vector>

#include "bench_support.h"
#include "cli/report_job.h"
#include "paint/painter.h"
#include "subcommands.h"
#include "text/font.h"

namespace forme::bench {
namespace {

constexpr const char* kDistricts[] = {"Alder Reach", "Brackmoor", "Corran Vale", "Dunholt", "Eskley", "Fallowmere"};
constexpr const char* kScenarios[] = {"Steady", "Growth", "Retrofit", "Cold winters"};

/// Heat demand per district and scenario, 120 months: a seasonal wave, a
/// scenario trend and noise. Invented for the benchmark.
std::string demand_csv(std::uint64_t seed) {
  std::mt19937_64 rng(seed);
  std::normal_distribution<double> noise(0, 1.5);
  std::string csv = "district,scenario,month,demand_gwh\n";
  char row[128];
  for (int d = 0; d < 6; ++d)
    for (int s = 0; s < 4; ++s) {
      const double base = 40 + 6 * d, trend = (s - 1.5) * 0.05;
      for (int m = 1; m <= 120; ++m) {
        const double v = base + 12 * std::cos(m * 2 * M_PI / 12) + trend * m + noise(rng);
        std::snprintf(row, sizeof row, "%s,%s,%d,%.2f\n", kDistricts[d], kScenarios[s], m, v);
        csv += row;
      }
    }
  return csv;
}

constexpr const char* kPage =
    "sheet: {size: A4, orientation: landscape, margins: 15mm}\n"
    "heading:\n"
    "  title: Heat demand by district, supply area $(unit)\n"
    "  standfirst: Monthly demand under four planning scenarios (invented benchmark data)\n"
    "tables:\n"
    "  units: units.csv\n"
    "  demand: data/$(unit).csv\n"
    "grid: {columns: 3, rows: 2, one-panel-per: district}\n"
    "panel:\n"
    "  kind: line\n"
    "  table: demand\n"
    "  x: month\n"
    "  y: demand_gwh\n"
    "  series-by: scenario\n"
    "  y-title: Demand\n"
    "  y-unit: GWh\n"
    "  value-labels: highest\n"
    "  callouts:\n"
    "    - text: Tariff review\n"
    "      from: \"61\"\n"
    "      to: \"66\"\n"
    "      width: 22mm\n"
    "source: \"Source: invented benchmark data\"\n";

constexpr const char* kReport =
    "title: Heat demand by supply area\n"
    "running-foot: Invented benchmark data\n"
    "contents: false\n"
    "sections:\n"
    "  - title: Supply areas\n"
    "    pages:\n"
    "      - page: page.yaml\n"
    "        title: Supply area $(unit)\n"
    "        one-page-per: {table: units, column: unit}\n";

}  // namespace

int run_report(int argc, char** argv) {
  CLI::App app{"one report of N six-panel pages rendered to one PDF", "forme-bench report"};
  int pages = 50;
  std::uint64_t seed = 1;
  app.add_option("--pages", pages, "pages to render")->check(CLI::Range(1, 10'000));
  app.add_option("--seed", seed, "seed for the invented data");
  bool attach = false;
  app.add_flag("--attach", attach, "embed each page's plotted rows (six CSV files a page) as a report does by default");
  std::string keep_in;
  app.add_option("--keep-in", keep_in,
                 "write the invented report into this folder and keep it, to render or profile it alone");
  CLI11_PARSE(app, argc, argv);

  ScratchFolder scratch("forme-bench-report");
  const std::filesystem::path dir = keep_in.empty() ? scratch.path() : std::filesystem::path(keep_in);
  std::string units = "unit\n";
  for (int p = 0; p < pages; ++p) {
    char name[16];
    std::snprintf(name, sizeof name, "U%04d", p + 1);
    units += std::string(name) + "\n";
    write_text(dir / "data" / (std::string(name) + ".csv"), demand_csv(seed + static_cast<std::uint64_t>(p)));
  }
  write_text(dir / "units.csv", units);
  // The pages as the benchmark specifies them are charts alone; --attach
  // measures the complete report, rows and all.
  write_text(dir / "page.yaml", std::string(kPage) + (attach ? "" : "data: {attach: false}\n"));
  write_text(dir / "report.yaml", kReport);
  const std::string report = (dir / "report.yaml").string();

  ReportRunOptions o;
  o.font_dir = find_font_dir("/proc/self/exe");
  o.creation_time = 0;
  StageTimes times;
  o.times = &times;

  // End to end, into a file as the command line writes it.
  const std::filesystem::path pdf = dir / "report.pdf";
  auto t0 = std::chrono::steady_clock::now();
  DiagnosticSink sink;
  {
    std::ofstream out(pdf, std::ios::binary);
    render_report(report, sink, o, out);
  }
  const double wall = seconds_since(t0);
  const double bytes = static_cast<double>(std::filesystem::file_size(pdf));
  const double peak_mb = peak_rss_mb();  // before the paint-only pass below holds every page at once

  // The same pages again, kept as composed, then painted alone.
  std::vector<DisplayPage> composed;
  o.times = nullptr;
  o.painting = [&](const DisplayPage& page) { composed.push_back(page); };
  DiagnosticSink again;
  render_report_to_bytes(report, again, o);
  t0 = std::chrono::steady_clock::now();
  {
    std::ostringstream out;
    PaintOptions po;
    po.info.title = "paint only";
    po.info.creation_time = 0;
    auto painter = make_painter(OutputFormat::pdf, out, po);
    for (const auto& page : composed) painter->paint(page);
    painter->finish();
  }
  const double paint_only = seconds_since(t0);

  std::printf(
      "pages=%d wall_s=%.3f pages_per_s=%.1f peak_mb=%.1f kb_per_page=%.1f read_s=%.3f data_s=%.3f scales_s=%.3f "
      "layout_s=%.3f place_s=%.3f paint_s=%.3f paint_only_s=%.3f total_over_paint_only=%.2f\n",
      pages, wall, pages / wall, peak_mb, bytes / 1024.0 / pages, times.read, times.data, times.scales, times.layout,
      times.place, times.paint, paint_only, wall / paint_only);
  return 0;
}

}  // namespace forme::bench
