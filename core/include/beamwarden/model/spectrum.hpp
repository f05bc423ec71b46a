#pragma once
// The light of an output: one line, several lines, or a band sampled as lines. Each sample carries its share of
// the output's power and the width of wavelength it stands for, so OD can be required per band.
#include "beamwarden/error.hpp"
#include "beamwarden/units.hpp"

#include <vector>

namespace beamwarden::model {

struct SpectralSample {
    units::Wavelength wavelength;
    double powerFraction = 1.0; // share of the output's power; the samples of a spectrum add up to 1
    units::Wavelength width;    // the band the sample stands for (0 for a line)
};

struct Spectrum {
    std::vector<SpectralSample> samples;

    [[nodiscard]] bool isSingleLine() const { return samples.size() == 1; }
    [[nodiscard]] units::Wavelength shortest() const;
    [[nodiscard]] units::Wavelength longest() const;
    // The power-weighted mean wavelength: the line itself, or the centre of a band.
    [[nodiscard]] units::Wavelength centroid() const;
};

// One line carrying all the power.
[[nodiscard]] Spectrum singleLine(units::Wavelength wavelength);
// A Gaussian band of the given full width at half maximum, sampled over +-1.5 FWHM (99.96 % of the power, renormalised
// to 1) in `samples` equal bins (odd, at least 3).
[[nodiscard]] Result<Spectrum> gaussianBand(units::Wavelength centre, units::Wavelength fwhm, int samples = 33);
// Several lines with their power shares (normalised to add up to 1).
[[nodiscard]] Result<Spectrum> lines(const std::vector<SpectralSample>& lines);

// Transform-limited Gaussian pulse: FWHM bandwidth = 0.441 lambda^2 / (c t_p) (exposure-limits.md section 6.3).
[[nodiscard]] units::Wavelength transformLimitedBandwidth(units::Wavelength centre, units::Duration pulse);

} // namespace beamwarden::model
