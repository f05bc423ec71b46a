// Files the store must not trust are refused without a byte of them changing: not SQLite, another program's
// database, a newer schema, an incomplete or damaged file. Backups open like the original; the migration mechanism
// copies a file aside and then moves it forward in one transaction.
#include "beamwarden/store/labstore.hpp"
#include "beamwarden/store/migration.hpp"
#include "storetestsupport.hpp"

#include <catch2/catch.hpp>
#include <sqlite3.h>

#include <array>

using namespace beamwarden;
using namespace beamwarden::model;
using namespace beamwarden::store;
using storetest::TempDir;

namespace {

std::filesystem::path makeLab(const TempDir& dir, const std::string& name = "lab.bwlab", int lasers = 1)
{
    const auto path = dir / name;
    auto store = LabStore::create(path, storetest::sampleLab()).value();
    for (int i = 0; i < lasers; ++i)
        REQUIRE(store.saveLaser(storetest::pulsedLaser("Laser " + std::to_string(i))).has_value());
    REQUIRE(store.saveEyewear(storetest::sampleEyewear()).has_value());
    return path; // the store closes here; the WAL is folded back into the file
}

// Opening must fail with a message about the file, and leave every byte as it was.
std::string requireRefusedUnchanged(const std::filesystem::path& path)
{
    const std::string before = storetest::fileBytes(path);
    auto store = LabStore::open(path);
    REQUIRE_FALSE(store.has_value());
    CHECK(store.error().field == "lab file");
    CHECK(storetest::fileBytes(path) == before);
    return store.error().message();
}

std::string readText(const std::filesystem::path& path)
{
    return storetest::fileBytes(path);
}

} // namespace

TEST_CASE("Creating a lab file refuses a path that exists", "[store][files]")
{
    TempDir dir;
    const auto path = dir / "taken.bwlab";
    storetest::writeBytes(path, "someone's notes");
    auto store = LabStore::create(path, storetest::sampleLab());
    REQUIRE_FALSE(store.has_value());
    CHECK(store.error().field == "lab file");
    CHECK(storetest::fileBytes(path) == "someone's notes");
}

TEST_CASE("A lab file from a newer Beamwarden is refused with a clear message and left unchanged", "[store][files]")
{
    TempDir dir;
    const auto path = makeLab(dir);
    REQUIRE(storetest::rawSql(path, "PRAGMA user_version = " + std::to_string(kSchemaVersion + 1)).empty());
    const std::string message = requireRefusedUnchanged(path);
    CHECK_THAT(message, Catch::Contains("newer Beamwarden"));
    CHECK_THAT(message, Catch::Contains("schema version " + std::to_string(kSchemaVersion + 1)));
    auto report = checkLabFile(path);
    REQUIRE(report.has_value());
    CHECK_FALSE(report->sound());
    CHECK(report->schemaVersion == kSchemaVersion + 1);
}

TEST_CASE("A file that is not SQLite is refused and left unchanged", "[store][files]")
{
    TempDir dir;
    for (const std::string& bytes :
         {std::string("just some text\n"), std::string(), std::string(4096, '\0'), std::string("SQLite format 2")}) {
        const auto path = dir / "notes.bwlab";
        storetest::writeBytes(path, bytes);
        CHECK_THAT(requireRefusedUnchanged(path), Catch::Contains("not an SQLite database"));
        CHECK_FALSE(checkLabFile(path).has_value());
    }
    CHECK_FALSE(LabStore::open(dir / "missing.bwlab").has_value());
    CHECK_FALSE(std::filesystem::exists(dir / "missing.bwlab"));
    CHECK_FALSE(LabStore::open(dir.path()).has_value()); // a folder
}

TEST_CASE("Another program's SQLite database is refused and left unchanged", "[store][files]")
{
    TempDir dir;
    const auto path = dir / "other.sqlite";
    REQUIRE(storetest::rawSql(path, "") == "could not open"); // rawSql does not create files
    sqlite3* db = nullptr;
    REQUIRE(sqlite3_open(path.c_str(), &db) == SQLITE_OK);
    REQUIRE(sqlite3_exec(db, "CREATE TABLE notes (text TEXT); INSERT INTO notes VALUES ('mine')", nullptr, nullptr,
                         nullptr) == SQLITE_OK);
    sqlite3_close(db);
    CHECK_THAT(requireRefusedUnchanged(path), Catch::Contains("another program"));

    // A database that carries our application id but no schema version is an incomplete lab file.
    REQUIRE(storetest::rawSql(path, "PRAGMA application_id = " + std::to_string(kApplicationId)).empty());
    CHECK_THAT(requireRefusedUnchanged(path), Catch::Contains("no schema version"));
}

