// forme's command line: parse arguments, call the driver, print diagnostics.
// Exit codes: 0 success, 1 input or data error (or, for check, findings that
// fail), 2 usage error.
#include <CLI/CLI.hpp>

#include <filesystem>
#include <iostream>
#include <optional>

#include "base/allocator_tuning.h"
#include "base/diagnostic.h"
#include "cli/colour_commands.h"
#include "cli/progress_bar.h"
#include "cli/render_job.h"
#include "cli/signal_cleanup.h"
#include "cli/starters.h"
#include "cli/watch.h"
#include "describe/json_schema.h"
#include "describe/schema.h"
#include "paint/painter.h"
#include "text/font.h"

namespace {

constexpr int kExitInput = 1;
constexpr int kExitUsage = 2;

// Errors first (the first line says why nothing was written), then
// warnings and notes, each group in the order found.
bool print_diagnostics(const std::vector<forme::Diagnostic>& ds) {
  bool error = false;
  for (const auto& d : ds)
    if (d.severity == forme::Severity::error) {
      std::cerr << forme::format_diagnostic(d) << '\n';
      error = true;
    }
  for (const auto& d : ds)
    if (d.severity != forme::Severity::error) std::cerr << forme::format_diagnostic(d) << '\n';
  return error;
}

bool has_warnings(const std::vector<forme::Diagnostic>& ds) {
  for (const auto& d : ds)
    if (d.severity == forme::Severity::warning) return true;
  return false;
}

int render(forme::RenderOptions& options, bool quiet, const char* argv0) {
  // A wrong output name is a mistake on the command line, not in the page.
  if (!forme::format_for_path(options.output_path)) {
    std::cerr << options.output_path << ": error: unknown output type\n  hint: name the output .pdf, .svg or .png\n";
    return kExitUsage;
  }
  std::error_code ec;
  if (std::filesystem::equivalent(options.output_path, options.page_path, ec)) {
    std::cerr << options.output_path << ": error: output would overwrite the page description\n"
              << "  hint: name a different output file\n";
    return kExitUsage;
  }
  forme::install_signal_cleanup();
  options.font_dir = forme::find_font_dir(argv0);
  // A report of many pages shows its progress on a terminal, unless asked not to.
  std::optional<forme::ProgressBar> bar;
  if (!quiet && forme::stderr_is_terminal()) {
    options.progress = [&bar](std::size_t done, std::size_t total) {
      if (!bar) bar.emplace(stderr);
      bar->update(done, total);
    };
  }
  forme::RenderResult r = forme::render_file(options);
  bar.reset();
  print_diagnostics(r.diagnostics);
  return r.ok ? 0 : kExitInput;
}

int check(const std::string& page, bool strict, bool greyscale, const forme::Limits& limits, const char* argv0) {
  forme::RenderResult r = forme::check_file(page, forme::find_font_dir(argv0), limits, greyscale);
  const bool errors = print_diagnostics(r.diagnostics);
  if (errors || !r.ok) return kExitInput;
  if (strict && has_warnings(r.diagnostics)) return kExitInput;
  if (r.diagnostics.empty()) std::cerr << page << ": no findings\n";
  return 0;
}

int make_starter(const std::string& kind, const std::string& dir) {
  try {
    forme::write_starter(kind, dir);
  } catch (const forme::InputError& e) {
    std::cerr << forme::format_diagnostic(e.diagnostic()) << '\n';
    return kExitInput;
  }
  std::cout << "wrote " << dir << "/page.yaml; render it with: forme render " << dir << "/page.yaml -o " << kind
            << ".pdf\n";
  return 0;
}

}  // namespace

