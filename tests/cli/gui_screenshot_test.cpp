// `beamwarden --screenshot FILE.png` is how scripts check the GUI without a person: it must write a PNG and exit 0.
#include "cli_runner.hpp"

#include <catch2/catch.hpp>

#include <array>
#include <cstdio>
#include <fstream>
#include <string>

TEST_CASE("beamwarden --screenshot writes a PNG of the main window and exits 0", "[gui][cli]")
{
    const std::string path = std::string(BEAMWARDEN_BIN_DIR) + "/../screenshot-test.png";
    std::remove(path.c_str());
    const auto out = runProgram("beamwarden", {"--demo", "--screenshot", path});
    REQUIRE(out.exitCode == 0);

    std::ifstream png(path, std::ios::binary);
    REQUIRE(png.good());
    std::array<char, 8> magic{};
    png.read(magic.data(), magic.size());
    // PNG signature (ISO/IEC 15948, common practice for file-type checks).
    CHECK(std::string(magic.data(), 8) == std::string("\x89PNG\r\n\x1a\n", 8));
    png.seekg(0, std::ios::end);
    CHECK(png.tellg() > 10000); // a rendered window, not an empty image
}

TEST_CASE("beamwarden refuses an unknown option with exit code 2", "[gui][cli]")
{
    const auto out = runProgram("beamwarden", {"--no-such-option"});
    CHECK(out.exitCode == 2);
    CHECK(out.stderrText.find("no-such-option") != std::string::npos);
}