TEST_CASE("A damaged lab file is refused and left unchanged", "[store][files]")
{
    TempDir dir;
    const auto path = makeLab(dir, "lab.bwlab", 60); // enough rows for a few dozen pages
    std::string bytes = storetest::fileBytes(path);
    constexpr std::size_t kPage = 4096; // SQLite's default page size (sqlite.org fileformat2, section 1.3.2)
    const std::size_t pages = bytes.size() / kPage;
    REQUIRE(pages > 8);

    SECTION("scribbled pages")
    {
        for (std::size_t page = pages / 2; page < pages / 2 + 3; ++page)
            std::fill_n(bytes.begin() + static_cast<std::ptrdiff_t>(page * kPage), 64, '\xA5');
        storetest::writeBytes(path, bytes);
    }
    SECTION("a truncated file")
    {
        storetest::writeBytes(path, bytes.substr(0, (pages / 2) * kPage));
    }
    CHECK_THAT(requireRefusedUnchanged(path), Catch::Contains("damaged") || Catch::Contains("malformed"));
    auto report = checkLabFile(path);
    REQUIRE(report.has_value());
    CHECK_FALSE(report->sound());
}

TEST_CASE("A sound lab file passes every check", "[store][files]")
{
    TempDir dir;
    const auto path = makeLab(dir);
    auto report = checkLabFile(path);
    REQUIRE(report.has_value());
    CHECK(report->problems.empty());
    CHECK(report->schemaVersion == kSchemaVersion);
    auto store = LabStore::open(path);
    REQUIRE(store.has_value());
    CHECK(store->check().value().sound());
}

TEST_CASE("The check finds broken references, missing triggers and tampered status rules", "[store][files]")
{
    TempDir dir;
    const auto path = makeLab(dir);
    SECTION("a dangling reference written with foreign keys off")
    {
        sqlite3* db = nullptr;
        REQUIRE(sqlite3_open(path.c_str(), &db) == SQLITE_OK);
        REQUIRE(sqlite3_exec(db, "UPDATE output SET laser_id = 999 WHERE id = 1", nullptr, nullptr, nullptr) ==
                SQLITE_OK);
        sqlite3_close(db);
    }
    SECTION("a trigger dropped")
    {
        REQUIRE(storetest::rawSql(path, "DROP TRIGGER assessment_approved_is_read_only").empty());
    }
    SECTION("a status move added")
    {
        REQUIRE(storetest::rawSql(path, "INSERT INTO status_move VALUES ('approved', 'draft')").empty());
    }
    auto report = checkLabFile(path);
    REQUIRE(report.has_value());
    CHECK(report->problems.size() == 1);
}

TEST_CASE("A backup is a consistent lab file that opens on its own", "[store][files]")
{
    TempDir dir;
    const auto path = dir / "lab.bwlab";
    auto store = LabStore::create(path, storetest::sampleLab()).value();
    const RecordId laserId = store.saveLaser(storetest::pulsedLaser()).value();
    REQUIRE(store.saveAssessment(storetest::draftAssessment(laserId)).has_value());

    const auto copy = dir / "copy.bwlab";
    REQUIRE(store.backup(copy).has_value()); // while the original is open
    auto backup = LabStore::open(copy);
    REQUIRE(backup.has_value());
    storetest::checkSameLaser(backup->laser(laserId).value(), store.laser(laserId).value(), true);
    CHECK(backup->assessments(laserId).value().size() == 1);
    CHECK(backup->check().value().sound());

    storetest::writeBytes(dir / "occupied.bwlab", "keep me");
    auto refused = store.backup(dir / "occupied.bwlab");
    REQUIRE_FALSE(refused.has_value());
    CHECK(storetest::fileBytes(dir / "occupied.bwlab") == "keep me");
}

