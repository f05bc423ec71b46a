#pragma once
// Hazard distances and required optical density for one output and one exposure case (hazard-and-eyewear.md
// sections 1, 3, 5), on top of the exposure-limit engine. Eye only: NOHD and OD are ocular quantities.
#include "beamwarden/error.hpp"
#include "beamwarden/limits/mpe.hpp"
#include "beamwarden/model/beam.hpp"
#include "beamwarden/model/emission.hpp"
#include "beamwarden/model/exposurecase.hpp"

#include <string>
#include <vector>

namespace beamwarden::hazard {

struct HazardRequest {
    model::Emission emission;
    model::Beam beam;
    model::ExposureCase exposureCase;
    limits::RuleChoice rules = limits::RuleChoice::Strictest;
    limits::C5Option c5 = limits::C5Option::Conservative;
};

// The exposure duration basis and why it was chosen.
struct ExposureBasis {
    units::Duration duration;
    bool isDefault = true;
    std::string reason;
};

enum class DistanceKind : std::uint8_t { Zero, Finite, Unbounded };

struct HazardDistance {
    DistanceKind kind = DistanceKind::Zero;
    units::Length value;       // the reported distance (the longer where two beam models are computed)
    units::Length linear;      // beam cases: d = a + phi r
    units::Length quadrature;  // beam cases: d^2 = a^2 + (phi r)^2
    units::Length smallSource; // diffuse: the radius if the lit spot is treated as a small source (no C6)
    std::string model;         // which model gives `value`, in words
};

// One spectral sample at the worst point.
struct LineResult {
    model::SpectralSample sample;
    limits::MpeResult mpe;
    double exposure = 0; // per pulse J/m^2 (pulsed) or W/m^2 (CW), at the worst point
    double limit = 0;    // the MPE in the same unit
    double ratio = 0;    // exposure / limit
};

// Required OD for one wavelength band (samples of a spectrum merged, lines kept apart).
struct BandOd {
    units::Wavelength from;
    units::Wavelength to;
    double ratio = 0;      // exposure / MPE of the band's own lines
    double requiredOd = 0; // exact, >= 0, with the band's share of the combined sum
};

struct RuleOd {
    limits::PulseRule rule = limits::PulseRule::SinglePulse;
    bool applies = false;
    double perPulseLimit = 0; // J/m^2
    double od = 0;
};

struct HazardResult {
    HazardRequest request;
    ExposureBasis basis;
    bool pulsed = false;
    std::string exposureUnit; // "J/m2" (per pulse) or "W/m2"
    std::vector<LineResult> lines;
    std::size_t governingLine = 0;

    double exposureAtPoint = 0; // the output's total exposure at the worst point (sum over lines)
    double limit = 0;           // the MPE of the governing line, same unit
    double combinedRatio = 0;   // sum of additive exposure/MPE ratios (the largest group)
    double requiredOd = 0;      // exact: log10(combinedRatio), at least 0
    double displayedOd = 0;     // rounded up to one decimal, never down
    limits::PulseRule governingRule = limits::PulseRule::SinglePulse;
    std::vector<RuleOd> perRule; // pulsed: OD against each rule's per-pulse limit (governing line and set)
    std::vector<BandOd> bands;

    HazardDistance nohd;
    units::Length pointDistance; // the worst point evaluated
    units::Angle sourceAngleAtPoint;
    units::Length aperture;               // limiting aperture used for the exposure
    std::vector<std::string> conventions; // how the exposure was formed (for the provenance)
    std::vector<std::string> notes;       // cautions about this figure
};

[[nodiscard]] Result<HazardResult> evaluateHazard(const HazardRequest& request);

// The default exposure basis for a spectrum (hazard-and-eyewear.md section 3).
[[nodiscard]] ExposureBasis defaultBasis(const model::Spectrum& spectrum);

// Rounds a requirement up to one decimal (3.17 -> 3.2); never down.
[[nodiscard]] double roundOdUp(double od);

} // namespace beamwarden::hazard
