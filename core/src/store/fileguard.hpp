#pragma once
// The checks a lab file passes before the store writes to it, all done without writing: SQLite header, application
// id, schema version, integrity, and (for a full check) foreign keys, schema objects and status rules.
#include "beamwarden/error.hpp"
#include "beamwarden/store/labstore.hpp"

#include <filesystem>

struct sqlite3;

namespace beamwarden::store {

// Refuses a path that is missing, not a regular file, or does not start with SQLite's 16-byte header.
[[nodiscard]] Result<void> requireSqliteFile(const std::filesystem::path& path);

// Opens `path` read-only and refuses it unless it is an undamaged lab file of kSchemaVersion or older. Returns
// the file's schema version.
[[nodiscard]] Result<int> admitLabFile(const std::filesystem::path& path);

// Every check on an open connection, appended to `report`.
void runChecks(sqlite3* db, CheckReport& report);

} // namespace beamwarden::store