TEST_CASE("The version-1 fixture opens and has the schema this program writes", "[store][files]")
{
    // tests/data/store/lab-v1.sql is a lab file at schema version 1. While kSchemaVersion is 1 a fresh file must
    // have exactly its schema: a schema change without a new version and a migration fails here.
    const auto fixture = std::filesystem::path(BEAMWARDEN_TEST_DATA_DIR) / "store" / "lab-v1.sql";
    REQUIRE(std::filesystem::exists(fixture));
    TempDir dir;
    const auto path = dir / "v1.bwlab";
    sqlite3* db = nullptr;
    REQUIRE(sqlite3_open(path.c_str(), &db) == SQLITE_OK);
    char* error = nullptr;
    const int code = sqlite3_exec(db, readText(fixture).c_str(), nullptr, nullptr, &error);
    INFO((error != nullptr ? error : ""));
    sqlite3_free(error);
    sqlite3_close(db);
    REQUIRE(code == SQLITE_OK);

    auto store = LabStore::open(path);
    REQUIRE(store.has_value());
    CHECK(store->lab().value().name == "Fixture lab (schema version 1)");
    const auto lasers = store->lasers().value();
    REQUIRE(lasers.size() == 1);
    const auto assessments = store->assessments(lasers.front().id).value();
    REQUIRE(assessments.size() == 1);
    CHECK(assessments.front().status == AssessmentStatus::Approved);
    CHECK(assessments.front().signOffs.size() == 2);
    CHECK(store->check().value().sound());

    if constexpr (kSchemaVersion == 1) {
        const auto fresh = dir / "fresh.bwlab";
        REQUIRE(LabStore::create(fresh, storetest::sampleLab()).has_value());
        const std::string schema = "SELECT group_concat(type || ' ' || name || ': ' || sql, char(10)) FROM "
                                   "(SELECT * FROM sqlite_schema WHERE sql IS NOT NULL ORDER BY type, name)";
        CHECK(storetest::rawQuery(fresh, schema) == storetest::rawQuery(path, schema));
    }
}

TEST_CASE("A migration copies the file aside, then moves it forward in one transaction", "[store][files][migration]")
{
    // There is no version 2 yet; these steps stand in for one so the mechanism itself is tested.
    TempDir dir;
    const auto path = makeLab(dir);
    const std::string original = storetest::fileBytes(path);
    const int next = kSchemaVersion + 1;

    SECTION("a step that works")
    {
        const std::array steps{MigrationStep{kSchemaVersion, "ALTER TABLE lab ADD COLUMN motto TEXT NOT NULL "
                                                             "DEFAULT ''; UPDATE lab SET motto = 'eyes first';"}};
        auto backup = detail::migrate(path, steps, next);
        REQUIRE(backup.has_value());
        CHECK(backup->filename() == "lab.bwlab.v" + std::to_string(kSchemaVersion) + ".backup");
        CHECK(storetest::rawQuery(path, "PRAGMA user_version") == std::to_string(next));
        CHECK(storetest::rawQuery(path, "SELECT motto FROM lab") == "eyes first");
        CHECK(storetest::rawQuery(path, "SELECT count(*) FROM laser") == "1");
        // The copy is the file as it was, and still opens with this program.
        CHECK(storetest::rawQuery(*backup, "PRAGMA user_version") == std::to_string(kSchemaVersion));
        CHECK(LabStore::open(*backup).has_value());
        // Migrating again is nothing to do; a second copy never overwrites the first.
        CHECK(detail::migrate(path, steps, next).value().empty());
        CHECK(migrationBackupPath(path, kSchemaVersion).filename() ==
              "lab.bwlab.v" + std::to_string(kSchemaVersion) + ".backup.1");
    }
    SECTION("a step that fails leaves the file as it was")
    {
        const std::array steps{MigrationStep{kSchemaVersion, "ALTER TABLE lab ADD COLUMN motto TEXT NOT NULL "
                                                             "DEFAULT ''; ALTER TABLE no_such_table ADD COLUMN x;"}};
        auto failed = detail::migrate(path, steps, next);
        REQUIRE_FALSE(failed.has_value());
        CHECK(storetest::fileBytes(path) == original);
        CHECK(storetest::rawQuery(path, "PRAGMA user_version") == std::to_string(kSchemaVersion));
    }
    SECTION("a version without a step is refused before anything is written")
    {
        auto refused = detail::migrate(path, {}, next);
        REQUIRE_FALSE(refused.has_value());
        CHECK_THAT(refused.error().message(), Catch::Contains("no step from schema version"));
        CHECK(storetest::fileBytes(path) == original);
        CHECK_FALSE(std::filesystem::exists(dir / ("lab.bwlab.v" + std::to_string(kSchemaVersion) + ".backup")));
    }
    SECTION("the program's own steps cover every version below kSchemaVersion")
    {
        for (int version = 1; version < kSchemaVersion; ++version) {
            const auto steps = migrationSteps();
            CHECK(std::any_of(steps.begin(), steps.end(),
                              [&](const MigrationStep& s) { return s.fromVersion == version; }));
        }
        CHECK(migrationSteps().size() == static_cast<std::size_t>(kSchemaVersion - 1));
    }
}
