#pragma once
// Runs a program as a child process and times it from launch: until a given line appears on its standard output,
// and until it exits, with its peak resident memory. POSIX (posix_spawn, wait4), for the GUI measurements.
#include <string>
#include <vector>

namespace beamwarden::bench {

struct ChildRun {
    bool started = false;
    bool timedOut = false;
    int exitCode = -1;         // -1 when killed by a signal
    double untilLine_ms = -1;  // launch to the line `waitFor` on stdout; -1 when it never came
    double untilExit_ms = -1;  // launch to exit
    long peakResident_kB = -1; // the child's ru_maxrss
    std::string output;        // stdout and stderr, for the report when something went wrong
};

// `environment` entries ("NAME=value") are added to (or replace those of) this process's environment.
[[nodiscard]] ChildRun runChild(const std::string& program, const std::vector<std::string>& arguments,
                                const std::vector<std::string>& environment, const std::string& waitFor,
                                double timeout_s);

} // namespace beamwarden::bench
