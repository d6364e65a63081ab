#include "paint/pdf_update.h"

#include <qpdf/Buffer.hh>
#include <qpdf/Pl_Buffer.hh>
#include <qpdf/Pl_Flate.hh>

#include <cctype>
#include <cstdio>
#include <stdexcept>
#include <string>
#include <vector>

namespace forme {

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
  void write(const std::string& s) { write(s.data(), s.size()); }
  std::size_t at() const { return at_; }

 private:
  std::ostream& out_;
  std::size_t at_ = 0;
};

// Copies the original file to `w`; returns the offset its `startxref`
// gives (ISO 32000-1 §7.5.5), read from the file's last kilobyte.
std::size_t copy_original(std::FILE* original, CountingWriter& w) {
  std::rewind(original);
  std::vector<char> buffer(1 << 16);
  std::string tail;
  for (;;) {
    const std::size_t n = std::fread(buffer.data(), 1, buffer.size(), original);
    if (n == 0) break;
    w.write(buffer.data(), n);
    tail.append(buffer.data(), n);
    if (tail.size() > 1024) tail.erase(0, tail.size() - 1024);
  }
  if (std::ferror(original)) throw std::runtime_error("PDF file: cannot read Cairo's output back");
  const std::size_t key = tail.rfind("startxref");
  if (key == std::string::npos) throw std::runtime_error("PDF file: Cairo's output has no startxref");
  std::size_t i = key + 9;
  while (i < tail.size() && std::isspace(static_cast<unsigned char>(tail[i]))) ++i;
  std::size_t offset = 0, digits = 0;
  for (; i < tail.size() && std::isdigit(static_cast<unsigned char>(tail[i])); ++i, ++digits)
    offset = offset * 10 + static_cast<std::size_t>(tail[i] - '0');
  if (digits == 0) throw std::runtime_error("PDF file: Cairo's startxref has no offset");
  if (tail.back() != '\n' && tail.back() != '\r') w.write("\n", 1);
  return offset;
}

std::string header(QPDFObjGen id) {
  return std::to_string(id.getObj()) + " " + std::to_string(id.getGen()) + " obj\n";
}

// A stream made here holds its data unfiltered; it goes out compressed.
void write_stream(QPDFObjectHandle s, CountingWriter& w) {
  auto raw = s.getRawStreamData();
  Pl_Buffer collected("compressed");
  Pl_Flate flate("flate", &collected, Pl_Flate::a_deflate);
  flate.write(raw->getBuffer(), raw->getSize());
  flate.finish();
  auto data = collected.getBufferSharedPointer();
  QPDFObjectHandle dict = s.getDict().shallowCopy();
  dict.replaceKey("/Length", QPDFObjectHandle::newInteger(static_cast<long long>(data->getSize())));
  dict.replaceKey("/Filter", QPDFObjectHandle::newName("/FlateDecode"));
  dict.removeKey("/DecodeParms");
  w.write(header(s.getObjGen()) + dict.unparse() + "\nstream\n");
  w.write(reinterpret_cast<const char*>(data->getBuffer()), data->getSize());
  w.write("\nendstream\nendobj\n");
}

// A cross-reference entry is exactly 20 bytes (ISO 32000-1 §7.5.4).
std::string xref_entry(std::size_t offset, int generation) {
  char row[24];
  std::snprintf(row, sizeof row, "%010zu %05d n \n", offset, generation);
  return row;
}

}  // namespace

void write_incremental_update(QPDF& q, std::FILE* original, const std::set<QPDFObjGen>& changed,
                              const std::map<QPDFObjGen, std::string>& rewritten, std::ostream& out) {
  QPDFObjectHandle trailer = q.getTrailer();
  const long long old_size = trailer.getKey("/Size").isInteger() ? trailer.getKey("/Size").getIntValue() : 0;
  if (old_size <= 0) throw std::runtime_error("PDF file: Cairo's trailer has no /Size");

  CountingWriter w(out);
  const std::size_t prev = copy_original(original, w);

  // Objects added since the file was read are numbered on from its /Size.
  std::set<QPDFObjGen> ids = changed;
  for (const auto& [id, text] : rewritten) ids.insert(id);
  int next = static_cast<int>(old_size);
  for (;; ++next) {
    QPDFObjectHandle o = q.getObjectByID(next, 0);
    if (o.isNull()) break;
    ids.insert(o.getObjGen());
  }

  std::vector<std::pair<QPDFObjGen, std::size_t>> offsets;
  for (const QPDFObjGen& id : ids) {
    offsets.emplace_back(id, w.at());
    if (auto text = rewritten.find(id); text != rewritten.end()) {
      w.write(text->second);
      continue;
    }
    QPDFObjectHandle o = q.getObjectByObjGen(id);
    if (o.isStream()) write_stream(o, w);
    else w.write(header(id) + o.unparseResolved() + "\nendobj\n");
  }

  // One subsection per run of consecutive object numbers.
  const std::size_t xref_at = w.at();
  std::string xref = "xref\n";
  for (std::size_t i = 0; i < offsets.size();) {
    std::size_t j = i + 1;
    while (j < offsets.size() && offsets[j].first.getObj() == offsets[j - 1].first.getObj() + 1) ++j;
    xref += std::to_string(offsets[i].first.getObj()) + " " + std::to_string(j - i) + "\n";
    for (; i < j; ++i) xref += xref_entry(offsets[i].second, offsets[i].first.getGen());
  }
  QPDFObjectHandle update = trailer.shallowCopy();
  update.replaceKey("/Size", QPDFObjectHandle::newInteger(next));
  update.replaceKey("/Prev", QPDFObjectHandle::newInteger(static_cast<long long>(prev)));
  update.removeKey("/XRefStm");
  w.write(xref + "trailer\n" + update.unparse() + "\nstartxref\n" + std::to_string(xref_at) + "\n%%EOF\n");
}

}  // namespace forme
