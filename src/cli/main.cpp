// forme's command line: parse arguments, call the driver, print diagnostics.
// Exit codes: 0 success, 1 input or data error, 2 usage error.
#include <CLI/CLI.hpp>

#include <iostream>

#include "base/diagnostic.h"
#include "cli/render_job.h"
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

  forme::RenderOptions render;
  auto* cmd = app.add_subcommand("render", "Render a page description to PDF, SVG or PNG.");
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
    render.font_dir = forme::find_font_dir(argv[0]);
    forme::RenderResult r = forme::render_file(render);
    int code = print_diagnostics(r.diagnostics);
    (void)code;
    return r.ok ? 0 : kExitInput;
  }
  return kExitUsage;
}
