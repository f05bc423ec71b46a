#pragma once
// beamwarden-cli lab: create, export, import and check lab files, and import eyewear inventories.
#include <string>
#include <vector>

namespace beamwarden::cli {

int runLab(const std::vector<std::string>& args);

} // namespace beamwarden::cli
