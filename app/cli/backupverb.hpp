#pragma once
// beamwarden-cli backup: a consistent copy of a lab file, taken with SQLite's online backup while it may be open.
#include <string>
#include <vector>

namespace beamwarden::cli {

int runBackup(const std::vector<std::string>& args);

} // namespace beamwarden::cli
