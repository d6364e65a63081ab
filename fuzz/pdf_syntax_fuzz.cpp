// Fuzzes the PDF object text forme reads and edits (paint/pdf_syntax) and
// the cross-reference reader (paint/pdf_file_reader) on arbitrary bytes.
// A std::runtime_error is a correct refusal; a crash, a hang or a sanitizer
// report is a bug. What dict_with returns must still hold the key it set,
// with the value it was given.
#include <cstddef>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <stdexcept>
#include <string>
#include <string_view>

#include "paint/pdf_file_reader.h"
#include "paint/pdf_syntax.h"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  const std::string_view text(reinterpret_cast<const char*>(data), size);
  using namespace forme::pdf;
  for (std::string_view key : {"/Type", "/K", "/S", "/Kids"}) {
    if (auto v = dict_value(text, key)) {
      (void)reference(*v);
      (void)array_items(*v);
      (void)is_name(*v, "/Page");
    }
  }
  (void)array_items(text);
  (void)reference(text);
  try {
    const std::string edited = dict_with(text, "/Alt", "(fuzz)");
    if (dict_value(edited, "/Alt") != std::string_view("(fuzz)")) std::abort();
  } catch (const std::runtime_error&) {
  }
  (void)text_string(text);
  (void)name(text);
  (void)byte_string(text);

  // The same bytes as a whole file.
  std::FILE* f = std::tmpfile();
  if (!f) return 0;
  std::fwrite(data, 1, size, f);
  std::fflush(f);
  try {
    const FileReader reader(f);
    for (int n = 1; n < 4 && n < reader.size(); ++n) {
      try {
        (void)dict_value(reader.object(n), "/Type");
      } catch (const std::runtime_error&) {
      }
    }
  } catch (const std::runtime_error&) {
  }
  std::fclose(f);
  return 0;
}
