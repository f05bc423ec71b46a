// Additivity of several wavelengths (exposure-limits.md section 6.2). The table's layout is verified (BGI 832,
// p. 23); its cells are reconstructed.
#include "beamwarden/limits/additivity.hpp"

#include <algorithm>
#include <array>

namespace beamwarden::limits {

namespace {

// kTable[target][a][b]: whether region a and region b add for that target (A = eye, S = skin).
constexpr std::array<std::array<std::array<bool, 4>, 4>, 2> kTable{{
    // eye
    {{{true, true, false, false}, {true, true, false, true}, {false, false, true, false}, {false, true, false, true}}},
    // skin
    {{{true, true, false, false}, {true, true, true, true}, {false, true, true, true}, {false, true, true, true}}},
}};

} // namespace

SpectralRegion spectralRegion(units::Wavelength wavelength)
{
    const double nm = wavelength.nanometres();
    if (nm < 315.0)
        return SpectralRegion::Uv180To315;
    if (nm < 400.0)
        return SpectralRegion::Uv315To400;
    if (nm < 1400.0)
        return SpectralRegion::Visible400To1400;
    return SpectralRegion::Infrared1400To1mm;
}

bool additive(Target target, SpectralRegion a, SpectralRegion b)
{
    return kTable[target == Target::Eye ? 0 : 1][static_cast<std::size_t>(a)][static_cast<std::size_t>(b)];
}

AdditivityResult combineLines(Target target, const std::vector<LineRatio>& lines)
{
    AdditivityResult result;
    result.combinedRatio.assign(lines.size(), 0.0);
    result.share.assign(lines.size(), 0.0);
    // The relation is not transitive (315-400 nm adds with both neighbours, which do not add with each other), so
    // each line gets the sum over the lines that add with it, and the largest sum governs.
    for (std::size_t i = 0; i < lines.size(); ++i) {
        const SpectralRegion ri = spectralRegion(lines[i].wavelength);
        for (const LineRatio& other : lines) {
            if (additive(target, ri, spectralRegion(other.wavelength)))
                result.combinedRatio[i] += other.exposureOverMpe;
        }
        // Among equal sums (lines of one additive group) the line with the largest own ratio is named.
        const bool larger = result.combinedRatio[i] > result.governingSum * (1.0 + 1e-12);
        const bool tieButStronger = result.combinedRatio[i] >= result.governingSum * (1.0 - 1e-12) &&
                                    lines[i].exposureOverMpe > lines[result.governingLine].exposureOverMpe;
        if (larger || tieButStronger) {
            result.governingSum = std::max(result.governingSum, result.combinedRatio[i]);
            result.governingLine = i;
        }
    }
    if (lines.empty() || result.governingSum <= 0.0)
        return result;
    const SpectralRegion governing = spectralRegion(lines[result.governingLine].wavelength);
    for (std::size_t j = 0; j < lines.size(); ++j) {
        if (additive(target, governing, spectralRegion(lines[j].wavelength)))
            result.share[j] = lines[j].exposureOverMpe / result.governingSum;
    }
    return result;
}

} // namespace beamwarden::limits
