// Fault injection (issue 10): the disk filling up, a read-only file, the file removed while open, two processes writing
// one file, and a kill at every write step of an import. Each must leave a lab file that opens, passes integrity_check
// and holds the whole change or none of it, and whoever could not write is told so. crashsafety_test.cpp kills one
// large save at chosen delays; here the kills land at every SQL statement and at every write() the store makes.
// The faults come through SQLite's own public hooks (auto extensions, trace, the unix VFS's system-call table), so
// the store runs unchanged.
#include "beamwarden/store/eyewearcsv.hpp"
#include "beamwarden/store/labexport.hpp"
#include "beamwarden/store/labstore.hpp"
#include "storetestsupport.hpp"

#include <catch2/catch.hpp>
#include <sqlite3.h>

#include <chrono>
#include <csignal>
#include <cstdio>
#include <functional>
#include <string>
#include <sys/resource.h>
#include <sys/stat.h>
#include <sys/wait.h>
#include <type_traits>
#include <unistd.h>
#include <vector>

using namespace beamwarden;
using namespace beamwarden::model;
using namespace beamwarden::store;
using Catch::Matchers::Contains;
using storetest::TempDir;

namespace {

namespace fs = std::filesystem;

// ---- running a piece of work in a child process

struct ChildOutcome {
    bool killed = false; // ended by a signal (SIGKILL from a fault below)
    std::string report;  // what the child wrote back before it ended
};

void writeAll(int fd, std::string_view text)
{
    while (!text.empty()) {
        const ssize_t n = write(fd, text.data(), text.size());
        if (n <= 0)
            return;
        text.remove_prefix(static_cast<std::size_t>(n));
    }
}

std::string readAll(int fd)
{
    std::string text;
    char buffer[512];
    ssize_t n = 0;
    while ((n = read(fd, buffer, sizeof buffer)) > 0)
        text.append(buffer, static_cast<std::size_t>(n));
    return text;
}

// Runs `work` in a forked child and returns what it reported. The child never returns into Catch.
ChildOutcome inChild(const std::function<std::string()>& work)
{
    int channel[2];
    REQUIRE(pipe(channel) == 0);
    const pid_t child = fork();
    REQUIRE(child >= 0);
    if (child == 0) {
        close(channel[0]);
        std::string report;
        try {
            report = work();
        } catch (...) {
            report = "the child threw";
        }
        writeAll(channel[1], report);
        close(channel[1]);
        _exit(0);
    }
    close(channel[1]);
    ChildOutcome outcome;
    outcome.report = readAll(channel[0]);
    close(channel[0]);
    int status = 0;
    REQUIRE(waitpid(child, &status, 0) == child);
    outcome.killed = WIFSIGNALED(status);
    return outcome;
}

// ---- faults through SQLite's public hooks, armed in a child process only

// PRAGMA max_page_count is per connection, and the store opens its own; an auto extension runs on every connection
// opened after it is registered, so the store's connections get the limit too.
int g_maxPageCount = 0;

int limitPages(sqlite3* db, char**, const sqlite3_api_routines*)
{
    const std::string pragma = "PRAGMA max_page_count = " + std::to_string(g_maxPageCount);
    sqlite3_exec(db, pragma.c_str(), nullptr, nullptr, nullptr);
    return SQLITE_OK;
}

class PageLimit {
public:
    explicit PageLimit(int pages)
    {
        g_maxPageCount = pages;
        sqlite3_auto_extension(reinterpret_cast<void (*)()>(&limitPages));
    }
    PageLimit(const PageLimit&) = delete;
    PageLimit& operator=(const PageLimit&) = delete;
    ~PageLimit() { sqlite3_cancel_auto_extension(reinterpret_cast<void (*)()>(&limitPages)); }
};

// A kill at step N: the N-th SQL statement started on any connection, or the N-th write() to any file.
long g_statements = 0;
long g_writes = 0;
long g_killAtStatement = 0;
long g_killAtWrite = 0;
bool g_tornWrite = false; // at the killing write, write half of the bytes first (a torn page)

int countStatement(unsigned, void*, void*, void*)
{
    if (++g_statements == g_killAtStatement)
        raise(SIGKILL);
    return 0;
}

int traceStatements(sqlite3* db, char**, const sqlite3_api_routines*)
{
    sqlite3_trace_v2(db, SQLITE_TRACE_STMT, &countStatement, nullptr);
    return SQLITE_OK;
}

using WriteCall = ssize_t (*)(int, const void*, size_t);
using PwriteCall = ssize_t (*)(int, const void*, size_t, off_t);
using Pwrite64Call = ssize_t (*)(int, const void*, size_t, off64_t);
WriteCall g_write = nullptr;
PwriteCall g_pwrite = nullptr;
Pwrite64Call g_pwrite64 = nullptr;

void beforeWrite(const std::function<void(std::size_t)>& writeBytes, std::size_t size)
{
    if (++g_writes != g_killAtWrite)
        return;
    if (g_tornWrite)
        writeBytes(size / 2);
    raise(SIGKILL);
}

ssize_t countedWrite(int fd, const void* data, size_t size)
{
    beforeWrite([&](std::size_t n) { (void)g_write(fd, data, n); }, size);
    return g_write(fd, data, size);
}

ssize_t countedPwrite(int fd, const void* data, size_t size, off_t offset)
{
    beforeWrite([&](std::size_t n) { (void)g_pwrite(fd, data, n, offset); }, size);
    return g_pwrite(fd, data, size, offset);
}

ssize_t countedPwrite64(int fd, const void* data, size_t size, off64_t offset)
{
    beforeWrite([&](std::size_t n) { (void)g_pwrite64(fd, data, n, offset); }, size);
    return g_pwrite64(fd, data, size, offset);
}

// Counts (and at the chosen step, kills) from here on, in this process. Only ever called in a child.
void armKills(long atStatement, long atWrite, bool torn)
{
    g_statements = g_writes = 0;
    g_killAtStatement = atStatement;
    g_killAtWrite = atWrite;
    g_tornWrite = torn;
    sqlite3_auto_extension(reinterpret_cast<void (*)()>(&traceStatements));
    sqlite3_vfs* vfs = sqlite3_vfs_find(nullptr);
    const auto swap = [&](const char* name, auto& original, auto replacement) {
        if (auto* current = vfs->xGetSystemCall(vfs, name)) {
            original = reinterpret_cast<std::remove_reference_t<decltype(original)>>(current);
            vfs->xSetSystemCall(vfs, name, reinterpret_cast<sqlite3_syscall_ptr>(replacement));
        }
    };
    swap("write", g_write, &countedWrite);
    swap("pwrite", g_pwrite, &countedPwrite);
    swap("pwrite64", g_pwrite64, &countedPwrite64);
}

// ---- records and checks

std::vector<Laser> manyLasers(int count, const std::string& prefix)
{
    std::vector<Laser> lasers;
    for (int i = 0; i < count; ++i)
        lasers.push_back(storetest::pulsedLaser(prefix + " " + std::to_string(i)));
    return lasers;
}

fs::path labWithOneLaser(const TempDir& dir, const std::string& name)
{
    const auto path = dir / name;
    auto store = LabStore::create(path, storetest::sampleLab()).value();
    REQUIRE(store.saveLaser(storetest::cwLaser()).has_value());
    return path;
}

std::size_t laserCount(const fs::path& path)
{
    auto store = LabStore::open(path);
    REQUIRE(store.has_value());
    auto lasers = store->lasers();
    REQUIRE(lasers.has_value());
    return lasers->size();
}

void requireSound(const fs::path& path)
{
    auto report = checkLabFile(path);
    REQUIRE(report.has_value());
    INFO((report->problems.empty() ? std::string("sound") : report->problems.front()));
    CHECK(report->sound());
}

void removeWithSidecars(const fs::path& path)
{
    std::error_code ignored;
    for (const char* suffix : {"", "-wal", "-shm", "-journal"})
        fs::remove(path.string() + suffix, ignored);
}

bool hasSidecars(const fs::path& path)
{
    return fs::exists(path.string() + "-wal") || fs::exists(path.string() + "-shm");
}

// Runs `work` as an unprivileged user when the tests run as root (as CI does), since root writes to a file whatever
// its mode says. The folder is opened to that user; its files keep their own modes.
std::string asUnprivileged(const fs::path& folder, const std::function<std::string()>& work)
{
    if (geteuid() != 0)
        return work();
    REQUIRE(chmod(folder.c_str(), 0777) == 0);
    const ChildOutcome outcome = inChild([&]() -> std::string {
        constexpr uid_t kNobody = 65534;
        if (setgid(kNobody) != 0 || setuid(kNobody) != 0)
            return "could not drop privileges";
        return work();
    });
    REQUIRE_FALSE(outcome.killed);
    return outcome.report;
}

std::string describe(const InputError& error)
{
    return error.field + " | " + error.message();
}

// integrity_check through a read-write connection, as the next program to open the file would see it: a journal a
// killed writer left behind is rolled back or recovered first.
std::string integrityOf(const fs::path& path)
{
    sqlite3* db = nullptr;
    std::string result = "could not open";
    if (sqlite3_open_v2(path.c_str(), &db, SQLITE_OPEN_READWRITE, nullptr) == SQLITE_OK) {
        sqlite3_stmt* statement = nullptr;
        result = "could not run";
        if (sqlite3_prepare_v2(db, "PRAGMA integrity_check", -1, &statement, nullptr) == SQLITE_OK &&
            sqlite3_step(statement) == SQLITE_ROW)
            result = reinterpret_cast<const char*>(sqlite3_column_text(statement, 0));
        sqlite3_finalize(statement);
    }
    sqlite3_close(db);
    return result;
}

} // namespace

