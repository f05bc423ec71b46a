#pragma once
// The hazard result as JSON (`beamwarden-cli nohd|od --json`; keys in core/src/hazard/README.md).
#include "beamwarden/hazard/hazard.hpp"

#include <nlohmann/json_fwd.hpp>

namespace beamwarden::hazard {

[[nodiscard]] nlohmann::json toJson(const HazardResult& result);
[[nodiscard]] std::string_view toString(DistanceKind kind);

} // namespace beamwarden::hazard
