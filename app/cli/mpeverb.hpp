#pragma once
// beamwarden-cli mpe: the maximum permissible exposure for one wavelength, single exposure or pulse train.
#include <string>
#include <vector>

namespace beamwarden::cli {

int runMpe(const std::vector<std::string>& args);

} // namespace beamwarden::cli