TEST_CASE("store faults: a full disk (SQLITE_FULL) fails the save, says so, and leaves the file as it was",
          "[store][faults][full]")
{
    TempDir dir;
    const auto path = labWithOneLaser(dir, "full.bwlab");
    const int pages = std::stoi(storetest::rawQuery(path, "PRAGMA page_count"));
    {
        const PageLimit limit(pages + 2); // room for a page or two, far less than 200 lasers need
        auto store = LabStore::open(path);
        REQUIRE(store.has_value());
        auto saved = store->saveLasers(manyLasers(200, "Bulk laser"));
        REQUIRE_FALSE(saved.has_value());
        // the storage field makes the CLI say "failed while working" and exit 1; SQLite's words name the cause
        CHECK(saved.error().field == kStorageField);
        CHECK_THAT(saved.error().value, Contains("full"));
        // the same store still reads, and reads what was there before
        auto lasers = store->lasers();
        REQUIRE(lasers.has_value());
        CHECK(lasers->size() == 1);
    }
    requireSound(path);
    CHECK(laserCount(path) == 1);
    // with room again the same save goes through whole
    auto store = LabStore::open(path);
    REQUIRE(store.has_value());
    REQUIRE(store->saveLasers(manyLasers(200, "Bulk laser")).has_value());
    CHECK(store->lasers()->size() == 201);
}

