// LabStore's life cycle: creating, opening (with the checks that come before any write), copying and checking a
// lab file. The record operations are in labstorerecords.cpp.
#include "beamwarden/store/labstore.hpp"

#include "beamwarden/store/migration.hpp"
#include "store/assessmentrows.hpp"
#include "store/databasecopy.hpp"
#include "store/eyewearrows.hpp"
#include "store/fileguard.hpp"
#include "store/labrows.hpp"
#include "store/laserrows.hpp"
#include "store/recordcheck.hpp"
#include "store/schema.hpp"
#include "store/sqlite.hpp"

#include <fmt/core.h>

#include <cstdio>
#include <utility>

namespace beamwarden::store {

namespace {

// Per connection: foreign keys are off by default in SQLite. FULL sync makes a committed record survive a power
// cut as well as a crash; a lab file is written seldom, so the cost does not matter.
Result<void> configure(sqlite3* db)
{
    if (auto done = execute(db, "PRAGMA foreign_keys = ON; PRAGMA synchronous = FULL"); !done)
        return done;
    auto mode = Statement::prepare(db, "PRAGMA journal_mode = WAL");
    if (!mode)
        return std::unexpected(mode.error());
    auto row = mode->step();
    if (!row)
        return std::unexpected(row.error());
    if (!*row || mode->text(0) != "wal")
        return fail(std::string(kStorageField), "journal mode " + (*row ? mode->text(0) : std::string{}),
                    "a file system where SQLite's WAL journal works");
    return {};
}

// O_EXCL-style creation, so two programs creating the same lab file cannot both believe they made it.
Result<void> createEmptyFile(const std::filesystem::path& path)
{
    std::error_code error;
    if (std::filesystem::exists(path, error))
        return fail("lab file", path.string(), "a path where no file exists yet");
    std::FILE* file = std::fopen(path.c_str(), "wx");
    if (file == nullptr)
        return fail(std::string(kStorageField), path.string() + ": the file could not be created", "");
    std::fclose(file);
    return {};
}

Result<void> writeContents(sqlite3* db, const LabContents& contents)
{
    if (auto done = configure(db); !done)
        return done;
    auto transaction = Transaction::begin(db);
    if (!transaction)
        return std::unexpected(transaction.error());
    if (auto done = execute(db, fmt::format("PRAGMA application_id = {}", kApplicationId)); !done)
        return done;
    if (auto done = createSchema(db); !done)
        return done;
    if (auto done = insertLab(db, contents.lab); !done)
        return done;
    for (std::size_t i = 0; i < contents.lasers.size(); ++i) {
        if (auto done = writeLaser(db, contents.lasers[i], LaserWrite::Insert, indexPath("", "lasers", i)); !done)
            return std::unexpected(done.error());
    }
    for (std::size_t i = 0; i < contents.eyewear.size(); ++i) {
        if (auto done = writeEyewear(db, contents.eyewear[i], true, indexPath("", "eyewear", i)); !done)
            return std::unexpected(done.error());
    }
    auto assessments = AssessmentInserter::prepare(db);
    if (!assessments)
        return std::unexpected(assessments.error());
    for (std::size_t i = 0; i < contents.assessments.size(); ++i) {
        if (auto done = assessments->insertWithHistory(contents.assessments[i], indexPath("", "assessments", i)); !done)
            return std::unexpected(done.error());
    }
    // The version goes in last: a file without it is refused as incomplete, should anything above be cut short.
    if (auto done = execute(db, fmt::format("PRAGMA user_version = {}", kSchemaVersion)); !done)
        return done;
    return transaction->commit();
}

} // namespace

LabStore::LabStore(sqlite3* db, std::filesystem::path path, bool historyChecked)
    : m_db(db), m_path(std::move(path)), m_historyChecked(historyChecked)
{
}

LabStore::LabStore(LabStore&& other) noexcept
    : m_db(std::exchange(other.m_db, nullptr)), m_path(std::move(other.m_path)),
      m_historyChecked(other.m_historyChecked)
{
}

LabStore& LabStore::operator=(LabStore&& other) noexcept
{
    if (this != &other) {
        closeHandle(m_db);
        m_db = std::exchange(other.m_db, nullptr);
        m_path = std::move(other.m_path);
        m_historyChecked = other.m_historyChecked;
    }
    return *this;
}

LabStore::~LabStore()
{
    closeHandle(m_db);
}

Result<LabStore> LabStore::create(const std::filesystem::path& path, const model::Lab& lab)
{
    return create(path, LabContents{lab, {}, {}, {}});
}

Result<LabStore> LabStore::create(const std::filesystem::path& path, const LabContents& contents)
{
    if (auto made = createEmptyFile(path); !made)
        return std::unexpected(made.error());
    auto connection = Connection::open(path, OpenMode::ReadWrite);
    if (!connection) {
        removeLabFile(path);
        return std::unexpected(connection.error());
    }
    if (auto written = writeContents(connection->handle(), contents); !written) {
        connection->close();
        removeLabFile(path); // ours from the start, so nothing of anyone else's is lost
        return std::unexpected(written.error());
    }
    return LabStore(connection->release(), path, true); // written here: nothing in it to distrust
}

Result<LabStore> LabStore::open(const std::filesystem::path& path)
{
    auto version = admitLabFile(path);
    if (!version)
        return std::unexpected(version.error());
    if (*version < kSchemaVersion) {
        if (auto migrated = detail::migrate(path, migrationSteps(), kSchemaVersion); !migrated)
            return std::unexpected(migrated.error());
    }
    auto connection = Connection::open(path, OpenMode::ReadWrite);
    if (!connection)
        return std::unexpected(connection.error());
    if (auto done = configure(connection->handle()); !done)
        return std::unexpected(done.error());
    // A migrated file was checked whole before the migration.
    return LabStore(connection->release(), path, *version < kSchemaVersion);
}

Result<void> LabStore::requireSoundHistory()
{
    if (m_historyChecked)
        return {};
    if (auto sound = checkHistoryIntegrity(m_db, m_path); !sound)
        return sound;
    m_historyChecked = true;
    return {};
}

Result<void> LabStore::backup(const std::filesystem::path& outPath)
{
    return copyDatabase(m_db, outPath);
}

Result<CheckReport> LabStore::check()
{
    CheckReport report;
    runChecks(m_db, report);
    return report;
}

} // namespace beamwarden::store
