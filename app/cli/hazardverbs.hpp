#pragma once
// beamwarden-cli nohd and od: hazard distance and required optical density for one output and exposure case.
#include <string>
#include <vector>

namespace beamwarden::cli {

int runNohd(const std::vector<std::string>& args);
int runOd(const std::vector<std::string>& args);

} // namespace beamwarden::cli