TEST_CASE("store faults: an import that fills the disk leaves no file behind", "[store][faults][full]")
{
    TempDir dir;
    const auto probe = dir / "probe.bwlab";
    (void)LabStore::create(probe, storetest::sampleLab()).value();
    const int emptyPages = std::stoi(storetest::rawQuery(probe, "PRAGMA page_count"));

    LabContents contents;
    contents.lab = storetest::sampleLab();
    contents.lasers = manyLasers(50, "Imported laser");
    for (std::size_t i = 0; i < contents.lasers.size(); ++i)
        contents.lasers[i].id = static_cast<RecordId>(i + 1);
    storetest::writeBytes(dir / "big.bwlab.json", toLabExport(contents));

    const auto target = dir / "imported.bwlab";
    {
        const PageLimit limit(emptyPages + 3); // the schema fits, the lasers do not
        auto imported = importLab(dir / "big.bwlab.json", target);
        REQUIRE_FALSE(imported.has_value());
        CHECK(imported.error().field == kStorageField);
        CHECK_THAT(imported.error().value, Contains("full"));
    }
    CHECK_FALSE(fs::exists(target));
    CHECK_FALSE(hasSidecars(target));
}

TEST_CASE("store faults: a write the operating system cuts short (file size limit) fails and loses nothing",
          "[store][faults][full]")
{
    TempDir dir;
    const auto path = labWithOneLaser(dir, "limited.bwlab");
    const auto before = fs::file_size(path);
    // RLIMIT_FSIZE makes write() stop at the limit (EFBIG) as a full disk would; only in the child.
    const ChildOutcome outcome = inChild([&]() -> std::string {
        std::signal(SIGXFSZ, SIG_IGN);
        const rlim_t limit = static_cast<rlim_t>(before) + 64 * 1024;
        const rlimit size{limit, limit};
        if (setrlimit(RLIMIT_FSIZE, &size) != 0)
            return "setrlimit failed";
        auto store = LabStore::open(path);
        if (!store)
            return "open: " + describe(store.error());
        auto saved = store->saveLasers(manyLasers(300, "Bulk laser"));
        return saved ? std::string("saved") : describe(saved.error());
    });
    REQUIRE_FALSE(outcome.killed);
    INFO(outcome.report);
    CHECK(outcome.report.starts_with(std::string(kStorageField) + " |"));
    requireSound(path);
    CHECK(laserCount(path) == 1);
}

