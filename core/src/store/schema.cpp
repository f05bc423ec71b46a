#include "store/schema.hpp"

#include "beamwarden/model/records.hpp"
#include "store/sqlite.hpp"

#include <array>

namespace beamwarden::store {

namespace {

// Constraints refuse values no laser or filter can have; the model's validate functions, run before every write,
// refuse the merely implausible with a friendlier message. STRICT tables refuse text in number columns. 1e999 is
// how SQLite spells infinity, so "< 1e999" keeps infinities out (NaN arrives as NULL and meets NOT NULL).
constexpr std::string_view kTables = R"sql(
CREATE TABLE lab (
    id INTEGER PRIMARY KEY CHECK (id = 1),
    name TEXT NOT NULL CHECK (length(trim(name)) > 0),
    lso_name TEXT NOT NULL,
    notes TEXT NOT NULL
) STRICT;

CREATE TABLE room (
    id INTEGER PRIMARY KEY,
    position INTEGER NOT NULL CHECK (position >= 0),
    name TEXT NOT NULL UNIQUE CHECK (length(trim(name)) > 0),
    description TEXT NOT NULL
) STRICT;

CREATE TABLE laser (
    id INTEGER PRIMARY KEY,
    name TEXT NOT NULL UNIQUE CHECK (length(trim(name)) > 0),
    maker_model TEXT NOT NULL,
    serial TEXT NOT NULL,
    room_id INTEGER REFERENCES room (id) ON DELETE RESTRICT,
    class TEXT NOT NULL CHECK (class IN ('unknown', '1', '1M', '1C', '2', '2M', '3R', '3B', '4')),
    notes TEXT NOT NULL
) STRICT;
CREATE INDEX laser_room ON laser (room_id);

CREATE TABLE output (
    id INTEGER PRIMARY KEY,
    laser_id INTEGER NOT NULL REFERENCES laser (id) ON DELETE CASCADE,
    position INTEGER NOT NULL CHECK (position >= 0),
    name TEXT NOT NULL CHECK (length(trim(name)) > 0),
    pulsed INTEGER NOT NULL CHECK (pulsed IN (0, 1)),
    average_power_W REAL NOT NULL CHECK (average_power_W >= 0 AND average_power_W < 1e999),
    pulse_energy_J REAL NOT NULL CHECK (pulse_energy_J >= 0 AND pulse_energy_J < 1e999),
    pulse_duration_s REAL NOT NULL CHECK (pulse_duration_s >= 0 AND pulse_duration_s < 1e999),
    prf_Hz REAL NOT NULL CHECK (prf_Hz >= 0 AND prf_Hz < 1e999),
    burst_pulses INTEGER CHECK (burst_pulses >= 1),
    burst_rate_Hz REAL CHECK (burst_rate_Hz > 0 AND burst_rate_Hz < 1e999),
    beam_diameter_m REAL NOT NULL CHECK (beam_diameter_m > 0 AND beam_diameter_m <= 10),
    beam_divergence_rad REAL NOT NULL CHECK (beam_divergence_rad >= 0 AND beam_divergence_rad <= 3.2),
    beam_definition TEXT NOT NULL CHECK (beam_definition IN ('1/e', '1/e2')),
    beam_profile TEXT NOT NULL CHECK (beam_profile IN ('unknown', 'gaussian', 'flat-top')),
    CHECK ((burst_pulses IS NULL) = (burst_rate_Hz IS NULL)),
    CHECK (pulsed = 1 OR (pulse_energy_J = 0 AND burst_pulses IS NULL)),
    UNIQUE (laser_id, position),
    UNIQUE (laser_id, name)
) STRICT;

CREATE TABLE spectral_sample (
    output_id INTEGER NOT NULL REFERENCES output (id) ON DELETE CASCADE,
    position INTEGER NOT NULL CHECK (position >= 0),
    wavelength_m REAL NOT NULL CHECK (wavelength_m >= 180e-9 AND wavelength_m <= 1e-3),
    power_fraction REAL NOT NULL CHECK (power_fraction > 0 AND power_fraction <= 1),
    width_m REAL NOT NULL CHECK (width_m >= 0 AND width_m <= 1e-3),
    PRIMARY KEY (output_id, position)
) STRICT, WITHOUT ROWID;

CREATE TABLE exposure_case (
    id INTEGER PRIMARY KEY,
    output_id INTEGER NOT NULL REFERENCES output (id) ON DELETE CASCADE,
    position INTEGER NOT NULL CHECK (position >= 0),
    name TEXT NOT NULL CHECK (length(trim(name)) > 0),
    viewing TEXT NOT NULL CHECK (viewing IN ('direct', 'lens', 'fibre', 'diffuse', 'specular', 'aided')),
    exposure_s REAL NOT NULL CHECK (exposure_s >= 0 AND exposure_s <= 3e4),
    distance_m REAL NOT NULL CHECK (distance_m >= 0 AND distance_m <= 1e6),
    focal_length_m REAL NOT NULL CHECK (focal_length_m >= 0 AND focal_length_m < 1e999),
    numerical_aperture REAL NOT NULL CHECK (numerical_aperture >= 0 AND numerical_aperture < 1),
    reflectance REAL NOT NULL CHECK (reflectance >= 0 AND reflectance <= 1),
    viewing_angle_rad REAL NOT NULL CHECK (viewing_angle_rad >= 0 AND viewing_angle_rad < 1.5707963267948966),
    magnification REAL NOT NULL CHECK (magnification > 0 AND magnification < 1e999),
    objective_diameter_m REAL NOT NULL CHECK (objective_diameter_m >= 0 AND objective_diameter_m <= 10),
    transmission REAL NOT NULL CHECK (transmission >= 0 AND transmission <= 1),
    UNIQUE (output_id, position),
    UNIQUE (output_id, name)
) STRICT;

CREATE TABLE eyewear (
    id INTEGER PRIMARY KEY,
    name TEXT NOT NULL UNIQUE CHECK (length(trim(name)) > 0),
    description TEXT NOT NULL,
    visible_transmittance REAL NOT NULL CHECK (visible_transmittance >= 0 AND visible_transmittance <= 1),
    count INTEGER NOT NULL CHECK (count >= 0),
    location TEXT NOT NULL,
    last_inspection TEXT NOT NULL
        CHECK (last_inspection = '' OR last_inspection GLOB '[0-9][0-9][0-9][0-9]-[01][0-9]-[0-3][0-9]'),
    notes TEXT NOT NULL
) STRICT;

CREATE TABLE eyewear_od (
    eyewear_id INTEGER NOT NULL REFERENCES eyewear (id) ON DELETE CASCADE,
    position INTEGER NOT NULL CHECK (position >= 0),
    from_m REAL NOT NULL CHECK (from_m >= 180e-9 AND from_m <= 1e-3),
    to_m REAL NOT NULL CHECK (to_m >= 180e-9 AND to_m <= 1e-3),
    od REAL NOT NULL CHECK (od >= 0 AND od < 1e999),
    at_least INTEGER NOT NULL CHECK (at_least IN (0, 1)),
    CHECK (from_m <= to_m),
    PRIMARY KEY (eyewear_id, position)
) STRICT, WITHOUT ROWID;

CREATE TABLE eyewear_marking (
    eyewear_id INTEGER NOT NULL REFERENCES eyewear (id) ON DELETE CASCADE,
    kind TEXT NOT NULL CHECK (kind IN ('en207', 'en208')),
    position INTEGER NOT NULL CHECK (position >= 0),
    text TEXT NOT NULL CHECK (length(trim(text)) > 0),
    PRIMARY KEY (eyewear_id, kind, position)
) STRICT, WITHOUT ROWID;

CREATE TABLE status_move (
    from_status TEXT NOT NULL,
    to_status TEXT NOT NULL,
    PRIMARY KEY (from_status, to_status)
) STRICT, WITHOUT ROWID;

CREATE TABLE assessment (
    id INTEGER PRIMARY KEY,
    laser_id INTEGER NOT NULL REFERENCES laser (id) ON DELETE CASCADE,
    title TEXT NOT NULL,
    rule_set TEXT NOT NULL,
    program_version TEXT NOT NULL,
    author TEXT NOT NULL,
    created TEXT NOT NULL CHECK (created GLOB '*Z' AND julianday(created) IS NOT NULL),
    updated TEXT NOT NULL CHECK (updated GLOB '*Z' AND julianday(updated) IS NOT NULL),
    status TEXT NOT NULL CHECK (status IN ('draft', 'in review', 'approved', 'withdrawn')),
    out_of_date INTEGER NOT NULL CHECK (out_of_date IN (0, 1)),
    input_snapshot TEXT NOT NULL CHECK (input_snapshot = '' OR json_valid(input_snapshot)),
    results TEXT NOT NULL CHECK (results = '' OR json_valid(results))
) STRICT;
CREATE INDEX assessment_laser ON assessment (laser_id);

CREATE TABLE sign_off (
    id INTEGER PRIMARY KEY,
    assessment_id INTEGER NOT NULL REFERENCES assessment (id) ON DELETE CASCADE,
    who TEXT NOT NULL CHECK (length(trim(who)) > 0),
    signed_at TEXT NOT NULL CHECK (signed_at GLOB '*Z' AND julianday(signed_at) IS NOT NULL),
    from_status TEXT NOT NULL CHECK (from_status IN ('draft', 'in review', 'approved', 'withdrawn')),
    to_status TEXT NOT NULL CHECK (to_status IN ('draft', 'in review', 'approved', 'withdrawn')),
    comment TEXT NOT NULL
) STRICT;
CREATE INDEX sign_off_assessment ON sign_off (assessment_id);
)sql";

// The status rules live in triggers as well as in LabStore, so a file edited with another SQLite tool cannot
// rewrite an approval either. A RAISE text is what the user reads; keep it a plain sentence.
constexpr std::string_view kStatusTriggers = R"sql(
CREATE TRIGGER assessment_starts_as_draft BEFORE INSERT ON assessment
WHEN NEW.status <> 'draft' OR NEW.out_of_date <> 0
BEGIN
    SELECT RAISE(ABORT, 'a new assessment starts as a draft; its status moves only by sign-off');
END;

CREATE TRIGGER assessment_approved_is_read_only BEFORE UPDATE ON assessment
WHEN OLD.status IN ('approved', 'withdrawn') AND (
    NEW.laser_id IS NOT OLD.laser_id OR NEW.title IS NOT OLD.title OR NEW.rule_set IS NOT OLD.rule_set OR
    NEW.program_version IS NOT OLD.program_version OR NEW.author IS NOT OLD.author OR
    NEW.created IS NOT OLD.created OR NEW.updated IS NOT OLD.updated OR
    NEW.input_snapshot IS NOT OLD.input_snapshot OR NEW.results IS NOT OLD.results)
BEGIN
    SELECT RAISE(ABORT, 'an approved or withdrawn assessment is read-only; start a new draft');
END;

CREATE TRIGGER assessment_status_by_sign_off BEFORE UPDATE OF status ON assessment
WHEN NEW.status IS NOT OLD.status AND NOT EXISTS (
    SELECT 1 FROM sign_off
    WHERE assessment_id = NEW.id AND from_status = OLD.status AND to_status = NEW.status
      AND id = (SELECT max(id) FROM sign_off WHERE assessment_id = NEW.id))
BEGIN
    SELECT RAISE(ABORT, 'an assessment''s status changes only with a sign-off');
END;

CREATE TRIGGER assessment_out_of_date_rule BEFORE UPDATE OF out_of_date ON assessment
WHEN NEW.out_of_date IS NOT OLD.out_of_date AND (NEW.out_of_date = 0 OR OLD.status NOT IN ('approved', 'withdrawn'))
BEGIN
    SELECT RAISE(ABORT, 'only an approved assessment is marked out of date, and the mark is never cleared');
END;

CREATE TRIGGER assessment_kept_as_record BEFORE DELETE ON assessment
WHEN OLD.status IN ('approved', 'withdrawn')
BEGIN
    SELECT RAISE(ABORT, 'an approved or withdrawn assessment is kept as a record and cannot be removed');
END;

CREATE TRIGGER sign_off_allowed_move BEFORE INSERT ON sign_off
WHEN NEW.from_status IS NOT (SELECT status FROM assessment WHERE id = NEW.assessment_id)
  OR NOT EXISTS (SELECT 1 FROM status_move WHERE from_status = NEW.from_status AND to_status = NEW.to_status)
BEGIN
    SELECT RAISE(ABORT, 'a sign-off must start from the assessment''s current status and make an allowed move');
END;

CREATE TRIGGER sign_off_moves_status AFTER INSERT ON sign_off
BEGIN
    UPDATE assessment SET status = NEW.to_status WHERE id = NEW.assessment_id;
END;

CREATE TRIGGER sign_off_never_edited BEFORE UPDATE ON sign_off
BEGIN
    SELECT RAISE(ABORT, 'a sign-off is never edited');
END;

CREATE TRIGGER sign_off_kept_as_record BEFORE DELETE ON sign_off
WHEN (SELECT status FROM assessment WHERE id = OLD.assessment_id) IN ('approved', 'withdrawn')
BEGIN
    SELECT RAISE(ABORT, 'the sign-offs of an approved or withdrawn assessment are kept as records');
END;
)sql";

