#pragma once
// Eyewear inventories from CSV (columns in docs/lab-export.md): one item per row, all rows checked before any is
// written, the row and column named on error.
#include "beamwarden/error.hpp"
#include "beamwarden/model/records.hpp"
#include "beamwarden/store/labstore.hpp"

#include <filesystem>
#include <string_view>
#include <vector>

namespace beamwarden::store {

// The items of a CSV inventory. A header row names the columns (any order, "name" required); errors read
// "row 3, column od_table (line 4)".
[[nodiscard]] Result<std::vector<model::EyewearItem>> parseEyewearCsv(std::string_view text);

// Adds every item of the CSV file at `path` to the store in one transaction, or none of them. Names already on the
// lab's shelf are refused. Returns the new items' ids.
[[nodiscard]] Result<std::vector<model::RecordId>> importEyewearCsv(LabStore& store, const std::filesystem::path& path);

} // namespace beamwarden::store
