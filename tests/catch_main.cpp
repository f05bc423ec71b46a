// The shared Catch2 entry point for every suite.
#define CATCH_CONFIG_MAIN
#include <catch2/catch.hpp>
