#include "cli/colour_commands.h"

#include <cstdio>
#include <sstream>

#include "base/fixed_decimals.h"
#include "base/diagnostic.h"
#include "colour/audit.h"
#include "colour/contrast.h"
#include "colour/convert.h"
#include "colour/palette.h"
#include "colour/parse.h"
#include "describe/suggest.h"
#include "layout/page_style.h"
#include "layout/palette_sheet.h"
#include "paint/atomic_file.h"
#include "paint/painter.h"

namespace forme {

namespace {

bool read_colour(const std::string& text, Rgb& out, std::ostream& err) {
  ParsedColour p = parse_colour(text);
  if (p.colour) {
    out = *p.colour;
    return true;
  }
  err << "forme: error: " << p.error << '\n';
  if (!p.hint.empty()) err << "  hint: " << p.hint << '\n';
  return false;
}

}  // namespace

int run_contrast(const std::string& fg, const std::string& bg, std::ostream& out, std::ostream& err) {
  Rgb a, b;
  if (!read_colour(fg, a, err) || !read_colour(bg, b, err)) return 1;
  const double ratio = contrast_ratio(a, b);
  // Thresholds of WCAG 2.x SC 1.4.3, 1.4.6 and 1.4.11; no rounding.
  auto verdict = [&](double need) { return meets(ratio, need) ? "pass" : "fail"; };
  out << to_hex(a) << " on " << to_hex(b) << ": contrast " << fixed(ratio, 2) << ":1\n"
      << "  text (4.5:1)            " << verdict(4.5) << '\n'
      << "  large text (3:1)        " << verdict(3.0) << '\n'
      << "  graphics (3:1)          " << verdict(3.0) << '\n'
      << "  enhanced text (7:1)     " << verdict(7.0) << '\n';
  return 0;
}

int run_palette(const std::string& name, std::ostream& out, std::ostream& err) {
  const Palette* p = find_palette(name);
  if (!p) {
    std::vector<std::string> names;
    for (const auto& q : all_palettes()) names.push_back(q.name);
    err << "forme: error: no palette named '" << name << "'\n";
    if (auto near = nearest(name, names)) err << "  hint: did you mean '" << *near << "'?\n";
    else {
      err << "  hint: palettes:";
      for (const auto& n : names) err << ' ' << n;
      err << '\n';
    }
    return 1;
  }
  const char* kinds[] = {"categorical", "sequential", "diverging"};
  out << p->name << " (" << kinds[static_cast<int>(p->kind)] << ", " << p->colours.size() << " colours)\n";
  const Rgb white{1, 1, 1};
  for (std::size_t i = 0; i < p->colours.size(); ++i) {
    const OkLch l = to_oklch(p->colours[i]);
    out << "  " << p->name << '.' << (i + 1) << "  " << to_hex(p->colours[i]) << "  oklch(" << fixed(l.l, 3) << ' '
        << fixed(l.c, 3) << ' ' << fixed(l.h, 1) << ")  contrast on white " << fixed(contrast_ratio(p->colours[i], white), 2)
        << ":1\n";
  }
  out << "closest pair (CIEDE2000):\n";
  for (Vision v : all_visions) {
    if (auto f = closest_pair(p->colours, v))
      out << "  " << to_string(v) << ": " << p->name << '.' << (f->first + 1) << " / " << p->name << '.' << (f->second + 1)
          << "  " << fixed(f->delta_e, 1) << '\n';
  }
  return 0;
}

int run_palette_sheet(const std::string& path, const std::string& font_dir, std::ostream& err) {
  auto format = format_for_path(path);
  if (!format) {
    err << "forme: error: " << path << ": unknown output type\n  hint: name the sheet .png, .pdf or .svg\n";
    return 1;
  }
  try {
    PageStyle st;
    st.fonts = open_bundled_fonts(font_dir);
    st.base = 8;
    st.ink = Inks{ink::text, ink::muted, ink::rule, ink::grid, Rgb{1, 1, 1}};
    const DisplayPage page = palette_sheet(st);
    std::ostringstream bytes;
    PaintOptions po;
    po.dpi = 110;
    po.info.title = page.title;
    po.info.creation_time = 0;  // the sheet depends on nothing but forme itself
    auto painter = make_painter(*format, bytes, po);
    painter->paint(page);
    painter->finish();
    AtomicFile file(path);
    file.write(std::move(bytes).str());
    file.commit();
  } catch (const InputError& e) {
    err << format_diagnostic(e.diagnostic()) << '\n';
    return 1;
  }
  return 0;
}

}  // namespace forme
