// Every way a CSV file is refused, pinned to its exact message and line:col.
// Columns are 1-based characters; a field's column is that of its first
// character (the opening quote for a quoted field).
#include <catch2/catch.hpp>

#include <filesystem>
#include <fstream>
#include <unistd.h>

#include "data/csv_reader.h"
#include "unit/data/csv_test_support.h"

using forme::ColumnType;
using forme::CsvOptions;
using forme::test::csv_error;
using forme::test::csv_hint;

TEST_CASE("csv error: no header row", "[data][csv][errors]") {
  CHECK(csv_error("") == "t.csv: error: table has no header row");
  CHECK(csv_error("\n\r\n\r") == "t.csv: error: table has no header row");
}

TEST_CASE("csv error: a header but no data rows", "[data][csv][errors]") {
  CHECK(csv_error("a,b") == "t.csv: error: table has no data rows");
  CHECK(csv_error("a,b\r\n\r\n\n") == "t.csv: error: table has no data rows");
}

TEST_CASE("csv error: empty header name", "[data][csv][errors]") {
  CHECK(csv_error("a,,c\n1,2,3\n") == "t.csv:1:3: error: column 2 has an empty header name");
  CHECK(csv_error("a,b,\n1,2,3\n") == "t.csv:1:5: error: column 3 has an empty header name");
  CHECK(csv_error("a,\"  \"\n1,2\n") == "t.csv:1:3: error: column 2 has an empty header name");
}

TEST_CASE("csv error: duplicate column names", "[data][csv][errors]") {
  CHECK(csv_error("a,x,b,x\n1,2,3,4\n") == "t.csv:1:7: error: duplicate column name 'x' (first at column 2)");
  // Header names are trimmed before they are compared.
  CHECK(csv_error("x, x\n1,2\n") == "t.csv:1:3: error: duplicate column name 'x' (first at column 1)");
}

TEST_CASE("csv error: ragged rows", "[data][csv][errors]") {
  // Too many: points at the first field past the header's width.
  CHECK(csv_error("a,b,c\n1,2,3\n1,2,3,4\n") == "t.csv:3:7: error: row has 4 fields but the header has 3");
  CHECK(csv_hint("a,b,c\n1,2,3,4\n") == "a field that contains a comma must be enclosed in double quotes");
  // Too few: the row's line.
  CHECK(csv_error("a,b,c\n1,2\n") == "t.csv:2: error: row has 2 fields but the header has 3");
  CHECK(csv_error("a,b\n1\n") == "t.csv:2: error: row has 1 field but the header has 2");
  CHECK(csv_error("a\n1,2\n") == "t.csv:2:3: error: row has 2 fields but the header has 1");
  // A row that spans lines: too many fields points at the extra field,
  // too few at the line where the row starts.
  CHECK(csv_error("a,b\n\"x\ny\",1,2\n") == "t.csv:3:6: error: row has 3 fields but the header has 2");
  CHECK(csv_error("a,b,c\n\"x\ny\",1\n") == "t.csv:2: error: row has 2 fields but the header has 3");
}

TEST_CASE("csv error: unterminated quoted field, at the opening quote", "[data][csv][errors]") {
  CHECK(csv_error("a,b\n1,\"abc\n2,3\n") ==
        "t.csv:2:3: error: quoted field is not closed: no closing quote before the end of the file");
  CHECK(csv_error("\"a") ==
        "t.csv:1:1: error: quoted field is not closed: no closing quote before the end of the file");
  CHECK(csv_error("a\n\"x\"\"") ==
        "t.csv:2:1: error: quoted field is not closed: no closing quote before the end of the file");
}

TEST_CASE("csv error: quote inside an unquoted field", "[data][csv][errors]") {
  CHECK(csv_error("a,b\n1,ab\"c\n") == "t.csv:2:5: error: quote character inside an unquoted field");
  CHECK(csv_hint("a,b\n1,ab\"c\n") == "enclose the whole field in double quotes and double each quote inside it");
  // A blank before an opening quote makes the field unquoted.
  CHECK(csv_error("a,b\n1, \"c\"\n") == "t.csv:2:4: error: quote character inside an unquoted field");
  CHECK(csv_hint("a,b\n1, \"c\"\n") ==
        "a quoted field must start right after the comma; remove the blanks before the quote");
}

TEST_CASE("csv error: text after a closing quote", "[data][csv][errors]") {
  CHECK(csv_error("a,b\n1,\"ab\"c\n") == "t.csv:2:7: error: text after the closing quote of a quoted field");
  CHECK(csv_error("a,b\n1,\"ab\" \n") == "t.csv:2:7: error: text after the closing quote of a quoted field");
}

