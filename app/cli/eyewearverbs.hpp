#pragma once
// beamwarden-cli eyewear level|check: EN 207 levels a source requires, and whether an item protects against it.
#include <string>
#include <vector>

namespace beamwarden::cli {

int runEyewear(const std::vector<std::string>& args);

} // namespace beamwarden::cli
