#pragma once
// Records as lab-export JSON (docs/lab-export.md). Keys come out in the order written here, so an export is stable
// from run to run; ids stay out of it, records refer to each other by name.
#include "beamwarden/model/records.hpp"

#include <nlohmann/json.hpp>

#include <string_view>

namespace beamwarden::store {

using OrderedJson = nlohmann::ordered_json;

[[nodiscard]] OrderedJson toJson(const model::Lab& lab);
[[nodiscard]] OrderedJson toJson(const model::Laser& laser);
[[nodiscard]] OrderedJson toJson(const model::Output& output);
[[nodiscard]] OrderedJson toJson(const model::EyewearItem& item);
[[nodiscard]] OrderedJson toJson(const model::Assessment& assessment, std::string_view laserName);

} // namespace beamwarden::store
