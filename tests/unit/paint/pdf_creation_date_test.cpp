// Setting the creation date of a finished PDF. The checks read the file
// structure back independently: every in-use cross-reference entry must
// point at the byte where "N G obj" begins, and startxref at the keyword
// `xref` (ISO 32000-1 §7.5.4, §7.5.5). A hand-written file also lets the
// test cover the case Cairo does not produce (no /CreationDate at all).
#include "paint/pdf_creation_date.h"

#include <catch2/catch.hpp>
#include <sstream>
#include <string>
#include <vector>

namespace {

/// A small classic PDF with a correct cross-reference table, built by
/// measuring offsets as the objects are appended.
std::string tiny_pdf(const std::string& info_body) {
  std::vector<std::string> objects = {
      "<< /Type /Catalog /Pages 2 0 R >>",
      "<< /Type /Pages /Kids [3 0 R] /Count 1 >>",
      "<< /Type /Page /Parent 2 0 R /MediaBox [0 0 100 100] >>",
      info_body,
      "<< /Note (an object placed after the information dictionary) >>",
  };
  std::string pdf = "%PDF-1.5\n";
  std::vector<std::size_t> offsets;
  for (std::size_t i = 0; i < objects.size(); ++i) {
    offsets.push_back(pdf.size());
    pdf += std::to_string(i + 1) + " 0 obj\n" + objects[i] + "\nendobj\n";
  }
  const std::size_t xref = pdf.size();
  pdf += "xref\n0 " + std::to_string(objects.size() + 1) + "\n0000000000 65535 f \n";
  for (std::size_t off : offsets) {
    char line[24];
    std::snprintf(line, sizeof line, "%010zu 00000 n \n", off);
    pdf += line;
  }
  pdf += "trailer\n<< /Size " + std::to_string(objects.size() + 1) + " /Root 1 0 R /Info 4 0 R >>\nstartxref\n" +
         std::to_string(xref) + "\n%%EOF\n";
  return pdf;
}

/// Checks every cross-reference entry and startxref against the bytes.
void check_structure(const std::string& pdf) {
  const std::size_t sx = pdf.rfind("startxref\n");
  REQUIRE(sx != std::string::npos);
  const std::size_t xref = std::stoul(pdf.substr(sx + 10));
  REQUIRE(pdf.compare(xref, 4, "xref") == 0);
  std::istringstream in(pdf.substr(xref + 5));
  std::size_t first = 0, count = 0;
  in >> first >> count;
  std::string off, gen, kind;
  for (std::size_t k = 0; k < count; ++k) {
    in >> off >> gen >> kind;
    REQUIRE(off.size() == 10);
    if (kind != "n") continue;
    const std::string head = std::to_string(first + k) + " 0 obj";
    INFO("object " << first + k);
    CHECK(pdf.compare(std::stoul(off), head.size(), head) == 0);
  }
}

}  // namespace

TEST_CASE("the hand-made PDF is itself sound before any rewrite", "[paint][pdf-date]") {
  check_structure(tiny_pdf("<< /Producer (test) /CreationDate (20200101000000Z) >>"));
}

TEST_CASE("a date without the D: prefix is replaced and later offsets move", "[paint][pdf-date]") {
  const std::string before = tiny_pdf("<< /Producer (test) /CreationDate (20200101000000Z) >>");
  const std::string after = forme::set_pdf_creation_date(before, "D:20240229120000Z");
  CHECK(after.size() == before.size() + 2);
  CHECK(after.find("/CreationDate (D:20240229120000Z)") != std::string::npos);
  CHECK(after.find("(20200101000000Z)") == std::string::npos);
  check_structure(after);
}

TEST_CASE("a missing creation date is added to the information dictionary", "[paint][pdf-date]") {
  const std::string after = forme::set_pdf_creation_date(tiny_pdf("<< /Producer (test) >>"), "D:19700101000000Z");
  const std::size_t info = after.find("4 0 obj");
  const std::size_t date = after.find("/CreationDate (D:19700101000000Z)");
  REQUIRE(date != std::string::npos);
  CHECK(date > info);
  CHECK(date < after.find("endobj", info));
  check_structure(after);
}

TEST_CASE("a shorter date moves offsets backwards, and a string with nested parentheses is replaced whole",
          "[paint][pdf-date]") {
  // §7.3.4.2: balanced parentheses and backslash escapes inside a literal string.
  const std::string before = tiny_pdf("<< /CreationDate (a (long) \\) date string) /Producer (x) >>");
  const std::string after = forme::set_pdf_creation_date(before, "D:20240229120000Z");
  CHECK(after.find("/CreationDate (D:20240229120000Z) /Producer (x)") != std::string::npos);
  CHECK(after.size() < before.size());
  check_structure(after);
}

TEST_CASE("layouts the rewrite does not understand are refused, not patched", "[paint][pdf-date]") {
  const std::string good = tiny_pdf("<< /Producer (test) >>");
  CHECK_THROWS_AS(forme::set_pdf_creation_date("not a pdf", "D:19700101000000Z"), std::runtime_error);
  std::string with_prev = good;
  with_prev.replace(with_prev.find("/Info 4 0 R"), 11, "/Info 4 0 R /Prev 9");
  CHECK_THROWS_AS(forme::set_pdf_creation_date(with_prev, "D:19700101000000Z"), std::runtime_error);
  std::string no_info = good;
  no_info.replace(no_info.find("/Info 4 0 R"), 11, "           ");
  CHECK_THROWS_AS(forme::set_pdf_creation_date(no_info, "D:19700101000000Z"), std::runtime_error);
  CHECK_THROWS_AS(forme::set_pdf_creation_date(good, "D:(bad"), std::runtime_error);
}
