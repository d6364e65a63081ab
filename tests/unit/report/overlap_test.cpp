// Composing the next page on a second thread while this one is painted must
// not change a byte: the report is rendered both ways and compared.
#include <catch2/catch.hpp>

#include "cli/report_job.h"
#include "text/font.h"

using namespace forme;

TEST_CASE("a report composed on two threads is byte-identical to one composed on one", "[report]") {
  const std::string report = std::string(FORME_SOURCE_DIR) + "/tests/pages/report/report.yaml";
  ReportRunOptions o;
  o.font_dir = find_font_dir(FORME_BINARY);
  o.creation_time = 1709208000;
  std::size_t calls = 0, total = 0;
  o.progress = [&](std::size_t done, std::size_t all) {
    ++calls;
    CHECK(done == calls);
    total = all;
  };
  o.overlap = true;
  DiagnosticSink a_sink, b_sink;
  const std::string two = render_report_to_bytes(report, a_sink, o);
  CHECK(calls == total);
  CHECK(total > 5);
  o.overlap = false;
  o.progress = nullptr;
  const std::string one = render_report_to_bytes(report, b_sink, o);
  REQUIRE(one.size() > 10000);
  CHECK(one == two);
}
