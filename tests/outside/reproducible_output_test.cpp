// Same inputs, same bytes: the forme executable run twice in separate
// processes writes identical PDF, SVG and PNG files when SOURCE_DATE_EPOCH
// pins the date (reproducible-builds.org SOURCE_DATE_EPOCH specification).
// Independent readers confirm the date and the file structure: poppler's
// pdfinfo parses /CreationDate (ISO 32000-1 §7.9.4 form) and qpdf --check
// finds the cross-reference table sound after forme rewrote the date.
// PNG files carry no time or text chunks (PNG specification, W3C / ISO/IEC
// 15948, §11.3.6.1 tIME and §11.3.4 text chunks), read here by walking the
// chunk list directly.
#include <catch2/catch.hpp>

#include <algorithm>
#include <cstdint>
#include <filesystem>
#include <string>
#include <tuple>
#include <vector>

#include "support/outside_tools.h"

using namespace forme::test;

namespace {

const std::string kPage = std::string(FORME_SOURCE_DIR) + "/layouts/reservoirs/page.yaml";

CommandResult render_with_epoch(const std::string& epoch, const std::string& out) {
  return run("SOURCE_DATE_EPOCH='" + epoch + "' " + FORME_BINARY + " render '" + kPage + "' -o '" + out + "'");
}

/// Chunk types of a PNG file, in order (PNG §5.3: length, type, data, CRC).
std::vector<std::string> png_chunks(const std::string& png) {
  std::vector<std::string> types;
  REQUIRE(png.size() > 8);
  REQUIRE(png.compare(0, 8, "\x89PNG\r\n\x1a\n") == 0);  // PNG §5.2 signature
  std::size_t i = 8;
  while (i + 12 <= png.size()) {
    std::uint32_t n = 0;
    for (int k = 0; k < 4; ++k) n = (n << 8) | static_cast<unsigned char>(png[i + static_cast<std::size_t>(k)]);
    types.push_back(png.substr(i + 4, 4));
    i += 12 + n;
  }
  CHECK(i == png.size());
  return types;
}

}  // namespace

TEST_CASE("two runs with SOURCE_DATE_EPOCH write identical PDF, SVG and PNG bytes", "[outside][reproducible]") {
  TempDir dir;
  for (const char* ext : {".pdf", ".svg", ".png"}) {
    INFO(ext);
    const std::string a = dir.file(std::string("a") + ext), b = dir.file(std::string("b") + ext);
    auto ra = render_with_epoch("1709208000", a);
    auto rb = render_with_epoch("1709208000", b);
    INFO(ra.err << rb.err);
    REQUIRE(ra.exit_code == 0);
    REQUIRE(rb.exit_code == 0);
    const std::string bytes = read_file(a);
    REQUIRE(bytes.size() > 1000);
    CHECK(bytes == read_file(b));
  }
}

TEST_CASE("pdfinfo reads the SOURCE_DATE_EPOCH instant as the creation date, and qpdf finds the file sound",
          "[outside][reproducible]") {
  REQUIRE(have_tool("pdfinfo"));
  REQUIRE(have_tool("qpdf"));
  TempDir dir;
  const std::string pdf = dir.file("dated.pdf");
  // 1709208000 = 2024-02-29T12:00:00Z (54 × 365 + 13 leap days to 2024, plus
  // 59 days and 12 hours: worked by hand). 0 is the epoch itself.
  for (auto [epoch, iso, raw] : {std::tuple{"1709208000", "2024-02-29T12:00:00Z", "D:20240229120000Z"},
                                 std::tuple{"0", "1970-01-01T00:00:00Z", "D:19700101000000Z"}}) {
    INFO(epoch);
    auto r = render_with_epoch(epoch, pdf);
    INFO(r.err);
    REQUIRE(r.exit_code == 0);
    CHECK(read_file(pdf).find(std::string("/CreationDate (") + raw + ")") != std::string::npos);
    auto info = run("pdfinfo -isodates '" + pdf + "'");
    REQUIRE(info.exit_code == 0);
    CHECK(info.out.find(std::string("CreationDate:    ") + iso) != std::string::npos);
    auto check = run("qpdf --check '" + pdf + "'");
    INFO(check.out << check.err);
    CHECK(check.exit_code == 0);
    CHECK(check.out.find("No syntax or stream encoding errors found") != std::string::npos);
  }
}

TEST_CASE("a PNG preview holds no time or text chunks", "[outside][reproducible]") {
  TempDir dir;
  const std::string png = dir.file("page.png");
  auto r = run_forme("render '" + kPage + "' -o '" + png + "'");
  REQUIRE(r.exit_code == 0);
  const auto chunks = png_chunks(read_file(png));
  REQUIRE(!chunks.empty());
  CHECK(chunks.front() == "IHDR");
  CHECK(chunks.back() == "IEND");
  for (const char* t : {"tIME", "tEXt", "zTXt", "iTXt"}) {
    INFO(t);
    CHECK(std::find(chunks.begin(), chunks.end(), t) == chunks.end());
  }
}

TEST_CASE("a malformed SOURCE_DATE_EPOCH stops the run and names the variable", "[outside][reproducible]") {
  TempDir dir;
  const std::string pdf = dir.file("never.pdf");
  auto r = render_with_epoch("2024-02-29", pdf);
  CHECK(r.exit_code == 1);
  CHECK(r.err.find("SOURCE_DATE_EPOCH") != std::string::npos);
  CHECK_FALSE(std::filesystem::exists(pdf));
}
