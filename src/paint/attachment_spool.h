#pragma once
/// Files to embed in a PDF, gathered while its pages are painted and kept
/// compressed in an unnamed temporary file until the PDF is finished: a
/// report that carries every page's plotted rows holds, in memory, only a
/// short record per file.
#include <cstdio>
#include <string>
#include <vector>

#include "paint/painter.h"

namespace forme {

/// One file as embedded: what its file specification and stream dictionary
/// say, and where its Flate-compressed bytes lie in the spool.
struct SpooledFile {
  std::string name, description, mime_type;
  std::size_t size = 0;      ///< bytes before compression (/Params /Size)
  std::string md5;           ///< RFC 1321 digest, 32 lower-case hexadecimal digits (/Params /CheckSum)
  long offset = 0;           ///< in the spool
  std::size_t length = 0;    ///< compressed bytes (/Length)
};

class AttachmentSpool {
 public:
  AttachmentSpool() = default;
  ~AttachmentSpool();
  AttachmentSpool(const AttachmentSpool&) = delete;
  AttachmentSpool& operator=(const AttachmentSpool&) = delete;

  /// Compresses and stores `file`. Throws on failure.
  void add(const EmbeddedFile& file);
  const std::vector<SpooledFile>& files() const { return files_; }
  /// The spool itself, for copying straight into the output; null when empty.
  std::FILE* file() const { return file_; }

 private:
  std::FILE* file_ = nullptr;
  std::vector<SpooledFile> files_;
};

}  // namespace forme
