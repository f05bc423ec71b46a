#pragma once
// Forward-only schema migrations. Step N takes a lab file from schema version N to N + 1; LabStore::open runs the
// steps a file needs after copying it aside, all in one transaction, so a failed migration leaves the file as it was.
#include "beamwarden/error.hpp"

#include <filesystem>
#include <span>
#include <string_view>

namespace beamwarden::store {

struct MigrationStep {
    int fromVersion = 0;  // the step moves a file from this version to fromVersion + 1
    std::string_view sql; // statements run inside the migration's transaction
};

// The program's steps, one per version below kSchemaVersion (none while the schema is at version 1).
[[nodiscard]] std::span<const MigrationStep> migrationSteps();

// Where open() copies a file at `version` before migrating it: "<file>.v<version>.backup", or with a numbered
// suffix when that exists already.
[[nodiscard]] std::filesystem::path migrationBackupPath(const std::filesystem::path& labFile, int version);

namespace detail {
// Brings the lab file at `path` from its user_version to `targetVersion` with `steps`, after copying it to
// migrationBackupPath(). LabStore::open passes migrationSteps() and kSchemaVersion; tests pass their own steps to
// exercise the mechanism before a real version 2 exists. Returns the backup's path (empty when nothing was to do).
[[nodiscard]] Result<std::filesystem::path> migrate(const std::filesystem::path& path,
                                                    std::span<const MigrationStep> steps, int targetVersion);
} // namespace detail

} // namespace beamwarden::store
