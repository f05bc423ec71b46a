#pragma once
// Lasers with their outputs, spectra and exposure cases, to and from the lab file's rows. The callers hold the
// transaction.
#include "beamwarden/error.hpp"
#include "beamwarden/model/records.hpp"

#include <optional>
#include <vector>

struct sqlite3;

namespace beamwarden::store {

// Every laser (or the one with `only`), in id order.
[[nodiscard]] Result<std::vector<model::Laser>> readLasers(sqlite3* db, std::optional<model::RecordId> only = {});

enum class LaserWrite : std::uint8_t {
    Save,  // id 0 inserts, another id updates that laser
    Insert // a fresh file: non-zero ids are used as given
};

// Validates and writes one laser; `path` prefixes field names in errors (e.g. "lasers[2]").
[[nodiscard]] Result<model::RecordId> writeLaser(sqlite3* db, const model::Laser& laser, LaserWrite mode,
                                                 std::string_view path);

// Refused while the laser has approved or withdrawn assessments.
[[nodiscard]] Result<void> deleteLaser(sqlite3* db, model::RecordId id);

} // namespace beamwarden::store
