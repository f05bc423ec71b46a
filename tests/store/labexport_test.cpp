// The lab export: export -> import -> export gives the same bytes (also for the demo lab), and an import checks the
// whole document before writing, names the first bad field by its JSON path and leaves nothing behind.
#include "beamwarden/store/labexport.hpp"
#include "storetestsupport.hpp"

#include <catch2/catch.hpp>
#include <nlohmann/json.hpp>

using namespace beamwarden;
using namespace beamwarden::model;
using namespace beamwarden::store;
using nlohmann::json;
using storetest::TempDir;

namespace {

const std::filesystem::path& demoExport()
{
    // resources/ sits beside tests/ in the source tree.
    static const auto path =
        std::filesystem::path(BEAMWARDEN_TEST_DATA_DIR).parent_path().parent_path() / "resources" / "demo.bwlab.json";
    return path;
}

// A lab with one record of every kind, including an approved, out-of-date and a withdrawn assessment.
std::filesystem::path fullLab(const TempDir& dir)
{
    const auto path = dir / "full.bwlab";
    auto store = LabStore::create(path, storetest::sampleLab()).value();
    const RecordId a1 = store.saveLaser(storetest::pulsedLaser()).value();
    const RecordId h1 = store.saveLaser(storetest::cwLaser()).value();
    REQUIRE(store.saveEyewear(storetest::sampleEyewear()).has_value());
    REQUIRE(store.saveEyewear(EyewearItem{0, "Goggle G5", "", {}, {}, {}, 0, 0, "", "", ""}).has_value());
    const auto sign = [&](RecordId id, AssessmentStatus from, AssessmentStatus to) {
        REQUIRE(store.signOff(id, SignOff{0, "A. N. Example", "2026-12-02T09:00:00Z", from, to, "ok, \"quoted\""})
                    .has_value());
    };
    const RecordId approved = store.saveAssessment(storetest::draftAssessment(a1)).value();
    sign(approved, AssessmentStatus::Draft, AssessmentStatus::InReview);
    sign(approved, AssessmentStatus::InReview, AssessmentStatus::Approved);
    Laser changed = store.laser(a1).value();
    changed.serial = "SN-0099";
    REQUIRE(store.saveLaser(changed).has_value()); // marks the approval out of date
    const RecordId withdrawn = store.saveAssessment(storetest::draftAssessment(h1)).value();
    sign(withdrawn, AssessmentStatus::Draft, AssessmentStatus::Withdrawn);
    REQUIRE(store.saveAssessment(storetest::draftAssessment(h1)).has_value());
    return path;
}

std::string exportOf(const std::filesystem::path& lab, const std::filesystem::path& out)
{
    auto store = LabStore::open(lab);
    REQUIRE(store.has_value());
    REQUIRE(exportLab(*store, out).has_value());
    return storetest::fileBytes(out);
}

// Parses the demo export, lets `edit` break it, and returns the error of importing the result.
InputError importError(const std::function<void(json&)>& edit)
{
    json document = json::parse(storetest::fileBytes(demoExport()));
    edit(document);
    auto parsed = parseLabExport(document.dump());
    REQUIRE_FALSE(parsed.has_value());
    return parsed.error();
}

} // namespace

TEST_CASE("Export, import, export gives the same bytes for every record kind", "[store][lab-export]")
{
    TempDir dir;
    const auto lab = fullLab(dir);
    const std::string first = exportOf(lab, dir / "first.bwlab.json");
    REQUIRE(importLab(dir / "first.bwlab.json", dir / "copy.bwlab").has_value());
    const std::string second = exportOf(dir / "copy.bwlab", dir / "second.bwlab.json");
    CHECK(first == second);

    // And the records themselves came across, statuses and out-of-date marks included.
    auto original = LabStore::open(lab).value().contents().value();
    auto copy = LabStore::open(dir / "copy.bwlab").value().contents().value();
    REQUIRE(copy.lasers.size() == original.lasers.size());
    for (std::size_t i = 0; i < copy.lasers.size(); ++i)
        storetest::checkSameLaser(copy.lasers[i], original.lasers[i]);
    REQUIRE(copy.eyewear.size() == 2);
    storetest::checkSameEyewear(copy.eyewear[0], original.eyewear[0]);
    REQUIRE(copy.assessments.size() == 3);
    for (std::size_t i = 0; i < copy.assessments.size(); ++i)
        storetest::checkSameAssessment(copy.assessments[i], original.assessments[i]);
    CHECK(copy.assessments[0].status == AssessmentStatus::Approved);
    CHECK(copy.assessments[0].outOfDate);
    CHECK(copy.assessments[1].status == AssessmentStatus::Withdrawn);
    CHECK(LabStore::open(dir / "copy.bwlab").value().check().value().sound());
}

