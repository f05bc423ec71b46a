#pragma once
// NOHD and hazard-zone radius per exposure case (hazard-and-eyewear.md section 5), and the words that state how a
// result was formed.
#include "beamwarden/hazard/hazard.hpp"

namespace beamwarden::hazard {

[[nodiscard]] HazardDistance hazardDistance(const HazardRequest& request, const HazardResult& result);
void describeConventions(HazardResult& result);

} // namespace beamwarden::hazard
