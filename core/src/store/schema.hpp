#pragma once
// The lab file's tables, constraints and triggers at kSchemaVersion.
#include "beamwarden/error.hpp"

#include <string_view>
#include <vector>

struct sqlite3;

namespace beamwarden::store {

// Creates every table and trigger of the current schema and fills the status_move table from
// model::isAllowedTransition. Runs inside the caller's transaction.
[[nodiscard]] Result<void> createSchema(sqlite3* db);

// The names of the tables and triggers a sound file at kSchemaVersion holds, for the check.
[[nodiscard]] const std::vector<std::string_view>& expectedSchemaObjects();

} // namespace beamwarden::store
