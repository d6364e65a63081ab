// `forme-bench place`: times the point-label placers and checks their output
// independently of their own bookkeeping.
//
// Set-ups:
// - random: N points, uniform in a 180 × 120 mm area. Each point has a
//   7 pt label of 4–10 characters, 0.55 em wide per character, 7 pt × 1.2
//   tall. Every point is also a 2 × 2 pt data mark. Eight positions,
//   2 pt offset.
// - classic: modelled on the point-feature experiments of Christensen,
//   Marks & Shieber (1995). The parameters are recalled from memory, not
//   checked against the paper: a 792 × 612 area, 30 × 7 labels, four corner
//   positions touching the point, no marks.
// Each run prints one line:
//   setup=random n=1000 method=anneal placed_pct=… overlaps=0 over_marks=… ms=…
// overlaps: pairs of placed boxes that overlap, by an O(n²) check here.
// over_marks: placed boxes that overlap at least one mark.
// ms: wall time of the placer call alone; cpu_ms: the thread's CPU time for
// the same call, which stays honest when the machine is shared.
// With --maps K, each line averages K maps: placed_pct, over_marks and ms
// are means, and overlaps is the total. The exit status is 1 when any
// overlap is found or a box leaves the area.
#include <CLI/CLI.hpp>
#include <algorithm>
#include <chrono>
#include <cstdint>
#include <cstdio>
#include <ctime>
#include <random>
#include <string>
#include <vector>

#include "base/geometry.h"
#include "place/point_labels.h"
#include "subcommands.h"

namespace forme::bench {
namespace {

struct Setup {
  std::string name;
  std::vector<int> sizes;
  PlacementOptions options;
};

double uniform(std::mt19937_64& rng, double lo, double hi) {
  return lo + (hi - lo) * static_cast<double>(rng() >> 11) * 0x1.0p-53;
}

PlacementProblem random_problem(int n, std::mt19937_64& rng) {
  constexpr double kFontSize = 7, kEmPerChar = 0.55, kLineHeight = 1.2, kDot = 2;
  PlacementProblem p;
  p.area = {0, 0, mm_to_pt(180), mm_to_pt(120)};
  for (int i = 0; i < n; ++i) {
    const Point a{uniform(rng, 0, p.area.w), uniform(rng, 0, p.area.h)};
    const auto chars = static_cast<double>(4 + rng() % 7);
    p.labels.push_back({a, chars * kEmPerChar * kFontSize, kFontSize * kLineHeight});
    p.marks.push_back({a.x - kDot / 2, a.y - kDot / 2, kDot, kDot});
  }
  return p;
}

PlacementProblem classic_problem(int n, std::mt19937_64& rng) {
  PlacementProblem p;
  p.area = {0, 0, 792, 612};
  for (int i = 0; i < n; ++i)
    p.labels.push_back({{uniform(rng, 0, p.area.w), uniform(rng, 0, p.area.h)}, 30, 7});
  return p;
}

/// CPU time of this thread: unlike wall time, it does not grow when other
/// processes share the cores.
double thread_cpu_ms() {
  timespec t{};
  clock_gettime(CLOCK_THREAD_CPUTIME_ID, &t);
  return static_cast<double>(t.tv_sec) * 1e3 + static_cast<double>(t.tv_nsec) * 1e-6;
}

struct Check {
  int placed = 0, overlaps = 0, over_marks = 0, outside = 0;
};

/// Brute force, deliberately independent of the placer's grid.
Check check(const PlacementProblem& p, const PlacementResult& r) {
  Check c;
  std::vector<Rect> boxes;
  for (const LabelPlacement& l : r.labels)
    if (l.placed) boxes.push_back(l.box);
  c.placed = static_cast<int>(boxes.size());
  for (std::size_t i = 0; i < boxes.size(); ++i) {
    const Rect& b = boxes[i];
    for (std::size_t j = i + 1; j < boxes.size(); ++j) c.overlaps += b.overlaps(boxes[j]);
    for (const Rect& m : p.marks) {
      if (b.overlaps(m)) {
        ++c.over_marks;
        break;
      }
    }
    c.outside += b.x < p.area.x || b.y < p.area.y || b.right() > p.area.right() ||
                 b.bottom() > p.area.bottom();
  }
  return c;
}

}  // namespace

int run_place(int argc, char** argv) {
  CLI::App app{"label placement: greedy vs annealing", "forme-bench place"};
  std::uint64_t seed = 1;
  int maps = 1;
  std::vector<std::string> only;
  app.add_option("--seed", seed, "seed for the random maps and for annealing");
  app.add_option("--maps", maps, "random maps per line, averaged")->check(CLI::PositiveNumber);
  app.add_option("--setup", only, "run only these set-ups")
      ->check(CLI::IsMember({"random", "classic"}));
  CLI11_PARSE(app, argc, argv);

  PlacementOptions classic_options;
  classic_options.positions.assign(kCornerPositions.begin(), kCornerPositions.end());
  classic_options.offset = 0;
  const std::vector<Setup> setups = {
      {"random", {100, 1000, 10000}, PlacementOptions{}},
      {"classic", {100, 250, 500, 750, 1000, 1500}, classic_options},
  };
  const struct {
    const char* name;
    PlacementResult (*run)(const PlacementProblem&, const PlacementOptions&);
  } methods[] = {{"greedy", place_labels_greedy}, {"anneal", place_labels_annealing}};

  bool ok = true;
  for (const Setup& setup : setups) {
    if (!only.empty() && std::find(only.begin(), only.end(), setup.name) == only.end()) continue;
    for (int n : setup.sizes) {
      for (const auto& method : methods) {
        PlacementOptions options = setup.options;
        options.seed = seed;
        std::mt19937_64 rng(seed + static_cast<std::uint64_t>(n));  // same maps for both methods
        double placed_pct = 0, over_marks = 0, ms = 0, cpu_ms = 0;
        int overlaps = 0, outside = 0;
        for (int k = 0; k < maps; ++k) {
          const PlacementProblem problem =
              setup.name == "random" ? random_problem(n, rng) : classic_problem(n, rng);
          const double cpu_start = thread_cpu_ms();
          const auto start = std::chrono::steady_clock::now();
          const PlacementResult result = method.run(problem, options);
          const auto stop = std::chrono::steady_clock::now();
          cpu_ms += thread_cpu_ms() - cpu_start;
          const Check c = check(problem, result);
          placed_pct += 100.0 * c.placed / n;
          over_marks += c.over_marks;
          overlaps += c.overlaps;
          outside += c.outside;
          ms += std::chrono::duration<double, std::milli>(stop - start).count();
        }
        std::printf(
            "setup=%s n=%d method=%s placed_pct=%.1f overlaps=%d over_marks=%.1f ms=%.2f "
            "cpu_ms=%.2f\n",
            setup.name.c_str(), n, method.name, placed_pct / maps, overlaps, over_marks / maps,
            ms / maps, cpu_ms / maps);
        if (outside > 0) std::printf("  error: %d boxes outside the area\n", outside);
        ok = ok && overlaps == 0 && outside == 0;
      }
    }
  }
  return ok ? 0 : 1;
}

}  // namespace forme::bench
