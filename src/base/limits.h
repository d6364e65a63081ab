#pragma once
/// Limits on what one run will accept. Bad or hostile input is part of the
/// product: each limit turns input that would exhaust memory, time or the
/// stack into an ordinary located error. The values travel in a `Limits`
/// passed to the stages that enforce them (no globals), so tests and fuzzers
/// can tighten them.
///
/// The defaults are generous for real pages (a page description is a few
/// kilobytes; a chart with a million points cannot be read in print) and
/// small enough that a refused input costs milliseconds.
#include <cstddef>

namespace forme {

struct Limits {
  // --- the page description (enforced by describe/yaml_guard) -------------
  /// Largest page description accepted, in bytes.
  std::size_t description_bytes = 1024 * 1024;
  /// Most anchors (`&name`) one description may define.
  int yaml_anchors = 100;
  /// Most aliases (`*name`) one description may use.
  int yaml_aliases = 100;
  /// Most nodes the description may stand for once every alias is expanded.
  /// A few nested aliases can stand for billions of nodes (an "alias bomb");
  /// later passes walk the expanded tree, so this bounds their work.
  std::size_t yaml_expanded_nodes = 100'000;
  /// Deepest nesting of mappings and lists. Parsers and validators recurse
  /// once per level, so this also bounds stack use.
  int nesting_depth = 64;

  // --- the page (enforced by describe/read_page) --------------------------
  /// Most panels listed under `panels`.
  std::size_t panels = 400;

  // --- data (enforced by data/csv_reader through CsvOptions::max_bytes) ---
  /// Largest CSV table file accepted, in bytes.
  std::size_t table_bytes = 256u * 1024 * 1024;

  // --- later stages (recorded here; not yet enforced: the stages have no
  //     Limits parameter yet, see tests/bad/KNOWN-GAPS.md) ----------------
  /// Pages per output file (forme renders one page per description today).
  std::size_t pages = 1;
  /// Most points in one series.
  std::size_t points_per_series = 1'000'000;
  /// Most direct labels placed on one page.
  std::size_t labels = 10'000;
};

}  // namespace forme
