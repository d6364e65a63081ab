# Finds the Debian 12 packages forme builds on and gathers them behind one
# interface target, forme::deps. Cairo, HarfBuzz and FreeType ship pkg-config
# files; yaml-cpp and CLI11 ship CMake packages.
find_package(PkgConfig REQUIRED)
pkg_check_modules(CAIRO REQUIRED IMPORTED_TARGET cairo cairo-pdf cairo-svg cairo-png cairo-ft)
# harfbuzz-subset (part of libharfbuzz-dev): cuts the fonts an SVG carries down to the characters it sets.
pkg_check_modules(HARFBUZZ REQUIRED IMPORTED_TARGET harfbuzz harfbuzz-subset)
pkg_check_modules(FREETYPE REQUIRED IMPORTED_TARGET freetype2)
# libunibreak: Unicode line breaking (UAX #14) for wrapped notes and callouts.
pkg_check_modules(UNIBREAK REQUIRED IMPORTED_TARGET libunibreak)
# zlib: compresses the files forme embeds in a finished PDF (Flate, the
# filter every PDF reader knows).
pkg_check_modules(ZLIB REQUIRED IMPORTED_TARGET zlib)
# Nettle: the MD5 checksum PDF asks for in an embedded file's /Params.
pkg_check_modules(NETTLE REQUIRED IMPORTED_TARGET nettle)
# fontconfig: finds installed fonts for characters the bundled Noto Sans lacks.
pkg_check_modules(FONTCONFIG REQUIRED IMPORTED_TARGET fontconfig)
# FriBidi: the Unicode Bidirectional Algorithm (UAX #9) for right-to-left text.
pkg_check_modules(FRIBIDI REQUIRED IMPORTED_TARGET fribidi)
find_package(yaml-cpp REQUIRED)
find_package(CLI11 REQUIRED)

add_library(forme_deps INTERFACE)
target_link_libraries(forme_deps INTERFACE
  PkgConfig::CAIRO PkgConfig::HARFBUZZ PkgConfig::FREETYPE PkgConfig::UNIBREAK PkgConfig::ZLIB PkgConfig::NETTLE
  PkgConfig::FONTCONFIG PkgConfig::FRIBIDI
  yaml-cpp CLI11::CLI11)
add_library(forme::deps ALIAS forme_deps)
