// Fuzzes the CSV reader on arbitrary bytes. An InputError is a correct
// refusal; anything else is a bug.
#include <cstddef>
#include <cstdint>
#include <string_view>

#include "base/diagnostic.h"
#include "data/csv_reader.h"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  try {
    (void)forme::parse_csv(std::string_view(reinterpret_cast<const char*>(data), size), "fuzz.csv");
  } catch (const forme::InputError&) {
  }
  return 0;
}
