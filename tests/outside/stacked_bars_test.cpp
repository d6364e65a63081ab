// Stacked bars (tests/pages/stacked): segments stand on each other in
// proportion to their values, every value is either written inside its own
// segment in an ink that reads at 4.5:1 or reported as left out, and
// poppler's pdftotext finds each written value inside its segment.
#include <catch2/catch.hpp>

#include <cmath>
#include <map>
#include <string>
#include <vector>

#include "cli/render_job.h"
#include "support/outside_tools.h"
#include "text/font.h"

using namespace forme::test;

namespace {

const std::string kPage = std::string(FORME_TEST_DIR) + "/pages/stacked/page.yaml";

// WCAG 2.x relative luminance and contrast ratio, written out here from the
// definition (W3C WCAG 2.1, "relative luminance" and "contrast ratio").
double channel(double c) { return c <= 0.04045 ? c / 12.92 : std::pow((c + 0.055) / 1.055, 2.4); }
double luminance(const forme::Rgb& c) { return 0.2126 * channel(c.r) + 0.7152 * channel(c.g) + 0.0722 * channel(c.b); }
double contrast(const forme::Rgb& a, const forme::Rgb& b) {
  const double la = luminance(a), lb = luminance(b);
  return (std::max(la, lb) + 0.05) / (std::min(la, lb) + 0.05);
}

struct Segment {
  forme::Rect r;
  forme::Rgb fill;
};

std::vector<Segment> segments(const forme::DisplayPage& page) {
  std::vector<Segment> out;
  for (const auto& item : page.items)
    if (const auto* p = std::get_if<forme::PathItem>(&item); p && p->fill && p->closed && p->points.size() == 4 && p->stroke) {
      const double x0 = p->points[0].x, y0 = std::min(p->points[0].y, p->points[2].y);
      const double x1 = p->points[2].x, y1 = std::max(p->points[0].y, p->points[2].y);
      out.push_back({{x0, y0, x1 - x0, y1 - y0}, *p->fill});
    }
  return out;
}

// The values in the CSV, read directly: month → values in file order.
std::map<std::string, std::vector<double>> sold_by_month() {
  std::map<std::string, std::vector<double>> out;
  const std::string csv = read_file(std::string(FORME_TEST_DIR) + "/pages/stacked/data/sales.csv");
  std::size_t at = csv.find('\n') + 1;
  while (at < csv.size()) {
    const std::size_t end = csv.find('\n', at);
    const std::string row = csv.substr(at, end - at);
    out[row.substr(0, row.find(','))].push_back(std::stod(row.substr(row.rfind(',') + 1)));
    at = end == std::string::npos ? csv.size() : end + 1;
  }
  return out;
}

}  // namespace

TEST_CASE("stacked bars: segments stand on each other, each as tall as its value", "[outside][stacked]") {
  forme::DiagnosticSink sink;
  const forme::DisplayPage page = forme::compose_page(kPage, forme::find_font_dir(FORME_BINARY), sink);
  const auto segs = segments(page);
  const auto months = sold_by_month();
  std::size_t rows = 0;
  for (const auto& [m, v] : months) rows += v.size();
  REQUIRE(segs.size() == rows);
  // Segments sharing an x form one stack with no gaps; height / value is one
  // constant for the whole panel (a linear axis from zero).
  std::map<long, std::vector<forme::Rect>> stacks;
  for (const auto& s : segs) stacks[std::lround(s.r.x * 100)].push_back(s.r);
  REQUIRE(stacks.size() == months.size());
  double points_per_ticket = 0;
  for (auto& [x, rects] : stacks) {
    std::sort(rects.begin(), rects.end(), [](auto& a, auto& b) { return a.y > b.y; });  // bottom first
    for (std::size_t i = 1; i < rects.size(); ++i) CHECK(rects[i].bottom() == Approx(rects[i - 1].y).margin(1e-6));
    double total = 0;
    for (const auto& r : rects) total += r.h;
    // The tallest stack is June's: 702 + 390 + 85 + 66 = 1243 tickets.
    points_per_ticket = std::max(points_per_ticket, total / 1243.0);
  }
  for (const auto& [m, values] : months) {
    double sum = 0;
    for (double v : values) sum += v;
    bool found = false;
    for (const auto& [x, rects] : stacks) {
      double total = 0;
      for (const auto& r : rects) total += r.h;
      found = found || std::abs(total - sum * points_per_ticket) < 1e-6;
    }
    INFO(m);
    CHECK(found);
  }
}

