// Text in records (issue 10): names and free text must be UTF-8 (the export would otherwise change them and two
// names could become one), names fit on one line and in 200 characters, free text in 10000. Every store write
// checks this, so the GUI, lab new and both imports refuse alike, naming the field, and write nothing.
#include "beamwarden/store/labstore.hpp"
#include "storetestsupport.hpp"

#include <catch2/catch.hpp>

#include <filesystem>

using namespace beamwarden;
using namespace beamwarden::store;

TEST_CASE("text that is not UTF-8 is refused in every record the store writes, naming the field", "[store][fuzz]")
{
    // The same rule on the store's own API (what the GUI and lab new use), not only through the CSV import.
    storetest::TempDir dir;
    model::Lab badLab = storetest::sampleLab();
    badLab.name = "Lab \xff";
    auto refused = LabStore::create(dir / "refused.bwlab", badLab);
    REQUIRE_FALSE(refused.has_value());
    CHECK(refused.error().field == "lab.name");
    CHECK_FALSE(std::filesystem::exists(dir / "refused.bwlab")); // nothing half-written

    auto store = LabStore::create(dir / "lab.bwlab", storetest::sampleLab());
    REQUIRE(store.has_value());
    model::EyewearItem notes = storetest::sampleEyewear();
    notes.notes = "scratched \xc3"; // a cut-off two-byte sequence
    auto saved = store->saveEyewear(notes);
    REQUIRE_FALSE(saved.has_value());
    CHECK(saved.error().field.ends_with("notes"));
    model::Laser laser = storetest::cwLaser("Laser \xed\xa0\x80"); // a UTF-16 surrogate, not allowed in UTF-8
    auto savedLaser = store->saveLaser(laser);
    REQUIRE_FALSE(savedLaser.has_value());
    CHECK(savedLaser.error().field.ends_with("name"));
    CHECK(store->eyewear()->empty());
    CHECK(store->lasers()->empty());
}

TEST_CASE("names have a length limit and one line; free text has a larger limit", "[store][bad]")
{
    storetest::TempDir dir;
    auto store = LabStore::create(dir / "lab.bwlab", storetest::sampleLab());
    REQUIRE(store.has_value());
    // recordcheck.cpp: names up to 200 characters (counted as characters, so 200 x "µ" is 400 bytes and allowed)
    std::string micro;
    for (int i = 0; i < 200; ++i)
        micro += "\xC2\xB5";
    CHECK(store->saveEyewear(storetest::sampleEyewear(micro)).has_value());
    auto tooLong = store->saveEyewear(storetest::sampleEyewear(std::string(201, 'x')));
    REQUIRE_FALSE(tooLong.has_value());
    CHECK(tooLong.error().field == "name");
    CHECK_THAT(tooLong.error().allowed, Catch::Matchers::Contains("at most 200 characters (this one has 201)"));
    CHECK(tooLong.error().value.size() < 60); // the refusal quotes the start of the name, not all of it
    auto twoLines = store->saveEyewear(storetest::sampleEyewear("Goggle\nG2"));
    REQUIRE_FALSE(twoLines.has_value());
    CHECK_THAT(twoLines.error().allowed, Catch::Matchers::Contains("one line"));
    // free text: 10000 characters allowed, one more refused (recordcheck.cpp)
    model::EyewearItem item = storetest::sampleEyewear("Goggle G3");
    item.notes = std::string(10000, 'n');
    CHECK(store->saveEyewear(item).has_value());
    item = storetest::sampleEyewear("Goggle G4");
    item.notes = std::string(10001, 'n');
    auto longNotes = store->saveEyewear(item);
    REQUIRE_FALSE(longNotes.has_value());
    CHECK(longNotes.error().field == "notes");
}
