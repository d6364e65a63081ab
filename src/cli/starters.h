#pragma once
/// `forme new KIND DIR`: starter pages for the four jobs forme is made for
/// (a board briefing, a monthly report, a poster panel, a journal figure),
/// each a commented page description with small invented data that renders
/// at once. The files under starters/ are compiled into the binary, so an
/// installed forme needs nothing else.
#include <string>
#include <string_view>
#include <vector>

#include "base/diagnostic.h"

namespace forme {

/// One file of a starter: `path` is relative to the new folder.
struct StarterFile {
  std::string_view kind;
  std::string_view path;
  std::string_view contents;
};

/// Every embedded starter file (generated at build time from starters/).
const std::vector<StarterFile>& starter_files();

/// The starter kinds, sorted: briefing, figure, poster, report.
std::vector<std::string> starter_kinds();

/// Writes the starter `kind` into `dir`, which must not exist or be empty.
/// The files are written into a temporary sibling folder first and renamed
/// into place, so a failed run leaves no half-written folder. Throws
/// InputError located at `dir` (an unknown kind, a non-empty folder, a
/// folder that cannot be written).
void write_starter(const std::string& kind, const std::string& dir);

}  // namespace forme
