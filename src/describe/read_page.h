#pragma once
/// Stage 1, read description: a page description file → `PageSpec`.
#include <string>
#include <vector>

#include "base/diagnostic.h"
#include "describe/page_spec.h"
#include "describe/yaml_document.h"

namespace forme {

/// Builds the page from a document that passed `validate_document`. Throws
/// InputError for values that are well-formed but unusable (an unknown sheet
/// size, margins that leave no room).
PageSpec build_page_spec(const YamlDocument& doc, const Limits& limits = {});

/// Loads, validates and builds. Validation problems are all returned in
/// `errors` (and the result is empty); other problems throw InputError.
std::optional<PageSpec> read_page(const std::string& path, std::vector<Diagnostic>& errors,
                                  const Limits& limits = {});

}  // namespace forme
