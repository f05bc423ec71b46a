// The lab-file seeds of tests/fuzz/corpus/labfile (issue 10), opened the way fuzz_labfile opens them, in the normal
// and sanitizer builds: each is opened and read, or refused with an error that names the file; none crashes.
#include "beamwarden/store/labexport.hpp"
#include "beamwarden/store/labstore.hpp"
#include "storetestsupport.hpp"

#include <catch2/catch.hpp>

#include <filesystem>

using namespace beamwarden;
using namespace beamwarden::store;

TEST_CASE("fuzz regression: every lab-file seed opens and reads, or is refused with an error naming the file",
          "[store][fuzz]")
{
    const auto seeds = std::filesystem::path(BEAMWARDEN_SOURCE_DIR) / "tests" / "fuzz" / "corpus" / "labfile";
    REQUIRE(std::filesystem::is_directory(seeds)); // a missing fixture fails, it never skips
    storetest::TempDir dir;
    int opened = 0;
    int refused = 0;
    for (const auto& entry : std::filesystem::directory_iterator(seeds)) {
        const auto path = dir / (entry.path().filename().string() + ".bwlab");
        storetest::writeBytes(path, storetest::fileBytes(entry.path()));
        INFO(entry.path().filename().string());
        auto store = LabStore::open(path);
        if (!store) {
            ++refused;
            CHECK(store.error().field == "lab file");
            CHECK_FALSE(store.error().allowed.empty());
            continue;
        }
        ++opened;
        auto contents = store->contents();
        REQUIRE(contents.has_value());
        CHECK_FALSE(toLabExport(*contents).empty());
        auto report = store->check();
        REQUIRE(report.has_value());
        CHECK(report->sound());
    }
    CHECK(opened >= 2); // the version-1 fixture, in rollback and in WAL mode
    CHECK(refused >= 4);
}
