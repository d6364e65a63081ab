#include "paint/attachment_spool.h"

#include <nettle/md5.h>
#include <zlib.h>

#include <cstdint>
#include <stdexcept>

#include "paint/temp_spool.h"

namespace forme {

namespace {

std::string md5_hex(const std::string& data) {
  md5_ctx ctx;
  md5_init(&ctx);
  md5_update(&ctx, data.size(), reinterpret_cast<const std::uint8_t*>(data.data()));
  std::uint8_t digest[MD5_DIGEST_SIZE];
  md5_digest(&ctx, MD5_DIGEST_SIZE, digest);
  std::string out;
  char pair[4];
  for (std::uint8_t b : digest) {
    std::snprintf(pair, sizeof pair, "%02x", b);
    out += pair;
  }
  return out;
}

}  // namespace

AttachmentSpool::~AttachmentSpool() {
  if (file_) std::fclose(file_);
}

void AttachmentSpool::add(const EmbeddedFile& file) {
  if (!file_) file_ = anonymous_temp_file();
  uLongf length = compressBound(static_cast<uLong>(file.bytes.size()));
  std::string packed(length, '\0');
  if (compress2(reinterpret_cast<Bytef*>(packed.data()), &length, reinterpret_cast<const Bytef*>(file.bytes.data()),
                static_cast<uLong>(file.bytes.size()), Z_BEST_COMPRESSION) != Z_OK)
    throw std::runtime_error("PDF file: cannot compress an embedded file");
  if (std::fseek(file_, 0, SEEK_END) != 0) throw std::runtime_error("PDF file: temporary file write failed");
  SpooledFile f{file.name, file.description, file.mime_type, file.bytes.size(), md5_hex(file.bytes),
                std::ftell(file_), length};
  if (std::fwrite(packed.data(), 1, length, file_) != length)
    throw std::runtime_error("PDF file: temporary file write failed");
  files_.push_back(std::move(f));
}

}  // namespace forme
