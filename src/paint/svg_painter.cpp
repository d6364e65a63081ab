// SVG output: one page per file, written element by element from the
// display page. Shapes are paths and circles; text stays text (<text>
// elements a reader can search and select), set in the page's fonts, which
// travel inside the file (svg_fonts.h), with each glyph cluster placed
// where the PDF places it.
#include <cmath>
#include <cstdio>
#include <sstream>
#include <stdexcept>

#include "paint/hatch_geometry.h"
#include "paint/painter.h"
#include "paint/svg_description.h"
#include "paint/svg_fonts.h"

namespace forme {

namespace {

// Coordinates to a thousandth of a point, trailing zeros dropped: finer
// than any printer resolves, and the same bytes every run.
std::string num(double v) {
  if (std::abs(v) < 0.0005) return "0";
  char buf[32];
  std::snprintf(buf, sizeof buf, "%.3f", v);
  std::string s = buf;
  while (s.back() == '0') s.pop_back();
  if (s.back() == '.') s.pop_back();
  return s;
}

std::string colour(const Rgb& c) {
  auto byte = [](double v) { return static_cast<int>(std::lround(std::clamp(v, 0.0, 1.0) * 255)); };
  char buf[8];
  std::snprintf(buf, sizeof buf, "#%02x%02x%02x", byte(c.r), byte(c.g), byte(c.b));
  return buf;
}

std::string attribute_text(std::string_view s) {
  std::string out = xml_text(s);
  for (std::size_t p = out.find('"'); p != std::string::npos; p = out.find('"', p + 1)) out.replace(p, 1, "&quot;");
  return out;
}

std::string paint_attributes(const std::optional<Rgb>& fill, const std::optional<Stroke>& stroke) {
  std::string a = " fill=\"" + (fill ? colour(*fill) : std::string("none")) + "\"";
  if (stroke) {
    a += " stroke=\"" + colour(stroke->colour) + "\" stroke-width=\"" + num(stroke->width) + "\"";
    a += stroke->round ? " stroke-linecap=\"round\" stroke-linejoin=\"round\"" : " stroke-miterlimit=\"10\"";
    if (!stroke->dash.empty()) {
      a += " stroke-dasharray=\"";
      for (std::size_t i = 0; i < stroke->dash.size(); ++i) a += (i ? " " : "") + num(stroke->dash[i]);
      a += "\"";
    }
  }
  return a;
}

std::string path_data(const PathItem& p) {
  std::string d;
  for (std::size_t i = 0; i < p.points.size(); ++i)
    d += (i ? " L " : "M ") + num(p.points[i].x) + " " + num(p.points[i].y);
  if (p.closed) d += " Z";
  return d;
}

class SvgWriter {
 public:
  explicit SvgWriter(std::ostringstream& body) : out_(body) {}

  void draw(const PathItem& p) {
    if (p.points.empty()) return;
    if (p.hatch && p.closed && p.fill) {
      out_ << "<path d=\"" << path_data(p) << "\"" << paint_attributes(p.fill, std::nullopt) << "/>\n";
      hatch(p, *p.hatch);
      if (p.stroke) out_ << "<path d=\"" << path_data(p) << "\"" << paint_attributes(std::nullopt, p.stroke) << "/>\n";
      return;
    }
    out_ << "<path d=\"" << path_data(p) << "\"" << paint_attributes(p.fill, p.stroke) << "/>\n";
  }

  void draw(const CircleItem& c) {
    out_ << "<circle cx=\"" << num(c.centre.x) << "\" cy=\"" << num(c.centre.y) << "\" r=\"" << num(c.radius) << "\""
         << paint_attributes(c.fill, c.stroke) << "/>\n";
  }

  // One <text> per run. A left-to-right run gives every character its
  // cluster's x, so the reader's own shaping cannot drift from forme's; a
  // right-to-left run is written in logical order from its left end and
  // the reader sets it right to left (its characters are strongly
  // right-to-left), as the PDF shows it.
  void draw(const TextItem& t) {
    const ShapedText& s = t.text;
    for (const GlyphRun& run : s.runs) {
      const std::string_view bytes(s.utf8.data() + run.byte_begin, run.byte_end - run.byte_begin);
      fonts_.use(run.font, bytes);
      const double left = t.origin.x + s.glyphs[run.glyph_begin].x;
      out_ << "<text" << SvgFonts::attributes(*run.font) << " font-size=\"" << num(s.size) << "\" fill=\""
           << colour(t.colour) << "\" y=\"" << num(t.origin.y) << "\" x=\"";
      if (run.rtl) out_ << num(left);
      else out_ << character_positions(t, run);
      out_ << "\">" << xml_text(bytes) << "</text>\n";
    }
  }

  const SvgFonts& fonts() const { return fonts_; }

