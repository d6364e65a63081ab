#pragma once
/// Unnamed temporary files for what a PDF gathers page by page but writes
/// only when it is finished: Cairo's output itself, and each figure's
/// alternate text. On disk, they leave memory flat however long the report.
#include <cstdio>
#include <string>
#include <string_view>

namespace forme {

/// An unnamed file (created in TMPDIR, or /tmp, and unlinked at once) open
/// for reading and writing; the caller closes it. Throws InputError located
/// at the folder, with a hint, when the folder is not writable.
std::FILE* anonymous_temp_file();

/// Strings written in order and read back in the same order, kept in an
/// anonymous temporary file rather than in memory.
class TextSpool {
 public:
  TextSpool() = default;
  ~TextSpool();
  TextSpool(const TextSpool&) = delete;
  TextSpool& operator=(const TextSpool&) = delete;

  /// Appends one string; the file is made on the first. Throws on failure.
  void push(std::string_view text);
  /// Strings pushed so far.
  std::size_t size() const { return count_; }
  /// Starts reading from the first string; call after the last push.
  void rewind();
  /// The next string in push order. Throws once all have been read.
  std::string next();

 private:
  std::FILE* file_ = nullptr;
  std::size_t count_ = 0, read_ = 0;
};

}  // namespace forme
