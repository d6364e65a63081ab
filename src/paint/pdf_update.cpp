#include "paint/pdf_update.h"

#include <algorithm>
#include <stdexcept>
#include <string>
#include <utility>
#include <vector>

#include "paint/pdf_syntax.h"

namespace forme::pdf {

namespace {

// Counts what goes out, for the cross-reference offsets.
class CountingWriter {
 public:
  explicit CountingWriter(std::ostream& out) : out_(out) {}
  void write(const char* p, std::size_t n) {
    out_.write(p, static_cast<std::streamsize>(n));
    if (!out_) throw std::runtime_error("PDF file: write failed");
    at_ += n;
  }
  void write(std::string_view s) { write(s.data(), s.size()); }
  std::size_t at() const { return at_; }

 private:
  std::ostream& out_;
  std::size_t at_ = 0;
};

// Copies the whole original file to `w`, ending on an end of line.
void copy_original(std::FILE* original, CountingWriter& w) {
  std::rewind(original);
  std::vector<char> buffer(1 << 16);
  char last = '\n';
  for (;;) {
    const std::size_t n = std::fread(buffer.data(), 1, buffer.size(), original);
    if (n == 0) break;
    w.write(buffer.data(), n);
    last = buffer[n - 1];
  }
  if (std::ferror(original)) throw std::runtime_error("PDF file: cannot read Cairo's output back");
  if (last != '\n' && last != '\r') w.write("\n", 1);
}

// Copies `length` bytes from `offset` in `file` to `w`.
void copy_range(std::FILE* file, long offset, std::size_t length, CountingWriter& w) {
  if (std::fseek(file, offset, SEEK_SET) != 0) throw std::runtime_error("PDF file: cannot read a temporary file back");
  std::vector<char> buffer(1 << 16);
  while (length > 0) {
    const std::size_t n = std::fread(buffer.data(), 1, std::min(length, buffer.size()), file);
    if (n == 0) throw std::runtime_error("PDF file: cannot read a temporary file back");
    w.write(buffer.data(), n);
    length -= n;
  }
}

// A cross-reference entry is exactly 20 bytes (ISO 32000-1 §7.5.4).
std::string xref_entry(std::size_t offset) {
  char row[24];
  std::snprintf(row, sizeof row, "%010zu 00000 n \n", offset);
  return row;
}

}  // namespace

int Update::add(std::string text) {
  objects_[next_] = std::move(text);
  return next_++;
}

int Update::add_spooled_stream(std::string_view entries, std::FILE* spool, long offset, std::size_t length) {
  const int number = add("<< " + std::string(entries) + " /Length " + std::to_string(length) +
                         " /Filter /FlateDecode >>\nstream\n");
  spooled_[number] = {spool, offset, length};
  return number;
}

void Update::write(std::FILE* file, std::ostream& out) const {
  CountingWriter w(out);
  copy_original(file, w);

  // Every object this update holds belongs to the one generation forme's
  // files use: Cairo numbers its objects with generation 0.
  std::vector<std::pair<int, std::size_t>> offsets;
  for (const auto& [number, text] : objects_) {
    offsets.emplace_back(number, w.at());
    w.write(std::to_string(number) + " 0 obj\n");
    w.write(text);
    if (auto s = spooled_.find(number); s != spooled_.end()) {
      copy_range(s->second.file, s->second.offset, s->second.length, w);
      w.write("\nendstream");
    }
    w.write("\nendobj\n");
  }

  // One subsection per run of consecutive object numbers.
  const std::size_t xref_at = w.at();
  std::string xref = "xref\n";
  for (std::size_t i = 0; i < offsets.size();) {
    std::size_t j = i + 1;
    while (j < offsets.size() && offsets[j].first == offsets[j - 1].first + 1) ++j;
    xref += std::to_string(offsets[i].first) + " " + std::to_string(j - i) + "\n";
    for (; i < j; ++i) xref += xref_entry(offsets[i].second);
  }
  std::string t = dict_with(trailer, "/Size", std::to_string(next_));
  t = dict_with(t, "/Prev", std::to_string(original_.xref_offset()));
  w.write(xref + "trailer\n" + t + "\nstartxref\n" + std::to_string(xref_at) + "\n%%EOF\n");
}

}  // namespace forme::pdf
