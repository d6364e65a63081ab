// Painting the same display list twice, in one process, gives the same bytes
// in every format once the document date is fixed. One process is the hard
// case: a painter may not number anything from a process-wide counter. The PDF date
// form is ISO 32000-1 §7.9.4.
#include <catch2/catch.hpp>
#include <algorithm>
#include <ctime>
#include <sstream>
#include <string>
#include <vector>

#include "cli/render_job.h"
#include "paint/painter.h"
#include "paint/pdf_dates.h"
#include "text/font.h"

namespace {

forme::DisplayPage demo_page() {
  forme::DiagnosticSink sink;
  return forme::compose_page(std::string(FORME_SOURCE_DIR) + "/layouts/reservoirs/page.yaml",
                             forme::find_font_dir(FORME_BINARY), sink);
}

std::string paint(const forme::DisplayPage& page, forme::OutputFormat format, std::optional<std::int64_t> when) {
  std::ostringstream out;
  forme::PaintOptions po;
  po.dpi = 72;
  po.info.title = page.title;
  po.info.creation_time = when;
  auto painter = forme::make_painter(format, out, po);
  painter->paint(page);
  painter->finish();
  return std::move(out).str();
}

}  // namespace

TEST_CASE("PDF, SVG and PNG bytes repeat exactly within one process", "[paint][reproducible]") {
  const forme::DisplayPage page = demo_page();
  for (auto format : {forme::OutputFormat::pdf, forme::OutputFormat::svg, forme::OutputFormat::png}) {
    INFO("format " << static_cast<int>(format));
    const std::string a = paint(page, format, 1709208000);
    const std::string b = paint(page, format, 1709208000);
    REQUIRE(a.size() > 1000);
    CHECK(a == b);
  }
}

TEST_CASE("the PDF carries the stated creation date with the D: prefix", "[paint][reproducible]") {
  const std::string pdf = paint(demo_page(), forme::OutputFormat::pdf, 1709208000);
  // 1709208000 s after the epoch is 2024-02-29 12:00:00 UTC: 19782 days
  // (1970..2023, 13 of them leap years: 54 × 365 + 13) + 59 days + 12 h.
  REQUIRE(1709208000 == (54LL * 365 + 13 + 59) * 86400 + 12 * 3600);
  CHECK(pdf.find("/CreationDate (D:20240229120000Z)") != std::string::npos);
}

TEST_CASE("without a stated date the PDF is dated at the time of painting", "[paint][reproducible]") {
  const forme::DisplayPage page = demo_page();
  const std::int64_t before = std::time(nullptr);
  const std::string pdf = paint(page, forme::OutputFormat::pdf, std::nullopt);
  const std::int64_t after = std::time(nullptr);
  // The last revision's date is the one in force (ISO 32000-1 §7.5.6:
  // an incremental update supersedes the objects it rewrites).
  const std::size_t at = pdf.rfind("/CreationDate (");
  REQUIRE(at != std::string::npos);
  const std::string date = pdf.substr(at + 15, 17);
  // The string sorts like the instant it names, so the painted date lies
  // between the two clock readings.
  CHECK(date >= forme::pdf_date_utc(before));
  CHECK(date <= forme::pdf_date_utc(after));
}