// A change to what the figures describe makes the laser's approved assessments out of date. The laser's notes
// carry no figure, so editing them leaves approvals current.
constexpr std::string_view kOutOfDateTriggers = R"sql(
CREATE TRIGGER laser_changed AFTER UPDATE ON laser
WHEN NEW.name IS NOT OLD.name OR NEW.maker_model IS NOT OLD.maker_model OR NEW.serial IS NOT OLD.serial OR
     NEW.room_id IS NOT OLD.room_id OR NEW.class IS NOT OLD.class
BEGIN
    UPDATE assessment SET out_of_date = 1 WHERE laser_id = NEW.id AND status = 'approved';
END;

CREATE TRIGGER output_added AFTER INSERT ON output
BEGIN
    UPDATE assessment SET out_of_date = 1 WHERE laser_id = NEW.laser_id AND status = 'approved';
END;
CREATE TRIGGER output_changed AFTER UPDATE ON output
BEGIN
    UPDATE assessment SET out_of_date = 1 WHERE laser_id IN (NEW.laser_id, OLD.laser_id) AND status = 'approved';
END;
CREATE TRIGGER output_removed AFTER DELETE ON output
BEGIN
    UPDATE assessment SET out_of_date = 1 WHERE laser_id = OLD.laser_id AND status = 'approved';
