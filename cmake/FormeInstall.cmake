# What `cmake --install` needs beyond the executable and the fonts. The
# starter pages travel inside the executable (FormeStarters.cmake), so an
# installed forme needs no source tree.
include(FormeStarters)
