// beamwarden-cli's first contract: --version, --help listing the verbs, and exit code 2 for refused input.
#include "cli_runner.hpp"

#include <catch2/catch.hpp>

TEST_CASE("beamwarden-cli --version prints the project version", "[cli]")
{
    const auto out = runCli({"--version"});
    CHECK(out.exitCode == 0);
    CHECK(out.stdoutText.starts_with("beamwarden-cli "));
}

TEST_CASE("beamwarden-cli --help lists its verbs and the caution", "[cli]")
{
    const auto out = runCli({"--help"});
    CHECK(out.exitCode == 0);
    CHECK(out.stdoutText.find("Verbs:") != std::string::npos);
    CHECK(out.stdoutText.find("version") != std::string::npos);
    CHECK(out.stdoutText.find("laser safety officer") != std::string::npos);
}

TEST_CASE("beamwarden-cli refuses an unknown verb with exit code 2", "[cli]")
{
    const auto out = runCli({"frobnicate"});
    CHECK(out.exitCode == 2);
    CHECK(out.stderrText.find("frobnicate") != std::string::npos);
}