TEST_CASE("The export carries the documented keys, in SI units", "[store][lab-export]")
{
    TempDir dir;
    const json document = json::parse(exportOf(fullLab(dir), dir / "out.bwlab.json"));
    CHECK(document["format"] == "beamwarden-lab");
    CHECK(document["version"] == 1);
    const json& output = document["lasers"][0]["outputs"][0];
    // 800 nm = 8e-7 m, 35 fs = 3.5e-14 s, 10 mm = 0.01 m (SI prefixes, BIPM SI brochure)
    CHECK(output["emission"]["spectrum"].size() == 7);
    CHECK(output["emission"]["pulse_duration_s"].get<double>() == 35e-15);
    CHECK(output["emission"]["prf_Hz"].get<double>() == 1e3);
    CHECK(output["beam"]["diameter_m"].get<double>() == 10e-3);
    CHECK(output["beam"]["definition"] == "1/e2");
    CHECK(document["lasers"][0]["outputs"][1]["emission"]["burst"]["pulses_per_burst"] == 10);
    CHECK(document["eyewear"][0]["spectral_od"][0]["from_m"].get<double>() == 740e-9);
    CHECK(document["assessments"][0]["laser"] == "Amplifier A1");
    CHECK(document["assessments"][0]["sign_offs"][1]["to"] == "approved");
    // The snapshot is kept as the exact text that was stored, not re-serialised.
    CHECK(document["assessments"][0]["input_snapshot"] == storetest::draftAssessment(1).inputSnapshot);
}

TEST_CASE("The demo lab imports, checks sound, and round-trips byte for byte", "[store][lab-export][demo]")
{
    REQUIRE(std::filesystem::exists(demoExport()));
    TempDir dir;
    auto store = importLab(demoExport(), dir / "demo.bwlab");
    REQUIRE(store.has_value());
    const auto contents = store->contents().value();
    // vocabulary.md "The demo lab": three rooms, seven lasers; about seven eyewear items
    CHECK(contents.lab.name == "Larkspur Ridge Photonics Laboratory");
    CHECK(contents.lab.rooms.size() == 3);
    REQUIRE(contents.lasers.size() == 7);
    CHECK(contents.lasers[0].name == "Amplifier A1");
    CHECK(contents.lasers[0].outputs.size() == 5);
    CHECK(contents.eyewear.size() == 7);
    for (const Laser& laser : contents.lasers) {
        CHECK_FALSE(laser.room.empty());
        for (const Output& output : laser.outputs)
            CHECK_FALSE(output.exposureCases.empty());
    }
    CHECK(store->check().value().sound());
    // The file in resources/ is itself in the canonical form, so importing and exporting it changes nothing.
    REQUIRE(exportLab(*store, dir / "demo.bwlab.json").has_value());
    CHECK(storetest::fileBytes(dir / "demo.bwlab.json") == storetest::fileBytes(demoExport()));
}

TEST_CASE("An import names the first bad field by its JSON path", "[store][lab-export]")
{
    CHECK(importError([](json& d) { d["lasers"][2]["outputs"][0]["beam"]["diameter_m"] = -0.001; }).field ==
          "lasers[2].outputs[0].beam.diameter_m");
    CHECK(importError([](json& d) {
              d["lasers"][0]["outputs"][1]["emission"]["spectrum"][0]["wavelength_m"] = 1e-7;
          }).field == "lasers[0].outputs[1].emission.spectrum[0].wavelength_m");
    CHECK(importError([](json& d) { d["lasers"][1]["outputs"][0]["emission"]["average_power_W"] = "0.6 W"; }).field ==
          "lasers[1].outputs[0].emission.average_power_W");
    CHECK(importError([](json& d) {
              d["lasers"][3]["outputs"][0]["exposure_cases"][1]["numerical_aperture"] = 1.5;
          }).field == "lasers[3].outputs[0].exposure_cases[1].numerical_aperture");
    CHECK(importError([](json& d) { d["lasers"][4]["outputs"][0]["emission"]["powr_W"] = 1; }).field ==
          "lasers[4].outputs[0].emission.powr_W");
    CHECK(importError([](json& d) { d["lasers"][5]["room"] = "Z999"; }).field == "lasers[5].room");
    CHECK(importError([](json& d) { d["lasers"][6]["name"] = "Amplifier A1"; }).field == "lasers[6].name");
    CHECK(importError([](json& d) { d["lasers"][6]["class"] = "5"; }).field == "lasers[6].class");
    CHECK(importError([](json& d) { d["lasers"][0]["outputs"][0]["beam"].erase("definition"); }).field ==
          "lasers[0].outputs[0].beam.definition");
    CHECK(importError([](json& d) { d["eyewear"][3]["spectral_od"][0]["od"] = -1; }).field ==
          "eyewear[3].spectral_od[0].od");
    CHECK(importError([](json& d) { d["eyewear"][1]["count"] = 2.5; }).field == "eyewear[1].count");
    CHECK(importError([](json& d) { d["eyewear"][6]["name"] = "Goggle G1"; }).field == "eyewear[6].name");
    CHECK(importError([](json& d) { d["eyewear"][0]["last_inspection"] = "10.02.2026"; }).field ==
          "eyewear[0].last_inspection");
    CHECK(importError([](json& d) { d["lab"]["rooms"][1]["name"] = "B112"; }).field == "lab.rooms[1].name");
    CHECK(importError([](json& d) { d["format"] = "something-else"; }).field == "format");
    CHECK(importError([](json& d) { d["unexpected"] = true; }).field == "unexpected");
    const InputError newer = importError([](json& d) { d["version"] = 2; });
    CHECK(newer.field == "version");
    CHECK_THAT(newer.message(), Catch::Contains("newer Beamwarden"));
    // The first bad field wins: here the laser comes before the eyewear.
    CHECK(importError([](json& d) {
              d["lasers"][1]["outputs"][0]["beam"]["divergence_rad"] = -1;
              d["eyewear"][0]["count"] = -1;
          }).field == "lasers[1].outputs[0].beam.divergence_rad");
}

