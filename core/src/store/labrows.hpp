#pragma once
// The lab row and its rooms. The callers hold the transaction.
#include "beamwarden/error.hpp"
#include "beamwarden/model/records.hpp"

struct sqlite3;

namespace beamwarden::store {

[[nodiscard]] Result<model::Lab> readLab(sqlite3* db);
// The one lab row of a fresh file, with its rooms.
[[nodiscard]] Result<void> insertLab(sqlite3* db, const model::Lab& lab);
// Name, LSO and notes; rooms matched by name keep their id, new ones are added, missing ones removed unless a
// laser is in them.
[[nodiscard]] Result<void> updateLab(sqlite3* db, const model::Lab& lab);

} // namespace beamwarden::store
