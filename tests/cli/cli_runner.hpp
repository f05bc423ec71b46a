#pragma once
// Runs the built beamwarden-cli as a child process and captures what it printed.
#include <string>
#include <vector>

struct CliOutput {
    int exitCode = -1;
    std::string stdoutText;
    std::string stderrText;
};

// Runs build/bin/PROGRAM with ARGS; runCli is the common case of beamwarden-cli.
CliOutput runProgram(const std::string& program, const std::vector<std::string>& args);
inline CliOutput runCli(const std::vector<std::string>& args)
{
    return runProgram("beamwarden-cli", args);
}