TEST_CASE("csv error: invalid UTF-8 is refused with its byte offset and line:col", "[data][csv][errors]") {
  // A lead byte without its continuation.
  CHECK(csv_error("a,b\n1,\xC3(\n") == "t.csv:2:3: error: invalid UTF-8 at byte offset 6 (byte 0xC3)");
  // Columns count characters: "é" before the bad byte is one column.
  CHECK(csv_error("a,b\né,\xFF\n") == "t.csv:2:3: error: invalid UTF-8 at byte offset 7 (byte 0xFF)");
  // A lone continuation byte, an overlong "/", a surrogate (U+D800), a code
  // point past U+10FFFF, a sequence cut off by the end of the file: the
  // ill-formed sequences of the Unicode Standard's Table 3-7.
  CHECK(csv_error("a\n\x80") == "t.csv:2:1: error: invalid UTF-8 at byte offset 2 (byte 0x80)");
  CHECK(csv_error("a\n\xC0\xAF") == "t.csv:2:1: error: invalid UTF-8 at byte offset 2 (byte 0xC0)");
  CHECK(csv_error("a\n\xED\xA0\x80") == "t.csv:2:1: error: invalid UTF-8 at byte offset 2 (byte 0xED)");
  CHECK(csv_error("a\n\xF4\x90\x80\x80") == "t.csv:2:1: error: invalid UTF-8 at byte offset 2 (byte 0xF4)");
  CHECK(csv_error("a\n\xE2\x82") == "t.csv:2:1: error: invalid UTF-8 at byte offset 2 (byte 0xE2)");
  // Inside a quoted field and in the header too.
  CHECK(csv_error("a\n\"x\ny\xFE\"") == "t.csv:3:2: error: invalid UTF-8 at byte offset 6 (byte 0xFE)");
  CHECK(csv_error("a\xF8,b\n1,2") == "t.csv:1:2: error: invalid UTF-8 at byte offset 1 (byte 0xF8)");
  // The largest code points and the edges of the valid ranges pass.
  CHECK(csv_error("a\n\xF4\x8F\xBF\xBF,\xEF\xBF\xBD,\xED\x9F\xBF,\xF0\x90\x80\x80") ==
        "t.csv:2:3: error: row has 4 fields but the header has 1");
  // A UTF-16 file gets a hint that says so.
  CHECK(csv_error("\xFF\xFE" "a\0") == "t.csv:1:1: error: invalid UTF-8 at byte offset 0 (byte 0xFF)");
  CHECK(csv_hint("\xFF\xFE" "a\0") == "the file starts with a UTF-16 byte-order mark; save it as UTF-8");
}

TEST_CASE("csv error: NUL bytes", "[data][csv][errors]") {
  using namespace std::string_view_literals;
  CHECK(csv_error("a\0,b\n"sv) == "t.csv:1:2: error: NUL byte at byte offset 1");
}

TEST_CASE("csv error: declared number column with a non-number", "[data][csv][errors]") {
  CsvOptions o;
  o.declared["x"] = ColumnType::number;
  CHECK(csv_error("id,x\n1,2\n2,abc\n", o) == "t.csv:3:3: error: cell 'abc' in column 'x' is not a number");
  CHECK(csv_error("id,x\n1,\"1,234\"\n", o) == "t.csv:2:3: error: cell '1,234' in column 'x' is not a number");
  CHECK(csv_hint("id,x\n1,\"1,234\"\n", o) == "write numbers without thousands separators, e.g. 1234567");
  CHECK(csv_hint("id,x\n1,12%\n", o) == "write percentages without the % sign");
  // Long cells are cut short in the message; line breaks are shown escaped.
  CHECK(csv_error("id,x\n1,\"two\nlines\"\n", o) == "t.csv:2:3: error: cell 'two\\nlines' in column 'x' is not a number");
  CHECK(csv_error("id,x\n1," + std::string(50, 'z') + "\n", o) ==
        "t.csv:2:3: error: cell '" + std::string(40, 'z') + "…' in column 'x' is not a number");
}

TEST_CASE("csv error: non-finite numbers in a number column", "[data][csv][errors]") {
  CHECK(csv_error("x\n1\ninf\n") == "t.csv:3:1: error: non-finite number 'inf' in column 'x'");
  CHECK(csv_error("x\n1\n NaN\n") == "t.csv:3:1: error: non-finite number 'NaN' in column 'x'");
  CHECK(csv_error("k,x\na,1e999\nb,2\n") == "t.csv:2:3: error: non-finite number '1e999' in column 'x'");
  CHECK(csv_error("k,x\na,2\nb,\"-Infinity\"\n") == "t.csv:3:3: error: non-finite number '-Infinity' in column 'x'");
  CsvOptions o;
  o.declared["x"] = ColumnType::number;
  CHECK(csv_error("x\nnan\n", o) == "t.csv:2:1: error: non-finite number 'nan' in column 'x'");
  CHECK(csv_error("x\n-1.8e308\n", o) == "t.csv:2:1: error: non-finite number '-1.8e308' in column 'x'");
}

