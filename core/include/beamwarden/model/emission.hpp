#pragma once
// An output's emission: its spectrum and its time structure (CW, or pulses at a rate, optionally in bursts).
#include "beamwarden/error.hpp"
#include "beamwarden/model/ranges.hpp"
#include "beamwarden/model/spectrum.hpp"
#include "beamwarden/units.hpp"

#include <optional>

namespace beamwarden::model {

struct BurstPattern {
    int pulsesPerBurst = 0;
    units::Frequency burstRate;
};

struct Emission {
    Spectrum spectrum;
    bool pulsed = false;
    units::Power averagePower;     // CW power, or the mean power of a pulsed output
    units::Energy pulseEnergy;     // pulsed only
    units::Duration pulseDuration; // pulsed only
    units::Frequency prf;          // pulsed only: the rate within a burst, if bursts are given
    std::optional<BurstPattern> burst;

    // Mean pulses per second (prf, or pulses per burst x burst rate).
    [[nodiscard]] double pulsesPerSecond() const;
};

// Fills the missing one of average power and pulse energy from the other and the rate; refuses a pair that
// disagrees by more than 1 %, values outside their ranges (ranges.hpp) or a peak power above kMaxPeakPower_W, and a
// pulsed emission without duration or rate.
[[nodiscard]] Result<Emission> completeAndValidate(Emission emission);

} // namespace beamwarden::model