 private:
  // x of each character of a left-to-right run (code points, which is
  // what SVG 2 §11.8.1 counts): a cluster's characters share its width.
  static std::string character_positions(const TextItem& t, const GlyphRun& run) {
    const ShapedText& s = t.text;
    std::string xs;
    std::size_t g = run.glyph_begin;
    while (g < run.glyph_end) {
      const unsigned c = s.glyphs[g].cluster;
      const double x = t.origin.x + s.glyphs[g].x;
      double advance = 0;
      std::size_t j = g;
      for (; j < run.glyph_end && s.glyphs[j].cluster == c; ++j) advance += s.glyphs[j].advance;
      const std::size_t end = j < run.glyph_end ? s.glyphs[j].cluster : run.byte_end;
      std::size_t chars = 0;
      for (std::size_t b = c; b < end; ++b)
        if ((static_cast<unsigned char>(s.utf8[b]) & 0xC0) != 0x80) ++chars;
      for (std::size_t k = 0; k < chars; ++k) xs += (xs.empty() ? "" : " ") + num(x + advance * static_cast<double>(k) / static_cast<double>(chars));
      g = j;
    }
    return xs;
  }

  void hatch(const PathItem& p, const Hatch& h) {
    double x0 = 1e300, y0 = 1e300, x1 = -1e300, y1 = -1e300;
    for (const Point& pt : p.points) x0 = std::min(x0, pt.x), y0 = std::min(y0, pt.y), x1 = std::max(x1, pt.x), y1 = std::max(y1, pt.y);
    const std::string id = "clip" + std::to_string(++clips_);
    out_ << "<clipPath id=\"" << id << "\"><path d=\"" << path_data(p) << "\"/></clipPath>\n<g clip-path=\"url(#" << id << ")\"";
    if (h.kind == Hatch::Kind::dots) {
      out_ << " fill=\"" << colour(h.ink) << "\">";
      for (const Point& c : hatch_dots(x0, y0, x1, y1, h.spacing))
        out_ << "<circle cx=\"" << num(c.x) << "\" cy=\"" << num(c.y) << "\" r=\"" << num(h.width / 2) << "\"/>";
    } else {
      out_ << " fill=\"none\" stroke=\"" << colour(h.ink) << "\" stroke-width=\"" << num(h.width) << "\"><path d=\"";
      for (const auto& [from, to] : hatch_segments(x0, y0, x1, y1, h))
        out_ << "M " << num(from.x) << " " << num(from.y) << " L " << num(to.x) << " " << num(to.y) << " ";
      out_ << "\"/>";
    }
    out_ << "</g>\n";
  }

  std::ostringstream& out_;
  SvgFonts fonts_;
  int clips_ = 0;
};

class SvgPainter final : public Painter {
 public:
  SvgPainter(std::ostream& out, const PaintOptions& options)
      : out_(out), title_(options.info.title), description_(options.info.description), language_(options.info.language) {}

  void paint(const DisplayPage& page) override {
    if (painted_) throw std::runtime_error("SVG holds one page; write a PDF for several");
    painted_ = true;
    std::ostringstream body;
    SvgWriter writer(body);
    for (const auto& item : page.items) std::visit([&](const auto& it) { writer.draw(it); }, item);

    const std::string& title = title_.empty() ? page.title : title_;
    std::string lang;
    if (!language_.empty())
      lang = " lang=\"" + attribute_text(language_) + "\" xml:lang=\"" + attribute_text(language_) + "\"";
    std::ostringstream svg;
    svg << "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n"
        << "<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"" << num(page.width) << "pt\" height=\"" << num(page.height)
        << "pt\" viewBox=\"0 0 " << num(page.width) << " " << num(page.height) << "\" version=\"1.1\"" << lang
        << " xml:space=\"preserve\">\n";
    // SVG 1.1 §5.4: the first <title> and <desc> describe the drawing.
    if (!title.empty()) svg << "<title>" << xml_text(title) << "</title>\n";
    if (!description_.empty()) svg << "<desc>" << xml_text(description_) << "</desc>\n";
    svg << "<defs><style>\n" << writer.fonts().font_face_rules() << "text { white-space: pre; }\n</style></defs>\n"
        << body.str() << "</svg>\n";
    const std::string bytes = std::move(svg).str();
    out_.write(bytes.data(), static_cast<std::streamsize>(bytes.size()));
    if (!out_) throw std::runtime_error("SVG file: write failed");
  }
  void finish() override {}

 private:
  std::ostream& out_;
  std::string title_, description_;  ///< the SVG's <title> and <desc>
  std::string language_;             ///< the root's lang and xml:lang
  bool painted_ = false;
};

}  // namespace

std::unique_ptr<Painter> make_svg_painter(std::ostream& out, const PaintOptions& options) {
  return std::make_unique<SvgPainter>(out, options);
}

}  // namespace forme
