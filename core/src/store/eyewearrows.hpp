#pragma once
// Eyewear items with their spectral OD rows and markings, to and from the lab file's rows. The callers hold the
// transaction.
#include "beamwarden/error.hpp"
#include "beamwarden/model/records.hpp"

#include <optional>
#include <string_view>
#include <vector>

struct sqlite3;

namespace beamwarden::store {

// Every item (or the one with `only`), in id order.
[[nodiscard]] Result<std::vector<model::EyewearItem>> readEyewear(sqlite3* db,
                                                                  std::optional<model::RecordId> only = {});

// Validates and writes one item: id 0 inserts; another id updates that item, or with `keepId` (a fresh file)
// inserts it under that id. `path` prefixes field names in errors.
[[nodiscard]] Result<model::RecordId> writeEyewear(sqlite3* db, const model::EyewearItem& item, bool keepId,
                                                   std::string_view path);

[[nodiscard]] Result<void> deleteEyewear(sqlite3* db, model::RecordId id);

} // namespace beamwarden::store
