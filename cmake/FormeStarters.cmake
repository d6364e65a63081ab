# Starter pages (starters/KIND/...) compiled into forme_core, for `forme new`.
file(GLOB_RECURSE FORME_STARTER_FILES CONFIGURE_DEPENDS ${PROJECT_SOURCE_DIR}/starters/*)
set(FORME_STARTERS_CPP ${PROJECT_BINARY_DIR}/generated/starter_files.cpp)
add_custom_command(
  OUTPUT ${FORME_STARTERS_CPP}
  COMMAND ${CMAKE_COMMAND} -DSTARTERS_DIR=${PROJECT_SOURCE_DIR}/starters -DOUTPUT=${FORME_STARTERS_CPP}
          -P ${PROJECT_SOURCE_DIR}/cmake/EmbedStarters.cmake
  DEPENDS ${FORME_STARTER_FILES} ${PROJECT_SOURCE_DIR}/cmake/EmbedStarters.cmake
  COMMENT "Embedding the starter pages"
  VERBATIM)
target_sources(forme_core PRIVATE ${FORME_STARTERS_CPP})
