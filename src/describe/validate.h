#pragma once
/// Checks a YAML tree against the page vocabulary (describe/schema.h)
/// before anything is built from it: unknown keys (with the nearest valid
/// key as a hint), duplicate keys, missing required keys (reported at the
/// parent mapping), wrong shapes, values that do not parse, unterminated
/// quoted strings. After this pass, later code may trust the tree's shape.
#include <vector>

#include "base/diagnostic.h"
#include "describe/schema.h"
#include "describe/yaml_document.h"

namespace forme {

/// Returns every problem found, in document order; empty when valid.
std::vector<Diagnostic> validate_document(const YamlDocument& doc, const NodeSpec& root);

}  // namespace forme
