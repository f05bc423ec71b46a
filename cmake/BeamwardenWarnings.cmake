# Project code is held to -Wall -Wextra -Wpedantic -Werror; third-party headers come in as SYSTEM includes.
# -Wnull-dereference is left out: GCC 12 reports false positives inside libstdc++ strings at -O2.
add_library(beamwarden_warnings INTERFACE)
target_compile_options(beamwarden_warnings INTERFACE
  -Wall -Wextra -Wpedantic -Werror
  -Wshadow -Wconversion -Wno-sign-conversion -Wnon-virtual-dtor -Wold-style-cast -Woverloaded-virtual
  -Wdouble-promotion -Wformat=2 -Wimplicit-fallthrough)
