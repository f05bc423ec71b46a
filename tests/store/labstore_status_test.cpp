// The status rules (vocabulary.md): draft -> in review -> approved, or withdrawn; an approved assessment is never
// edited; a change to its laser marks it out of date. Enforced by LabStore and, for other SQLite tools, by triggers.
#include "beamwarden/store/labstore.hpp"
#include "storetestsupport.hpp"

#include <catch2/catch.hpp>

#include <array>

using namespace beamwarden;
using namespace beamwarden::model;
using namespace beamwarden::store;
using namespace beamwarden::units::literals;
using storetest::TempDir;

namespace {

using enum AssessmentStatus;

struct Fixture {
    TempDir dir;
    std::filesystem::path path = dir / "lab.bwlab";
    LabStore store = LabStore::create(path, storetest::sampleLab()).value();
    RecordId laserId = store.saveLaser(storetest::pulsedLaser()).value();
    RecordId otherLaserId = store.saveLaser(storetest::cwLaser()).value();

    RecordId assessmentAt(AssessmentStatus status, RecordId laser = 0)
    {
        const RecordId id = store.saveAssessment(storetest::draftAssessment(laser != 0 ? laser : laserId)).value();
        const auto move = [&](AssessmentStatus from, AssessmentStatus to) {
            REQUIRE(store.signOff(id, SignOff{0, "A. N. Example", "2026-12-02T09:00:00Z", from, to, ""}).has_value());
        };
        if (status == InReview || status == Approved)
            move(Draft, InReview);
        if (status == Approved)
            move(InReview, Approved);
        if (status == Withdrawn)
            move(Draft, Withdrawn);
        return id;
    }

    Assessment get(RecordId id) { return store.assessment(id).value(); }
};

SignOff move(AssessmentStatus from, AssessmentStatus to)
{
    return SignOff{0, "B. Reviewer", "2026-12-03T10:00:00Z", from, to, "comment"};
}

} // namespace

TEST_CASE("Sign-offs move the status only along model::isAllowedTransition", "[store][status]")
{
    constexpr std::array kAll{Draft, InReview, Approved, Withdrawn};
    for (const auto from : kAll) {
        for (const auto to : kAll) {
            if (from == Withdrawn && to == Withdrawn)
                continue;
            Fixture f;
            const RecordId id = f.assessmentAt(from);
            INFO(toString(from) << " -> " << toString(to));
            const auto signed_ = f.store.signOff(id, move(from, to));
            CHECK(signed_.has_value() == isAllowedTransition(from, to));
            CHECK(f.get(id).status == (isAllowedTransition(from, to) ? to : from));
        }
    }
}

TEST_CASE("A sign-off records who, when, from and to, and must start from the current status", "[store][status]")
{
    Fixture f;
    const RecordId id = f.assessmentAt(Draft);
    auto stale = f.store.signOff(id, move(InReview, Approved)); // someone else's view of the status
    REQUIRE_FALSE(stale.has_value());
    CHECK(stale.error().field == "sign_off.from");
    auto nobody = f.store.signOff(id, SignOff{0, "", "", Draft, InReview, ""});
    REQUIRE_FALSE(nobody.has_value());
    CHECK(nobody.error().field == "sign_off.who");

    REQUIRE(f.store.signOff(id, move(Draft, InReview)).has_value());
    REQUIRE(f.store.signOff(id, move(InReview, Draft)).has_value()); // sent back
    REQUIRE(f.store.signOff(id, move(Draft, InReview)).has_value());
    const Assessment a = f.get(id);
    REQUIRE(a.signOffs.size() == 3);
    CHECK(a.signOffs[1].from == InReview);
    CHECK(a.signOffs[1].to == Draft);
    CHECK(a.signOffs[1].who == "B. Reviewer");
    CHECK(a.signOffs[1].comment == "comment");
    CHECK(a.status == InReview);
}

TEST_CASE("An approved assessment is read-only except for out-of-date and withdrawal", "[store][status]")
{
    Fixture f;
    const RecordId id = f.assessmentAt(Approved);
    Assessment edited = f.get(id);
    edited.title = "changed after approval";

    auto saved = f.store.saveAssessment(edited);
    REQUIRE_FALSE(saved.has_value());
    CHECK(saved.error().field == "status");
    CHECK(f.get(id).title == "Amplifier A1, all outputs");

    // Past the store, the trigger refuses the same edit, and the removal of the record or its history.
    CHECK_THAT(storetest::rawSql(f.path, "UPDATE assessment SET results = '{}'"), Catch::Contains("read-only"));
    CHECK_THAT(storetest::rawSql(f.path, "UPDATE assessment SET status = 'draft'"),
               Catch::Contains("only with a sign-off"));
    CHECK_THAT(storetest::rawSql(f.path, "DELETE FROM assessment"), Catch::Contains("kept as a record"));
    CHECK_THAT(storetest::rawSql(f.path, "DELETE FROM sign_off"), Catch::Contains("kept as records"));
    CHECK_THAT(storetest::rawSql(f.path, "UPDATE sign_off SET who = 'someone else'"), Catch::Contains("never edited"));
    CHECK_THAT(storetest::rawSql(f.path, "INSERT INTO sign_off (assessment_id, who, signed_at, from_status, to_status,"
                                         " comment) VALUES (1, 'x', '2026-12-04T00:00:00Z', 'approved', 'draft', '')"),
               Catch::Contains("allowed move"));

    // What stays possible: the out-of-date mark (through a laser change) and a withdrawal sign-off.
    Laser laser = f.store.laser(f.laserId).value();
    laser.outputs[0].emission.averagePower = 4.2_W;
    laser.outputs[0].emission.pulseEnergy = 4.2_mJ;
    REQUIRE(f.store.saveLaser(laser).has_value());
    CHECK(f.get(id).outOfDate);
    CHECK_THAT(storetest::rawSql(f.path, "UPDATE assessment SET out_of_date = 0"), Catch::Contains("never cleared"));
    REQUIRE(f.store.signOff(id, move(Approved, Withdrawn)).has_value());
    const Assessment withdrawn = f.get(id);
    CHECK(withdrawn.status == Withdrawn);
    CHECK(withdrawn.outOfDate);
    CHECK(withdrawn.title == "Amplifier A1, all outputs");
    CHECK_FALSE(f.store.saveAssessment(withdrawn).has_value());
    CHECK(f.store.check().value().sound());
}

