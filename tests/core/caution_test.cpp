// The caution every output carries says what the vocabulary asks of it.
#include "beamwarden/caution.hpp"

#include <catch2/catch.hpp>

#include <string>

TEST_CASE("The caution names the rule set, the LSO and local regulations", "[caution]")
{
    const std::string text{beamwarden::caution()};
    CHECK(text.find("formula structure") != std::string::npos);
    CHECK(text.find("laser safety officer") != std::string::npos);
    CHECK(text.find("local regulations") != std::string::npos);
    CHECK(text.find("manufacturer") != std::string::npos);
}

TEST_CASE("The program version comes from the CMake project", "[caution]")
{
    const std::string version{beamwarden::programVersion()};
    REQUIRE_FALSE(version.empty());
    CHECK(version.find('.') != std::string::npos);
}
