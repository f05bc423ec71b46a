#pragma once
// The flags shared by `nohd` and `od`, read into a hazard request.
#include "arguments.hpp"
#include "beamwarden/hazard/hazard.hpp"

#include <vector>

namespace beamwarden::cli {

[[nodiscard]] const std::vector<FlagSpec>& hazardFlags();
// Reads the flags; missing essentials are refused (never guessed). Worst-case defaults that are stated in the
// output: reflectance 1, viewing angle 0, distance 0 (at the exit), exposure basis by wavelength.
[[nodiscard]] Result<hazard::HazardRequest> hazardRequestFrom(const Arguments& args);

} // namespace beamwarden::cli
