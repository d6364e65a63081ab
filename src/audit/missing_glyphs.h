#pragma once
/// Characters that no installed font can draw: a located warning for each,
/// never a silent empty box in print.
#include "base/diagnostic.h"
#include "describe/page_spec.h"
#include "paint/display_list.h"

namespace forme {

/// Warns once per character that some text on `page` could not be drawn,
/// located at its first appearance in the page description or one of its
/// tables (the file's line and column), or at the page itself.
void audit_missing_glyphs(const PageSpec& spec, const DisplayPage& page, DiagnosticSink& findings);

}  // namespace forme
