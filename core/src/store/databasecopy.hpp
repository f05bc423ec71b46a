#pragma once
// A consistent copy of an open database through SQLite's online backup API, for `backup` and for the copy made
// before a migration.
#include "beamwarden/error.hpp"

#include <filesystem>

struct sqlite3;

namespace beamwarden::store {

// Copies `source` to `out`, which must not exist. The copy is written under a temporary name and renamed into
// place, so `out` never holds half a file.
[[nodiscard]] Result<void> copyDatabase(sqlite3* source, const std::filesystem::path& out);

// Removes a lab file this program created and its WAL companions.
void removeLabFile(const std::filesystem::path& path);

} // namespace beamwarden::store
