#include "store/recordcheck.hpp"

#include "store/isotime.hpp"

#include "beamwarden/text.hpp"

#include <fmt/core.h>
#include <nlohmann/json.hpp>

#include <cmath>
#include <initializer_list>
#include <map>
#include <set>

namespace beamwarden::store {

namespace {

// Share of the power the samples of one spectrum may miss or exceed 1 by: rounding in a sampled band, never more.
constexpr double kFractionSumTolerance = 1e-6;

// The model's validate functions name fields as the CLI flags do; the export's keys say the unit instead.
const std::map<std::string, std::string, std::less<>>& exportKeys()
{
    static const std::map<std::string, std::string, std::less<>> keys = {
        {"wavelength", "spectrum"},
        {"power", "average_power_W"},
        {"pulse-energy", "pulse_energy_J"},
        {"duration", "pulse_duration_s"},
        {"prf", "prf_Hz"},
        {"burst-count", "burst.pulses_per_burst"},
        {"burst-rate", "burst.burst_rate_Hz"},
        {"beam-diameter", "diameter_m"},
        {"divergence", "divergence_rad"},
        {"exposure", "exposure_s"},
        {"distance", "distance_m"},
        {"focal-length", "focal_length_m"},
        {"na", "numerical_aperture"},
        {"reflectance", "reflectance"},
        {"angle", "viewing_angle_rad"},
        {"magnification", "magnification"},
        {"objective-diameter", "objective_diameter_m"},
        {"transmission", "transmission"},
    };
    return keys;
}

std::unexpected<InputError> underPath(const InputError& error, std::string_view path)
{
    const auto key = exportKeys().find(error.field);
    return fail(joinPath(path, key != exportKeys().end() ? key->second : error.field), error.value, error.allowed);
}

// Names are what people pick records by and what the export tells duplicates apart by: UTF-8 (other bytes would
// change on export, and two names could become one), one line, and short enough to show in a list or on a sheet.
constexpr std::size_t kMaxNameCharacters = 200;
// Free text (descriptions, notes, markings as printed): UTF-8, any number of lines, at most this much.
constexpr std::size_t kMaxTextCharacters = 10000;

Result<void> requireUtf8(const std::string& text, const std::string& at, std::string_view what)
{
    if (!text::isValidUtf8(text))
        return fail(at, text, fmt::format("{} in UTF-8 (this one holds bytes that are not UTF-8)", what));
    return {};
}

Result<void> requireName(const std::string& name, std::string_view path)
{
    const std::string at = joinPath(path, "name");
    if (name.find_first_not_of(" \t\r\n") == std::string::npos)
        return fail(at, name, "a name that is not empty");
    if (auto utf8 = requireUtf8(name, at, "a name"); !utf8)
        return utf8;
    if (text::hasControlCharacter(name))
        return fail(at, name, "a name on one line, without tabs or control characters");
    if (const std::size_t count = text::characterCount(name); count > kMaxNameCharacters)
        return fail(at, text::displayable(name, 40),
                    fmt::format("a name of at most {} characters (this one has {})", kMaxNameCharacters, count));
    return {};
}

// Optional free text: empty is fine.
Result<void> requireText(const std::string& value, std::string_view path, std::string_view key)
{
    const std::string at = joinPath(path, key);
    if (auto utf8 = requireUtf8(value, at, "text"); !utf8)
        return utf8;
    if (const std::size_t count = text::characterCount(value); count > kMaxTextCharacters)
        return fail(at, text::displayable(value, 40),
                    fmt::format("text of at most {} characters (this one has {})", kMaxTextCharacters, count));
    return {};
}

// Several free-text fields of one record, checked in order.
Result<void> requireTexts(std::initializer_list<std::pair<std::string_view, const std::string*>> fields,
                          std::string_view path)
{
    for (const auto& [key, value] : fields) {
        if (auto checked = requireText(*value, path, key); !checked)
            return checked;
    }
    return {};
}

bool isWavelength(double metres)
{
    return std::isfinite(metres) && metres >= 180e-9 && metres <= 1e-3;
}

std::string number(double value)
{
    return fmt::format("{}", value);
}

Result<void> validateSpectrum(const model::Spectrum& spectrum, std::string_view path)
{
    const std::string at = joinPath(path, "spectrum");
    if (spectrum.samples.empty())
        return fail(at, "", "at least one wavelength");
    double total = 0.0;
    for (std::size_t i = 0; i < spectrum.samples.size(); ++i) {
        const model::SpectralSample& s = spectrum.samples[i];
        const std::string sample = indexPath(path, "spectrum", i);
        if (!isWavelength(s.wavelength.si()))
            return fail(joinPath(sample, "wavelength_m"), number(s.wavelength.si()), "180e-9 m to 1e-3 m");
        if (!std::isfinite(s.powerFraction) || s.powerFraction <= 0.0 || s.powerFraction > 1.0)
            return fail(joinPath(sample, "power_fraction"), number(s.powerFraction), "a share above 0 and at most 1");
        if (!std::isfinite(s.width.si()) || s.width.si() < 0.0 || s.width.si() > 1e-3)
            return fail(joinPath(sample, "width_m"), number(s.width.si()), "0 (a line) up to 1e-3 m");
        total += s.powerFraction;
    }
    if (std::abs(total - 1.0) > kFractionSumTolerance)
        return fail(at, number(total), "power fractions that add up to 1");
    return {};
}

Result<void> validateEmission(const model::Emission& emission, std::string_view path)
{
    if (auto spectrum = validateSpectrum(emission.spectrum, path); !spectrum)
        return spectrum;
    if (auto checked = model::completeAndValidate(emission); !checked)
        return underPath(checked.error(), path);
    if (emission.burst) {
        const std::string burst = joinPath(path, "burst");
        if (!emission.pulsed)
            return fail(burst, "", "no bursts for a CW output");
        if (emission.burst->pulsesPerBurst < 1)
            return fail(joinPath(burst, "pulses_per_burst"), std::to_string(emission.burst->pulsesPerBurst),
                        "1 or more pulses");
        const double rate = emission.burst->burstRate.si();
        if (!std::isfinite(rate) || rate <= 0.0)
            return fail(joinPath(burst, "burst_rate_Hz"), number(rate), "a burst rate above 0 Hz");
    }
    return {};
}

Result<void> validateOutput(const model::Output& output, std::string_view path)
{
    if (auto name = requireName(output.name, path); !name)
        return name;
    if (auto emission = validateEmission(output.emission, joinPath(path, "emission")); !emission)
        return emission;
    if (auto beam = model::validate(output.beam); !beam)
        return underPath(beam.error(), joinPath(path, "beam"));
    std::set<std::string> names;
    for (std::size_t i = 0; i < output.exposureCases.size(); ++i) {
        const model::NamedExposureCase& c = output.exposureCases[i];
        const std::string at = indexPath(path, "exposure_cases", i);
        if (auto name = requireName(c.name, at); !name)
            return name;
        if (!names.insert(c.name).second)
            return fail(joinPath(at, "name"), c.name, "a name no other case of this output has");
        if (auto checked = model::validate(c.exposureCase); !checked)
            return underPath(checked.error(), at);
        // The model checks only the numbers each viewing uses; the file keeps them all, so none may be impossible.
        const model::ExposureCase& e = c.exposureCase;
        if (!std::isfinite(e.focalLength.si()) || e.focalLength.si() < 0.0)
            return fail(joinPath(at, "focal_length_m"), number(e.focalLength.si()), "0 or a focal length above 0 m");
        if (!std::isfinite(e.numericalAperture) || e.numericalAperture < 0.0 || e.numericalAperture >= 1.0)
            return fail(joinPath(at, "numerical_aperture"), number(e.numericalAperture), "0 up to below 1");
        if (!std::isfinite(e.reflectance) || e.reflectance < 0.0 || e.reflectance > 1.0)
            return fail(joinPath(at, "reflectance"), number(e.reflectance), "0 to 1");
        if (!std::isfinite(e.viewingAngle.si()) || e.viewingAngle.si() < 0.0 || e.viewingAngle.degrees() >= 90.0)
            return fail(joinPath(at, "viewing_angle_rad"), number(e.viewingAngle.si()), "0 up to below pi/2 rad");
        if (!std::isfinite(e.magnification) || e.magnification <= 0.0)
            return fail(joinPath(at, "magnification"), number(e.magnification), "a magnification above 0");
        if (!std::isfinite(e.objectiveDiameter.si()) || e.objectiveDiameter.si() < 0.0 ||
            e.objectiveDiameter.si() > 10.0)
            return fail(joinPath(at, "objective_diameter_m"), number(e.objectiveDiameter.si()), "0 to 10 m");
        if (!std::isfinite(e.transmission) || e.transmission < 0.0 || e.transmission > 1.0)
            return fail(joinPath(at, "transmission"), number(e.transmission), "0 to 1");
    }
    return {};
}

bool isJsonOrEmpty(const std::string& text)
{
    return text.empty() || nlohmann::json::accept(text);
}

} // namespace

std::string joinPath(std::string_view path, std::string_view key)
{
    if (path.empty())
        return std::string(key);
    return std::string(path) + "." + std::string(key);
}

std::string indexPath(std::string_view path, std::string_view key, std::size_t index)
{
    return joinPath(path, key) + "[" + std::to_string(index) + "]";
}

Result<void> validateLab(const model::Lab& lab, std::string_view path)
{
    if (auto name = requireName(lab.name, path); !name)
        return name;
    if (auto texts = requireTexts({{"lso_name", &lab.lsoName}, {"notes", &lab.notes}}, path); !texts)
        return texts;
    std::set<std::string> names;
    for (std::size_t i = 0; i < lab.rooms.size(); ++i) {
        const std::string at = indexPath(path, "rooms", i);
        if (auto name = requireName(lab.rooms[i].name, at); !name)
            return name;
        if (auto description = requireText(lab.rooms[i].description, at, "description"); !description)
            return description;
        if (!names.insert(lab.rooms[i].name).second)
            return fail(joinPath(at, "name"), lab.rooms[i].name, "a name no other room has");
    }
    return {};
}

Result<void> validateLaser(const model::Laser& laser, std::string_view path)
{
    if (auto name = requireName(laser.name, path); !name)
        return name;
    if (auto texts = requireTexts({{"maker_model", &laser.makerModel},
                                   {"serial", &laser.serial},
                                   {"room", &laser.room},
                                   {"notes", &laser.notes}},
                                  path);
        !texts)
        return texts;
    if (laser.outputs.empty())
        return fail(joinPath(path, "outputs"), "", "at least one output");
    std::set<std::string> names;
    for (std::size_t i = 0; i < laser.outputs.size(); ++i) {
        const std::string at = indexPath(path, "outputs", i);
        if (auto output = validateOutput(laser.outputs[i], at); !output)
            return output;
        if (!names.insert(laser.outputs[i].name).second)
            return fail(joinPath(at, "name"), laser.outputs[i].name, "a name no other output of this laser has");
    }
    return {};
}

Result<void> validateEyewear(const model::EyewearItem& item, std::string_view path)
{
    if (auto name = requireName(item.name, path); !name)
        return name;
    if (auto texts = requireTexts(
            {{"description", &item.description}, {"location", &item.location}, {"notes", &item.notes}}, path);
        !texts)
        return texts;
    for (std::size_t i = 0; i < item.spectralOd.size(); ++i) {
        const model::OdRow& row = item.spectralOd[i];
        const std::string at = indexPath(path, "spectral_od", i);
        if (!isWavelength(row.from.si()))
            return fail(joinPath(at, "from_m"), number(row.from.si()), "180e-9 m to 1e-3 m");
        if (!isWavelength(row.to.si()))
            return fail(joinPath(at, "to_m"), number(row.to.si()), "180e-9 m to 1e-3 m");
        if (row.to < row.from)
            return fail(joinPath(at, "to_m"), number(row.to.si()), "the end of the band, not below its start");
        if (!std::isfinite(row.od) || row.od < 0.0 || row.od > model::kMaxOpticalDensity)
            return fail(joinPath(at, "od"), number(row.od),
                        fmt::format("an optical density from 0 to {}", model::kMaxOpticalDensity));
    }
    for (const auto& [key, markings] :
         {std::pair{"en207", &item.en207Markings}, std::pair{"en208", &item.en208Markings}}) {
        for (std::size_t i = 0; i < markings->size(); ++i) {
            if ((*markings)[i].find_first_not_of(" \t") == std::string::npos)
                return fail(indexPath(path, key, i), (*markings)[i], "a marking as printed, not empty");
            if (auto utf8 = requireUtf8((*markings)[i], indexPath(path, key, i), "a marking"); !utf8)
                return utf8;
        }
    }
    if (!std::isfinite(item.visibleTransmittance) || item.visibleTransmittance < 0.0 || item.visibleTransmittance > 1.0)
        return fail(joinPath(path, "visible_transmittance"), number(item.visibleTransmittance),
                    "0 to 1 (0 when not known)");
    if (item.count < 0)
        return fail(joinPath(path, "count"), std::to_string(item.count), "0 or more");
    if (!item.lastInspection.empty() && !isIsoDate(item.lastInspection))
        return fail(joinPath(path, "last_inspection"), item.lastInspection, "a date as YYYY-MM-DD, or nothing");
    return {};
}

Result<void> validateAssessment(const model::Assessment& assessment, std::string_view path)
{
    if (!assessment.created.empty() && !isIsoUtcTime(assessment.created))
        return fail(joinPath(path, "created"), assessment.created, "a UTC time such as 2026-12-01T14:03:00Z");
    if (!assessment.updated.empty() && !isIsoUtcTime(assessment.updated))
        return fail(joinPath(path, "updated"), assessment.updated, "a UTC time such as 2026-12-01T14:03:00Z");
    if (!isJsonOrEmpty(assessment.inputSnapshot))
        return fail(joinPath(path, "input_snapshot"), assessment.inputSnapshot.substr(0, 40), "JSON text");
    if (!isJsonOrEmpty(assessment.results))
        return fail(joinPath(path, "results"), assessment.results.substr(0, 40), "JSON text");
    return {};
}

Result<void> validateSignOff(const model::SignOff& signOff, std::string_view path)
{
    if (signOff.who.find_first_not_of(" \t") == std::string::npos)
        return fail(joinPath(path, "who"), signOff.who, "the name of whoever signs");
    if (!signOff.when.empty() && !isIsoUtcTime(signOff.when))
        return fail(joinPath(path, "when"), signOff.when, "a UTC time such as 2026-12-01T14:03:00Z");
    return {};
}

} // namespace beamwarden::store
