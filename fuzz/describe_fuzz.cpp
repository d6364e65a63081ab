// Fuzzes stage 1 on arbitrary bytes: parse, validate, build the PageSpec.
// Any InputError is a correct refusal; a crash, sanitizer report, hang or
// other exception is a bug.
#include <cstddef>
#include <cstdint>
#include <string>

#include "base/diagnostic.h"
#include "base/limits.h"
#include "describe/read_page.h"
#include "describe/schema.h"
#include "describe/validate.h"
#include "describe/yaml_document.h"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  forme::Limits limits;
  limits.description_bytes = 64 * 1024;  // the fuzzer's inputs stay small
  try {
    forme::YamlDocument doc =
        forme::parse_yaml(std::string(reinterpret_cast<const char*>(data), size), "fuzz.yaml", limits);
    if (forme::validate_document(doc, forme::page_schema()).empty()) (void)forme::build_page_spec(doc, limits);
  } catch (const forme::InputError&) {
  }
  return 0;
}