END;

CREATE TRIGGER spectral_sample_added AFTER INSERT ON spectral_sample
BEGIN
    UPDATE assessment SET out_of_date = 1
    WHERE laser_id = (SELECT laser_id FROM output WHERE id = NEW.output_id) AND status = 'approved';
END;
CREATE TRIGGER spectral_sample_changed AFTER UPDATE ON spectral_sample
BEGIN
    UPDATE assessment SET out_of_date = 1
    WHERE laser_id IN (SELECT laser_id FROM output WHERE id IN (NEW.output_id, OLD.output_id))
      AND status = 'approved';
END;
CREATE TRIGGER spectral_sample_removed AFTER DELETE ON spectral_sample
BEGIN
    UPDATE assessment SET out_of_date = 1
    WHERE laser_id = (SELECT laser_id FROM output WHERE id = OLD.output_id) AND status = 'approved';
END;

CREATE TRIGGER exposure_case_added AFTER INSERT ON exposure_case
BEGIN
    UPDATE assessment SET out_of_date = 1
    WHERE laser_id = (SELECT laser_id FROM output WHERE id = NEW.output_id) AND status = 'approved';
END;
CREATE TRIGGER exposure_case_changed AFTER UPDATE ON exposure_case
BEGIN
    UPDATE assessment SET out_of_date = 1
    WHERE laser_id IN (SELECT laser_id FROM output WHERE id IN (NEW.output_id, OLD.output_id))
      AND status = 'approved';
