// Lasers and eyewear items from lab-export JSON: every key type-checked, unknown keys refused, defaults from the
// model where the schema allows a key to be left out (docs/lab-export.md).
#include "store/labjsonread.hpp"

#include "store/jsonfields.hpp"
#include "store/recordcheck.hpp"
#include "store/tryresult.hpp"

namespace beamwarden::store {

using nlohmann::json;

namespace {

Result<model::SpectralSample> readSample(const json& value, const std::string& path)
{
    BW_TRY(f, JsonFields::of(value, path));
    BW_TRY(wavelength, f.number("wavelength_m"));
    BW_TRY(fraction, f.number("power_fraction", 1.0));
    BW_TRY(width, f.number("width_m", 0.0));
    BW_CHECK(f.noOtherKeys());
    return model::SpectralSample{units::Wavelength::fromSi(wavelength), fraction, units::Wavelength::fromSi(width)};
}

Result<model::Emission> readEmission(const json& value, const std::string& path)
{
    BW_TRY(f, JsonFields::of(value, path));
    model::Emission e;
    BW_TRY(spectrum, f.list("spectrum", true));
    for (std::size_t i = 0; i < spectrum->size(); ++i) {
        BW_TRY(sample, readSample((*spectrum)[i], indexPath(path, "spectrum", i)));
        e.spectrum.samples.push_back(sample);
    }
    BW_TRY(pulsed, f.flag("pulsed", false));
    BW_TRY(power, f.number("average_power_W", 0.0));
    BW_TRY(energy, f.number("pulse_energy_J", 0.0));
    BW_TRY(duration, f.number("pulse_duration_s", 0.0));
    BW_TRY(prf, f.number("prf_Hz", 0.0));
    e.pulsed = pulsed;
    e.averagePower = units::Power::fromSi(power);
    e.pulseEnergy = units::Energy::fromSi(energy);
    e.pulseDuration = units::Duration::fromSi(duration);
    e.prf = units::Frequency::fromSi(prf);
    BW_TRY(burst, f.object("burst"));
    if (burst != nullptr) {
        BW_TRY(b, JsonFields::of(*burst, f.pathOf("burst")));
        BW_TRY(pulses, b.integer("pulses_per_burst"));
        BW_TRY(rate, b.number("burst_rate_Hz"));
        BW_CHECK(b.noOtherKeys());
        e.burst = model::BurstPattern{pulses, units::Frequency::fromSi(rate)};
    }
    BW_CHECK(f.noOtherKeys());
    return e;
}

Result<model::Beam> readBeam(const json& value, const std::string& path)
{
    BW_TRY(f, JsonFields::of(value, path));
    BW_TRY(diameter, f.number("diameter_m"));
    BW_TRY(divergence, f.number("divergence_rad"));
    // No default for the definition: a wrong guess moves every distance by a factor of sqrt 2.
    BW_TRY(definitionText, f.text("definition"));
    BW_TRY(definition, parsedAs(model::parseBeamDefinition(definitionText), f.pathOf("definition")));
    BW_TRY(profileText, f.text("profile", "unknown"));
    BW_TRY(profile, parsedAs(model::parseBeamProfile(profileText), f.pathOf("profile")));
    BW_CHECK(f.noOtherKeys());
    return model::Beam{units::Length::fromSi(diameter), units::Angle::fromSi(divergence), definition, profile};
}

Result<model::NamedExposureCase> readCase(const json& value, const std::string& path)
{
    BW_TRY(f, JsonFields::of(value, path));
    const model::ExposureCase defaults;
    model::NamedExposureCase named;
    BW_TRY(name, f.text("name"));
    BW_TRY(viewingText, f.text("viewing"));
    BW_TRY(viewing, parsedAs(model::parseViewing(viewingText), f.pathOf("viewing")));
    BW_TRY(exposure, f.number("exposure_s", 0.0));
    BW_TRY(distance, f.number("distance_m", 0.0));
    BW_TRY(focal, f.number("focal_length_m", 0.0));
    BW_TRY(na, f.number("numerical_aperture", defaults.numericalAperture));
    BW_TRY(reflectance, f.number("reflectance", defaults.reflectance));
    BW_TRY(angle, f.number("viewing_angle_rad", 0.0));
    BW_TRY(magnification, f.number("magnification", defaults.magnification));
    BW_TRY(objective, f.number("objective_diameter_m", 0.0));
    BW_TRY(transmission, f.number("transmission", defaults.transmission));
    BW_CHECK(f.noOtherKeys());
    named.name = name;
    model::ExposureCase& c = named.exposureCase;
    c.viewing = viewing;
    c.exposure = units::Duration::fromSi(exposure);
    c.distance = units::Length::fromSi(distance);
    c.focalLength = units::Length::fromSi(focal);
    c.numericalAperture = na;
    c.reflectance = reflectance;
    c.viewingAngle = units::Angle::fromSi(angle);
    c.magnification = magnification;
    c.objectiveDiameter = units::Length::fromSi(objective);
    c.transmission = transmission;
    return named;
}

Result<model::Output> readOutput(const json& value, const std::string& path)
{
    BW_TRY(f, JsonFields::of(value, path));
    model::Output output;
    BW_TRY(name, f.text("name"));
    output.name = name;
    BW_TRY(emission, f.object("emission", true));
    BW_TRY(parsedEmission, readEmission(*emission, f.pathOf("emission")));
    output.emission = parsedEmission;
    BW_TRY(beam, f.object("beam", true));
    BW_TRY(parsedBeam, readBeam(*beam, f.pathOf("beam")));
    output.beam = parsedBeam;
    BW_TRY(cases, f.list("exposure_cases"));
    for (std::size_t i = 0; i < cases->size(); ++i) {
        BW_TRY(c, readCase((*cases)[i], indexPath(path, "exposure_cases", i)));
        output.exposureCases.push_back(std::move(c));
    }
    BW_CHECK(f.noOtherKeys());
    return output;
}

} // namespace

Result<model::Laser> laserFromJson(const json& value, const std::string& path)
{
    BW_TRY(f, JsonFields::of(value, path));
    model::Laser laser;
    BW_TRY(name, f.text("name"));
    BW_TRY(makerModel, f.text("maker_model", ""));
    BW_TRY(serial, f.text("serial", ""));
    BW_TRY(room, f.text("room", ""));
    BW_TRY(classText, f.text("class", "unknown"));
    BW_TRY(laserClass, parsedAs(model::parseLaserClass(classText), f.pathOf("class")));
    BW_TRY(notes, f.text("notes", ""));
    laser.name = name;
    laser.makerModel = makerModel;
    laser.serial = serial;
    laser.room = room;
    laser.laserClass = laserClass;
    laser.notes = notes;
    BW_TRY(outputs, f.list("outputs", true));
    for (std::size_t i = 0; i < outputs->size(); ++i) {
        BW_TRY(output, readOutput((*outputs)[i], indexPath(path, "outputs", i)));
        laser.outputs.push_back(std::move(output));
    }
    BW_CHECK(f.noOtherKeys());
    return laser;
}

namespace {

Result<model::OdRow> readOdRow(const json& value, const std::string& path)
{
    BW_TRY(f, JsonFields::of(value, path));
    BW_TRY(from, f.number("from_m"));
    BW_TRY(to, f.number("to_m"));
    BW_TRY(od, f.number("od"));
    BW_TRY(atLeast, f.flag("at_least", true));
    BW_CHECK(f.noOtherKeys());
    return model::OdRow{units::Wavelength::fromSi(from), units::Wavelength::fromSi(to), od, atLeast};
}

} // namespace

Result<model::EyewearItem> eyewearFromJson(const json& value, const std::string& path)
{
    BW_TRY(f, JsonFields::of(value, path));
    model::EyewearItem item;
    BW_TRY(name, f.text("name"));
    BW_TRY(description, f.text("description", ""));
    item.name = name;
    item.description = description;
    BW_TRY(rows, f.list("spectral_od"));
    for (std::size_t i = 0; i < rows->size(); ++i) {
        BW_TRY(row, readOdRow((*rows)[i], indexPath(path, "spectral_od", i)));
        item.spectralOd.push_back(row);
    }
    BW_TRY(en207, f.texts("en207"));
    BW_TRY(en208, f.texts("en208"));
    BW_TRY(transmittance, f.number("visible_transmittance", 0.0));
    BW_TRY(count, f.integer("count", 1));
    BW_TRY(location, f.text("location", ""));
    BW_TRY(inspection, f.text("last_inspection", ""));
    BW_TRY(notes, f.text("notes", ""));
    BW_CHECK(f.noOtherKeys());
    item.en207Markings = en207;
    item.en208Markings = en208;
    item.visibleTransmittance = transmittance;
    item.count = count;
    item.location = location;
    item.lastInspection = inspection;
    item.notes = notes;
    return item;
}

} // namespace beamwarden::store
