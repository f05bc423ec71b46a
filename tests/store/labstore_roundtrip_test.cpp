// Every record kind comes back from a lab file as it went in, field by field, and survives closing and reopening.
#include "beamwarden/store/labstore.hpp"
#include "storetestsupport.hpp"

#include <catch2/catch.hpp>

using namespace beamwarden;
using namespace beamwarden::model;
using namespace beamwarden::store;
using namespace beamwarden::units::literals;
using storetest::TempDir;

TEST_CASE("A new lab file holds the lab and its rooms", "[store][roundtrip]")
{
    TempDir dir;
    const auto path = dir / "lab.bwlab";
    {
        auto store = LabStore::create(path, storetest::sampleLab());
        REQUIRE(store.has_value());
    }
    auto store = LabStore::open(path);
    REQUIRE(store.has_value());
    const auto lab = store->lab();
    REQUIRE(lab.has_value());
    CHECK(lab->name == "Larkspur Ridge Photonics Laboratory");
    CHECK(lab->lsoName == "A. N. Example");
    CHECK(lab->notes == "test lab");
    REQUIRE(lab->rooms.size() == 3);
    CHECK(lab->rooms[0].name == "B112");
    CHECK(lab->rooms[0].description == "ultrafast");
    CHECK(lab->rooms[2].name == "T03");
    // The file announces itself: application id, schema version and the WAL journal (SQLite file format, sqlite.org)
    CHECK(storetest::rawQuery(path, "PRAGMA application_id") == std::to_string(kApplicationId));
    CHECK(storetest::rawQuery(path, "PRAGMA user_version") == std::to_string(kSchemaVersion));
    CHECK(storetest::rawQuery(path, "PRAGMA journal_mode") == "wal");
}

TEST_CASE("A laser with every field, spectrum, burst and kind of exposure case round-trips", "[store][roundtrip]")
{
    TempDir dir;
    const auto path = dir / "lab.bwlab";
    const Laser original = storetest::pulsedLaser();
    RecordId id = 0;
    {
        auto store = LabStore::create(path, storetest::sampleLab());
        REQUIRE(store.has_value());
        auto saved = store->saveLaser(original);
        REQUIRE(saved.has_value());
        id = *saved;
        CHECK(id > 0);
    }
    auto store = LabStore::open(path);
    REQUIRE(store.has_value());
    auto loaded = store->laser(id);
    REQUIRE(loaded.has_value());
    CHECK(loaded->id == id);
    storetest::checkSameLaser(*loaded, original);
    CHECK(loaded->outputs.front().exposureCases.size() == 6);
    for (const Output& output : loaded->outputs) {
        CHECK(output.id > 0);
        for (const NamedExposureCase& c : output.exposureCases)
            CHECK(c.id > 0);
    }
    auto all = store->lasers();
    REQUIRE(all.has_value());
    REQUIRE(all->size() == 1);
    storetest::checkSameLaser(all->front(), *loaded, true);
}

TEST_CASE("Updating a laser replaces its outputs and keeps the ids it was given", "[store][roundtrip]")
{
    TempDir dir;
    auto store = LabStore::create(dir / "lab.bwlab", storetest::sampleLab());
    REQUIRE(store.has_value());
    const RecordId id = store->saveLaser(storetest::pulsedLaser()).value();
    Laser laser = store->laser(id).value();
    const RecordId keptOutput = laser.outputs[0].id;
    const RecordId keptCase = laser.outputs[0].exposureCases[0].id;

    laser.serial = "SN-0002";
    laser.room = "B114";
    laser.outputs.erase(laser.outputs.begin() + 1); // drop the SHG
    laser.outputs[0].exposureCases.resize(2);
    laser.outputs[0].beam.divergence = units::Angle::fromSi(0.7e-3);
    Output idler = storetest::cwLaser().outputs.front();
    idler.name = "idler";
    idler.id = 0;
    laser.outputs.push_back(idler);
    REQUIRE(store->saveLaser(laser).value() == id);

    const Laser loaded = store->laser(id).value();
    storetest::checkSameLaser(loaded, laser);
    CHECK(loaded.outputs[0].id == keptOutput);
    CHECK(loaded.outputs[0].exposureCases[0].id == keptCase);
    CHECK(loaded.outputs[1].id != 0);
    CHECK(store->lasers().value().size() == 1);
}

