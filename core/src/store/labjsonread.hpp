#pragma once
// Lasers and eyewear items from lab-export JSON, type-checked key by key; range checks follow in recordcheck.
#include "beamwarden/error.hpp"
#include "beamwarden/model/records.hpp"

#include <nlohmann/json.hpp>

#include <string>

namespace beamwarden::store {

[[nodiscard]] Result<model::Laser> laserFromJson(const nlohmann::json& value, const std::string& path);
[[nodiscard]] Result<model::EyewearItem> eyewearFromJson(const nlohmann::json& value, const std::string& path);

} // namespace beamwarden::store
