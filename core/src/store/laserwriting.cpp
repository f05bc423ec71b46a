// Writing lasers: validation first, then the rows, replacing outputs only when their content changed.
#include "store/laserrows.hpp"

#include "store/labjson.hpp"
#include "store/recordcheck.hpp"
#include "store/sqlite.hpp"

#include <set>

namespace beamwarden::store {

namespace {

using model::RecordId;

void bindOptionalId(Statement& statement, int index, RecordId id)
{
    if (id != 0)
        statement.bind(index, id);
    else
        statement.bindNull(index);
}

// The ids an update may keep: those the laser's outputs and cases have in the file now.
struct KeptIds {
    std::set<RecordId> outputs;
    std::set<RecordId> cases;
};

Result<void> insertOutputs(sqlite3* db, RecordId laserId, const std::vector<model::Output>& outputs,
                           const KeptIds* kept, std::string_view path)
{
    auto insertOutput = Statement::prepare(db, R"sql(
        INSERT INTO output (id, laser_id, position, name, pulsed, average_power_W, pulse_energy_J, pulse_duration_s,
                            prf_Hz, burst_pulses, burst_rate_Hz, beam_diameter_m, beam_divergence_rad,
                            beam_definition, beam_profile)
        VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7, ?8, ?9, ?10, ?11, ?12, ?13, ?14, ?15))sql");
    auto insertSample = Statement::prepare(db, R"sql(
        INSERT INTO spectral_sample (output_id, position, wavelength_m, power_fraction, width_m)
        VALUES (?1, ?2, ?3, ?4, ?5))sql");
    auto insertCase = Statement::prepare(db, R"sql(
        INSERT INTO exposure_case (id, output_id, position, name, viewing, exposure_s, distance_m, focal_length_m,
                                   numerical_aperture, reflectance, viewing_angle_rad, magnification,
                                   objective_diameter_m, transmission)
        VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7, ?8, ?9, ?10, ?11, ?12, ?13, ?14))sql");
    if (!insertOutput)
        return std::unexpected(insertOutput.error());
    if (!insertSample)
        return std::unexpected(insertSample.error());
    if (!insertCase)
        return std::unexpected(insertCase.error());

    for (std::size_t i = 0; i < outputs.size(); ++i) {
        const model::Output& output = outputs[i];
        const std::string at = indexPath(path, "outputs", i);
        const model::Emission& e = output.emission;
        Statement& o = *insertOutput;
        bindOptionalId(o, 1, kept == nullptr || kept->outputs.contains(output.id) ? output.id : 0);
        o.bind(2, laserId).bind(3, static_cast<std::int64_t>(i)).bind(4, output.name).bind(5, e.pulsed);
        o.bind(6, e.averagePower.si()).bind(7, e.pulseEnergy.si()).bind(8, e.pulseDuration.si()).bind(9, e.prf.si());
        if (e.burst)
            o.bind(10, e.burst->pulsesPerBurst).bind(11, e.burst->burstRate.si());
        else
            o.bindNull(10).bindNull(11);
        o.bind(12, output.beam.diameter.si()).bind(13, output.beam.divergence.si());
        o.bind(14, model::toString(output.beam.definition)).bind(15, model::toString(output.beam.profile));
        if (auto done = o.run(at); !done)
            return done;
        const RecordId outputId = lastInsertId(db);

        for (std::size_t k = 0; k < e.spectrum.samples.size(); ++k) {
            const model::SpectralSample& s = e.spectrum.samples[k];
            insertSample->bind(1, outputId).bind(2, static_cast<std::int64_t>(k)).bind(3, s.wavelength.si());
            insertSample->bind(4, s.powerFraction).bind(5, s.width.si());
            if (auto done = insertSample->run(indexPath(joinPath(at, "emission"), "spectrum", k)); !done)
                return done;
        }
        for (std::size_t k = 0; k < output.exposureCases.size(); ++k) {
            const model::NamedExposureCase& named = output.exposureCases[k];
            const model::ExposureCase& c = named.exposureCase;
            Statement& s = *insertCase;
            bindOptionalId(s, 1, kept == nullptr || kept->cases.contains(named.id) ? named.id : 0);
            s.bind(2, outputId).bind(3, static_cast<std::int64_t>(k)).bind(4, named.name);
            s.bind(5, model::toString(c.viewing)).bind(6, c.exposure.si()).bind(7, c.distance.si());
            s.bind(8, c.focalLength.si()).bind(9, c.numericalAperture).bind(10, c.reflectance);
            s.bind(11, c.viewingAngle.si()).bind(12, c.magnification).bind(13, c.objectiveDiameter.si());
            s.bind(14, c.transmission);
            if (auto done = s.run(indexPath(at, "exposure_cases", k)); !done)
                return done;
        }
    }
    return {};
}

// Content equality through the export form, which leaves ids out: re-saving what is stored is not a change.
bool sameOutputs(const std::vector<model::Output>& a, const std::vector<model::Output>& b)
{
    if (a.size() != b.size())
        return false;
    for (std::size_t i = 0; i < a.size(); ++i) {
        if (toJson(a[i]) != toJson(b[i]))
            return false;
    }
    return true;
}

Result<std::optional<RecordId>> roomId(sqlite3* db, const std::string& room, std::string_view path)
{
    if (room.empty())
        return std::optional<RecordId>{};
    auto select = Statement::prepare(db, "SELECT id FROM room WHERE name = ?1");
    if (!select)
        return std::unexpected(select.error());
    select->bind(1, room);
    auto row = select->step();
    if (!row)
        return std::unexpected(row.error());
    if (!*row)
        return fail(joinPath(path, "room"), room, "the name of one of the lab's rooms, or nothing");
    return std::optional<RecordId>{select->integer(0)};
}