TEST_CASE("An output id from another laser is refused on update", "[store][roundtrip]")
{
    TempDir dir;
    auto store = LabStore::create(dir / "lab.bwlab", storetest::sampleLab());
    REQUIRE(store.has_value());
    const RecordId a = store->saveLaser(storetest::pulsedLaser("A")).value();
    const RecordId b = store->saveLaser(storetest::cwLaser("B")).value();
    Laser laserB = store->laser(b).value();
    laserB.outputs[0].id = store->laser(a).value().outputs[0].id;
    auto saved = store->saveLaser(laserB);
    REQUIRE_FALSE(saved.has_value());
    CHECK(saved.error().field == "outputs[0].id");
}

TEST_CASE("Eyewear with OD rows and both kinds of marking round-trips", "[store][roundtrip]")
{
    TempDir dir;
    const auto path = dir / "lab.bwlab";
    const EyewearItem original = storetest::sampleEyewear();
    EyewearItem bare;
    bare.name = "Goggle G5";
    RecordId id = 0;
    {
        auto store = LabStore::create(path, storetest::sampleLab());
        REQUIRE(store.has_value());
        id = store->saveEyewear(original).value();
        REQUIRE(store->saveEyewear(bare).has_value());
    }
    auto store = LabStore::open(path);
    REQUIRE(store.has_value());
    const EyewearItem loaded = store->eyewearItem(id).value();
    CHECK(loaded.id == id);
    storetest::checkSameEyewear(loaded, original);
    const auto shelf = store->eyewear().value();
    REQUIRE(shelf.size() == 2);
    storetest::checkSameEyewear(shelf[1], bare);

    EyewearItem changed = loaded;
    changed.spectralOd.pop_back();
    changed.en208Markings.clear();
    changed.count = 0;
    REQUIRE(store->saveEyewear(changed).value() == id);
    storetest::checkSameEyewear(store->eyewearItem(id).value(), changed);

    REQUIRE(store->removeEyewear(id).has_value());
    CHECK(store->eyewear().value().size() == 1);
    CHECK_FALSE(store->eyewearItem(id).has_value());
    CHECK_FALSE(store->removeEyewear(id).has_value());
    // The OD rows and markings went with the item (ON DELETE CASCADE)
    CHECK(storetest::rawQuery(path, "SELECT count(*) FROM eyewear_od") == "0");
}

TEST_CASE("An assessment and its sign-offs round-trip", "[store][roundtrip]")
{
    TempDir dir;
    const auto path = dir / "lab.bwlab";
    Assessment original;
    RecordId id = 0;
    {
        auto store = LabStore::create(path, storetest::sampleLab());
        REQUIRE(store.has_value());
        const RecordId laserId = store->saveLaser(storetest::pulsedLaser()).value();
        original = storetest::draftAssessment(laserId);
        id = store->saveAssessment(original).value();
        const SignOff toReview{0,
                               "A. N. Example",
                               "2026-12-02T09:00:00Z",
                               AssessmentStatus::Draft,
                               AssessmentStatus::InReview,
                               "ready for review"};
        const SignOff approve{0,
                              "B. Reviewer",
                              "2026-12-03T10:30:00Z",
                              AssessmentStatus::InReview,
                              AssessmentStatus::Approved,
                              "figures checked by hand"};
        REQUIRE(store->signOff(id, toReview).has_value());
        REQUIRE(store->signOff(id, approve).has_value());
        original.signOffs = {toReview, approve};
        original.status = AssessmentStatus::Approved;
    }
    auto store = LabStore::open(path);
    REQUIRE(store.has_value());
    const Assessment loaded = store->assessment(id).value();
    storetest::checkSameAssessment(loaded, original);
    CHECK(loaded.signOffs[0].id > 0);
    const auto forLaser = store->assessments(original.laserId).value();
    REQUIRE(forLaser.size() == 1);
    CHECK(forLaser.front().id == id);
    CHECK(store->assessments(original.laserId + 100).value().empty());
}