TEST_CASE("csv error: declared date column with a non-date or mixed precision", "[data][csv][errors]") {
  CsvOptions o;
  o.declared["when"] = ColumnType::date;
  CHECK(csv_error("when\n2024-01-05\n2024-02-30\n", o) ==
        "t.csv:3:1: error: cell '2024-02-30' in column 'when' is not a date: February 2024 has 29 days");
  CHECK(csv_error("when\n2024-01-05\n\n2024-02\n", o) ==
        "t.csv:4:1: error: date '2024-02' in column 'when' is by month (YYYY-MM) but the column is by day (YYYY-MM-DD)");
}

TEST_CASE("csv error: a type declared for a column the table lacks", "[data][csv][errors]") {
  CsvOptions o;
  o.declared["valeu"] = ColumnType::number;
  CHECK(csv_error("value\n1\n", o) ==
        "t.csv: error: a type is declared for column 'valeu' but the table has no such column");
}

TEST_CASE("csv error: content larger than max_bytes", "[data][csv][errors]") {
  CsvOptions o;
  o.max_bytes = 8;
  CHECK(csv_error("a,b\n1,2\n", o) == "no error");  // exactly 8 bytes
  CHECK(csv_error("a,b\n1,2\n\n", o) == "t.csv: error: data file is 9 bytes, more than the limit of 8 bytes");
}

namespace {

/// A fresh scratch folder for one test, removed afterwards.
struct ScratchDir {
  std::filesystem::path path;
  explicit ScratchDir(const std::string& name)
      : path(std::filesystem::temp_directory_path() / ("forme-data-" + name + "-" + std::to_string(::getpid()))) {
    std::filesystem::remove_all(path);
    std::filesystem::create_directories(path);
  }
  ~ScratchDir() {
    std::error_code ec;
    std::filesystem::remove_all(path, ec);
  }
  std::string write(const std::string& file, const std::string& content) const {
    const auto p = path / file;
    std::ofstream(p, std::ios::binary) << content;
    return p.string();
  }
};

std::string read_error(const std::string& path, const CsvOptions& options = {}) {
  try {
    forme::read_csv(path, "data/t.csv", options);
  } catch (const forme::InputError& e) {
    forme::Diagnostic d = e.diagnostic();
    d.hint.clear();
    return format_diagnostic(d);
  }
  return "no error";
}

}  // namespace

TEST_CASE("read_csv reads a file from disk", "[data][csv]") {
  ScratchDir dir("read");
  const std::string p = dir.write("t.csv", "year,value\r\n2023,1.5\r\n2024,2\r\n");
  const forme::Table t = forme::read_csv(p, "data/t.csv");
  CHECK(t.path == "data/t.csv");
  CHECK(t.rows == 2);
  CHECK(t.find("value")->values == std::vector<double>{1.5, 2.0});
  // Errors name the display path, not the path opened.
  const std::string bad = dir.write("bad.csv", "a,b\n1\n");
  CHECK(read_error(bad) == "data/t.csv:2: error: row has 1 field but the header has 2");
}

TEST_CASE("read_csv error: missing file, directory", "[data][csv][errors]") {
  ScratchDir dir("missing");
  CHECK(read_error((dir.path / "nope.csv").string()) ==
        "data/t.csv: error: cannot open data file: No such file or directory");
  CHECK(read_error(dir.path.string()) == "data/t.csv: error: cannot open data file: Is a directory");
}

TEST_CASE("read_csv error: file larger than max_bytes is refused before reading", "[data][csv][errors]") {
  ScratchDir dir("large");
  CsvOptions o;
  o.max_bytes = 10;
  CHECK(read_error(dir.write("ok.csv", "a,b\n1,2\n"), o) == "no error");
  CHECK(read_error(dir.write("big.csv", "a,b\n1,2\n3,4\n"), o) ==
        "data/t.csv: error: data file is 12 bytes, more than the limit of 10 bytes");
  // A sparse 1 GiB file: refused from its size alone, at once, with the
  // default limit of 256 MiB.
  const auto sparse = dir.path / "sparse.csv";
  std::ofstream(sparse, std::ios::binary) << "a\n";
  std::filesystem::resize_file(sparse, 1ULL << 30);
  CHECK(read_error(sparse.string()) ==
        "data/t.csv: error: data file is 1073741824 bytes, more than the limit of 268435456 bytes");
}