TEST_CASE("Drafts and assessments in review can be edited, and their status is the store's", "[store][status]")
{
    Fixture f;
    const RecordId id = f.assessmentAt(InReview);
    Assessment a = f.get(id);
    a.results = R"({"outputs":[]})";
    REQUIRE(f.store.saveAssessment(a).has_value());
    CHECK(f.get(id).results == R"({"outputs":[]})");
    a.status = Approved; // a status change through saveAssessment is refused: it needs a sign-off
    auto refused = f.store.saveAssessment(a);
    REQUIRE_FALSE(refused.has_value());
    CHECK(refused.error().field == "status");
    CHECK(f.get(id).status == InReview);
}

TEST_CASE("A change to a laser marks only its approved assessments out of date", "[store][status]")
{
    Fixture f;
    const RecordId approved = f.assessmentAt(Approved);
    const RecordId draft = f.assessmentAt(Draft);
    const RecordId otherApproved = f.assessmentAt(Approved, f.otherLaserId);
    const auto marked = [&] { return f.get(approved).outOfDate; };

    SECTION("saving the laser unchanged, or editing only its notes, changes nothing")
    {
        Laser laser = f.store.laser(f.laserId).value();
        REQUIRE(f.store.saveLaser(laser).has_value());
        for (Output& output : laser.outputs) // the same content under new ids is still the same laser
            output.id = 0;
        REQUIRE(f.store.saveLaser(laser).has_value());
        laser.notes = "cleaned the compressor gratings";
        REQUIRE(f.store.saveLaser(laser).has_value());
        CHECK_FALSE(marked());
    }
    SECTION("a new serial")
    {
        Laser laser = f.store.laser(f.laserId).value();
        laser.serial = "SN-REPLACED";
        REQUIRE(f.store.saveLaser(laser).has_value());
        CHECK(marked());
    }
    SECTION("an exposure case")
    {
        Laser laser = f.store.laser(f.laserId).value();
        laser.outputs[0].exposureCases[3].exposureCase.distance = 0.2_m;
        REQUIRE(f.store.saveLaser(laser).has_value());
        CHECK(marked());
    }
    SECTION("a spectrum sample")
    {
        Laser laser = f.store.laser(f.laserId).value();
        laser.outputs[0].emission.spectrum = singleLine(805_nm);
        REQUIRE(f.store.saveLaser(laser).has_value());
        CHECK(marked());
    }
    SECTION("an output removed")
    {
        Laser laser = f.store.laser(f.laserId).value();
        laser.outputs.pop_back();
        REQUIRE(f.store.saveLaser(laser).has_value());
        CHECK(marked());
    }
    SECTION("a row changed by another SQLite tool")
    {
        REQUIRE(storetest::rawSql(f.path, "UPDATE exposure_case SET distance_m = 3 WHERE output_id IN "
                                          "(SELECT id FROM output WHERE laser_id = " +
                                              std::to_string(f.laserId) + ")")
                    .empty());
        CHECK(marked());
    }
    CHECK_FALSE(f.get(draft).outOfDate);         // a draft describes whatever the laser is now
    CHECK_FALSE(f.get(otherApproved).outOfDate); // another laser's approval is untouched
    CHECK(f.store.check().value().sound());
}

TEST_CASE("A laser with an approved assessment cannot be removed", "[store][status]")
{
    Fixture f;
    const RecordId draft = f.assessmentAt(Draft, f.otherLaserId);
    REQUIRE(f.store.removeLaser(f.otherLaserId).has_value()); // drafts go with their laser
    CHECK_FALSE(f.store.assessment(draft).has_value());

    f.assessmentAt(Approved);
    auto refused = f.store.removeLaser(f.laserId);
    REQUIRE_FALSE(refused.has_value());
    CHECK(refused.error().field == "laser");
    CHECK(f.store.laser(f.laserId).has_value());
    // Past the store, the cascade from the laser meets the assessment's trigger and the whole delete fails.
    CHECK_THAT(storetest::rawSql(f.path, "DELETE FROM laser"), Catch::Contains("kept as a record"));
    CHECK(f.store.lasers().value().size() == 1);
}

TEST_CASE("A new assessment starts as a draft, also past the store", "[store][status]")
{
    Fixture f;
    CHECK_THAT(storetest::rawSql(f.path, "INSERT INTO assessment (laser_id, title, rule_set, program_version, author,"
                                         " created, updated, status, out_of_date, input_snapshot, results) VALUES (" +
                                             std::to_string(f.laserId) +
                                             ", 't', 'strictest', '0.1.0', 'x', '2026-12-01T00:00:00Z', "
                                             "'2026-12-01T00:00:00Z', 'approved', 0, '', '')"),
               Catch::Contains("starts as a draft"));
}
