#pragma once
/// Output that appears whole or not at all: bytes go to a temporary file in
/// the target's folder, which is flushed to disk and renamed over the target
/// only on `commit`. A failed run leaves any earlier file untouched.
#include <array>
#include <memory>
#include <ostream>
#include <streambuf>
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
  /// The file as a stream, for output written as it is made (a long
  /// report is never held in memory whole). A failed write throws as
  /// `write` does. `commit` flushes it.
  std::ostream& stream();
  /// fsync, rename over the target, fsync the folder.
  void commit();
  const std::string& temp_path() const { return temp_; }

 private:
  class Buffer : public std::streambuf {
   public:
    explicit Buffer(AtomicFile& file) : file_(file) { setp(bytes_.data(), bytes_.data() + bytes_.size()); }
    int sync() override;

   protected:
    int_type overflow(int_type c) override;

   private:
    AtomicFile& file_;
    std::array<char, 1 << 16> bytes_;
  };

  void write(const char* p, std::size_t n);

  std::string target_, temp_;
  std::unique_ptr<Buffer> buffer_;
  std::unique_ptr<std::ostream> stream_;
  int fd_ = -1;
  bool committed_ = false;
};

}  // namespace forme
