#pragma once
/// Helpers for tests that ask independent tools (poppler, qpdf, fontTools)
/// about files forme wrote.
#include <algorithm>
#include <map>
#include <string>
#include <vector>

namespace forme::test {

struct CommandResult {
  int exit_code = -1;
  std::string out;  ///< standard output
  std::string err;  ///< standard error
};

/// Runs a shell command, capturing its output.
CommandResult run(const std::string& command);

/// True when `tool` is on PATH (tests that need it fail loudly if not).
bool have_tool(const std::string& tool);

/// A fresh temporary folder, removed when the object dies.
class TempDir {
 public:
  TempDir();
  ~TempDir();
  TempDir(const TempDir&) = delete;
  TempDir& operator=(const TempDir&) = delete;
  const std::string& path() const { return path_; }
  std::string file(const std::string& name) const { return path_ + "/" + name; }

 private:
  std::string path_;
};

void write_file(const std::string& path, const std::string& text);
std::string read_file(const std::string& path);

/// Runs the forme executable with the given arguments.
CommandResult run_forme(const std::string& args);

/// A word as `pdftotext -bbox` reports it (page coordinates, y down).
struct PdfWord {
  std::string text;
  double x_min = 0, y_min = 0, x_max = 0, y_max = 0;
};

/// Whether two word boxes overlap by more than `slack` points each way:
/// boxes that only share an edge, as stacked lines do, do not.
inline bool words_overlap(const PdfWord& a, const PdfWord& b, double slack = 0.05) {
  const double w = std::min(a.x_max, b.x_max) - std::max(a.x_min, b.x_min);
  const double h = std::min(a.y_max, b.y_max) - std::max(a.y_min, b.y_min);
  return w > slack && h > slack;
}

/// Every pair of `words` that overlap (as `words_overlap`), written
/// "'a' overlaps 'b'", so a test can check the list is empty and print it.
inline std::vector<std::string> overlapping_words(const std::vector<PdfWord>& words, double slack = 0.05) {
  std::vector<std::string> out;
  for (std::size_t i = 0; i < words.size(); ++i)
    for (std::size_t j = i + 1; j < words.size(); ++j)
      if (words_overlap(words[i], words[j], slack))
        out.push_back("'" + words[i].text + "' overlaps '" + words[j].text + "'");
  return out;
}

struct PdfPageWords {
  double width = 0, height = 0;
  std::vector<PdfWord> words;
};

/// Words of every page of a PDF, via poppler's `pdftotext -bbox`.
std::vector<PdfPageWords> pdf_words(const std::string& pdf);

/// Lines of every page, via `pdftotext -bbox-layout` (each line's box and text).
std::vector<PdfPageWords> pdf_lines(const std::string& pdf);

/// Words of every page, via `pdftotext -bbox-layout` (each word's box, as
/// laid out into lines and blocks).
std::vector<PdfPageWords> pdf_layout_words(const std::string& pdf);

/// A page box as poppler's `pdfinfo -box` prints it: points, two decimals.
struct PdfBox {
  double x0 = 0, y0 = 0, x1 = 0, y1 = 0;
  double width() const { return x1 - x0; }
  double height() const { return y1 - y0; }
};

/// Every box `pdfinfo -box` prints for page 1, by name ("MediaBox",
/// "TrimBox", …). Throws if pdfinfo fails.
std::map<std::string, PdfBox> pdfinfo_boxes(const std::string& pdf);

/// Every page description under layouts/ (not reports, nor the pages a
/// report repeats, which hold placeholders).
std::vector<std::string> layout_pages();

/// Every report description under layouts/.
std::vector<std::string> layout_reports();

}  // namespace forme::test