END;
CREATE TRIGGER exposure_case_removed AFTER DELETE ON exposure_case
BEGIN
    UPDATE assessment SET out_of_date = 1
    WHERE laser_id = (SELECT laser_id FROM output WHERE id = OLD.output_id) AND status = 'approved';
END;
)sql";

constexpr std::array kStatuses{model::AssessmentStatus::Draft, model::AssessmentStatus::InReview,
                               model::AssessmentStatus::Approved, model::AssessmentStatus::Withdrawn};

} // namespace

Result<void> createSchema(sqlite3* db)
{
    for (const std::string_view part : {kTables, kStatusTriggers, kOutOfDateTriggers}) {
        if (auto done = execute(db, part, "schema"); !done)
            return done;
    }
    auto insert = Statement::prepare(db, "INSERT INTO status_move (from_status, to_status) VALUES (?1, ?2)");
    if (!insert)
        return std::unexpected(insert.error());
    for (const auto from : kStatuses) {
        for (const auto to : kStatuses) {
            if (!model::isAllowedTransition(from, to))
                continue;
            if (auto done = insert->bind(1, model::toString(from)).bind(2, model::toString(to)).run("schema"); !done)
                return done;
        }
    }
    return {};
}

const std::vector<std::string_view>& expectedSchemaObjects()
{
    static const std::vector<std::string_view> names = {
        "lab", "room", "laser", "output", "spectral_sample", "exposure_case", "eyewear", "eyewear_od",
        "eyewear_marking", "status_move", "assessment", "sign_off",
        // status rules
        "assessment_starts_as_draft", "assessment_approved_is_read_only", "assessment_status_by_sign_off",
        "assessment_out_of_date_rule", "assessment_kept_as_record", "sign_off_allowed_move", "sign_off_moves_status",
        "sign_off_never_edited", "sign_off_kept_as_record",
        // out-of-date marks
        "laser_changed", "output_added", "output_changed", "output_removed", "spectral_sample_added",
        "spectral_sample_changed", "spectral_sample_removed", "exposure_case_added", "exposure_case_changed",
        "exposure_case_removed"};
    return names;
}

} // namespace beamwarden::store
