#pragma once
// beamwarden-cli assess LAB [--laser NAME] [--json]: every output and exposure case of the lab's lasers through the
// engines, with the shelf checked against each laser.
#include <string>
#include <vector>

namespace beamwarden::cli {

int runAssess(const std::vector<std::string>& args);

} // namespace beamwarden::cli
