#include "storetestsupport.hpp"

#include <sqlite3.h>

#include <cstdlib>
#include <fstream>
#include <sstream>
#include <stdexcept>

namespace storetest {

using namespace beamwarden;
using namespace beamwarden::model;
using namespace beamwarden::units::literals;

TempDir::TempDir()
{
    std::string pattern = (std::filesystem::temp_directory_path() / "bw-store-test-XXXXXX").string();
    if (mkdtemp(pattern.data()) == nullptr)
        throw std::runtime_error("could not create a temporary folder");
    m_path = pattern;
}

TempDir::~TempDir()
{
    std::error_code ignored;
    std::filesystem::remove_all(m_path, ignored);
}

std::string fileBytes(const std::filesystem::path& path)
{
    std::ifstream in(path, std::ios::binary);
    std::ostringstream bytes;
    bytes << in.rdbuf();
    return bytes.str();
}

void writeBytes(const std::filesystem::path& path, const std::string& bytes)
{
    std::ofstream out(path, std::ios::binary | std::ios::trunc);
    out.write(bytes.data(), static_cast<std::streamsize>(bytes.size()));
}

std::string rawSql(const std::filesystem::path& path, const std::string& sql)
{
    sqlite3* db = nullptr;
    if (sqlite3_open_v2(path.c_str(), &db, SQLITE_OPEN_READWRITE, nullptr) != SQLITE_OK) {
        sqlite3_close(db);
        return "could not open";
    }
    char* message = nullptr;
    sqlite3_exec(db, "PRAGMA foreign_keys = ON", nullptr, nullptr, nullptr);
    const int code = sqlite3_exec(db, sql.c_str(), nullptr, nullptr, &message);
    std::string error = code == SQLITE_OK ? "" : (message != nullptr ? message : "failed");
    sqlite3_free(message);
    sqlite3_close(db);
    return error;
}

std::string rawQuery(const std::filesystem::path& path, const std::string& sql)
{
    sqlite3* db = nullptr;
    std::string result;
    if (sqlite3_open_v2(path.c_str(), &db, SQLITE_OPEN_READONLY, nullptr) == SQLITE_OK) {
        sqlite3_stmt* statement = nullptr;
        if (sqlite3_prepare_v2(db, sql.c_str(), -1, &statement, nullptr) == SQLITE_OK &&
            sqlite3_step(statement) == SQLITE_ROW) {
            const auto* text = sqlite3_column_text(statement, 0);
            result = text != nullptr ? reinterpret_cast<const char*>(text) : "";
        }
        sqlite3_finalize(statement);
    }
    sqlite3_close(db);
    return result;
}

Lab sampleLab()
{
    Lab lab;
    lab.name = "Larkspur Ridge Photonics Laboratory";
    lab.lsoName = "A. N. Example";
    lab.notes = "test lab";
    lab.rooms = {{0, "B112", "ultrafast"}, {0, "B114", "spectroscopy"}, {0, "T03", "teaching"}};
    return lab;
}

namespace {

NamedExposureCase namedCase(const std::string& name, Viewing viewing)
{
    NamedExposureCase c;
    c.name = name;
    c.exposureCase.viewing = viewing;
    c.exposureCase.exposure = 0.25_s;
    c.exposureCase.distance = 1.5_m;
    switch (viewing) {
    case Viewing::Lens:
        c.exposureCase.focalLength = 50_mm;
        break;
    case Viewing::Fibre:
        c.exposureCase.numericalAperture = 0.12;
        break;
    case Viewing::Diffuse:
        c.exposureCase.reflectance = 0.9;
        c.exposureCase.viewingAngle = units::Angle::fromSi(0.3);
        break;
    case Viewing::Specular:
        c.exposureCase.reflectance = 0.04;
        break;
    case Viewing::Aided:
        c.exposureCase.magnification = 7;
        c.exposureCase.objectiveDiameter = 50_mm;
        c.exposureCase.transmission = 0.8;
        break;
    case Viewing::Direct:
        break;
    }
    return c;
}

} // namespace

Laser pulsedLaser(const std::string& name)
{
    Laser laser;
    laser.name = name;
    laser.makerModel = "Ti:sapphire amplifier (invented)";
    laser.serial = "SN-0001";
    laser.room = "B112";
    laser.laserClass = LaserClass::Class4;
    laser.notes = "notes with \"quotes\", commas, and ünïcödé";

    Output fundamental;
    fundamental.name = "fundamental";
    fundamental.emission.spectrum = gaussianBand(800_nm, 27_nm, 7).value();
    fundamental.emission.pulsed = true;
    fundamental.emission.pulseDuration = 35_fs;
    fundamental.emission.prf = 1_kHz;
    fundamental.emission.pulseEnergy = 4_mJ;
    fundamental.emission.averagePower = 4_W;
    fundamental.beam =
        Beam{10_mm, units::Angle::fromSi(0.5e-3), BeamDefinition::OneOverESquared, BeamProfile::Gaussian};
    for (const auto& [caseName, viewing] :
         {std::pair{"intrabeam", Viewing::Direct}, std::pair{"through a lens", Viewing::Lens},
          std::pair{"fibre end", Viewing::Fibre}, std::pair{"diffuse", Viewing::Diffuse},
          std::pair{"specular", Viewing::Specular}, std::pair{"binoculars", Viewing::Aided}})
        fundamental.exposureCases.push_back(namedCase(caseName, viewing));
    laser.outputs.push_back(fundamental);

    Output shg;
    shg.name = "SHG";
    shg.emission.spectrum = singleLine(400_nm);
    shg.emission.pulsed = true;
    shg.emission.pulseDuration = 120_fs;
    shg.emission.prf = 10_kHz;
    shg.emission.burst = BurstPattern{10, 100_Hz};
    shg.emission.pulseEnergy = 1.2_mJ; // power left 0: completeAndValidate fills it when the figures are computed
    shg.beam = Beam{8_mm, units::Angle::fromSi(0.6e-3), BeamDefinition::OneOverE, BeamProfile::FlatTop};
    shg.exposureCases.push_back(namedCase("intrabeam", Viewing::Direct));
    laser.outputs.push_back(shg);
    return laser;
}

Laser cwLaser(const std::string& name)
{
    Laser laser;
    laser.name = name;
    laser.makerModel = "HeNe (invented)";
    laser.room = "T03";
    laser.laserClass = LaserClass::Class3R;
    Output beam;
    beam.name = "beam";
    beam.emission.spectrum = singleLine(632.8_nm);
    beam.emission.averagePower = 4_mW;
    beam.beam = Beam{0.8_mm, units::Angle::fromSi(1.2e-3), BeamDefinition::OneOverESquared, BeamProfile::Gaussian};
    beam.exposureCases.push_back(namedCase("intrabeam", Viewing::Direct));
    laser.outputs.push_back(beam);
    return laser;
}

EyewearItem sampleEyewear(const std::string& name)
{
    EyewearItem item;
    item.name = name;
    item.description = "absorbing glass";
    item.spectralOd = {OdRow{740_nm, 1100_nm, 7, true}, OdRow{1100_nm, 1300_nm, 4.5, false}};
    item.en207Markings = {"740-1100 D LB7 + IR LB8 + M LB8", "1100-1300 D LB4"};
    item.en208Markings = {"1 W 2x10^-4 J 632-640 RB3"};
    item.visibleTransmittance = 0.25;
    item.count = 6;
    item.location = "B112 cabinet";
    item.lastInspection = "2026-02-28";
    item.notes = "inspected";
    return item;
}

Assessment draftAssessment(RecordId laserId)
{
    Assessment a;
    a.laserId = laserId;
    a.title = "Amplifier A1, all outputs";
    a.ruleSet = "strictest";
    a.programVersion = "0.1.0";
    a.author = "A. N. Example";
    a.created = "2026-12-01T14:03:00Z";
    a.updated = "2026-12-01T14:05:30Z";
    a.inputSnapshot = R"({"laser":{"name":"Amplifier A1"},"c5":"conservative"})";
    a.results = R"({"outputs":[{"name":"fundamental","nohd_m":1234.5}]})";
    return a;
}

} // namespace storetest

