# The asan preset turns this on: address and undefined-behaviour sanitizers for all project targets.
if(BEAMWARDEN_SANITIZE)
  add_compile_options(-fsanitize=address,undefined -fno-omit-frame-pointer -fno-sanitize-recover=undefined)
  add_link_options(-fsanitize=address,undefined)
endif()
