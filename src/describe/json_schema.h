#pragma once
/// The page description's vocabulary as a JSON Schema (draft 2020-12), for
/// editors that complete and check YAML as it is typed. Generated from the
/// same table the validator walks (describe/schema.h), so the two agree.
#include <string>

#include "describe/schema.h"

namespace forme {

/// The JSON Schema text for a vocabulary rooted at `root`: keys in table
/// order, two-space indent, a final newline, so the output is reproducible.
/// Fixed-key mappings refuse other keys; lengths are strings matched by a
/// number+unit pattern; refused keys refuse every value and say why.
///
///     std::cout << json_schema_text(page_schema());   // `forme schema`
std::string json_schema_text(const NodeSpec& root);

/// The pattern a length must match (a number, then pt, mm, cm or in),
/// mirroring describe/lengths.h's parse_length.
extern const char* const kLengthPattern;

}  // namespace forme
