#pragma once
/// Reads the indirect objects of a finished PDF one at a time, straight
/// from the file, through its cross-reference table (ISO 32000-1 §7.5.4).
///
/// Only the table's subsection headers are held: an entry is found by its
/// position, since every entry is exactly 20 bytes. So reading a few
/// objects of a thousand-page report costs the same memory as reading them
/// from a one-page one. Files whose cross-reference information is a stream
/// (§7.5.8, PDF 1.5) are refused; Cairo writes the classic table.
#include <cstdio>
#include <string>
#include <vector>

namespace forme::pdf {

class FileReader {
 public:
  /// Reads the trailer of `file` (which stays open, owned by the caller).
  /// Throws std::runtime_error when the file does not end as a PDF must.
  explicit FileReader(std::FILE* file);

  /// The trailer dictionary (§7.5.5), as written.
  const std::string& trailer() const { return trailer_; }
  /// The trailer's /Size: one more than the highest object number.
  int size() const { return size_; }
  /// Where the last cross-reference section starts: an update's /Prev.
  long xref_offset() const { return xref_at_; }

  /// The text of object `number` between "N G obj" and "endobj". Throws
  /// std::runtime_error when it is not in use or cannot be read. Meant for
  /// dictionaries, not for streams (their data are read through).
  std::string object(int number) const;

 private:
  struct Subsection {
    int first = 0, count = 0;
    long entries_at = 0;  ///< file offset of its first entry
  };
  std::FILE* file_;
  std::vector<Subsection> subsections_;
  std::string trailer_;
  int size_ = 0;
  long xref_at_ = 0;
};

}  // namespace forme::pdf
