// forme's command line: parse arguments, call the driver, print diagnostics.
// Exit codes: 0 success, 1 input or data error, 2 usage error.
#include <CLI/CLI.hpp>

#include <filesystem>
#include <iostream>

#include "base/diagnostic.h"
#include "cli/render_job.h"
#include "cli/signal_cleanup.h"
#include "paint/painter.h"
#include "text/font.h"

namespace {

constexpr int kExitInput = 1;
constexpr int kExitUsage = 2;

int print_diagnostics(const std::vector<forme::Diagnostic>& ds) {
  bool error = false;
  for (const auto& d : ds) {
    std::cerr << forme::format_diagnostic(d) << '\n';
    error |= d.severity == forme::Severity::error;
  }
  return error ? kExitInput : 0;
}

}  // namespace

int main(int argc, char** argv) {
  CLI::App app{"forme: composes print-ready chart pages from a YAML page description and CSV tables."};
  app.set_version_flag("--version", std::string("forme ") + FORME_VERSION);
  app.require_subcommand(1);

  // Usage errors read like every other forme error, one line and a hint.
  auto usage_message = [](const CLI::App* a, const CLI::Error& e) {
    std::string name = a->get_name().empty() ? "forme" : "forme " + a->get_name();
    return "forme: error: " + std::string(e.what()) + "\n  hint: run '" + name + " --help'\n";
  };
  app.failure_message(usage_message);
  // CLI11 reports an unknown command as "A subcommand is required".
  if (argc > 1 && argv[1][0] != '-' && std::string(argv[1]) != "render") {
    std::cerr << "forme: error: unknown command '" << argv[1] << "'\n  hint: the command is 'render'\n";
    return kExitUsage;
  }

  forme::RenderOptions render;
  auto* cmd = app.add_subcommand("render", "Render a page description to PDF, SVG or PNG.");
  cmd->failure_message(usage_message);
  cmd->add_option("page", render.page_path, "page description (YAML)")->required();
  cmd->add_option("-o,--output", render.output_path, "output file: .pdf, .svg or .png")->required();
  cmd->add_option("--dpi", render.dpi, "resolution of PNG output")->check(CLI::Range(10.0, 2400.0));

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

  if (*cmd) {
    // A wrong output name is a mistake on the command line, not in the page.
    if (!forme::format_for_path(render.output_path)) {
      std::cerr << render.output_path << ": error: unknown output type\n  hint: name the output .pdf, .svg or .png\n";
      return kExitUsage;
    }
    std::error_code ec;
    if (std::filesystem::equivalent(render.output_path, render.page_path, ec)) {
      std::cerr << render.output_path << ": error: output would overwrite the page description\n"
                << "  hint: name a different output file\n";
      return kExitUsage;
    }
    forme::install_signal_cleanup();
    render.font_dir = forme::find_font_dir(argv[0]);
    forme::RenderResult r = forme::render_file(render);
    int code = print_diagnostics(r.diagnostics);
    (void)code;
    return r.ok ? 0 : kExitInput;
  }
  return kExitUsage;
}
