// The lab-file seeds of tests/fuzz/corpus/labfile (issue 10), opened the way fuzz_labfile opens them, in the normal
// and sanitizer builds: each is opened and read, or refused with an error that names the file; none crashes. Below
// them, the fuzz targets' findings that go through the store.
#include "beamwarden/store/eyewearcsv.hpp"
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

TEST_CASE("fuzz finding: eyewear names differing only in bytes that are not UTF-8 export as one name, and the export "
          "no longer imports",
          "[store][fuzz]")
{
    // fuzz_eyewearcsv (promise: what the CSV import accepts, the lab export carries and reads back unchanged). The CSV
    // import stored names as bytes; the export replaces what is not UTF-8 by U+FFFD (labexport.cpp), so "Goggle \xff"
    // and "Goggle \xfe" both became "Goggle \uFFFD" and the lab's own export was refused as holding a duplicate name.
    // The record checks now refuse text that is not UTF-8 at every edge, naming the cell; nothing is written.
    storetest::TempDir dir;
    const auto lab = dir / "lab.bwlab";
    {
        auto store = LabStore::create(lab, storetest::sampleLab());
        REQUIRE(store.has_value());
    }
    const std::string before = storetest::fileBytes(lab);
    storetest::writeBytes(dir / "shelf.csv", "name\nGoggle \xff\nGoggle \xfe\n");
    {
        auto store = LabStore::open(lab);
        REQUIRE(store.has_value());
        auto added = importEyewearCsv(*store, dir / "shelf.csv");
        REQUIRE_FALSE(added.has_value());
        CHECK(added.error().field == "row 1, column name (line 2)");
        CHECK(added.error().value == "Goggle \xff"); // the stored error keeps the bytes; message() shows U+FFFD
        CHECK_THAT(added.error().message(), Catch::Matchers::Contains("'Goggle \xEF\xBF\xBD' is not accepted"));
        CHECK_THAT(added.error().allowed, Catch::Matchers::Contains("UTF-8"));
        auto shelf = store->eyewear();
        REQUIRE(shelf.has_value());
        CHECK(shelf->empty());
    }
    CHECK(storetest::fileBytes(lab) == before); // closed cleanly, the file is byte for byte as it was
}
