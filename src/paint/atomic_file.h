#pragma once
/// Output that appears whole or not at all: bytes go to a temporary file in
/// the target's folder, which is flushed to disk and renamed over the target
/// only on `commit`. A failed run leaves any earlier file untouched.
#include <string>

namespace forme {

class AtomicFile {
 public:
  /// Creates the temporary file; throws InputError (located at the output
  /// path) when the folder is missing or not writable.
  explicit AtomicFile(std::string target);
  ~AtomicFile();  ///< removes the temporary file unless committed
  AtomicFile(const AtomicFile&) = delete;
  AtomicFile& operator=(const AtomicFile&) = delete;

  /// Writes all of `bytes`; throws on failure.
  void write(const std::string& bytes);
  /// fsync, rename over the target, fsync the folder.
  void commit();
  const std::string& temp_path() const { return temp_; }

 private:
  std::string target_, temp_;
  int fd_ = -1;
  bool committed_ = false;
};

}  // namespace forme
