# Project code is held to -Wall -Wextra -Wpedantic -Werror; third-party headers come in as SYSTEM includes.
# -Wnull-dereference is left out: GCC 12 reports false positives inside libstdc++ strings at -O2.
add_library(beamwarden_warnings INTERFACE)
target_compile_options(beamwarden_warnings INTERFACE
  -Wall -Wextra -Wpedantic -Werror
  -Wshadow -Wconversion -Wno-sign-conversion -Wnon-virtual-dtor -Wold-style-cast -Woverloaded-virtual
  -Wdouble-promotion -Wformat=2 -Wimplicit-fallthrough)

# GCC 12 at -O3 (the Release build of the benchmarks) reports -Wrestrict inside libstdc++'s std::string operator+
# for ordinary code ("literal" + std::string): a known false positive of that compiler (fixed in GCC 13).
if(CMAKE_CXX_COMPILER_ID STREQUAL "GNU" AND CMAKE_CXX_COMPILER_VERSION VERSION_LESS 13)
  target_compile_options(beamwarden_warnings INTERFACE $<$<CONFIG:Release>:-Wno-restrict>)
endif()
