#include "paint/temp_spool.h"

#include <unistd.h>

#include <cerrno>
#include <cstdint>
#include <cstdlib>
#include <cstring>
#include <stdexcept>

#include "base/diagnostic.h"

namespace forme {

std::FILE* anonymous_temp_file() {
  const char* env = std::getenv("TMPDIR");
  const std::string dir = env && *env ? env : "/tmp";
  std::string path = dir + "/forme-pdf-XXXXXX";
  const int fd = ::mkstemp(path.data());
  if (fd < 0)
    throw InputError(SourceLoc{dir}, std::string("cannot create a temporary file for the PDF: ") + std::strerror(errno),
                     "set TMPDIR to a writable folder");
  ::unlink(path.c_str());
  std::FILE* f = ::fdopen(fd, "w+b");
  if (!f) {
    ::close(fd);
    throw std::runtime_error("PDF file: cannot open a temporary file");
  }
  return f;
}

TextSpool::~TextSpool() {
  if (file_) std::fclose(file_);
}

// Each string is its length (8 bytes, host order: the file never leaves
// this process) and its bytes.
void TextSpool::push(std::string_view text) {
  if (!file_) file_ = anonymous_temp_file();
  const std::uint64_t n = text.size();
  if (std::fwrite(&n, sizeof n, 1, file_) != 1 || std::fwrite(text.data(), 1, text.size(), file_) != text.size())
    throw std::runtime_error("PDF file: temporary file write failed");
  ++count_;
}

void TextSpool::rewind() {
  read_ = 0;
  if (!file_) return;
  if (std::fflush(file_) != 0) throw std::runtime_error("PDF file: temporary file write failed");
  std::rewind(file_);
}

std::string TextSpool::next() {
  if (read_ >= count_) throw std::runtime_error("PDF file: read past the last spooled text");
  std::uint64_t n = 0;
  if (std::fread(&n, sizeof n, 1, file_) != 1 || n > (1u << 30))
    throw std::runtime_error("PDF file: cannot read a temporary file back");
  std::string text(n, '\0');
  if (std::fread(text.data(), 1, n, file_) != n) throw std::runtime_error("PDF file: cannot read a temporary file back");
  ++read_;
  return text;
}

}  // namespace forme