int main(int argc, char** argv) {
  forme::tune_allocator();
  CLI::App app{"forme: composes print-ready chart pages from a YAML page description and CSV tables."};
  app.set_version_flag("--version", std::string("forme ") + FORME_VERSION);
  app.require_subcommand(1);

  // Usage errors read like every other forme error, one line and a hint.
  auto usage_message = [](const CLI::App* a, const CLI::Error& e) {
    // The root command's name is argv[0], which may be a path: say "forme".
    std::string name = a->get_parent() == nullptr ? "forme" : "forme " + a->get_name();
    return "forme: error: " + std::string(e.what()) + "\n  hint: run '" + name + " --help'\n";
  };
  app.failure_message(usage_message);

  forme::RenderOptions render_options;
  auto* render_cmd = app.add_subcommand("render", "Render a page description to PDF, SVG or PNG.");
  render_cmd->add_option("page", render_options.page_path, "page description (YAML)")->required();
  render_cmd->add_option("-o,--output", render_options.output_path, "output file: .pdf, .svg or .png")->required();
  render_cmd->add_option("--dpi", render_options.dpi, "resolution of PNG output")->check(CLI::Range(10.0, 2400.0));
  render_cmd->add_flag("--greyscale", render_options.greyscale,
                       "paint in greys of the same lightness, for black-and-white printing");
  bool quiet = false;
  render_cmd->add_flag("-q,--quiet", quiet, "no progress bar while a report renders");

  forme::RenderOptions watch_options;
  auto* watch_cmd = app.add_subcommand(
      "watch", "Render, then render again whenever the description or a file it reads changes (until interrupted).");
  watch_cmd->add_option("page", watch_options.page_path, "page or report description (YAML)")->required();
  watch_cmd->add_option("-o,--output", watch_options.output_path, "output file: .pdf, .svg or .png")->required();
  watch_cmd->add_option("--dpi", watch_options.dpi, "resolution of PNG output")->check(CLI::Range(10.0, 2400.0));

  std::string check_page;
  bool strict = false;
  bool check_greyscale = false;
  auto* check_cmd = app.add_subcommand(
      "check", "Read a page or report, resolve its data and scales without painting, and list what could mislead.");
  check_cmd->add_option("page", check_page, "page or report description (YAML)")->required();
  check_cmd->add_flag("--strict", strict, "treat warnings as failures (exit 1)");
  check_cmd->add_flag("--greyscale", check_greyscale, "check the page as painted in grey for black-and-white printing");

  // --limit NAME=N, on both commands that read pages (base/limits.h).
  std::vector<std::string> limit_settings;
  std::string limit_help = "raise or lower a limit, as NAME=N; limits:";
  for (const auto& l : forme::limit_names()) limit_help += std::string("\n  ") + l.name + ": " + l.what;
  const CLI::Validator valid_limit(
      [](std::string& text) {
        forme::Limits scratch;
        return forme::set_limit(scratch, text);
      },
      "NAME=N");
  for (auto* sub : {render_cmd, check_cmd})
    // One NAME=N per --limit, so the page after it is not read as another.
    sub->add_option("--limit", limit_settings, limit_help)->check(valid_limit)->allow_extra_args(false);

  std::string fg, bg;
  auto* contrast_cmd = app.add_subcommand("contrast", "Print the WCAG 2.x contrast ratio of two colours.");
  contrast_cmd->add_option("foreground", fg, "#rgb, #rrggbb, oklch(L C H) or a palette entry such as estuary.2")->required();
  contrast_cmd->add_option("background", bg, "the colour behind it")->required();

  std::string palette_name;
  auto* palette_cmd = app.add_subcommand("palette", "Show a palette with its distances under simulated colour vision.");
  std::string sheet_path;
  palette_cmd->add_option("name", palette_name, "palette name");
  palette_cmd->add_option("--sheet", sheet_path,
                          "write a sheet of every palette under simulated colour vision (.png, .pdf or .svg)");

  auto* schema_cmd = app.add_subcommand(
      "schema", "Print a JSON Schema of the page description, for editors that check YAML as it is typed.");

  std::string starter_kind, starter_dir;
  auto* new_cmd = app.add_subcommand("new", "Write a starter page description with example data into a new folder.");
  new_cmd->add_option("kind", starter_kind, "briefing, report, poster or figure")
      ->required()
      ->check(CLI::IsMember(forme::starter_kinds()));
  new_cmd->add_option("folder", starter_dir, "a folder that does not exist yet, or an empty one")->required();

  for (auto* sub : app.get_subcommands({})) sub->failure_message(usage_message);

  // CLI11 reports an unknown command as "A subcommand is required".
  if (argc > 1 && argv[1][0] != '-') {
    bool known = false;
    for (auto* sub : app.get_subcommands({})) known |= sub->get_name() == argv[1];
    if (!known) {
      std::cerr << "forme: error: unknown command '" << argv[1]
                << "'\n  hint: the commands are render, watch, check, contrast, palette, schema and new\n";
      return kExitUsage;
    }
  }

  try {
    app.parse(argc, argv);
  } catch (const CLI::CallForHelp& e) {
    return app.exit(e);
  } catch (const CLI::CallForAllHelp& e) {
    return app.exit(e);
  } catch (const CLI::CallForVersion& e) {
    return app.exit(e);
  } catch (const CLI::ParseError& e) {
    app.exit(e);
    return kExitUsage;
  }

  forme::Limits limits;
  for (const auto& setting : limit_settings) forme::set_limit(limits, setting);  // checked while parsing
  render_options.limits = limits;
  if (*render_cmd) return render(render_options, quiet, argv[0]);
  if (*check_cmd) return check(check_page, strict, check_greyscale, limits, argv[0]);
  if (*watch_cmd) {
    if (!forme::format_for_path(watch_options.output_path)) {
      std::cerr << watch_options.output_path << ": error: unknown output type\n  hint: name the output .pdf, .svg or .png\n";
      return kExitUsage;
    }
    forme::install_signal_cleanup();
    watch_options.font_dir = forme::find_font_dir(argv[0]);
    watch_options.limits = limits;
    return forme::watch_and_render(watch_options);
  }
  if (*contrast_cmd) return forme::run_contrast(fg, bg, std::cout, std::cerr);
  if (*palette_cmd) {
    if (!sheet_path.empty()) return forme::run_palette_sheet(sheet_path, forme::find_font_dir(argv[0]), std::cerr);
    if (palette_name.empty()) {
      std::cerr << "forme: error: name a palette, or give --sheet FILE\n  hint: run 'forme palette --help'\n";
      return kExitUsage;
    }
    return forme::run_palette(palette_name, std::cout, std::cerr);
  }
  if (*new_cmd) return make_starter(starter_kind, starter_dir);
  if (*schema_cmd) {
    std::cout << forme::json_schema_text(forme::page_schema());
    return 0;
  }
  return kExitUsage;
}
