#pragma once
/// Checks a page description's size and shape before yaml-cpp builds a node
/// tree from it, so hostile text is refused cheaply and at the right place.
///
/// Two passes, both linear in the text:
///  1. A raw scan of the characters for nesting depth (flow brackets plus
///     block indentation levels). yaml-cpp's parser recurses once per level,
///     so 10,000 '[' must be refused before it runs.
///  2. yaml-cpp's event parser (no tree) counting anchors, aliases, the node
///     count once aliases are expanded, and exact nesting depth. An alias
///     bomb (a few lines whose aliases expand to billions of nodes) is
///     refused at the alias that crosses the limit.
/// Also refused: text larger than `Limits::description_bytes`, and a second
/// YAML document in the file (forme would otherwise silently ignore it).
#include <string>

#include "base/diagnostic.h"
#include "base/limits.h"

namespace forme {

/// Throws InputError (located at the offending line:col of `file`) when
/// `text` breaks one of `limits`' description limits; also rethrows
/// yaml-cpp syntax errors as yaml-cpp's own exceptions for the caller to
/// explain.
void guard_yaml(const std::string& text, const std::string& file, const Limits& limits);

}  // namespace forme
