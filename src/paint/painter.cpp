#include "paint/painter.h"

#include <algorithm>
#include <filesystem>
#include <stdexcept>

#include "paint/cairo_stream.h"

namespace forme {

std::unique_ptr<Painter> make_pdf_painter(std::ostream& out, const PaintOptions& options);
std::unique_ptr<Painter> make_svg_painter(std::ostream& out, const PaintOptions& options);
std::unique_ptr<Painter> make_png_painter(std::ostream& out, const PaintOptions& options);

std::unique_ptr<Painter> make_painter(OutputFormat format, std::ostream& out, const PaintOptions& options) {
  switch (format) {
    case OutputFormat::pdf: return make_pdf_painter(out, options);
    case OutputFormat::svg: return make_svg_painter(out, options);
    case OutputFormat::png: return make_png_painter(out, options);
  }
  throw std::logic_error("unknown output format");
}

std::optional<OutputFormat> format_for_path(const std::string& path) {
  std::string ext = std::filesystem::path(path).extension().string();
  std::transform(ext.begin(), ext.end(), ext.begin(), [](unsigned char c) { return static_cast<char>(std::tolower(c)); });
  if (ext == ".pdf") return OutputFormat::pdf;
  if (ext == ".svg") return OutputFormat::svg;
  if (ext == ".png") return OutputFormat::png;
  return std::nullopt;
}

void check_cairo(cairo_status_t status, const char* what) {
  if (status != CAIRO_STATUS_SUCCESS)
    throw std::runtime_error(std::string(what) + ": " + cairo_status_to_string(status));
}

}  // namespace forme
