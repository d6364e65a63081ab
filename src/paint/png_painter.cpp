// PNG output: a raster preview at the requested resolution, white paper.
#include <cairo.h>

#include <cmath>
#include <stdexcept>

#include "paint/cairo_stream.h"
#include "paint/draw_cairo.h"
#include "paint/painter.h"

namespace forme {

namespace {

class PngPainter final : public Painter {
 public:
  PngPainter(std::ostream& out, double dpi) : out_(out), dpi_(dpi) {}

  void paint(const DisplayPage& page) override {
    if (painted_) throw std::runtime_error("PNG holds one page; write a PDF for several");
    painted_ = true;
    const double k = dpi_ / 72.0;
    int w = static_cast<int>(std::lround(page.width * k));
    int h = static_cast<int>(std::lround(page.height * k));
    if (w < 1 || h < 1 || static_cast<double>(w) * h > 400e6)
      throw std::runtime_error("PNG would be too large at this resolution; lower --dpi");
    cairo_surface_t* s = cairo_image_surface_create(CAIRO_FORMAT_RGB24, w, h);
    cairo_t* cr = cairo_create(s);
    cairo_set_source_rgb(cr, 1, 1, 1);
    cairo_paint(cr);
    cairo_scale(cr, k, k);
    draw_page(cr, page);
    cairo_status_t st = cairo_status(cr);
    cairo_destroy(cr);
    cairo_status_t st2 = st == CAIRO_STATUS_SUCCESS ? cairo_surface_write_to_png_stream(s, write_to_ostream, &out_) : st;
    cairo_surface_destroy(s);
    check_cairo(st, "PNG drawing");
    check_cairo(st2, "PNG file");
  }
  void finish() override {}

 private:
  std::ostream& out_;
  double dpi_;
  bool painted_ = false;
};

}  // namespace

std::unique_ptr<Painter> make_png_painter(std::ostream& out, const PaintOptions& options) {
  return std::make_unique<PngPainter>(out, options.dpi);
}

}  // namespace forme
