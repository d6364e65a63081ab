// forme-bench: a thin dispatcher; `forme-bench <subcommand> [args]`.
#include <cstdio>
#include <cstring>

#include "base/allocator_tuning.h"
#include "subcommands.h"

namespace {

struct Subcommand {
  const char* name;
  const char* summary;
  int (*run)(int argc, char** argv);  // argv[0] is the subcommand's name
};

constexpr Subcommand kSubcommands[] = {
    {"place", "label placement: greedy vs annealing on random point sets", forme::bench::run_place},
    {"series", "one line panel of N points rendered to PDF in memory", forme::bench::run_series},
    {"report", "one report of N six-panel pages rendered to one PDF", forme::bench::run_report},
};

int usage(std::FILE* out) {
  std::fprintf(out, "usage: forme-bench <subcommand> [options]\n\nsubcommands:\n");
  for (const Subcommand& s : kSubcommands) std::fprintf(out, "  %-10s %s\n", s.name, s.summary);
  return out == stdout ? 0 : 2;
}

}  // namespace

int main(int argc, char** argv) {
  forme::tune_allocator();  // as the command line does
  if (argc < 2) return usage(stderr);
  if (std::strcmp(argv[1], "--help") == 0 || std::strcmp(argv[1], "-h") == 0) return usage(stdout);
  for (const Subcommand& s : kSubcommands)
    if (std::strcmp(argv[1], s.name) == 0) return s.run(argc - 1, argv + 1);
  std::fprintf(stderr, "forme-bench: unknown subcommand '%s'\n", argv[1]);
  return usage(stderr);
}
