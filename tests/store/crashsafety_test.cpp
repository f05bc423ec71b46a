// Crash safety: a child process saving 2000 lasers in one transaction is killed with SIGKILL part-way. The file must
// then open, pass integrity_check and hold either the whole change or none of it (SQLite's WAL commits atomically:
// sqlite.org "Atomic Commit In SQLite" and "Write-Ahead Logging").
#include "beamwarden/store/labstore.hpp"
#include "storetestsupport.hpp"

#include <catch2/catch.hpp>

#include <chrono>
#include <csignal>
#include <sys/wait.h>
#include <thread>
#include <unistd.h>

using namespace beamwarden;
using namespace beamwarden::model;
using namespace beamwarden::store;
using storetest::TempDir;

namespace {

constexpr int kLasers = 2000;

std::vector<Laser> manyLasers()
{
    std::vector<Laser> lasers;
    for (int i = 0; i < kLasers; ++i)
        lasers.push_back(storetest::pulsedLaser("Bulk laser " + std::to_string(i)));
    return lasers;
}

// In the child: open the file and save everything in one transaction. _exit, never return into Catch.
[[noreturn]] void saveInChild(const std::filesystem::path& path, const std::vector<Laser>& lasers)
{
    auto store = LabStore::open(path);
    if (!store)
        _exit(3);
    auto saved = store->saveLasers(lasers);
    _exit(saved ? 0 : 4);
}

struct Outcome {
    bool killed = false;
    std::uintmax_t walBytes = 0; // what the writer left in the journal before anyone else opened the file
    std::size_t lasers = 0;
};

std::uintmax_t walSize(const std::filesystem::path& path)
{
    std::error_code missing;
    const auto size = std::filesystem::file_size(path.string() + "-wal", missing);
    return missing ? 0 : size;
}

// When to kill the writer: never, after a delay, or once its journal holds this many bytes of the unfinished change.
struct Kill {
    std::optional<std::chrono::microseconds> after;
    std::optional<std::uintmax_t> journalBytes;
};

Outcome runAndMaybeKill(const std::filesystem::path& path, const std::vector<Laser>& lasers, Kill when)
{
    const pid_t child = fork();
    REQUIRE(child >= 0);
    if (child == 0)
        saveInChild(path, lasers);
    if (when.after) {
        std::this_thread::sleep_for(*when.after);
        kill(child, SIGKILL);
    }
    if (when.journalBytes) {
        // Poll until the writer has spilled part of its transaction to the WAL; give up if it finishes first.
        int status = 0;
        while (walSize(path) < *when.journalBytes && waitpid(child, &status, WNOHANG) == 0)
            std::this_thread::sleep_for(std::chrono::microseconds(200));
        kill(child, SIGKILL);
    }
    int status = 0;
    REQUIRE(waitpid(child, &status, 0) == child);
    Outcome outcome;
    outcome.killed = WIFSIGNALED(status);
    if (!outcome.killed)
        REQUIRE(WEXITSTATUS(status) == 0);
    outcome.walBytes = walSize(path);

    // The parent opens what the child left: sound, and all or nothing.
    auto report = checkLabFile(path);
    REQUIRE(report.has_value());
    INFO(report->problems.size());
    CHECK(report->sound());
    auto store = LabStore::open(path);
    REQUIRE(store.has_value());
    auto stored = store->lasers();
    REQUIRE(stored.has_value());
    outcome.lasers = stored->size();
    return outcome;
}

} // namespace

TEST_CASE("A writer killed mid-transaction leaves a sound file with all or none of its change", "[store][crash]")
{
    TempDir dir;
    const auto lasers = manyLasers();
    const auto fresh = [&](const std::string& name) {
        const auto path = dir / name;
        auto store = LabStore::create(path, storetest::sampleLab()).value();
        REQUIRE(store.saveLaser(storetest::cwLaser()).has_value());
        return path;
    };

    // First an undisturbed run, to learn how long the whole save takes.
    const auto start = std::chrono::steady_clock::now();
    const Outcome whole = runAndMaybeKill(fresh("whole.bwlab"), lasers, Kill{});
    const auto duration =
        std::chrono::duration_cast<std::chrono::microseconds>(std::chrono::steady_clock::now() - start);
    CHECK(whole.lasers == kLasers + 1);

    // Then kills at points spread over that time, and kills as soon as the journal shows the change half-written:
    // each must leave the old file or the whole change.
    int killedMidWrite = 0;
    const auto check = [&](const std::string& name, Kill when) {
        const Outcome outcome = runAndMaybeKill(fresh(name), lasers, when);
        INFO(name << ": " << outcome.walBytes << " journal bytes left, " << outcome.lasers << " lasers");
        CHECK((outcome.lasers == 1 || outcome.lasers == kLasers + 1));
        if (outcome.killed && outcome.lasers == 1 && outcome.walBytes > 0)
            ++killedMidWrite;
    };
    for (const double fraction : {0.1, 0.5, 0.9})
        check("after-" + std::to_string(fraction) + ".bwlab",
              Kill{std::chrono::microseconds(static_cast<long>(fraction * static_cast<double>(duration.count()))), {}});
    for (const std::uintmax_t bytes : {std::uintmax_t{4096}, std::uintmax_t{256} << 10})
        check("journal-" + std::to_string(bytes) + ".bwlab", Kill{{}, bytes});
    // At least one kill must have landed after the writer had written part of its change and before it committed,
    // or the test proved nothing.
    CHECK(killedMidWrite > 0);
}