TEST_CASE("stacked bars: each value is written inside its segment at 4.5:1, or reported as left out", "[outside][stacked]") {
  REQUIRE(have_tool("pdftotext"));
  forme::DiagnosticSink sink;
  const forme::DisplayPage page = forme::compose_page(kPage, forme::find_font_dir(FORME_BINARY), sink);
  const auto segs = segments(page);
  int written = 0, reported = 0;
  for (const auto& item : page.items)
    if (const auto* t = std::get_if<forme::TextItem>(&item); t && t->role == forme::TextRole::value_label) {
      ++written;
      int inside = 0;
      for (const auto& s : segs)
        if (s.r.x <= t->box().x && t->box().right() <= s.r.right() && s.r.y <= t->box().y && t->box().bottom() <= s.r.bottom()) {
          ++inside;
          INFO(t->text.utf8);
          CHECK(contrast(t->colour, s.fill) >= 4.5);  // WCAG 2.x SC 1.4.3
        }
      CHECK(inside == 1);
    }
  for (const auto& d : sink.items())
    if (d.message.find("does not fit inside its segment") != std::string::npos) ++reported;
  CHECK(written + reported == static_cast<int>(segs.size()));
  CHECK(reported > 0);  // the bicycle segments are too thin on purpose
  CHECK(written > 0);
  // pdftotext: every written value sits inside a segment on the printed page too.
  TempDir dir;
  const std::string pdf = dir.file("stacked.pdf");
  REQUIRE(run_forme("render '" + kPage + "' -o '" + pdf + "'").exit_code == 0);
  int found = 0;
  const auto pages = pdf_words(pdf);  // kept: a range-for over a temporary's member would dangle
  REQUIRE(!pages.empty());
  for (const auto& w : pages.front().words) {
    if (w.text.find_first_not_of("0123456789,") != std::string::npos) continue;
    for (const auto& s : segs)
      if (s.r.x - 0.5 <= w.x_min && w.x_max <= s.r.right() + 0.5 && s.r.y - 0.5 <= w.y_min && w.y_max <= s.r.bottom() + 0.5) {
        ++found;
        break;
      }
  }
  CHECK(found == written);
}

TEST_CASE("stacked areas: the top edge is the total at every x, on a scale from zero", "[outside][stacked]") {
  TempDir dir;
  const std::string page_path = std::string(FORME_TEST_DIR) + "/pages/stacked/area.yaml";
  forme::DiagnosticSink sink;
  const forme::DisplayPage page = forme::compose_page(page_path, forme::find_font_dir(FORME_BINARY), sink);
  // Totals per week, read straight from the CSV.
  std::map<int, double> total;
  const std::string csv = read_file(std::string(FORME_TEST_DIR) + "/pages/stacked/data/moorings.csv");
  std::size_t at = csv.find('\n') + 1;
  while (at < csv.size()) {
    const std::size_t end = csv.find('\n', at);
    const std::string row = csv.substr(at, end - at);
    total[std::stoi(row)] += std::stod(row.substr(row.rfind(',') + 1));
    at = end == std::string::npos ? csv.size() : end + 1;
  }
  REQUIRE(total.size() == 26);
  std::vector<const forme::PathItem*> bands;
  for (const auto& item : page.items)
    if (const auto* p = std::get_if<forme::PathItem>(&item); p && p->fill && p->closed && p->points.size() == 2 * total.size())
      bands.push_back(p);
  REQUIRE(bands.size() == 3);
  // The first band's lower edge is zero; the last band's upper edge the total.
  const double zero = bands.front()->points.back().y;
  for (std::size_t i = 0; i < total.size(); ++i) CHECK(bands.front()->points[2 * total.size() - 1 - i].y == Approx(zero));
  std::vector<double> per_boat;
  std::size_t i = 0;
  for (const auto& [week, boats] : total) per_boat.push_back((zero - bands.back()->points[i++].y) / boats);
  for (double k : per_boat) CHECK(k == Approx(per_boat.front()).epsilon(1e-9));
  CHECK(per_boat.front() > 0);
}