TEST_CASE("An import checks each assessment's history", "[store][lab-export]")
{
    const auto withAssessment = [](json& d, const json& signOffs, const std::string& status) {
        d["assessments"] = json::array({json{{"laser", "Pump P1"},
                                             {"created", "2026-12-01T14:03:00Z"},
                                             {"updated", "2026-12-01T14:03:00Z"},
                                             {"status", status},
                                             {"sign_offs", signOffs}}});
    };
    const json toReview = {{"who", "A"}, {"when", "2026-12-02T09:00:00Z"}, {"from", "draft"}, {"to", "in review"}};
    const json skip = {{"who", "A"}, {"when", "2026-12-02T09:00:00Z"}, {"from", "draft"}, {"to", "approved"}};
    CHECK(importError([&](json& d) { withAssessment(d, json::array({skip}), "approved"); }).field ==
          "assessments[0].sign_offs[0].to");
    CHECK(importError([&](json& d) { withAssessment(d, json::array({toReview}), "approved"); }).field ==
          "assessments[0].status");
    CHECK(importError([&](json& d) {
              withAssessment(d, json::array(), "draft");
              d["assessments"][0]["laser"] = "X";
          }).field == "assessments[0].laser");
    CHECK(importError([&](json& d) {
              withAssessment(d, json::array(), "draft");
              d["assessments"][0]["out_of_date"] = true;
          }).field == "assessments[0].out_of_date");
}

TEST_CASE("A failed import writes nothing", "[store][lab-export]")
{
    TempDir dir;
    json document = json::parse(storetest::fileBytes(demoExport()));
    document["eyewear"][6]["visible_transmittance"] = 2; // the very last record
    storetest::writeBytes(dir / "bad.bwlab.json", document.dump(2));
    auto imported = importLab(dir / "bad.bwlab.json", dir / "lab.bwlab");
    REQUIRE_FALSE(imported.has_value());
    CHECK(imported.error().field == "eyewear[6].visible_transmittance");
    CHECK_FALSE(std::filesystem::exists(dir / "lab.bwlab"));
    CHECK(std::distance(std::filesystem::directory_iterator(dir.path()), std::filesystem::directory_iterator{}) == 1);

    storetest::writeBytes(dir / "broken.bwlab.json", R"({"format": "beamwarden-lab", "version": 1, "lab": )");
    auto broken = importLab(dir / "broken.bwlab.json", dir / "lab.bwlab");
    REQUIRE_FALSE(broken.has_value());
    CHECK(broken.error().field == "document");
    CHECK_FALSE(std::filesystem::exists(dir / "lab.bwlab"));
}

TEST_CASE("An import refuses an existing lab file and leaves it alone", "[store][lab-export]")
{
    TempDir dir;
    storetest::writeBytes(dir / "lab.bwlab", "precious");
    auto imported = importLab(demoExport(), dir / "lab.bwlab");
    REQUIRE_FALSE(imported.has_value());
    CHECK(imported.error().field == "lab file");
    CHECK(storetest::fileBytes(dir / "lab.bwlab") == "precious");
}

TEST_CASE("A hand-written export with defaults left out imports", "[store][lab-export]")
{
    const auto parsed = parseLabExport(R"({
        "format": "beamwarden-lab", "version": 1,
        "lab": {"name": "Minimal lab"},
        "lasers": [{"name": "Diode", "outputs": [{"name": "beam",
            "emission": {"spectrum": [{"wavelength_m": 635e-9}], "average_power_W": 0.0009},
            "beam": {"diameter_m": 0.003, "divergence_rad": 0.001, "definition": "1/e2"}}]}]
    })");
    REQUIRE(parsed.has_value());
    REQUIRE(parsed->lasers.size() == 1);
    const Output& output = parsed->lasers[0].outputs[0];
    CHECK(output.emission.spectrum.samples[0].powerFraction == 1.0);
    CHECK_FALSE(output.emission.pulsed);
    CHECK(output.beam.profile == BeamProfile::Unknown);
    CHECK(parsed->lasers[0].laserClass == LaserClass::Unknown);
    CHECK(parsed->eyewear.empty());
}