TEST_CASE("store faults: a read-only lab file refuses writes with a clear error and stays unchanged",
          "[store][faults][read-only]")
{
    TempDir dir;
    const auto path = labWithOneLaser(dir, "read-only.bwlab");
    REQUIRE_FALSE(hasSidecars(path)); // closed cleanly: everything is in the file itself
    const std::string before = storetest::fileBytes(path);
    REQUIRE(chmod(path.c_str(), 0444) == 0);

    const std::string report = asUnprivileged(dir.path(), [&]() -> std::string {
        auto store = LabStore::open(path);
        if (!store)
            return "open refused: " + describe(store.error());
        auto lasers = store->lasers();
        if (!lasers || lasers->size() != 1)
            return "could not read the lasers";
        auto saved = store->saveLaser(storetest::pulsedLaser());
        if (saved)
            return "saved";
        return "save refused: " + describe(saved.error());
    });
    INFO(report);
    // Either way the user hears why: SQLite's "attempt to write a readonly database" under the storage field.
    CHECK((report.starts_with("save refused: ") || report.starts_with("open refused: ")));
    CHECK_THAT(report, Contains("readonly") || Contains("read-only") || Contains("permission"));
    REQUIRE(chmod(path.c_str(), 0644) == 0);
    CHECK(storetest::fileBytes(path) == before);
    requireSound(path);
}

TEST_CASE("store faults: a lab file removed while open is not written to as if it were still there",
          "[store][faults][removed]")
{
    // In WAL mode SQLite goes on committing to the journal of a deleted file, so a save used to report success for
    // records that no file at the path holds, and the journal left beside the path was replayed into any non-empty
    // file later put there. The store checks SQLITE_FCNTL_HAS_MOVED in every write transaction (sqlite.cpp).
    TempDir dir;
    const auto path = labWithOneLaser(dir, "removed.bwlab");
    const std::string earlierCopy = storetest::fileBytes(path); // e.g. last week's backup of the file
    auto store = LabStore::open(path);
    REQUIRE(store.has_value());
    REQUIRE(fs::remove(path));

    auto saved = store->saveLaser(storetest::pulsedLaser("Saved after removal"));
    INFO((saved ? std::string("saved") : describe(saved.error())));
    REQUIRE_FALSE(saved.has_value());
    CHECK(saved.error().field == kStorageField);
    CHECK_THAT(saved.error().value,
               Contains("moved, removed or replaced while it was open") && Contains("nothing was saved"));
    store = LabStore::create(dir / "other.bwlab", storetest::sampleLab()).value(); // closes the first store
    // nothing is left at the path that could pass for a lab file or be replayed into one
    CHECK_FALSE(fs::exists(path));
    CHECK_FALSE(hasSidecars(path));
    // a copy restored to the path holds the copy's records only, not what was saved to the removed file
    storetest::writeBytes(path, earlierCopy);
    CHECK(laserCount(path) == 1);
}

