// `forme-bench series --points N`: one line panel of N points, rendered to a
// PDF in memory. The data are invented: a seeded random walk of a sensor
// reading against a sample number, written as page.yaml + CSV into a
// temporary folder. Prints one line:
//   points=N drawn=… wall_s=… compose_s=… paint_s=… kb=… peak_mb=…
// drawn: points left on the series line after thinning.
// wall_s: render_to_bytes end to end (read, load, scale, lay out, paint);
// compose_s and paint_s: the same page again, split at the display list.
// peak_mb: the process's peak resident set (getrusage), data writing included.
// --out FILE also writes the PDF, to look at or take apart.
#include <CLI/CLI.hpp>
#include <algorithm>
#include <chrono>
#include <cmath>
#include <cstdint>
#include <cstdio>
#include <random>
#include <sstream>
#include <string>

#include "bench_support.h"
#include "cli/render_job.h"
#include "paint/painter.h"
#include "subcommands.h"
#include "text/font.h"

namespace forme::bench {
namespace {

std::string series_csv(std::size_t n, std::uint64_t seed) {
  std::mt19937_64 rng(seed);
  std::normal_distribution<double> step(0, 0.4);
  std::string csv = "sample,reading\n";
  csv.reserve(n * 20);
  double v = 50;
  char row[64];
  for (std::size_t i = 0; i < n; ++i) {
    v += step(rng) - 0.002 * (v - 50);  // drifts back towards 50
    std::snprintf(row, sizeof row, "%zu,%.3f\n", i + 1, v);
    csv += row;
  }
  return csv;
}

// The chart alone is measured: attached, a million rows would add their
// own few megabytes of compressed CSV, whatever the drawing costs.
constexpr const char* kPage = R"(sheet: {size: A4, orientation: landscape, margins: 15mm}
heading:
  title: Probe 7 reading over the test run
  standfirst: Invented data for a benchmark, one reading per sample
tables:
  probe: probe.csv
panel:
  kind: line
  table: probe
  x: sample
  y: reading
  y-title: Reading
source: "Source: invented benchmark data"
data: {attach: false}
)";

}  // namespace

int run_series(int argc, char** argv) {
  CLI::App app{"one line panel of N points rendered to PDF in memory", "forme-bench series"};
  std::size_t points = 100'000;
  std::uint64_t seed = 1;
  std::string out_path;
  app.add_option("--points", points, "points in the series")->check(CLI::Range(std::size_t{2}, std::size_t{50'000'000}));
  app.add_option("--seed", seed, "seed for the invented data");
  app.add_option("--out", out_path, "also write the PDF here");
  CLI11_PARSE(app, argc, argv);

  ScratchFolder dir("forme-bench-series");
  write_text(dir.path() / "probe.csv", series_csv(points, seed));
  write_text(dir.path() / "page.yaml", kPage);
  const std::string page = (dir.path() / "page.yaml").string();
  const std::string fonts = find_font_dir("/proc/self/exe");
  Limits limits;
  limits.table_bytes = std::max(limits.table_bytes, points * 32);
  limits.points_per_series = std::max(limits.points_per_series, points);

  DiagnosticSink sink;
  auto t0 = std::chrono::steady_clock::now();
  const std::string pdf = render_to_bytes(page, OutputFormat::pdf, fonts, 150, sink, limits);
  const double wall = seconds_since(t0);

  t0 = std::chrono::steady_clock::now();
  DisplayPage composed = compose_page(page, fonts, sink, limits);
  const double compose = seconds_since(t0);
  t0 = std::chrono::steady_clock::now();
  std::ostringstream out;
  PaintOptions po;
  po.info.creation_time = 0;
  auto painter = make_painter(OutputFormat::pdf, out, po);
  painter->paint(composed);
  painter->finish();
  const double paint = seconds_since(t0);

  std::size_t drawn = 0;  // the series line is the page's longest path
  for (const DisplayItem& item : composed.items)
    if (const auto* path = std::get_if<PathItem>(&item)) drawn = std::max(drawn, path->points.size());
  if (!out_path.empty()) write_text(out_path, pdf);

  std::printf("points=%zu drawn=%zu wall_s=%.3f compose_s=%.3f paint_s=%.3f kb=%.0f peak_mb=%.1f\n", points, drawn,
              wall, compose, paint, static_cast<double>(pdf.size()) / 1024.0, peak_rss_mb());
  return 0;
}

}  // namespace forme::bench
