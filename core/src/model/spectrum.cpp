#include "beamwarden/model/spectrum.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/core.h>
#include <numeric>

namespace beamwarden::model {

namespace {

constexpr double kSpeedOfLight = 299'792'458.0; // m/s, exact (SI definition)

bool inRange(units::Wavelength w)
{
    return std::isfinite(w.si()) && w.si() >= 180e-9 && w.si() <= 1e-3;
}

} // namespace

units::Wavelength Spectrum::shortest() const
{
    units::Wavelength best = samples.front().wavelength;
    for (const SpectralSample& s : samples)
        best = std::min(best, s.wavelength - s.width / 2.0);
    return best;
}

units::Wavelength Spectrum::longest() const
{
    units::Wavelength best = samples.front().wavelength;
    for (const SpectralSample& s : samples)
        best = std::max(best, s.wavelength + s.width / 2.0);
    return best;
}

units::Wavelength Spectrum::centroid() const
{
    double sum = 0.0;
    double weight = 0.0;
    for (const SpectralSample& s : samples) {
        sum += s.wavelength.si() * s.powerFraction;
        weight += s.powerFraction;
    }
    return weight > 0.0 ? units::Wavelength::fromSi(sum / weight) : units::Wavelength{};
}

Spectrum singleLine(units::Wavelength wavelength)
{
    return Spectrum{{SpectralSample{wavelength, 1.0, units::Wavelength{}}}};
}

Result<Spectrum> gaussianBand(units::Wavelength centre, units::Wavelength fwhm, int samples)
{
    if (!inRange(centre))
        return fail("wavelength", units::formatExact(centre), "180 nm to 1 mm");
    if (!std::isfinite(fwhm.si()) || fwhm.si() <= 0.0 || fwhm.si() > centre.si())
        return fail("bandwidth", units::formatExact(fwhm), "a full width at half maximum above 0 and below the centre");
    if (samples < 3 || samples % 2 == 0 || samples > 4097)
        return fail("samples", std::to_string(samples), "an odd number of samples from 3 to 4097");
    const double sigma = fwhm.si() / (2.0 * std::sqrt(2.0 * std::log(2.0)));
    const double span = 3.0 * fwhm.si(); // +-1.5 FWHM
    const double bin = span / samples;
    Spectrum spectrum;
    double total = 0.0;
    for (int i = 0; i < samples; ++i) {
        const double offset = -span / 2.0 + (i + 0.5) * bin;
        // Power in the bin from the Gaussian's cumulative distribution, so narrow and wide bins are both exact.
        const double lo = (offset - bin / 2.0) / (sigma * std::sqrt(2.0));
        const double hi = (offset + bin / 2.0) / (sigma * std::sqrt(2.0));
        const double share = 0.5 * (std::erf(hi) - std::erf(lo));
        total += share;
        spectrum.samples.push_back(
            SpectralSample{centre + units::Wavelength::fromSi(offset), share, units::Wavelength::fromSi(bin)});
    }
    for (SpectralSample& s : spectrum.samples)
        s.powerFraction /= total;
    if (!inRange(spectrum.shortest()) || !inRange(spectrum.longest()))
        return fail("bandwidth", units::formatExact(fwhm), "a band that stays within 180 nm to 1 mm (+-1.5 FWHM)");
    return spectrum;
}

Result<Spectrum> lines(const std::vector<SpectralSample>& given)
{
    if (given.empty())
        return fail("lines", "", "at least one line");
    double total = 0.0;
    for (std::size_t i = 0; i < given.size(); ++i) {
        const SpectralSample& s = given[i];
        if (!inRange(s.wavelength))
            return fail("lines[" + std::to_string(i) + "].wavelength", units::formatExact(s.wavelength),
                        "180 nm to 1 mm");
        if (!std::isfinite(s.powerFraction) || s.powerFraction <= 0.0)
            return fail("lines[" + std::to_string(i) + "].share", fmt::format("{}", s.powerFraction),
                        "a share of the power above 0");
        total += s.powerFraction;
    }
    Spectrum spectrum{given};
    for (SpectralSample& s : spectrum.samples)
        s.powerFraction /= total;
    return spectrum;
}

units::Wavelength transformLimitedBandwidth(units::Wavelength centre, units::Duration pulse)
{
    return units::Wavelength::fromSi(0.441 * centre.si() * centre.si() / (kSpeedOfLight * pulse.si()));
}

} // namespace beamwarden::model
