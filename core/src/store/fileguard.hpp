#pragma once
// The checks a lab file passes before the store writes to it, all done without writing: SQLite header, application
// id, schema version, integrity (of the history before the first write that touches it), and (for a full check)
// foreign keys, schema objects and status rules.
#include "beamwarden/error.hpp"
#include "beamwarden/store/labstore.hpp"

#include <filesystem>

struct sqlite3;

namespace beamwarden::store {

// Refuses a path that is missing, not a regular file, or does not start with SQLite's 16-byte header.
[[nodiscard]] Result<void> requireSqliteFile(const std::filesystem::path& path);

// Opens `path` read-only and refuses it unless it is an undamaged lab file of kSchemaVersion or older. Returns
// the file's schema version. The history (assessments and sign-offs) is left to checkHistoryIntegrity unless the
// file is about to be migrated.
[[nodiscard]] Result<int> admitLabFile(const std::filesystem::path& path);

// The integrity of the history tables, which admitLabFile leaves out; refuses (naming `path`) a damaged history.
[[nodiscard]] Result<void> checkHistoryIntegrity(sqlite3* db, const std::filesystem::path& path);

// Every check on an open connection, appended to `report`.
void runChecks(sqlite3* db, CheckReport& report);

} // namespace beamwarden::store
