// Crop marks and slug follow print-shop common practice (recalled from
// printers' artwork guides, not a standard): hairline marks about 0.25 pt
// wide and 5 to 10 mm long, starting no nearer the trim than the bleed so
// they never print into it; the slug sits in the same outer band.
#include "layout/press_sheet.h"

#include <time.h>

#include <algorithm>
#include <cstdio>

#include "base/geometry.h"
#include "layout/text_items.h"

namespace forme {

namespace {

void shift(DisplayPage& page, double d) {
  auto move = [d](Point& p) { p.x += d, p.y += d; };
  for (auto& item : page.items)
    std::visit(
        [&](auto& it) {
          using T = std::decay_t<decltype(it)>;
          if constexpr (std::is_same_v<T, PathItem>) {
            for (auto& p : it.points) move(p);
          } else if constexpr (std::is_same_v<T, CircleItem>) {
            move(it.centre);
          } else {
            move(it.origin);
          }
        },
        item);
  for (auto& r : page.plot_areas) r.x += d, r.y += d;
  for (auto& l : page.links) l.area.x += d, l.area.y += d;
}

PathItem hairline(Point a, Point b) {
  PathItem p;
  p.points = {a, b};
  p.stroke = Stroke{Rgb{0, 0, 0}, 0.25, {}, false};
  return p;
}

// Two marks at each corner, one continuing each edge outwards.
void add_crop_marks(const Rect& trim, const PressGeometry& g, DisplayPage& page) {
  const double near = g.mark_offset, far = g.mark_offset + g.mark_length;
  for (double x : {trim.left(), trim.right()})
    for (double y : {trim.top(), trim.bottom()}) {
      const double sx = x == trim.left() ? -1 : 1, sy = y == trim.top() ? -1 : 1;
      page.add(hairline({x + sx * near, y}, {x + sx * far, y}));
      page.add(hairline({x, y + sy * near}, {x, y + sy * far}));
    }
}

}  // namespace

PressGeometry press_geometry(const PressSpec& press) {
  PressGeometry g;
  g.bleed = press.bleed;
  g.outside = press.bleed;
  if (press.crop_marks || !press.slug.empty()) {
    g.mark_offset = std::max(press.bleed, mm_to_pt(3));
    g.mark_length = mm_to_pt(6);
    g.outside = g.mark_offset + g.mark_length;
  }
  return g;
}

std::string slug_line(const std::string& job, long long unix_seconds, std::size_t page, std::size_t pages) {
  const time_t t = static_cast<time_t>(unix_seconds);
  struct tm utc {};
  gmtime_r(&t, &utc);
  char date[32];
  std::snprintf(date, sizeof date, "%04d-%02d-%02d", utc.tm_year + 1900, utc.tm_mon + 1, utc.tm_mday);
  return job + "  \u00b7  " + date + "  \u00b7  page " + std::to_string(page) + " of " + std::to_string(pages);
}

DisplayPage to_press_sheet(DisplayPage page, const PressSpec& press, const PageStyle& st, const std::string& slug) {
  const PressGeometry g = press_geometry(press);
  const double d = g.outside;
  if (d > 0) shift(page, d);
  const Rect trim{d, d, page.width, page.height};
  const Rect bleed = trim.inflate(g.bleed);
  if (press.background) {
    page.items.insert(page.items.begin(), filled_rect(bleed, *press.background));
    for (auto& f : page.figures) ++f.first, ++f.end;  // the panels' items moved up by one
  }
  if (!press.any()) return page;
  page.width += 2 * d;
  page.height += 2 * d;
  page.trim_box = trim;
  page.bleed_box = bleed;
  if (press.crop_marks) add_crop_marks(trim, g, page);
  if (!slug.empty()) {
    // Below the trim, clear of the bottom-left crop mark, centred in the band
    // the marks occupy: 6 pt, the smallest size print keeps legible.
    auto t = shape_text(slug, st.fonts.regular, 6);
    const double cy = trim.bottom() + g.mark_offset + g.mark_length / 2;
    page.add(text_mid(std::move(t), trim.left() + g.mark_offset, cy, Align::left, Rgb{0, 0, 0}, TextRole::note));
  }
  return page;
}

}  // namespace forme
