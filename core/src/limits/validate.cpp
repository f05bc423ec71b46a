// Input ranges of the limit engine (exposure-limits.md section 6.1 item 1): refuse, never extrapolate.
#include "beamwarden/limits/mpe.hpp"
#include "beamwarden/units.hpp"

#include <cmath>
#include <fmt/core.h>

namespace beamwarden::limits {

Result<MpeRequest> validate(const MpeRequest& request)
{
    const double lambda = request.wavelength.si();
    if (!std::isfinite(lambda) || lambda < 180e-9 || lambda > 1e-3)
        return fail("wavelength", units::formatExact(request.wavelength), "180 nm to 1 mm");

    const double t = request.duration.si();
    if (!std::isfinite(t) || t <= 0.0 || t > 3e4)
        return fail("duration", units::formatExact(request.duration), "more than 0 s and at most 30000 s");

    const double alpha = request.sourceAngle.si();
    if (!std::isfinite(alpha) || alpha < 0.0 || alpha > 3.2)
        return fail("source-angle", units::formatExact(request.sourceAngle), "0 (small source) up to pi rad");

    const double area = request.skinArea.si();
    if (!std::isfinite(area) || area < 0.0 || area > 10.0)
        return fail("skin-area", units::formatExact(request.skinArea), "0 (not given) up to 10 m^2");

    if (!request.train)
        return request;

    const PulseTrain& train = *request.train;
    const double f = train.prf.si();
    if (!std::isfinite(f) || f <= 0.0 || f > 1e13)
        return fail("prf", units::formatExact(train.prf), "more than 0 Hz and at most 10 THz");
    if (t > 1.0 / f)
        return fail("duration", units::formatExact(request.duration),
                    "a pulse duration no longer than the pulse period 1/prf = " +
                        units::format(units::Duration::fromSi(1.0 / f)));
    const double exposure = train.exposure.si();
    if (!std::isfinite(exposure) || exposure <= 0.0 || exposure > 3e4)
        return fail("exposure", units::formatExact(train.exposure), "more than 0 s and at most 30000 s");
    if (exposure < t)
        return fail("exposure", units::formatExact(train.exposure),
                    "an exposure at least as long as one pulse (" + units::format(request.duration) + ")");

    if (train.burst) {
        const Burst& burst = *train.burst;
        if (burst.pulsesPerBurst < 1 || burst.pulsesPerBurst > 1'000'000'000)
            return fail("burst-count", std::to_string(burst.pulsesPerBurst), "1 to 1e9 pulses per burst");
        const double fb = burst.burstRate.si();
        if (!std::isfinite(fb) || fb <= 0.0 || fb > f)
            return fail("burst-rate", units::formatExact(burst.burstRate), "more than 0 Hz and at most the prf");
        const double span = (burst.pulsesPerBurst - 1) / f + t;
        if (span > 1.0 / fb)
            return fail("burst-count", std::to_string(burst.pulsesPerBurst),
                        "a burst (" + units::format(units::Duration::fromSi(span)) +
                            ") that ends before the next one starts (1/burst-rate = " +
                            units::format(units::Duration::fromSi(1.0 / fb)) + ")");
    }
    return request;
}

} // namespace beamwarden::limits
