#pragma once
// Validation of whole records before they are written, shared by LabStore and the lab import. Errors name the
// field by its lab-export path (docs/lab-export.md), e.g. "outputs[0].beam.diameter_m", under `path`.
#include "beamwarden/error.hpp"
#include "beamwarden/model/records.hpp"

#include <string>
#include <string_view>

namespace beamwarden::store {

// "a" + "b" -> "a.b"; an empty path gives just the key.
[[nodiscard]] std::string joinPath(std::string_view path, std::string_view key);
[[nodiscard]] std::string indexPath(std::string_view path, std::string_view key, std::size_t index);

[[nodiscard]] Result<void> validateLab(const model::Lab& lab, std::string_view path);
[[nodiscard]] Result<void> validateLaser(const model::Laser& laser, std::string_view path);
[[nodiscard]] Result<void> validateEyewear(const model::EyewearItem& item, std::string_view path);
// Content only; the status rules are the store's.
[[nodiscard]] Result<void> validateAssessment(const model::Assessment& assessment, std::string_view path);
[[nodiscard]] Result<void> validateSignOff(const model::SignOff& signOff, std::string_view path);

} // namespace beamwarden::store
