#pragma once
// Several wavelengths at once: lines acting on the same tissue by the same mechanism add, sum(X_i / MPE_i) <= 1
// (exposure-limits.md section 6.2, additivity table of BGI 832 p. 23, cells reconstructed).
#include "beamwarden/limits/types.hpp"
#include "beamwarden/units.hpp"

#include <vector>

namespace beamwarden::limits {

// The four spectral regions of the additivity table.
enum class SpectralRegion : std::uint8_t { Uv180To315, Uv315To400, Visible400To1400, Infrared1400To1mm };

[[nodiscard]] SpectralRegion spectralRegion(units::Wavelength wavelength);
// Whether exposures in regions a and b add for the target (A = eye, S = skin cells of the table).
[[nodiscard]] bool additive(Target target, SpectralRegion a, SpectralRegion b);

struct LineRatio {
    units::Wavelength wavelength;
    double exposureOverMpe = 0; // X_i / MPE_i, exposure and MPE for the same exposure duration and aperture
};

struct AdditivityResult {
    // For each line: the sum of the ratios of every line that adds with it (itself included).
    std::vector<double> combinedRatio;
    // For each line: its share of the largest combined sum (0 for lines that do not add with the governing one).
    std::vector<double> share;
    double governingSum = 0; // the largest combined sum; above 1 the exposure is over the limit
    std::size_t governingLine = 0;
};

// Using each line's governing MPE (the lower of thermal and photochemical) is never less protective than summing
// thermal and photochemical ratios separately, because every term is at least as large.
[[nodiscard]] AdditivityResult combineLines(Target target, const std::vector<LineRatio>& lines);

} // namespace beamwarden::limits
