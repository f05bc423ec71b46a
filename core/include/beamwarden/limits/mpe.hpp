#pragma once
// The exposure-limit engine's entry point: MPE for one wavelength, target, source size and exposure, single or as a
// pulse train, under one rule set or the strictest of all. Every figure carries its provenance.
#include "beamwarden/error.hpp"
#include "beamwarden/limits/ruleset.hpp"
#include "beamwarden/limits/types.hpp"
#include "beamwarden/units.hpp"

#include <array>
#include <cstdint>
#include <optional>

namespace beamwarden::limits {

// Bursts: groups of pulses at the pulse repetition rate, the groups repeated at burstRate.
struct Burst {
    int pulsesPerBurst = 0;
    units::Frequency burstRate;
};

struct PulseTrain {
    units::Frequency prf;     // pulse repetition rate (within a burst, if bursts are given)
    units::Duration exposure; // duration of the whole exposure to the train
    std::optional<Burst> burst;
};

struct MpeRequest {
    units::Wavelength wavelength;
    Target target = Target::Eye;
    // Single exposure: the exposure duration. Pulse train: the duration of one pulse.
    units::Duration duration;
    std::optional<PulseTrain> train;
    // Apparent source angle alpha (full angle); 0 or anything up to 1.5 mrad is a small source.
    units::Angle sourceAngle;
    // Irradiated skin area, for the large-area skin limit beyond 1400 nm (0: not given, the small-area limit holds).
    units::Area skinArea;
    RuleChoice rules = RuleChoice::Strictest;
    C5Option c5 = C5Option::Conservative;
};

// Checks ranges: 180 nm - 1 mm, durations > 0 and <= 30 000 s, finite non-negative angles, rates and counts.
[[nodiscard]] Result<MpeRequest> validate(const MpeRequest& request);

struct AppliedFactor {
    Factor factor;
    double value;
};

// One limit from one row, evaluated at one duration.
struct LimitTerm {
    const LimitRow* row = nullptr;
    units::Duration duration;           // the duration the row was evaluated at
    units::RadiantExposure withinField; // H as the row gives it with its factors, in the field of view below
    units::RadiantExposure wholeSource; // the equivalent limit for the exposure from the whole apparent source
    units::Angle fieldOfView;           // alpha_max (thermal) or gamma_ph (photochemical); 0 where none applies
    units::Angle alphaMax;              // alpha_max used for C6 (0 where C6 does not apply)
    units::Length aperture;             // limiting aperture diameter for this target, wavelength and duration
    std::array<AppliedFactor, 5> factors{};
    std::uint8_t factorCount = 0;
    bool belowTable = false; // the duration is below the table's shortest (1e-13 s): the shortest row's form is used

    [[nodiscard]] std::span<const AppliedFactor> appliedFactors() const { return {factors.data(), factorCount}; }
};

// Every limit that applies at one duration; the lowest whole-source value governs.
struct LimitSet {
    std::array<LimitTerm, 4> terms{};
    std::uint8_t count = 0;
    std::uint8_t governing = 0;

    [[nodiscard]] const LimitTerm& governingTerm() const { return terms[governing]; }
    [[nodiscard]] units::RadiantExposure value() const { return terms[governing].wholeSource; }
    [[nodiscard]] std::span<const LimitTerm> all() const { return {terms.data(), count}; }
};

// One pulse-train rule's per-pulse limit with what it was built from.
struct RuleOutcome {
    PulseRule rule = PulseRule::SinglePulse;
    bool applies = false;
    units::RadiantExposure perPulse;
    LimitTerm basis;          // the limit it was derived from (at t_p, Ti, the burst or T)
    double pulsesCounted = 0; // rule 2: pulses in T (or in the burst); rule 3: N
    double groupSize = 1;     // pulses per Ti group behind this value (1: not grouped)
    double c5 = 1;            // rule 3 only
    bool grouped = false;
    bool overBurst = false; // rule 2 over one burst rather than the whole exposure
};

struct TrainOutcome {
    RuleOutcome singlePulse; // rule 1 (the lower of the individual pulse and the Ti group)
    RuleOutcome average;     // rule 2 (the lower of the whole exposure and one burst)
    RuleOutcome repeated;    // rule 3, where it applies
    PulseRule governingRule = PulseRule::SinglePulse;
    units::RadiantExposure perPulse;
    units::Duration ti;          // 0 where no Ti applies
    double pulsesInExposure = 0; // N_T for rule 2
    double c5Conservative = 1;   // 2014 only: both readings, side by side
    double c5Edition = 1;
    bool hasBothC5 = false;
};

// The result under one rule set.
struct SetOutcome {
    RuleSetId set = RuleSetId::Iec60825_1_2007;
    C5Option c5 = C5Option::Conservative;
    LimitSet single; // at the single-exposure duration (trains: at the pulse duration)
    std::optional<TrainOutcome> train;
    units::RadiantExposure limit;                  // single: the MPE as H; train: per pulse
    RowStatus weakestStatus = RowStatus::Verified; // of the rows behind the governing figure
    bool belowTable = false;
};

struct MpeResult {
    MpeRequest request;
    std::array<SetOutcome, kRuleSetCount> sets{};
    std::uint8_t setCount = 0;
    std::uint8_t governingSet = 0;
    bool setsTie = false; // strictest: every set gave the same figure (within 1e-9 relative)

    [[nodiscard]] std::span<const SetOutcome> allSets() const { return {sets.data(), setCount}; }
    [[nodiscard]] const SetOutcome& governing() const { return sets[governingSet]; }
    [[nodiscard]] bool isTrain() const { return request.train.has_value(); }

    // Single exposure: the MPE as H for the duration. Train: the total allowed over the exposure (per pulse x N_T).
    [[nodiscard]] units::RadiantExposure radiantExposure() const;
    // Single exposure: H / duration. Train: the average irradiance allowed over the exposure.
    [[nodiscard]] units::Irradiance irradiance() const;
    // Trains: the per-pulse MPE after all rules. Single exposure: same as radiantExposure().
    [[nodiscard]] units::RadiantExposure perPulse() const;
    // True if the figure that governs rests on a row reconstructed from public material.
    [[nodiscard]] bool restsOnReconstructedRow() const;
};

// Evaluates the request (validated first). Refuses out-of-range input rather than extrapolating.
[[nodiscard]] Result<MpeResult> evaluateMpe(const MpeRequest& request);

// Lower-level: every limit that applies at (wavelength, duration) under one set, for the given source angle.
// alphaMaxOverride > 0 replaces alpha_max in C6 (rule 3 under the conservative C5 option uses 100 mrad).
[[nodiscard]] LimitSet evaluateLimits(const RuleSet& set, Target target, units::Wavelength wavelength,
                                      units::Duration duration, units::Angle sourceAngle, units::Area skinArea,
                                      double alphaMaxOverride_rad = 0.0);

} // namespace beamwarden::limits
