# Script mode (cmake -P): writes OUTPUT, a C++ file holding every file under
# STARTERS_DIR as a string, so `forme new` works from an installed binary.
# Each file becomes {kind, path, contents}: kind is its first folder.
file(GLOB_RECURSE files RELATIVE ${STARTERS_DIR} ${STARTERS_DIR}/*)
list(SORT files)
set(body "")
foreach(f IN LISTS files)
  string(FIND "${f}" "/" slash)
  if(slash LESS 1)
    message(FATAL_ERROR "starters/${f}: starter files live in a folder named for their kind")
  endif()
  string(SUBSTRING "${f}" 0 ${slash} kind)
  math(EXPR rest "${slash} + 1")
  string(SUBSTRING "${f}" ${rest} -1 path)
  file(SIZE ${STARTERS_DIR}/${f} size)
  file(READ ${STARTERS_DIR}/${f} hex HEX)
  # Every byte as a \xNN escape: no quoting or encoding questions.
  string(REGEX REPLACE "([0-9a-f][0-9a-f])" "\\\\x\\1" escaped "${hex}")
  string(APPEND body "      {\"${kind}\", \"${path}\", std::string_view(\"${escaped}\", ${size})},\n")
endforeach()
set(text "// Generated from starters/ by cmake/EmbedStarters.cmake; edit those files instead.
#include \"cli/starters.h\"

namespace forme {

const std::vector<StarterFile>& starter_files() {
  static const std::vector<StarterFile> files = {
${body}  };
  return files;
}

}  // namespace forme
")
# Rewrite only on change, so an unchanged set does not rebuild forme_core.
if(EXISTS ${OUTPUT})
  file(READ ${OUTPUT} old)
  if(old STREQUAL text)
    return()
  endif()
endif()
file(WRITE ${OUTPUT} "${text}")
