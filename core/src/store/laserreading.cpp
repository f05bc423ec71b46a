// Reading lasers with their outputs, spectra and exposure cases from the lab file's rows.
#include "store/laserrows.hpp"

#include "store/sqlite.hpp"

namespace beamwarden::store {

namespace {

using model::RecordId;

InputError damaged(std::string_view what, const std::string& text)
{
    return InputError{"lab file", text, "a stored " + std::string(what) + " this program knows"};
}

Result<std::vector<model::SpectralSample>> readSamples(Statement& select, RecordId outputId)
{
    std::vector<model::SpectralSample> samples;
    select.bind(1, outputId);
    for (;;) {
        auto row = select.step();
        if (!row)
            return std::unexpected(row.error());
        if (!*row)
            break;
        samples.push_back(model::SpectralSample{units::Wavelength::fromSi(select.real(0)), select.real(1),
                                                units::Wavelength::fromSi(select.real(2))});
    }
    select.reset();
    return samples;
}

Result<std::vector<model::NamedExposureCase>> readCases(Statement& select, RecordId outputId)
{
    std::vector<model::NamedExposureCase> cases;
    select.bind(1, outputId);
    for (;;) {
        auto row = select.step();
        if (!row)
            return std::unexpected(row.error());
        if (!*row)
            break;
        model::NamedExposureCase named;
        named.id = select.integer(0);
        named.name = select.text(1);
        auto viewing = model::parseViewing(select.text(2));
        if (!viewing)
            return std::unexpected(damaged("viewing", select.text(2)));
        model::ExposureCase& c = named.exposureCase;
        c.viewing = *viewing;
        c.exposure = units::Duration::fromSi(select.real(3));
        c.distance = units::Length::fromSi(select.real(4));
        c.focalLength = units::Length::fromSi(select.real(5));
        c.numericalAperture = select.real(6);
        c.reflectance = select.real(7);
        c.viewingAngle = units::Angle::fromSi(select.real(8));
        c.magnification = select.real(9);
        c.objectiveDiameter = units::Length::fromSi(select.real(10));
        c.transmission = select.real(11);
        cases.push_back(std::move(named));
    }
    select.reset();
    return cases;
}

struct OutputReaders {
    Statement outputs;
    Statement samples;
    Statement cases;
};

Result<OutputReaders> prepareOutputReaders(sqlite3* db)
{
    auto outputs = Statement::prepare(db, R"sql(
        SELECT id, name, pulsed, average_power_W, pulse_energy_J, pulse_duration_s, prf_Hz, burst_pulses,
               burst_rate_Hz, beam_diameter_m, beam_divergence_rad, beam_definition, beam_profile
        FROM output WHERE laser_id = ?1 ORDER BY position)sql");
    auto samples = Statement::prepare(
        db, "SELECT wavelength_m, power_fraction, width_m FROM spectral_sample WHERE output_id = ?1 ORDER BY position");
    auto cases = Statement::prepare(db, R"sql(
        SELECT id, name, viewing, exposure_s, distance_m, focal_length_m, numerical_aperture, reflectance,
               viewing_angle_rad, magnification, objective_diameter_m, transmission
        FROM exposure_case WHERE output_id = ?1 ORDER BY position)sql");
    if (!outputs)
        return std::unexpected(outputs.error());
    if (!samples)
        return std::unexpected(samples.error());
    if (!cases)
        return std::unexpected(cases.error());
    return OutputReaders{std::move(*outputs), std::move(*samples), std::move(*cases)};
}

Result<std::vector<model::Output>> readOutputs(OutputReaders& readers, RecordId laserId)
{
    std::vector<model::Output> outputs;
    Statement& select = readers.outputs;
    select.bind(1, laserId);
    for (;;) {
        auto row = select.step();
        if (!row)
            return std::unexpected(row.error());
        if (!*row)
            break;
        model::Output output;
        output.id = select.integer(0);
        output.name = select.text(1);
        model::Emission& e = output.emission;
        e.pulsed = select.integer(2) != 0;
        e.averagePower = units::Power::fromSi(select.real(3));
        e.pulseEnergy = units::Energy::fromSi(select.real(4));
        e.pulseDuration = units::Duration::fromSi(select.real(5));
        e.prf = units::Frequency::fromSi(select.real(6));
        if (!select.isNull(7))
            e.burst =
                model::BurstPattern{static_cast<int>(select.integer(7)), units::Frequency::fromSi(select.real(8))};
        output.beam.diameter = units::Length::fromSi(select.real(9));
        output.beam.divergence = units::Angle::fromSi(select.real(10));
        auto definition = model::parseBeamDefinition(select.text(11));
        auto profile = model::parseBeamProfile(select.text(12));
        if (!definition)
            return std::unexpected(damaged("beam definition", select.text(11)));
        if (!profile)
            return std::unexpected(damaged("beam profile", select.text(12)));
        output.beam.definition = *definition;
        output.beam.profile = *profile;
        outputs.push_back(std::move(output));
    }
    select.reset();
    for (model::Output& output : outputs) {
        auto samples = readSamples(readers.samples, output.id);
        if (!samples)
            return std::unexpected(samples.error());
        output.emission.spectrum.samples = std::move(*samples);
        auto cases = readCases(readers.cases, output.id);
        if (!cases)
            return std::unexpected(cases.error());
        output.exposureCases = std::move(*cases);
    }
    return outputs;
}

} // namespace

Result<std::vector<model::Laser>> readLasers(sqlite3* db, std::optional<model::RecordId> only)
{
    auto select = Statement::prepare(db, R"sql(
        SELECT l.id, l.name, l.maker_model, l.serial, coalesce(r.name, ''), l.class, l.notes
        FROM laser l LEFT JOIN room r ON r.id = l.room_id
        WHERE ?1 IS NULL OR l.id = ?1 ORDER BY l.id)sql");
    if (!select)
        return std::unexpected(select.error());
    if (only)
        select->bind(1, *only);
    std::vector<model::Laser> lasers;
    for (;;) {
        auto row = select->step();
        if (!row)
            return std::unexpected(row.error());
        if (!*row)
            break;
        model::Laser laser;
        laser.id = select->integer(0);
        laser.name = select->text(1);
        laser.makerModel = select->text(2);
        laser.serial = select->text(3);
        laser.room = select->text(4);
        auto laserClass = model::parseLaserClass(select->text(5));
        if (!laserClass)
            return std::unexpected(damaged("laser class", select->text(5)));
        laser.laserClass = *laserClass;
        laser.notes = select->text(6);
        lasers.push_back(std::move(laser));
    }
    auto readers = prepareOutputReaders(db);
    if (!readers)
        return std::unexpected(readers.error());
    for (model::Laser& laser : lasers) {
        auto outputs = readOutputs(*readers, laser.id);
        if (!outputs)
            return std::unexpected(outputs.error());
        laser.outputs = std::move(*outputs);
    }
    return lasers;
}

} // namespace beamwarden::store