#include <catch2/catch.hpp>

namespace storetest {

void checkSameLaser(const Laser& a, const Laser& b, bool withIds)
{
    if (withIds)
        CHECK(a.id == b.id);
    CHECK(a.name == b.name);
    CHECK(a.makerModel == b.makerModel);
    CHECK(a.serial == b.serial);
    CHECK(a.room == b.room);
    CHECK(a.laserClass == b.laserClass);
    CHECK(a.notes == b.notes);
    REQUIRE(a.outputs.size() == b.outputs.size());
    for (std::size_t i = 0; i < a.outputs.size(); ++i) {
        INFO("output " << i);
        const Output& x = a.outputs[i];
        const Output& y = b.outputs[i];
        if (withIds)
            CHECK(x.id == y.id);
        CHECK(x.name == y.name);
        CHECK(x.emission.pulsed == y.emission.pulsed);
        CHECK(x.emission.averagePower == y.emission.averagePower);
        CHECK(x.emission.pulseEnergy == y.emission.pulseEnergy);
        CHECK(x.emission.pulseDuration == y.emission.pulseDuration);
        CHECK(x.emission.prf == y.emission.prf);
        REQUIRE(x.emission.burst.has_value() == y.emission.burst.has_value());
        if (x.emission.burst) {
            CHECK(x.emission.burst->pulsesPerBurst == y.emission.burst->pulsesPerBurst);
            CHECK(x.emission.burst->burstRate == y.emission.burst->burstRate);
        }
        REQUIRE(x.emission.spectrum.samples.size() == y.emission.spectrum.samples.size());
        for (std::size_t k = 0; k < x.emission.spectrum.samples.size(); ++k) {
            CHECK(x.emission.spectrum.samples[k].wavelength == y.emission.spectrum.samples[k].wavelength);
            CHECK(x.emission.spectrum.samples[k].powerFraction == y.emission.spectrum.samples[k].powerFraction);
            CHECK(x.emission.spectrum.samples[k].width == y.emission.spectrum.samples[k].width);
        }
        CHECK(x.beam.diameter == y.beam.diameter);
        CHECK(x.beam.divergence == y.beam.divergence);
        CHECK(x.beam.definition == y.beam.definition);
        CHECK(x.beam.profile == y.beam.profile);
        REQUIRE(x.exposureCases.size() == y.exposureCases.size());
        for (std::size_t k = 0; k < x.exposureCases.size(); ++k) {
            INFO("case " << k);
            const NamedExposureCase& p = x.exposureCases[k];
            const NamedExposureCase& q = y.exposureCases[k];
            if (withIds)
                CHECK(p.id == q.id);
            CHECK(p.name == q.name);
            CHECK(p.exposureCase.viewing == q.exposureCase.viewing);
            CHECK(p.exposureCase.exposure == q.exposureCase.exposure);
            CHECK(p.exposureCase.distance == q.exposureCase.distance);
            CHECK(p.exposureCase.focalLength == q.exposureCase.focalLength);
            CHECK(p.exposureCase.numericalAperture == q.exposureCase.numericalAperture);
            CHECK(p.exposureCase.reflectance == q.exposureCase.reflectance);
            CHECK(p.exposureCase.viewingAngle == q.exposureCase.viewingAngle);
            CHECK(p.exposureCase.magnification == q.exposureCase.magnification);
            CHECK(p.exposureCase.objectiveDiameter == q.exposureCase.objectiveDiameter);
            CHECK(p.exposureCase.transmission == q.exposureCase.transmission);
        }
    }
}

void checkSameEyewear(const EyewearItem& a, const EyewearItem& b)
{
    CHECK(a.name == b.name);
    CHECK(a.description == b.description);
    REQUIRE(a.spectralOd.size() == b.spectralOd.size());
    for (std::size_t i = 0; i < a.spectralOd.size(); ++i) {
        CHECK(a.spectralOd[i].from == b.spectralOd[i].from);
        CHECK(a.spectralOd[i].to == b.spectralOd[i].to);
        CHECK(a.spectralOd[i].od == b.spectralOd[i].od);
        CHECK(a.spectralOd[i].atLeast == b.spectralOd[i].atLeast);
    }
    CHECK(a.en207Markings == b.en207Markings);
    CHECK(a.en208Markings == b.en208Markings);
    CHECK(a.visibleTransmittance == b.visibleTransmittance);
    CHECK(a.count == b.count);
    CHECK(a.location == b.location);
    CHECK(a.lastInspection == b.lastInspection);
    CHECK(a.notes == b.notes);
}

void checkSameAssessment(const Assessment& a, const Assessment& b)
{
    CHECK(a.laserId == b.laserId);
    CHECK(a.title == b.title);
    CHECK(a.ruleSet == b.ruleSet);
    CHECK(a.programVersion == b.programVersion);
    CHECK(a.author == b.author);
    CHECK(a.created == b.created);
    CHECK(a.updated == b.updated);
    CHECK(a.status == b.status);
    CHECK(a.outOfDate == b.outOfDate);
    CHECK(a.inputSnapshot == b.inputSnapshot);
    CHECK(a.results == b.results);
    REQUIRE(a.signOffs.size() == b.signOffs.size());
    for (std::size_t i = 0; i < a.signOffs.size(); ++i) {
        CHECK(a.signOffs[i].who == b.signOffs[i].who);
        CHECK(a.signOffs[i].when == b.signOffs[i].when);
        CHECK(a.signOffs[i].from == b.signOffs[i].from);
        CHECK(a.signOffs[i].to == b.signOffs[i].to);
        CHECK(a.signOffs[i].comment == b.signOffs[i].comment);
    }
}

} // namespace storetest
