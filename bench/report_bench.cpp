// `forme-bench report --pages N`: N one-page reports rendered to PDF one
// after another, the way a monthly report is rebuilt. Each page is a 3 × 2
// grid of line panels (one panel per district, via one-panel-per), each
// panel with four scenario lines of 120 monthly points. The data are
// invented, seeded per page, and written as page.yaml + CSV into a
// temporary folder before any timing starts. Prints one line:
//   pages=N wall_s=… pages_per_s=… peak_mb=… kb_per_page=…
//     compose_s=… paint_only_s=… overhead=…
// wall_s: render_to_bytes for every page, end to end; peak_mb: the peak
// resident set (getrusage) at the end of that run.
// compose_s: compose_page for every page (read, load, scale, lay out).
// paint_only_s: painting the already composed pages to PDF in memory.
// overhead: wall_s / paint_only_s, what the stages before painting cost
// relative to painting itself.
#include <CLI/CLI.hpp>
#include <chrono>
#include <cmath>
#include <cstdint>
#include <cstdio>
#include <random>
#include <sstream>
#include <string>
#include <vector>

#include "bench_support.h"
#include "cli/render_job.h"
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

std::string page_yaml(int n) {
  return "sheet: {size: A4, orientation: landscape, margins: 15mm}\n"
         "heading:\n"
         "  title: Heat demand by district, report " + std::to_string(n) + "\n"
         "  standfirst: Monthly demand under four planning scenarios (invented benchmark data)\n"
         "tables:\n"
         "  demand: demand.csv\n"
         "grid: {columns: 3, rows: 2, one-panel-per: district}\n"
         "panel:\n"
         "  kind: line\n"
         "  table: demand\n"
         "  x: month\n"
         "  y: demand_gwh\n"
         "  series-by: scenario\n"
         "  y-title: Demand\n"
         "  y-unit: GWh\n"
         "source: \"Source: invented benchmark data\"\n";
}

}  // namespace

int run_report(int argc, char** argv) {
  CLI::App app{"N one-page reports of six line panels, rendered to PDF one after another", "forme-bench report"};
  int pages = 50;
  std::uint64_t seed = 1;
  app.add_option("--pages", pages, "pages to render")->check(CLI::Range(1, 100'000));
  app.add_option("--seed", seed, "seed for the invented data");
  CLI11_PARSE(app, argc, argv);

  ScratchFolder dir("forme-bench-report");
  std::vector<std::string> paths;
  for (int p = 0; p < pages; ++p) {
    const auto folder = dir.path() / ("page" + std::to_string(p));
    write_text(folder / "demand.csv", demand_csv(seed + static_cast<std::uint64_t>(p)));
    write_text(folder / "page.yaml", page_yaml(p + 1));
    paths.push_back((folder / "page.yaml").string());
  }
  const std::string fonts = find_font_dir("/proc/self/exe");

  // End to end, page after page.
  double bytes = 0;
  auto t0 = std::chrono::steady_clock::now();
  for (const auto& page : paths) {
    DiagnosticSink sink;
    bytes += static_cast<double>(render_to_bytes(page, OutputFormat::pdf, fonts, 150, sink).size());
  }
  const double wall = seconds_since(t0);
  const double peak_mb = peak_rss_mb();  // before the split run below holds every page at once

  // The same pages split at the display list: compose every page, then
  // paint the composed pages.
  std::vector<DisplayPage> composed;
  composed.reserve(paths.size());
  t0 = std::chrono::steady_clock::now();
  for (const auto& page : paths) {
    DiagnosticSink sink;
    composed.push_back(compose_page(page, fonts, sink));
  }
  const double compose = seconds_since(t0);
  t0 = std::chrono::steady_clock::now();
  for (const auto& page : composed) {
    std::ostringstream out;
    PaintOptions po;
    po.info.title = page.title;
    po.info.creation_time = 0;
    auto painter = make_painter(OutputFormat::pdf, out, po);
    painter->paint(page);
    painter->finish();
  }
  const double paint = seconds_since(t0);

  std::printf(
      "pages=%d wall_s=%.3f pages_per_s=%.1f peak_mb=%.1f kb_per_page=%.1f compose_s=%.3f paint_only_s=%.3f "
      "overhead=%.2f\n",
      pages, wall, pages / wall, peak_mb, bytes / 1024.0 / pages, compose, paint, wall / paint);
  return 0;
}

}  // namespace forme::bench
