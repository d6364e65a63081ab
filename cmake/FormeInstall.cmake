# What `cmake --install` adds beyond the executable and the fonts: the
# manual page and bash completion, in the places man and bash-completion
# look under the prefix. The starter pages travel inside the executable
# (FormeStarters.cmake), so an installed forme needs no source tree.
include(FormeStarters)

install(FILES ${PROJECT_SOURCE_DIR}/doc/forme.1 DESTINATION share/man/man1)
install(FILES ${PROJECT_SOURCE_DIR}/completion/forme.bash
        DESTINATION share/bash-completion/completions RENAME forme)
