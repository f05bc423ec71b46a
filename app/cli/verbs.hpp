#pragma once
// The verbs of beamwarden-cli and the dispatcher that picks one. Exit codes: 0 done, 1 failed while working
// (e.g. a file could not be written), 2 the input was refused (bad flag or value), with a message naming the field.
#include <functional>
#include <string>
#include <vector>

namespace beamwarden::cli {

inline constexpr int kExitOk = 0;
inline constexpr int kExitFailed = 1;
inline constexpr int kExitBadInput = 2;

struct Verb {
    std::string name;
    std::string summary;
    std::function<int(const std::vector<std::string>& args)> run;
};

// Every verb the program has, in the order --help lists them.
[[nodiscard]] const std::vector<Verb>& verbs();

// Runs "beamwarden-cli ARGS...". Returns the process exit code.
int run(const std::vector<std::string>& args);

} // namespace beamwarden::cli
