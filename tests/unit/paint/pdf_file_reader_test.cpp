// Reading a finished PDF's objects through its cross-reference table, and
// adding an incremental update (ISO 32000-1 §7.5.4 cross-reference table,
// §7.5.5 trailer, §7.5.6 incremental updates). The updated file is checked
// by qpdf, an independent reader.
#include "paint/pdf_file_reader.h"

#include <catch2/catch.hpp>
#include <cstdio>
#include <sstream>
#include <stdexcept>
#include <string>

#include "paint/attachment_spool.h"
#include "paint/pdf_syntax.h"
#include "paint/pdf_update.h"
#include "support/outside_tools.h"

namespace {

// A one-page PDF written by hand, its xref offsets computed as it is built.
std::string tiny_pdf() {
  std::string pdf = "%PDF-1.4\n";
  std::vector<std::size_t> at;
  const char* objects[] = {
      "<< /Type /Catalog /Pages 2 0 R >>",
      "<< /Type /Pages /Kids [ 3 0 R ] /Count 1 >>",
      "<< /Type /Page % a comment, as Cairo writes one\n /Parent 2 0 R /MediaBox [ 0 0 200 100 ] >>",
      "<< /Producer (hand) /Title (notes endobj and more) /CreationDate (20240229120000Z) >>",
  };
  for (int i = 0; i < 4; ++i) {
    at.push_back(pdf.size());
    pdf += std::to_string(i + 1) + " 0 obj\n" + objects[i] + "\nendobj\n";
  }
  const std::size_t xref = pdf.size();
  pdf += "xref\n0 5\n0000000000 65535 f \n";
  char row[32];
  for (std::size_t a : at) {
    std::snprintf(row, sizeof row, "%010zu 00000 n \n", a);
    pdf += row;
  }
  pdf += "trailer\n<< /Size 5 /Root 1 0 R /Info 4 0 R >>\nstartxref\n" + std::to_string(xref) + "\n%%EOF\n";
  return pdf;
}

struct TempFile {
  std::FILE* f = std::tmpfile();
  explicit TempFile(const std::string& bytes) {
    std::fwrite(bytes.data(), 1, bytes.size(), f);
    std::fflush(f);
  }
  ~TempFile() { std::fclose(f); }
};

}  // namespace

TEST_CASE("objects are read by their cross-reference entries and an update supersedes them", "[paint][pdf]") {
  TempFile file(tiny_pdf());
  const forme::pdf::FileReader reader(file.f);
  CHECK(reader.size() == 5);
  CHECK(forme::pdf::dict_value(reader.trailer(), "/Root") == "1 0 R");
  CHECK(forme::pdf::dict_value(reader.object(3), "/MediaBox") == "[ 0 0 200 100 ]");
  // A string holding the word "endobj" does not end the object (found by page_fuzz).
  CHECK(forme::pdf::dict_value(reader.object(4), "/CreationDate") == "(20240229120000Z)");
  CHECK_THROWS_AS(reader.object(0), std::runtime_error);  // the free list's head
  CHECK_THROWS_AS(reader.object(9), std::runtime_error);

  forme::pdf::Update update(reader);
  update.replace(4, forme::pdf::dict_with(reader.object(4), "/CreationDate", "(D:20240229120000Z)"));
  forme::AttachmentSpool spool;
  spool.add({"counts.csv", "", "text/csv", "week,count\n1,4\n"});
  const forme::SpooledFile& f = spool.files().front();
  const int note = update.add_spooled_stream("/Type /EmbeddedFile", spool.file(), f.offset, f.length);
  CHECK(note == 5);
  std::ostringstream out;
  update.write(file.f, out);

  REQUIRE(forme::test::have_tool("qpdf"));
  forme::test::TempDir dir;
  forme::test::write_file(dir.file("updated.pdf"), out.str());
  auto check = forme::test::run("qpdf --check '" + dir.file("updated.pdf") + "'");
  INFO(check.out << check.err);
  CHECK(check.exit_code == 0);
  auto info = forme::test::run("qpdf --show-object=4 '" + dir.file("updated.pdf") + "'");
  CHECK(info.out.find("D:20240229120000Z") != std::string::npos);
  auto data = forme::test::run("qpdf --show-object=5 --filtered-stream-data '" + dir.file("updated.pdf") + "'");
  CHECK(data.out == "week,count\n1,4\n");
  auto trailer = forme::test::run("qpdf --show-xref '" + dir.file("updated.pdf") + "'");
  CHECK(trailer.out.find("5/0: uncompressed") != std::string::npos);
}

TEST_CASE("a file that does not end as a PDF must is refused, not read past", "[paint][pdf]") {
  for (const std::string& bad : {std::string(""), std::string("%PDF-1.4\n"), std::string("startxref\n99999\n%%EOF"),
                                std::string("xref\n0 1\nstartxref\n0\n%%EOF"), tiny_pdf().substr(0, 300)}) {
    TempFile file(bad);
    INFO(bad.size());
    CHECK_THROWS_AS(forme::pdf::FileReader(file.f), std::runtime_error);
  }
}
