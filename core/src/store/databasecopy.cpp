#include "store/databasecopy.hpp"

#include "beamwarden/store/labstore.hpp"
#include "store/sqlite.hpp"

#include <sqlite3.h>

namespace beamwarden::store {

namespace {

std::filesystem::path withSuffix(const std::filesystem::path& path, const std::string& suffix)
{
    return std::filesystem::path(path.string() + suffix);
}

// A name next to `out` that nothing uses, so an unrelated file is never overwritten or removed.
std::filesystem::path temporaryName(const std::filesystem::path& out)
{
    for (int i = 0;; ++i) {
        auto candidate = withSuffix(out, ".partial" + (i == 0 ? std::string{} : "." + std::to_string(i)));
        std::error_code error;
        if (!std::filesystem::exists(candidate, error) && !error)
            return candidate;
    }
}

} // namespace

Result<void> copyDatabase(sqlite3* source, const std::filesystem::path& out)
{
    std::error_code error;
    if (std::filesystem::exists(out, error))
        return fail("backup", out.string(), "a path where no file exists yet");
    const auto partial = temporaryName(out);
    auto result = [&]() -> Result<void> {
        auto destination = Connection::open(partial, OpenMode::Create);
        if (!destination)
            return std::unexpected(destination.error());
        sqlite3_backup* backup = sqlite3_backup_init(destination->handle(), "main", source, "main");
        if (backup == nullptr)
            return std::unexpected(
                sqliteError(destination->handle(), sqlite3_errcode(destination->handle()), "backup"));
        // One step copies every page under a single read lock: the copy is one consistent snapshot.
        const int stepped = sqlite3_backup_step(backup, -1);
        const int finished = sqlite3_backup_finish(backup);
        if (stepped != SQLITE_DONE)
            return std::unexpected(InputError{std::string(kStorageField), sqlite3_errstr(stepped), ""});
        if (finished != SQLITE_OK)
            return std::unexpected(sqliteError(destination->handle(), finished, "backup"));
        // The copy keeps the WAL flag of its source; a rollback journal makes it one self-contained file that can
        // be read without SQLite creating -wal and -shm files beside it. LabStore::open turns WAL on again.
        if (auto single = execute(destination->handle(), "PRAGMA journal_mode = DELETE", "backup"); !single)
            return single;
        destination->close();
        std::error_code renameError;
        std::filesystem::rename(partial, out, renameError);
        if (renameError)
            return std::unexpected(
                InputError{std::string(kStorageField), out.string() + ": " + renameError.message(), ""});
        return {};
    }();
    if (!result)
        removeLabFile(partial);
    return result;
}

void removeLabFile(const std::filesystem::path& path)
{
    std::error_code ignored;
    for (const char* suffix : {"", "-wal", "-shm", "-journal"})
        std::filesystem::remove(withSuffix(path, suffix), ignored);
}

} // namespace beamwarden::store
