// Impossible values are refused twice: by LabStore before writing (naming the field), and by the file's own CHECK
// constraints when another SQLite tool writes to it. The ranges are physical facts or the model's (records.hpp):
// power and counts are not negative, wavelengths lie in 180 nm to 1 mm (the range the rule sets cover, IEC 60825-1
// Table A.1), OD >= 0 (OD = -log10 T), transmittances lie in 0..1.
#include "beamwarden/store/labstore.hpp"
#include "storetestsupport.hpp"

#include <catch2/catch.hpp>

using namespace beamwarden;
using namespace beamwarden::model;
using namespace beamwarden::store;
using namespace beamwarden::units::literals;
using storetest::TempDir;

namespace {

struct Fixture {
    TempDir dir;
    std::filesystem::path path = dir / "lab.bwlab";
    LabStore store = LabStore::create(path, storetest::sampleLab()).value();
};

void requireRefused(const Result<RecordId>& saved, const std::string& field)
{
    REQUIRE_FALSE(saved.has_value());
    CHECK(saved.error().field == field);
}

// A raw write the file itself must refuse with a constraint error.
void requireFileRefuses(const std::filesystem::path& path, const std::string& sql, const std::string& reason)
{
    const std::string error = storetest::rawSql(path, sql);
    INFO(sql);
    CHECK_THAT(error, Catch::Contains(reason));
}

} // namespace

TEST_CASE("LabStore refuses impossible laser values and names the field", "[store][constraints]")
{
    Fixture f;
    Laser laser = storetest::pulsedLaser();

    SECTION("negative power")
    {
        laser.outputs[1].emission.averagePower = units::Power::fromSi(-1.0);
        requireRefused(f.store.saveLaser(laser), "outputs[1].emission.average_power_W");
    }
    SECTION("wavelength below 180 nm")
    {
        laser.outputs[1].emission.spectrum = singleLine(170_nm);
        requireRefused(f.store.saveLaser(laser), "outputs[1].emission.spectrum[0].wavelength_m");
    }
    SECTION("wavelength above 1 mm")
    {
        laser.outputs[1].emission.spectrum = singleLine(units::Wavelength::fromSi(2e-3));
        requireRefused(f.store.saveLaser(laser), "outputs[1].emission.spectrum[0].wavelength_m");
    }
    SECTION("power fractions that do not add up to 1")
    {
        laser.outputs[0].emission.spectrum.samples[0].powerFraction += 0.1;
        requireRefused(f.store.saveLaser(laser), "outputs[0].emission.spectrum");
    }
    SECTION("zero beam diameter")
    {
        laser.outputs[0].beam.diameter = units::Length::fromSi(0.0);
        requireRefused(f.store.saveLaser(laser), "outputs[0].beam.diameter_m");
    }
    SECTION("NA of 1 or more")
    {
        laser.outputs[0].exposureCases[2].exposureCase.numericalAperture = 1.2;
        requireRefused(f.store.saveLaser(laser), "outputs[0].exposure_cases[2].numerical_aperture");
    }
    SECTION("reflectance above 1 on a case that does not use it")
    {
        laser.outputs[0].exposureCases[0].exposureCase.reflectance = 1.5;
        requireRefused(f.store.saveLaser(laser), "outputs[0].exposure_cases[0].reflectance");
    }
    SECTION("a burst of no pulses")
    {
        laser.outputs[1].emission.burst->pulsesPerBurst = 0;
        requireRefused(f.store.saveLaser(laser), "outputs[1].emission.burst.pulses_per_burst");
    }
    SECTION("an empty name, a duplicate output name, no outputs")
    {
        Laser unnamed = laser;
        unnamed.name = "  ";
        requireRefused(f.store.saveLaser(unnamed), "name");
        Laser twins = laser;
        twins.outputs[1].name = twins.outputs[0].name;
        requireRefused(f.store.saveLaser(twins), "outputs[1].name");
        Laser empty = laser;
        empty.outputs.clear();
        requireRefused(f.store.saveLaser(empty), "outputs");
    }
    SECTION("a room the lab does not have")
    {
        laser.room = "Z999";
        requireRefused(f.store.saveLaser(laser), "room");
    }
    SECTION("a second laser of the same name")
    {
        REQUIRE(f.store.saveLaser(laser).has_value());
        requireRefused(f.store.saveLaser(laser), "name");
    }
    SECTION("an id no laser has")
    {
        laser.id = 4711;
        requireRefused(f.store.saveLaser(laser), "id");
    }
    CHECK(f.store.lasers().value().size() <= 1);
}

TEST_CASE("The wavelength range ends are accepted, by the store and by the file", "[store][constraints]")
{
    // 180 nm and 1 mm are inside the range (IEC 60825-1 covers 180 nm to 1 mm); SQLite must read the bounds in its
    // CHECK text as the same doubles as C++ does, or an edge value would pass one check and fail the other.
    Fixture f;
    Laser laser = storetest::cwLaser();
    laser.outputs[0].emission.spectrum = singleLine(180_nm);
    Output far = laser.outputs[0];
    far.name = "far infrared";
    far.emission.spectrum = singleLine(units::Wavelength::fromSi(1e-3));
    laser.outputs.push_back(far);
    CHECK(f.store.saveLaser(laser).has_value());
}