Result<void> requireUniqueName(sqlite3* db, const std::string& name, RecordId id, std::string_view path)
{
    auto select = Statement::prepare(db, "SELECT count(*) FROM laser WHERE name = ?1 AND id <> ?2");
    if (!select)
        return std::unexpected(select.error());
    select->bind(1, name).bind(2, id);
    auto row = select->step();
    if (!row)
        return std::unexpected(row.error());
    if (select->integer(0) > 0)
        return fail(joinPath(path, "name"), name, "a name no other laser of the lab has");
    return {};
}

Result<KeptIds> keptIds(const model::Laser& stored, const model::Laser& laser, std::string_view path)
{
    KeptIds storedIds;
    for (const model::Output& output : stored.outputs) {
        storedIds.outputs.insert(output.id);
        for (const model::NamedExposureCase& c : output.exposureCases)
            storedIds.cases.insert(c.id);
    }
    for (std::size_t i = 0; i < laser.outputs.size(); ++i) {
        const model::Output& output = laser.outputs[i];
        const std::string at = indexPath(path, "outputs", i);
        if (output.id != 0 && !storedIds.outputs.contains(output.id))
            return fail(joinPath(at, "id"), std::to_string(output.id), "0 or the id of one of this laser's outputs");
        for (std::size_t k = 0; k < output.exposureCases.size(); ++k) {
            const RecordId id = output.exposureCases[k].id;
            if (id != 0 && !storedIds.cases.contains(id))
                return fail(joinPath(indexPath(at, "exposure_cases", k), "id"), std::to_string(id),
                            "0 or the id of one of this laser's exposure cases");
        }
    }
    return storedIds;
}

} // namespace

Result<model::RecordId> writeLaser(sqlite3* db, const model::Laser& laser, LaserWrite mode, std::string_view path)
{
    if (auto valid = validateLaser(laser, path); !valid)
        return std::unexpected(valid.error());
    auto room = roomId(db, laser.room, path);
    if (!room)
        return std::unexpected(room.error());
    const bool update = mode == LaserWrite::Save && laser.id != 0;
    if (auto unique = requireUniqueName(db, laser.name, update ? laser.id : 0, path); !unique)
        return std::unexpected(unique.error());

    std::optional<model::Laser> stored;
    KeptIds kept;
    if (update) {
        auto found = readLasers(db, laser.id);
        if (!found)
            return std::unexpected(found.error());
        if (found->empty())
            return fail(joinPath(path, "id"), std::to_string(laser.id), "the id of a stored laser, or 0 for a new one");
        stored = std::move(found->front());
        auto ids = keptIds(*stored, laser, path);
        if (!ids)
            return std::unexpected(ids.error());
        kept = std::move(*ids);
    }

    auto write = Statement::prepare(
        db, update ? "UPDATE laser SET name = ?2, maker_model = ?3, serial = ?4, room_id = ?5, class = ?6, notes = ?7 "
                     "WHERE id = ?1"
                   : "INSERT INTO laser (id, name, maker_model, serial, room_id, class, notes) "
                     "VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7)");
    if (!write)
        return std::unexpected(write.error());
    bindOptionalId(*write, 1, mode == LaserWrite::Save && !update ? 0 : laser.id);
    write->bind(2, laser.name).bind(3, laser.makerModel).bind(4, laser.serial);
    if (*room)
        write->bind(5, **room);
    else
        write->bindNull(5);
    write->bind(6, model::toString(laser.laserClass)).bind(7, laser.notes);
    if (auto done = write->run(path.empty() ? "laser" : path); !done)
        return std::unexpected(done.error());

    if (!update) {
        const RecordId id = lastInsertId(db);
        // A new laser's outputs and cases are new records whatever ids they carried; a fresh file keeps them.
        const KeptIds none;
        if (auto done = insertOutputs(db, id, laser.outputs, mode == LaserWrite::Insert ? nullptr : &none, path); !done)
            return std::unexpected(done.error());
        return id;
    }
    if (sameOutputs(stored->outputs, laser.outputs))
        return laser.id;
    auto clear = Statement::prepare(db, "DELETE FROM output WHERE laser_id = ?1");
    if (!clear)
        return std::unexpected(clear.error());
    if (auto done = clear->bind(1, laser.id).run(joinPath(path, "outputs")); !done)
        return std::unexpected(done.error());
    if (auto done = insertOutputs(db, laser.id, laser.outputs, &kept, path); !done)
        return std::unexpected(done.error());
    return laser.id;
}

Result<void> deleteLaser(sqlite3* db, model::RecordId id)
{
    auto kept = Statement::prepare(
        db, "SELECT count(*) FROM assessment WHERE laser_id = ?1 AND status IN ('approved', 'withdrawn')");
    if (!kept)
        return std::unexpected(kept.error());
    kept->bind(1, id);
    auto row = kept->step();
    if (!row)
        return std::unexpected(row.error());
    if (kept->integer(0) > 0)
        return fail("laser", std::to_string(id),
                    "a laser without approved or withdrawn assessments; those are kept as records");
    auto remove = Statement::prepare(db, "DELETE FROM laser WHERE id = ?1");
    if (!remove)
        return std::unexpected(remove.error());
    if (auto done = remove->bind(1, id).run("laser"); !done)
        return done;
    if (changedRows(db) == 0)
        return fail("laser", std::to_string(id), "the id of a stored laser");
    return {};
}

} // namespace beamwarden::store