TEST_CASE("store faults: a lab file renamed while open refuses saves and keeps, under its new name, all it had",
          "[store][faults][removed]")
{
    TempDir dir;
    const auto path = labWithOneLaser(dir, "renamed.bwlab");
    const auto renamed = dir / "renamed-later.bwlab";
    {
        auto store = LabStore::open(path);
        REQUIRE(store.has_value());
        // committed to the journal beside the old name, not yet checkpointed into the file
        REQUIRE(store->saveLaser(storetest::pulsedLaser("Saved before the rename")).has_value());
        fs::rename(path, renamed);
        auto saved = store->saveLaser(storetest::pulsedLaser("Saved after the rename"));
        REQUIRE_FALSE(saved.has_value());
        CHECK(saved.error().field == kStorageField);
    }
    // closing put the journal into the renamed file and left nothing at the old name
    CHECK_FALSE(fs::exists(path));
    CHECK_FALSE(hasSidecars(path));
    CHECK_FALSE(hasSidecars(renamed));
    requireSound(renamed);
    CHECK(laserCount(renamed) == 2);
}

TEST_CASE("store faults: a lab file replaced while open (a copy restored over it) is not written to",
          "[store][faults][removed]")
{
    TempDir dir;
    const auto path = labWithOneLaser(dir, "replaced.bwlab");
    const auto copy = dir / "copy.bwlab";
    fs::copy_file(path, copy);
    auto store = LabStore::open(path);
    REQUIRE(store.has_value());
    // Another inode at the path, as a restore from a backup or a file manager's "replace" makes it.
    fs::rename(copy, path);
    const std::string restored = storetest::fileBytes(path);

    auto saved = store->saveLaser(storetest::pulsedLaser("Saved after the replacement"));
    INFO((saved ? std::string("saved") : describe(saved.error())));
    REQUIRE_FALSE(saved.has_value());
    CHECK(saved.error().field == kStorageField);
    CHECK_THAT(saved.error().value, Contains("moved, removed or replaced while it was open"));
    // reading still works: the open store shows what it had
    auto lasers = store->lasers();
    REQUIRE(lasers.has_value());
    CHECK(lasers->size() == 1);
    store = LabStore::create(dir / "other.bwlab", storetest::sampleLab()).value(); // closes the first store
    CHECK(storetest::fileBytes(path) == restored);                                 // the restored file is untouched
    requireSound(path);
    CHECK(laserCount(path) == 1);
}

TEST_CASE("store faults: removing an open lab file loses nothing that was saved before, and the path is free again",
          "[store][faults][removed]")
{
    TempDir dir;
    const auto path = labWithOneLaser(dir, "removed.bwlab");
    const auto copy = dir / "copy.bwlab";
    {
        auto store = LabStore::open(path);
        REQUIRE(store.has_value());
        REQUIRE(store->saveLaser(storetest::pulsedLaser("Saved before removal")).has_value());
        REQUIRE(fs::remove(path));
        // the open store still reads, and its backup still copies, everything committed before the removal
        auto lasers = store->lasers();
        REQUIRE(lasers.has_value());
        CHECK(lasers->size() == 2);
        REQUIRE(store->backup(copy).has_value());
    }
    requireSound(copy);
    CHECK(laserCount(copy) == 2);
    auto refused = LabStore::open(path);
    REQUIRE_FALSE(refused.has_value());
    CHECK(refused.error().field == "lab file");
    CHECK_THAT(refused.error().message(), Contains("no file at that path"));
    // a new lab file at the same path holds only its own records
    removeWithSidecars(path); // what a user would do: the journal of the removed file must not come back
    auto fresh = LabStore::create(path, storetest::sampleLab());
    REQUIRE(fresh.has_value());
    CHECK(fresh->lasers()->empty());
    requireSound(path);
}

