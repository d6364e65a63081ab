#include "paint/atomic_file.h"

#include <fcntl.h>
#include <sys/stat.h>
#include <unistd.h>

#include <cerrno>
#include <cstring>
#include <filesystem>
#include <vector>

#include "base/diagnostic.h"

namespace forme {

namespace {
std::string folder_of(const std::string& path) {
  std::filesystem::path p = std::filesystem::path(path).parent_path();
  return p.empty() ? "." : p.string();
}
}  // namespace

AtomicFile::AtomicFile(std::string target) : target_(std::move(target)) {
  std::filesystem::path t(target_);
  std::string dir = folder_of(target_);
  struct stat st{};
  if (::stat(target_.c_str(), &st) == 0 && S_ISDIR(st.st_mode))
    throw InputError(SourceLoc{target_}, "output path is a folder", "give a file name such as page.pdf");
  std::string pattern = dir + "/." + t.filename().string() + ".tmp-XXXXXX";
  std::vector<char> buf(pattern.begin(), pattern.end());
  buf.push_back('\0');
  fd_ = ::mkstemp(buf.data());
  if (fd_ < 0)
    throw InputError(SourceLoc{target_}, std::string("cannot write output: ") + std::strerror(errno),
                     "check that the folder '" + dir + "' exists and is writable");
  temp_ = buf.data();
  ::fchmod(fd_, 0644);
}

AtomicFile::~AtomicFile() {
  if (fd_ >= 0) ::close(fd_);
  if (!committed_ && !temp_.empty()) ::unlink(temp_.c_str());
}

void AtomicFile::write(const std::string& bytes) { write(bytes.data(), bytes.size()); }

void AtomicFile::write(const char* p, std::size_t left) {
  while (left > 0) {
    ssize_t n = ::write(fd_, p, left);
    if (n < 0) {
      if (errno == EINTR) continue;
      throw InputError(SourceLoc{target_}, std::string("cannot write output: ") + std::strerror(errno));
    }
    p += n;
    left -= static_cast<std::size_t>(n);
  }
}

std::ostream& AtomicFile::stream() {
  if (!stream_) {
    buffer_ = std::make_unique<Buffer>(*this);
    stream_ = std::make_unique<std::ostream>(buffer_.get());
    stream_->exceptions(std::ios::badbit);  // the write's own error, not a bare failed stream
  }
  return *stream_;
}

int AtomicFile::Buffer::sync() {
  file_.write(pbase(), static_cast<std::size_t>(pptr() - pbase()));
  setp(bytes_.data(), bytes_.data() + bytes_.size());
  return 0;
}

AtomicFile::Buffer::int_type AtomicFile::Buffer::overflow(int_type c) {
  sync();
  if (!traits_type::eq_int_type(c, traits_type::eof())) {
    *pptr() = traits_type::to_char_type(c);
    pbump(1);
  }
  return traits_type::not_eof(c);
}

void AtomicFile::commit() {
  if (stream_) stream_->flush();
  if (::fsync(fd_) != 0 || ::close(fd_) != 0) {
    fd_ = -1;
    throw InputError(SourceLoc{target_}, std::string("cannot write output: ") + std::strerror(errno));
  }
  fd_ = -1;
  if (::rename(temp_.c_str(), target_.c_str()) != 0)
    throw InputError(SourceLoc{target_}, std::string("cannot replace output: ") + std::strerror(errno));
  committed_ = true;
  // Make the rename itself durable.
  int dfd = ::open(folder_of(target_).c_str(), O_RDONLY | O_DIRECTORY);
  if (dfd >= 0) {
    ::fsync(dfd);
    ::close(dfd);
  }
}

}  // namespace forme