TEST_CASE("Empty times are filled with the current UTC time", "[store][roundtrip]")
{
    TempDir dir;
    auto store = LabStore::create(dir / "lab.bwlab", storetest::sampleLab());
    REQUIRE(store.has_value());
    Assessment a = storetest::draftAssessment(store->saveLaser(storetest::cwLaser()).value());
    a.created.clear();
    a.updated.clear();
    const RecordId id = store->saveAssessment(a).value();
    REQUIRE(store->signOff(id, SignOff{0, "A. N. Example", "", AssessmentStatus::Draft, AssessmentStatus::InReview, ""})
                .has_value());
    const Assessment loaded = store->assessment(id).value();
    // ISO 8601 basic shape "YYYY-MM-DDTHH:MM:SSZ" (common practice for UTC time stamps)
    CHECK(loaded.created.size() == 20);
    CHECK(loaded.created.back() == 'Z');
    CHECK(loaded.updated.size() == 20);
    CHECK(loaded.signOffs.front().when.size() == 20);
}

TEST_CASE("Saving the lab renames, reorders and adds rooms but keeps a room in use", "[store][roundtrip]")
{
    TempDir dir;
    auto store = LabStore::create(dir / "lab.bwlab", storetest::sampleLab());
    REQUIRE(store.has_value());
    REQUIRE(store->saveLaser(storetest::cwLaser()).has_value()); // in T03
    Lab lab = store->lab().value();
    const RecordId t03 = lab.rooms[2].id;
    lab.name = "Renamed lab";
    lab.rooms = {{0, "T03", "teaching, first floor"}, {0, "C201", "new room"}, {0, "B112", "ultrafast"}};
    REQUIRE(store->saveLab(lab).has_value());
    const Lab loaded = store->lab().value();
    CHECK(loaded.name == "Renamed lab");
    REQUIRE(loaded.rooms.size() == 3);
    CHECK(loaded.rooms[0].name == "T03");
    CHECK(loaded.rooms[0].id == t03);
    CHECK(loaded.rooms[0].description == "teaching, first floor");
    CHECK(loaded.rooms[1].name == "C201");
    CHECK(store->lasers().value().front().room == "T03");

    lab.rooms = {{0, "B112", "ultrafast"}}; // T03 still holds the teaching laser
    auto refused = store->saveLab(lab);
    REQUIRE_FALSE(refused.has_value());
    CHECK(refused.error().field == "lab.rooms");
    CHECK(refused.error().value == "T03");
    CHECK(store->lab().value().rooms.size() == 3); // nothing of the refused save stayed
}

TEST_CASE("Removing a laser removes its outputs and cases", "[store][roundtrip]")
{
    TempDir dir;
    const auto path = dir / "lab.bwlab";
    auto store = LabStore::create(path, storetest::sampleLab());
    REQUIRE(store.has_value());
    const RecordId id = store->saveLaser(storetest::pulsedLaser()).value();
    REQUIRE(store->saveLaser(storetest::cwLaser()).has_value());
    REQUIRE(store->removeLaser(id).has_value());
    CHECK(store->lasers().value().size() == 1);
    CHECK_FALSE(store->laser(id).has_value());
    CHECK(storetest::rawQuery(path, "SELECT count(*) FROM output") == "1");
    CHECK(storetest::rawQuery(path, "SELECT count(*) FROM spectral_sample") == "1");
    CHECK(storetest::rawQuery(path, "SELECT count(*) FROM exposure_case") == "1");
    CHECK_FALSE(store->removeLaser(id).has_value());
}

TEST_CASE("A lab store moves but is never copied", "[store][roundtrip]")
{
    STATIC_REQUIRE_FALSE(std::is_copy_constructible_v<LabStore>);
    STATIC_REQUIRE(std::is_nothrow_move_constructible_v<LabStore>);
    TempDir dir;
    auto store = LabStore::create(dir / "lab.bwlab", storetest::sampleLab());
    REQUIRE(store.has_value());
    LabStore moved = std::move(*store);
    CHECK(moved.lab().value().name == "Larkspur Ridge Photonics Laboratory");
    LabStore other = LabStore::create(dir / "other.bwlab", Lab{0, "Other", "", "", {}}).value();
    other = std::move(moved);
    CHECK(other.lab().value().name == "Larkspur Ridge Photonics Laboratory");
    CHECK(other.path() == dir / "lab.bwlab");
}
