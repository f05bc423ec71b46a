#include "store/labjson.hpp"

namespace beamwarden::store {

namespace {

OrderedJson toJson(const model::Emission& emission)
{
    OrderedJson spectrum = OrderedJson::array();
    for (const model::SpectralSample& s : emission.spectrum.samples)
        spectrum.push_back(OrderedJson{
            {"wavelength_m", s.wavelength.si()}, {"power_fraction", s.powerFraction}, {"width_m", s.width.si()}});
    OrderedJson json{
        {"spectrum", std::move(spectrum)},
        {"pulsed", emission.pulsed},
        {"average_power_W", emission.averagePower.si()},
        {"pulse_energy_J", emission.pulseEnergy.si()},
        {"pulse_duration_s", emission.pulseDuration.si()},
        {"prf_Hz", emission.prf.si()},
    };
    if (emission.burst)
        json["burst"] = OrderedJson{{"pulses_per_burst", emission.burst->pulsesPerBurst},
                                    {"burst_rate_Hz", emission.burst->burstRate.si()}};
    return json;
}

OrderedJson toJson(const model::Beam& beam)
{
    return OrderedJson{{"diameter_m", beam.diameter.si()},
                       {"divergence_rad", beam.divergence.si()},
                       {"definition", model::toString(beam.definition)},
                       {"profile", model::toString(beam.profile)}};
}

OrderedJson toJson(const model::NamedExposureCase& named)
{
    const model::ExposureCase& c = named.exposureCase;
    return OrderedJson{{"name", named.name},
                       {"viewing", model::toString(c.viewing)},
                       {"exposure_s", c.exposure.si()},
                       {"distance_m", c.distance.si()},
                       {"focal_length_m", c.focalLength.si()},
                       {"numerical_aperture", c.numericalAperture},
                       {"reflectance", c.reflectance},
                       {"viewing_angle_rad", c.viewingAngle.si()},
                       {"magnification", c.magnification},
                       {"objective_diameter_m", c.objectiveDiameter.si()},
                       {"transmission", c.transmission}};
}

OrderedJson toJson(const model::SignOff& signOff)
{
    return OrderedJson{{"who", signOff.who},
                       {"when", signOff.when},
                       {"from", model::toString(signOff.from)},
                       {"to", model::toString(signOff.to)},
                       {"comment", signOff.comment}};
}

} // namespace

OrderedJson toJson(const model::Lab& lab)
{
    OrderedJson rooms = OrderedJson::array();
    for (const model::Room& room : lab.rooms)
        rooms.push_back(OrderedJson{{"name", room.name}, {"description", room.description}});
    return OrderedJson{
        {"name", lab.name}, {"lso_name", lab.lsoName}, {"notes", lab.notes}, {"rooms", std::move(rooms)}};
}

OrderedJson toJson(const model::Output& output)
{
    OrderedJson cases = OrderedJson::array();
    for (const model::NamedExposureCase& c : output.exposureCases)
        cases.push_back(toJson(c));
    return OrderedJson{{"name", output.name},
                       {"emission", toJson(output.emission)},
                       {"beam", toJson(output.beam)},
                       {"exposure_cases", std::move(cases)}};
}

OrderedJson toJson(const model::Laser& laser)
{
    OrderedJson outputs = OrderedJson::array();
    for (const model::Output& output : laser.outputs)
        outputs.push_back(toJson(output));
    return OrderedJson{{"name", laser.name},
                       {"maker_model", laser.makerModel},
                       {"serial", laser.serial},
                       {"room", laser.room},
                       {"class", model::toString(laser.laserClass)},
                       {"notes", laser.notes},
                       {"outputs", std::move(outputs)}};
}

OrderedJson toJson(const model::EyewearItem& item)
{
    OrderedJson od = OrderedJson::array();
    for (const model::OdRow& row : item.spectralOd)
        od.push_back(
            OrderedJson{{"from_m", row.from.si()}, {"to_m", row.to.si()}, {"od", row.od}, {"at_least", row.atLeast}});
    return OrderedJson{{"name", item.name},
                       {"description", item.description},
                       {"spectral_od", std::move(od)},
                       {"en207", item.en207Markings},
                       {"en208", item.en208Markings},
                       {"visible_transmittance", item.visibleTransmittance},
                       {"count", item.count},
                       {"location", item.location},
                       {"last_inspection", item.lastInspection},
                       {"notes", item.notes}};
}

OrderedJson toJson(const model::Assessment& assessment, std::string_view laserName)
{
    OrderedJson signOffs = OrderedJson::array();
    for (const model::SignOff& signOff : assessment.signOffs)
        signOffs.push_back(toJson(signOff));
    // The snapshot and results stay text: an approved record must come back byte for byte, not re-serialised.
    return OrderedJson{{"laser", laserName},
                       {"title", assessment.title},
                       {"rule_set", assessment.ruleSet},
                       {"program_version", assessment.programVersion},
                       {"author", assessment.author},
                       {"created", assessment.created},
                       {"updated", assessment.updated},
                       {"status", model::toString(assessment.status)},
                       {"out_of_date", assessment.outOfDate},
                       {"input_snapshot", assessment.inputSnapshot},
                       {"results", assessment.results},
                       {"sign_offs", std::move(signOffs)}};
}

} // namespace beamwarden::store
