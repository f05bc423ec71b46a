#include "beamwarden/store/migration.hpp"

#include "beamwarden/store/labstore.hpp"
#include "store/databasecopy.hpp"
#include "store/sqlite.hpp"

#include <fmt/core.h>

#include <algorithm>
#include <array>

namespace beamwarden::store {

namespace {

// One entry per schema version below kSchemaVersion, oldest first. Version 1 is the first released schema, so the
// list is empty; a version 2 adds {1, "ALTER TABLE ..."} here and a version-1 fixture to tests/data/store.
constexpr std::array<MigrationStep, 0> kSteps{};

InputError refusal(const std::filesystem::path& path, std::string allowed)
{
    return InputError{"lab file", path.string(), std::move(allowed)};
}

} // namespace

std::span<const MigrationStep> migrationSteps()
{
    return kSteps;
}

std::filesystem::path migrationBackupPath(const std::filesystem::path& labFile, int version)
{
    const std::string base = fmt::format("{}.v{}.backup", labFile.string(), version);
    for (int i = 0;; ++i) {
        std::filesystem::path candidate(i == 0 ? base : fmt::format("{}.{}", base, i));
        std::error_code error;
        if (!std::filesystem::exists(candidate, error) && !error)
            return candidate;
    }
}

namespace detail {

Result<std::filesystem::path> migrate(const std::filesystem::path& path, std::span<const MigrationStep> steps,
                                      int targetVersion)
{
    auto connection = Connection::open(path, OpenMode::ReadWrite);
    if (!connection)
        return std::unexpected(connection.error());
    sqlite3* db = connection->handle();
    auto version = queryInteger(db, "PRAGMA user_version");
    if (!version)
        return std::unexpected(version.error());
    if (*version >= targetVersion)
        return std::filesystem::path{};
    for (auto from = *version; from < targetVersion; ++from) {
        const bool known = std::any_of(steps.begin(), steps.end(),
                                       [&](const MigrationStep& step) { return step.fromVersion == from; });
        if (!known)
            return std::unexpected(refusal(path, fmt::format("a lab file this program can migrate (no step from "
                                                             "schema version {})",
                                                             from)));
    }

    // The copy comes first, from the same connection, so it is exactly what the migration starts from.
    const auto backup = migrationBackupPath(path, static_cast<int>(*version));
    if (auto copied = copyDatabase(db, backup); !copied)
        return std::unexpected(copied.error());

    // Foreign keys stay off (a new connection's default) so a step may rebuild a table; they are checked as a whole
    // before the commit instead, as SQLite's ALTER TABLE notes advise.
    auto transaction = Transaction::begin(db);
    if (!transaction)
        return std::unexpected(transaction.error());
    auto current = queryInteger(db, "PRAGMA user_version"); // another program may have migrated meanwhile
    if (!current)
        return std::unexpected(current.error());
    for (auto from = *current; from < targetVersion; ++from) {
        const auto step =
            std::find_if(steps.begin(), steps.end(), [&](const MigrationStep& s) { return s.fromVersion == from; });
        if (auto done = execute(db, step->sql, fmt::format("migration from schema version {}", from)); !done)
            return std::unexpected(done.error());
        if (auto done = execute(db, fmt::format("PRAGMA user_version = {}", from + 1)); !done)
            return std::unexpected(done.error());
    }
    auto broken = queryInteger(db, "SELECT count(*) FROM pragma_foreign_key_check");
    if (!broken)
        return std::unexpected(broken.error());
    if (*broken > 0)
        return std::unexpected(refusal(path, "a migration that keeps every reference intact (it broke some)"));
    if (auto committed = transaction->commit(); !committed)
        return std::unexpected(committed.error());
    return backup;
}

} // namespace detail

} // namespace beamwarden::store