TEST_CASE("store faults: two processes saving to one lab file take turns and both saves arrive whole",
          "[store][faults][concurrent]")
{
    TempDir dir;
    const auto path = labWithOneLaser(dir, "shared.bwlab");
    constexpr int kChildLasers = 300;
    constexpr int kParentSaves = 20;
    int ready[2];
    REQUIRE(pipe(ready) == 0);
    const pid_t child = fork();
    REQUIRE(child >= 0);
    if (child == 0) {
        close(ready[0]);
        auto store = LabStore::open(path);
        if (!store)
            _exit(3);
        writeAll(ready[1], "x");
        close(ready[1]);
        auto saved = store->saveLasers(manyLasers(kChildLasers, "Child laser"));
        _exit(saved ? 0 : 4);
    }
    close(ready[1]);
    REQUIRE(readAll(ready[0]) == "x");
    close(ready[0]);
    // The parent saves one laser at a time while the child's large save runs: each waits for the other's lock
    // (busy timeout) rather than failing.
    auto store = LabStore::open(path);
    REQUIRE(store.has_value());
    std::vector<std::string> failures;
    for (int i = 0; i < kParentSaves; ++i) {
        auto saved = store->saveLaser(storetest::cwLaser("Parent laser " + std::to_string(i)));
        if (!saved)
            failures.push_back(describe(saved.error()));
    }
    int status = 0;
    REQUIRE(waitpid(child, &status, 0) == child);
    REQUIRE(WIFEXITED(status));
    CHECK(WEXITSTATUS(status) == 0);
    INFO((failures.empty() ? std::string("none failed") : failures.front()));
    CHECK(failures.empty());
    requireSound(path);
    CHECK(laserCount(path) == 1 + kChildLasers + kParentSaves);
}

TEST_CASE("store faults: a writer held up past the busy timeout by another process is told the file is locked",
          "[store][faults][concurrent]")
{
    TempDir dir;
    const auto path = labWithOneLaser(dir, "locked.bwlab");
    int locked[2];
    int release[2];
    REQUIRE(pipe(locked) == 0);
    REQUIRE(pipe(release) == 0);
    const pid_t child = fork();
    REQUIRE(child >= 0);
    if (child == 0) {
        // Another program holding the write lock: a plain SQLite connection inside BEGIN IMMEDIATE.
        close(locked[0]);
        close(release[1]);
        sqlite3* db = nullptr;
        if (sqlite3_open_v2(path.c_str(), &db, SQLITE_OPEN_READWRITE, nullptr) != SQLITE_OK ||
            sqlite3_exec(db, "BEGIN IMMEDIATE", nullptr, nullptr, nullptr) != SQLITE_OK)
            _exit(3);
        writeAll(locked[1], "x");
        close(locked[1]);
        (void)readAll(release[0]); // until the parent closes its end
        sqlite3_exec(db, "ROLLBACK", nullptr, nullptr, nullptr);
        sqlite3_close(db);
        _exit(0);
    }
    close(locked[1]);
    close(release[0]);
    REQUIRE(readAll(locked[0]) == "x");
    close(locked[0]);

    auto store = LabStore::open(path);
    REQUIRE(store.has_value());
    const auto start = std::chrono::steady_clock::now();
    auto saved = store->saveLaser(storetest::pulsedLaser("Held up"));
    const double waited = std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
    close(release[1]);
    int status = 0;
    REQUIRE(waitpid(child, &status, 0) == child);
    REQUIRE(WIFEXITED(status));
    REQUIRE(WEXITSTATUS(status) == 0);

    REQUIRE_FALSE(saved.has_value());
    CHECK(saved.error().field == kStorageField); // the CLI: "failed while working: database is locked", exit 1
    CHECK_THAT(saved.error().value, Contains("locked"));
    CHECK(waited > 4.0); // it waited out the store's 5 s busy timeout first (core/src/store/sqlite.cpp)
    requireSound(path);
    CHECK(laserCount(path) == 1);
    // once the other program is done, the same store saves
    REQUIRE(store->saveLaser(storetest::pulsedLaser("Held up")).has_value());
    CHECK(laserCount(path) == 2);
}