TEST_CASE("LabStore refuses impossible eyewear values and names the field", "[store][constraints]")
{
    Fixture f;
    EyewearItem item = storetest::sampleEyewear();
    SECTION("negative OD")
    {
        item.spectralOd[1].od = -1;
        requireRefused(f.store.saveEyewear(item), "spectral_od[1].od");
    }
    SECTION("a band that ends before it starts")
    {
        item.spectralOd[0].to = 700_nm;
        requireRefused(f.store.saveEyewear(item), "spectral_od[0].to_m");
    }
    SECTION("visible transmittance above 1")
    {
        item.visibleTransmittance = 1.5;
        requireRefused(f.store.saveEyewear(item), "visible_transmittance");
    }
    SECTION("a negative count")
    {
        item.count = -1;
        requireRefused(f.store.saveEyewear(item), "count");
    }
    SECTION("a date that does not exist")
    {
        item.lastInspection = "2026-02-30";
        requireRefused(f.store.saveEyewear(item), "last_inspection");
    }
    SECTION("an empty marking")
    {
        item.en208Markings.push_back(" ");
        requireRefused(f.store.saveEyewear(item), "en208[1]");
    }
    SECTION("a second item of the same name")
    {
        REQUIRE(f.store.saveEyewear(item).has_value());
        requireRefused(f.store.saveEyewear(item), "name");
    }
    SECTION("a batch with one bad item saves none")
    {
        EyewearItem bad = storetest::sampleEyewear("Goggle G2");
        bad.count = -3;
        const std::vector<EyewearItem> batch{item, bad};
        auto saved = f.store.saveEyewear(std::span<const EyewearItem>(batch));
        REQUIRE_FALSE(saved.has_value());
        CHECK(saved.error().field == "eyewear[1].count");
    }
    CHECK(f.store.eyewear().value().size() <= 1);
}

TEST_CASE("LabStore refuses malformed assessment content", "[store][constraints]")
{
    Fixture f;
    Assessment a = storetest::draftAssessment(f.store.saveLaser(storetest::cwLaser()).value());
    Assessment badTime = a;
    badTime.created = "1 December 2026";
    requireRefused(f.store.saveAssessment(badTime), "created");
    Assessment badJson = a;
    badJson.results = "{not json";
    requireRefused(f.store.saveAssessment(badJson), "results");
    Assessment noLaser = a;
    noLaser.laserId = 999;
    requireRefused(f.store.saveAssessment(noLaser), "laser");
    Assessment approved = a;
    approved.status = AssessmentStatus::Approved;
    requireRefused(f.store.saveAssessment(approved), "status");
}

TEST_CASE("The lab file's own constraints refuse impossible rows written past the store", "[store][constraints]")
{
    Fixture f;
    const RecordId laserId = f.store.saveLaser(storetest::cwLaser()).value();
    const RecordId itemId = f.store.saveEyewear(storetest::sampleEyewear()).value();
    REQUIRE(f.store.saveAssessment(storetest::draftAssessment(laserId)).has_value());
    const auto path = f.path;

    requireFileRefuses(path, "UPDATE output SET average_power_W = -1", "CHECK constraint failed");
    requireFileRefuses(path, "UPDATE output SET average_power_W = 'a lot'", "cannot store TEXT value in REAL");
    requireFileRefuses(path, "UPDATE output SET average_power_W = 1e999", "CHECK constraint failed");
    requireFileRefuses(path, "UPDATE output SET beam_diameter_m = 0", "CHECK constraint failed");
    requireFileRefuses(path, "UPDATE spectral_sample SET wavelength_m = 170e-9", "CHECK constraint failed");
    requireFileRefuses(path, "UPDATE spectral_sample SET wavelength_m = 2e-3", "CHECK constraint failed");
    requireFileRefuses(path, "UPDATE exposure_case SET numerical_aperture = 1", "CHECK constraint failed");
    requireFileRefuses(path, "UPDATE eyewear_od SET od = -0.5", "CHECK constraint failed");
    requireFileRefuses(path, "UPDATE eyewear SET visible_transmittance = 1.01", "CHECK constraint failed");
    requireFileRefuses(path, "UPDATE eyewear SET count = -1", "CHECK constraint failed");
    requireFileRefuses(path, "INSERT INTO eyewear_marking VALUES (" + std::to_string(itemId) + ", 'en166', 9, 'x')",
                       "CHECK constraint failed");
    requireFileRefuses(path, "UPDATE laser SET class = '5'", "CHECK constraint failed");
    // Triggers run before CHECK constraints, so an unknown status meets the sign-off rule first.
    requireFileRefuses(path, "UPDATE assessment SET status = 'finished'", "only with a sign-off");
    requireFileRefuses(path, "UPDATE assessment SET results = '{broken'", "CHECK constraint failed");
    requireFileRefuses(path,
                       "INSERT INTO output (laser_id, position, name, pulsed, average_power_W, pulse_energy_J, "
                       "pulse_duration_s, prf_Hz, beam_diameter_m, beam_divergence_rad, beam_definition, "
                       "beam_profile) VALUES (9999, 5, 'orphan', 0, 1, 0, 0, 0, 0.001, 0, '1/e', 'unknown')",
                       "FOREIGN KEY constraint failed");
    requireFileRefuses(path, "INSERT INTO lab (id, name, lso_name, notes) VALUES (2, 'second lab', '', '')",
                       "CHECK constraint failed");

    // Nothing of the refused writes got in: the file is still sound.
    auto report = f.store.check();
    REQUIRE(report.has_value());
    CHECK(report->sound());
}
