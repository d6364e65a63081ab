# Warnings on for forme's own targets; -Werror when FORME_WERROR is set (CI).
function(forme_set_warnings target)
  target_compile_options(${target} PRIVATE -Wall -Wextra -Wpedantic -Wshadow
    -Wnon-virtual-dtor -Wold-style-cast -Wcast-align -Wunused -Woverloaded-virtual
-Wdouble-promotion -Wformat=2 -Wimplicit-fallthrough
    # GCC 12 reports false dangling pointers inside yaml-cpp 0.7 headers and
    # false "maybe uninitialized" optionals inside std::variant, and false
    # -Wrestrict reports from std::string at -O3.
    $<$<CXX_COMPILER_ID:GNU>:-Wno-dangling-pointer -Wno-maybe-uninitialized -Wno-restrict>)
  if(FORME_WERROR)
    target_compile_options(${target} PRIVATE -Werror)
  endif()
  if(FORME_SANITIZE)
    target_compile_options(${target} PRIVATE -fsanitize=address,undefined -fno-omit-frame-pointer -fno-sanitize-recover=undefined)
    target_link_options(${target} PRIVATE -fsanitize=address,undefined)
  endif()
endfunction()
