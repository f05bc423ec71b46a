// beamwarden-cli: the same work as the desktop application, headless and in batch.
#include "verbs.hpp"

#include <string>
#include <vector>

int main(int argc, char* argv[])
{
    std::vector<std::string> args(argv + 1, argv + argc);
    return beamwarden::cli::run(args);
}
