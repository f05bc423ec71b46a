#include "beamwarden/model/emission.hpp"

#include <cmath>
#include <fmt/core.h>

namespace beamwarden::model {

double Emission::pulsesPerSecond() const
{
    if (!pulsed)
        return 0.0;
    if (burst)
        return burst->pulsesPerBurst * burst->burstRate.hertz();
    return prf.hertz();
}

Result<Emission> completeAndValidate(Emission e)
{
    if (e.spectrum.samples.empty())
        return fail("wavelength", "", "at least one wavelength");
    const auto positive = [](double v) { return std::isfinite(v) && v > 0.0; };
    const bool hasPower = e.averagePower.si() != 0.0;
    const bool hasEnergy = e.pulseEnergy.si() != 0.0;
    if (hasPower) {
        if (auto inRange = checkRange(Quantity::AveragePower, e.averagePower.si(), "power"); !inRange)
            return std::unexpected(inRange.error());
    }
    if (hasEnergy) {
        if (auto inRange = checkRange(Quantity::PulseEnergy, e.pulseEnergy.si(), "pulse-energy"); !inRange)
            return std::unexpected(inRange.error());
    }
    if (!e.pulsed) {
        // Zero is how a record says "no power"; a CW output needs one, so the refusal says what zero lacks.
        if (!hasPower)
            return fail("power", units::formatExact(e.averagePower), allowedRange(Quantity::AveragePower));
        if (hasEnergy)
            return fail("pulse-energy", units::formatExact(e.pulseEnergy), "a pulse energy only with --prf (pulsed)");
        return e;
    }
    if (auto inRange = checkRange(Quantity::PulseDuration, e.pulseDuration.si(), "duration"); !inRange)
        return std::unexpected(inRange.error());
    if (auto inRange = checkRange(Quantity::Prf, e.prf.si(), "prf"); !inRange)
        return std::unexpected(inRange.error());
    const double rate = e.pulsesPerSecond();
    // Only a burst pattern can make the rate zero here (the prf is above 0).
    if (!positive(rate)) {
        if (e.burst && e.burst->pulsesPerBurst < 1)
            return fail("burst-count", std::to_string(e.burst->pulsesPerBurst), "1 or more pulses per burst");
        return fail("burst-rate", units::formatExact(e.burst ? e.burst->burstRate : e.prf), "a burst rate above 0 Hz");
    }
    if (!hasPower && !hasEnergy)
        return fail("power", "", "the mean power (--power) or the pulse energy (--pulse-energy)");
    if (!hasEnergy) {
        e.pulseEnergy = units::Energy::fromSi(e.averagePower.si() / rate);
        if (!(e.pulseEnergy.si() <= kMaxPulseEnergy_J))
            return fail("power", units::formatExact(e.averagePower),
                        fmt::format("a mean power that gives at most {} per pulse at {} pulses per second",
                                    units::format(units::Energy::fromSi(kMaxPulseEnergy_J)),
                                    units::format(units::Frequency::fromSi(rate))));
    } else if (!hasPower) {
        e.averagePower = units::Power::fromSi(e.pulseEnergy.si() * rate);
        if (!(e.averagePower.si() <= kMaxAveragePower_W))
            return fail("pulse-energy", units::formatExact(e.pulseEnergy),
                        fmt::format("a pulse energy whose mean power (energy x pulses per second) is at most {}",
                                    units::format(units::Power::fromSi(kMaxAveragePower_W))));
    } else if (std::abs(e.pulseEnergy.si() * rate - e.averagePower.si()) > 0.01 * e.averagePower.si()) {
        return fail("pulse-energy", units::formatExact(e.pulseEnergy),
                    "a pulse energy that matches the mean power at the pulse rate (" +
                        units::format(units::Energy::fromSi(e.averagePower.si() / rate)) + ")");
    }
    // Peak power bounds the shortest pulse a given energy may have: 1 mJ in 1e-30 s is a slip, not a laser.
    if (!(e.pulseEnergy.si() / e.pulseDuration.si() <= kMaxPeakPower_W))
        return fail("duration", units::formatExact(e.pulseDuration),
                    fmt::format("a pulse duration of at least {} for {} per pulse (peak power, energy / duration, at "
                                "most {})",
                                units::format(units::Duration::fromSi(e.pulseEnergy.si() / kMaxPeakPower_W)),
                                units::format(e.pulseEnergy), units::format(units::Power::fromSi(kMaxPeakPower_W))));
    return e;
}

} // namespace beamwarden::model
