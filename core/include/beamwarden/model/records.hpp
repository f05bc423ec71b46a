#pragma once
// The records of a lab file (vocabulary.md "Records"): what the store keeps and the lab export carries. Plain values;
// the store gives them ids. Evaluations take the model types inside them (Emission, Beam, ExposureCase).
#include "beamwarden/model/beam.hpp"
#include "beamwarden/model/emission.hpp"
#include "beamwarden/model/exposurecase.hpp"
#include "beamwarden/units.hpp"

#include <cstdint>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace beamwarden::model {

using RecordId = std::int64_t; // 0: not stored yet

struct Room {
    RecordId id = 0;
    std::string name; // e.g. "B112"
    std::string description;
};

struct Lab {
    RecordId id = 0;
    std::string name;
    std::string lsoName; // the responsible laser safety officer, as typed by the user
    std::string notes;
    std::vector<Room> rooms;
};

enum class LaserClass : std::uint8_t { Unknown, Class1, Class1M, Class1C, Class2, Class2M, Class3R, Class3B, Class4 };
[[nodiscard]] std::string_view toString(LaserClass laserClass); // "unknown", "1", "1M", ..., "3B", "4"
[[nodiscard]] Result<LaserClass> parseLaserClass(std::string_view text);

struct NamedExposureCase {
    RecordId id = 0;
    std::string name; // e.g. "intrabeam at the exit", "diffuse from the beam dump"
    ExposureCase exposureCase;
};

struct Output {
    RecordId id = 0;
    std::string name; // e.g. "fundamental", "SHG", "signal"
    Emission emission;
    Beam beam;
    std::vector<NamedExposureCase> exposureCases;
};

struct Laser {
    RecordId id = 0;
    std::string name; // e.g. "Amplifier A1"
    std::string makerModel;
    std::string serial;
    std::string room; // a Room's name, or empty
    LaserClass laserClass = LaserClass::Unknown;
    std::string notes;
    std::vector<Output> outputs;
};

// The largest OD a table may state: far beyond what any filter is rated or measured at (common practice: printed
// tables stop near OD 10), so a larger figure is a slip such as 1e300, never a real filter.
inline constexpr double kMaxOpticalDensity = 20.0;

// One row of an eyewear item's spectral OD table: OD over [from, to]; makers print "at least" values.
struct OdRow {
    units::Wavelength from;
    units::Wavelength to;
    double od = 0;
    bool atLeast = true; // "OD >= 7" as printed, rather than a measured value
};

struct EyewearItem {
    RecordId id = 0;
    std::string name;        // e.g. "Goggle G1"
    std::string description; // e.g. "absorbing glass, grey-green"
    std::vector<OdRow> spectralOd;
    std::vector<std::string> en207Markings; // one per marked line, as printed, e.g. "740-1100 D LB7 + IR LB8"
    std::vector<std::string> en208Markings; // alignment eyewear, e.g. "1 W 2x10^-4 J 532 RB3"
    double visibleTransmittance = 0;        // 0..1, 0 = not known
    int count = 1;
    std::string location;
    std::string lastInspection; // ISO 8601 date "YYYY-MM-DD", or empty
    std::string notes;
};

enum class AssessmentStatus : std::uint8_t { Draft, InReview, Approved, Withdrawn };
[[nodiscard]] std::string_view toString(AssessmentStatus status); // "draft", "in review", "approved", "withdrawn"
[[nodiscard]] Result<AssessmentStatus> parseAssessmentStatus(std::string_view text);
// Allowed moves: draft -> in review -> approved; draft or in review -> withdrawn; in review -> draft (sent back).
[[nodiscard]] bool isAllowedTransition(AssessmentStatus from, AssessmentStatus to);

struct SignOff {
    RecordId id = 0;
    std::string who;
    std::string when; // ISO 8601 UTC, e.g. "2026-12-01T14:03:00Z"
    AssessmentStatus from = AssessmentStatus::Draft;
    AssessmentStatus to = AssessmentStatus::Draft;
    std::string comment;
};

struct Assessment {
    RecordId id = 0;
    RecordId laserId = 0;
    std::string title;
    std::string ruleSet;        // e.g. "strictest" (with the C5 option inside the snapshot)
    std::string programVersion; // the Beamwarden version that computed the results
    std::string author;
    std::string created; // ISO 8601 UTC
    std::string updated;
    AssessmentStatus status = AssessmentStatus::Draft;
    bool outOfDate = false;    // the laser changed after approval: the figures no longer describe it
    std::string inputSnapshot; // JSON text: the laser as assessed
    std::string results;       // JSON text: every figure, with provenance
    std::vector<SignOff> signOffs;
};

} // namespace beamwarden::model