namespace {

// A small export with a record of every kind: two lasers, two eyewear items, an assessment with its sign-offs.
LabContents smallImport()
{
    LabContents contents;
    contents.lab = storetest::sampleLab();
    contents.lasers = {storetest::pulsedLaser(), storetest::cwLaser()};
    contents.lasers[0].id = 1;
    contents.lasers[1].id = 2;
    contents.eyewear = {storetest::sampleEyewear("Goggle G1"), storetest::sampleEyewear("Goggle G2")};
    contents.eyewear[0].id = 1;
    contents.eyewear[1].id = 2;
    Assessment a = storetest::draftAssessment(1);
    a.id = 1;
    a.status = AssessmentStatus::Approved;
    a.signOffs = {SignOff{0, "A. N. Example", "2026-12-02T09:00:00Z", AssessmentStatus::Draft,
                          AssessmentStatus::InReview, "for review"},
                  SignOff{0, "B. Example", "2026-12-03T09:00:00Z", AssessmentStatus::InReview,
                          AssessmentStatus::Approved, "approved"}};
    contents.assessments = {a};
    return contents;
}

struct Steps {
    long statements = 0;
    long writes = 0;
};

// Runs `work` in a child that counts its SQL statements and writes, killing itself at the chosen step (0: never).
ChildOutcome killedAt(long statement, long writeCall, bool torn, const std::function<std::string()>& work)
{
    return inChild([&]() -> std::string {
        armKills(statement, writeCall, torn);
        std::string report = work();
        return report + " " + std::to_string(g_statements) + " " + std::to_string(g_writes);
    });
}

Steps countSteps(const std::function<std::string()>& work)
{
    const ChildOutcome whole = killedAt(0, 0, false, work);
    REQUIRE_FALSE(whole.killed);
    INFO(whole.report);
    REQUIRE(whole.report.starts_with("done "));
    Steps steps;
    REQUIRE(std::sscanf(whole.report.c_str(), "done %ld %ld", &steps.statements, &steps.writes) == 2);
    return steps;
}

} // namespace

TEST_CASE("store faults: an import killed at any statement or write leaves no lab file or the whole lab",
          "[store][faults][kill]")
{
    TempDir dir;
    const LabContents contents = smallImport();
    const auto exportPath = dir / "small.bwlab.json";
    storetest::writeBytes(exportPath, toLabExport(contents));
    const auto labPath = dir / "imported.bwlab";
    const auto import = [&]() -> std::string {
        auto store = importLab(exportPath, labPath);
        return store ? "done" : "refused: " + describe(store.error());
    };

    const Steps steps = countSteps(import);
    INFO(steps.statements << " statements, " << steps.writes << " writes in a whole import");
    REQUIRE(steps.statements > 20);
    REQUIRE(steps.writes > 5); // the write() hook is in place: SQLite's unix VFS calls it for every file write
    requireSound(labPath);
    removeWithSidecars(labPath);

    int whole = 0;
    int nothing = 0;
    std::vector<std::string> problems;
    const auto afterKill = [&](const std::string& at) {
        if (!fs::exists(labPath)) {
            ++nothing;
            return;
        }
        // Whatever is left is either refused as incomplete (before any of the import was committed) or is the
        // whole import: never a lab with part of the records.
        auto opened = LabStore::open(labPath);
        if (!opened) {
            if (opened.error().field != "lab file")
                problems.push_back(at + ": refused as " + describe(opened.error()));
            ++nothing;
        } else {
            auto stored = opened->contents();
            if (!stored || stored->lasers.size() != 2 || stored->eyewear.size() != 2 ||
                stored->assessments.size() != 1 || stored->assessments[0].signOffs.size() != 2)
                problems.push_back(at + ": opened with part of the import");
            ++whole;
        }
        if (storetest::fileBytes(labPath).starts_with(std::string_view("SQLite format 3\0", 16))) {
            auto report = checkLabFile(labPath);
            if (report && !report->problems.empty() && report->schemaVersion == kSchemaVersion)
                problems.push_back(at + ": " + report->problems.front());
            const std::string integrity = integrityOf(labPath);
            if (integrity != "ok")
                problems.push_back(at + ": integrity_check says " + integrity);
        }
        removeWithSidecars(labPath);
    };
    for (long k = 1; k <= steps.statements; ++k) {
        const ChildOutcome outcome = killedAt(k, 0, false, import);
        if (!outcome.killed)
            problems.push_back("statement " + std::to_string(k) + ": not killed (" + outcome.report + ")");
        afterKill("statement " + std::to_string(k));
    }
    for (long k = 1; k <= steps.writes; ++k) {
        for (const bool torn : {false, true}) {
            const ChildOutcome outcome = killedAt(0, k, torn, import);
            if (!outcome.killed)
                problems.push_back("write " + std::to_string(k) + ": not killed (" + outcome.report + ")");
            afterKill((torn ? "torn write " : "write ") + std::to_string(k));
        }
    }
    INFO(whole << " kills left the whole import, " << nothing << " left none");
    INFO((problems.empty() ? std::string("no problems") : problems.front()));
    CHECK(problems.empty());
    CHECK(nothing > 0);
}

