#include "beamwarden/model/emission.hpp"

#include <cmath>

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
    if (hasPower && !positive(e.averagePower.si()))
        return fail("power", units::format(e.averagePower), "a power above 0 W");
    if (!e.pulsed) {
        if (!hasPower)
            return fail("power", "", "the output's power, e.g. 20 W");
        if (hasEnergy)
            return fail("pulse-energy", units::format(e.pulseEnergy), "a pulse energy only with --prf (pulsed)");
        return e;
    }
    if (!positive(e.pulseDuration.si()))
        return fail("duration", units::format(e.pulseDuration), "the pulse duration, above 0 s");
    if (!positive(e.prf.si()))
        return fail("prf", units::format(e.prf), "the pulse repetition rate, above 0 Hz");
    if (hasEnergy && !positive(e.pulseEnergy.si()))
        return fail("pulse-energy", units::format(e.pulseEnergy), "a pulse energy above 0 J");
    const double rate = e.pulsesPerSecond();
    if (!hasPower && !hasEnergy)
        return fail("power", "", "the mean power (--power) or the pulse energy (--pulse-energy)");
    if (!hasEnergy)
        e.pulseEnergy = units::Energy::fromSi(e.averagePower.si() / rate);
    else if (!hasPower)
        e.averagePower = units::Power::fromSi(e.pulseEnergy.si() * rate);
    else if (std::abs(e.pulseEnergy.si() * rate - e.averagePower.si()) > 0.01 * e.averagePower.si())
        return fail("pulse-energy", units::format(e.pulseEnergy),
                    "a pulse energy that matches the mean power at the pulse rate (" +
                        units::format(units::Energy::fromSi(e.averagePower.si() / rate)) + ")");
    return e;
}

} // namespace beamwarden::model
