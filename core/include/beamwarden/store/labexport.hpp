#pragma once
// The lab export (.bwlab.json): a whole lab as JSON in our own documented schema (docs/lab-export.md), SI numbers
// under unit-suffixed keys. Export -> import -> export gives the same bytes.
#include "beamwarden/error.hpp"
#include "beamwarden/store/labcontents.hpp"
#include "beamwarden/store/labstore.hpp"

#include <filesystem>
#include <string>
#include <string_view>

namespace beamwarden::store {

inline constexpr std::string_view kLabExportFormat = "beamwarden-lab";
inline constexpr int kLabExportVersion = 1;

// The export text: keys in a fixed order, two-space indent, shortest round-tripping numbers, a final newline.
[[nodiscard]] std::string toLabExport(const LabContents& contents);

// Parses and checks a whole export before anything is written: types, ranges (the model's validate functions),
// duplicate names, references by name, and each assessment's sign-off history. The first bad field is named by its
// JSON path, e.g. "lasers[2].outputs[0].beam.diameter_m". Ids are given in file order, starting at 1.
[[nodiscard]] Result<LabContents> parseLabExport(std::string_view text);

// Writes the store's contents to `out` (replacing a file there) through a temporary file and a rename.
[[nodiscard]] Result<void> exportLab(LabStore& store, const std::filesystem::path& out);

// Creates the lab file `labPath` (which must not exist) from the export at `exportPath`; on any error nothing is
// left behind.
[[nodiscard]] Result<LabStore> importLab(const std::filesystem::path& exportPath, const std::filesystem::path& labPath);

} // namespace beamwarden::store