TEST_CASE("store faults: an eyewear CSV import killed at any statement or write keeps the old shelf or adds all rows",
          "[store][faults][kill]")
{
    TempDir dir;
    const auto original = dir / "original.bwlab";
    {
        auto store = LabStore::create(original, storetest::sampleLab()).value();
        REQUIRE(store.saveEyewear(storetest::sampleEyewear("Goggle G0")).has_value());
    }
    REQUIRE_FALSE(hasSidecars(original));
    const auto csv = dir / "shelf.csv";
    storetest::writeBytes(csv, "name,od_table,en207,count\n"
                               "Goggle G1,740-1100:7,740-1100 D LB7 + IR LB8,4\n"
                               "Goggle G2,1000-1100:6;1100-1300:=4.5,1064 D LB6,2\n"
                               "Goggle G3,190-400:5,,1\n");
    const auto labPath = dir / "lab.bwlab";
    const auto fresh = [&] {
        removeWithSidecars(labPath);
        fs::copy_file(original, labPath);
    };
    const auto import = [&]() -> std::string {
        auto store = LabStore::open(labPath);
        if (!store)
            return "open: " + describe(store.error());
        auto ids = importEyewearCsv(*store, csv);
        return ids ? "done" : "refused: " + describe(ids.error());
    };

    fresh();
    const Steps steps = countSteps(import);
    INFO(steps.statements << " statements, " << steps.writes << " writes in a whole import");
    REQUIRE(steps.writes > 3);

    std::vector<std::string> problems;
    int old = 0;
    int added = 0;
    const auto afterKill = [&](const std::string& at) {
        auto store = LabStore::open(labPath);
        if (!store) {
            problems.push_back(at + ": the lab file no longer opens: " + describe(store.error()));
            return;
        }
        auto shelf = store->eyewear();
        if (!shelf)
            problems.push_back(at + ": the shelf cannot be read");
        else if (shelf->size() == 1)
            ++old;
        else if (shelf->size() == 4)
            ++added;
        else
            problems.push_back(at + ": " + std::to_string(shelf->size()) + " items, part of the import");
        auto report = store->check();
        if (!report || !report->sound())
            problems.push_back(at + ": " + (report ? report->problems.front() : std::string("check failed")));
    };
    for (long k = 1; k <= steps.statements; ++k) {
        fresh();
        (void)killedAt(k, 0, false, import);
        afterKill("statement " + std::to_string(k));
    }
    for (long k = 1; k <= steps.writes; ++k) {
        for (const bool torn : {false, true}) {
            fresh();
            (void)killedAt(0, k, torn, import);
            afterKill((torn ? "torn write " : "write ") + std::to_string(k));
        }
    }
    INFO(old << " kills kept the old shelf, " << added << " added every row");
    INFO((problems.empty() ? std::string("no problems") : problems.front()));
    CHECK(problems.empty());
    CHECK(old > 0);
}
