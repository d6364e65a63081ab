#pragma once
/// forme-bench's subcommands. Each one lives in its own file; to add one,
/// declare its entry point here and list it in main.cpp's table.
namespace forme::bench {

/// `forme-bench place`: label-placement timings and quality (place_bench.cpp).
int run_place(int argc, char** argv);

/// `forme-bench series`: one line panel of N points to PDF (series_bench.cpp).
int run_series(int argc, char** argv);

/// `forme-bench report`: N six-panel pages to PDF, one after another (report_bench.cpp).
int run_report(int argc, char** argv);

}  // namespace forme::bench
