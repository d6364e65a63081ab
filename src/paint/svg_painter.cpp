// SVG output: one page per file, text kept as glyph outlines Cairo defines
// once and reuses.
#include <cairo-svg.h>

#include <sstream>
#include <stdexcept>

#include "paint/cairo_stream.h"
#include "paint/draw_cairo.h"
#include "paint/painter.h"
#include "paint/svg_description.h"
#include "paint/svg_ids.h"

namespace forme {

namespace {

class SvgPainter final : public Painter {
 public:
  SvgPainter(std::ostream& out, const PaintOptions& options) : out_(out), title_(options.info.title), description_(options.info.description) {}

  void paint(const DisplayPage& page) override {
    if (painted_) throw std::runtime_error("SVG holds one page; write a PDF for several");
    painted_ = true;
    std::ostringstream buffer;  // Cairo's output, before its ids are made stable
    cairo_surface_t* s = cairo_svg_surface_create_for_stream(write_to_ostream, &buffer, page.width, page.height);
    cairo_svg_surface_set_document_unit(s, CAIRO_SVG_UNIT_PT);
    cairo_t* cr = cairo_create(s);
    draw_page(cr, page);
    cairo_status_t st = cairo_status(cr);
    cairo_destroy(cr);
    cairo_surface_finish(s);
    cairo_status_t st2 = cairo_surface_status(s);
    cairo_surface_destroy(s);
    check_cairo(st, "SVG drawing");
    check_cairo(st2, "SVG file");
    const std::string& title = title_.empty() ? page.title : title_;
    const std::string bytes = add_svg_description(renumber_svg_ids(std::move(buffer).str()), title, description_);
    out_.write(bytes.data(), static_cast<std::streamsize>(bytes.size()));
    if (!out_) throw std::runtime_error("SVG file: write failed");
  }
  void finish() override {}

 private:
  std::ostream& out_;
  std::string title_, description_;  ///< the SVG's <title> and <desc>
  bool painted_ = false;
};

}  // namespace

std::unique_ptr<Painter> make_svg_painter(std::ostream& out, const PaintOptions& options) {
  return std::make_unique<SvgPainter>(out, options);
}

}  // namespace forme
