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
#include <string>
#include <string_view>
#include <vector>

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

  // --- reports (enforced by report/report_plan) --------------------------
  /// Most pages one report description may make (repeated pages included).
  std::size_t report_pages = 10'000;

  // --- data (enforced by data/csv_reader through CsvOptions::max_bytes) ---
  /// Largest CSV table file accepted, in bytes.
  std::size_t table_bytes = 256u * 1024 * 1024;

  // --- later stages -------------------------------------------------------
  /// Pages per output document (enforced where a document is composed).
  std::size_t pages = 5'000;
  /// Most points in one series (enforced by series/select_series).
  std::size_t points_per_series = 2'000'000;
  /// Most labels (everything but headings, axis text and notes) on one page
  /// (enforced by audit/audit_layout).
  std::size_t labels = 10'000;
};

/// The limits by the names the command line uses (`--limit NAME=N`), with
/// what each bounds, in declaration order.
struct LimitName {
  const char* name;
  const char* what;
};
const std::vector<LimitName>& limit_names();

/// Sets one limit from "NAME=N" (N a positive whole number). Returns an
/// empty string on success, else a one-line reason naming the valid names.
std::string set_limit(Limits& limits, std::string_view assignment);

}  // namespace forme
