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
    // each line gets the sum over the lines that add with it, and the largest sum governs. That sum depends only on
    // the line's region: one pass per region, adding in line order as a line-by-line sum would, keeps it linear in
    // the number of lines (a band may carry hundreds of samples) and gives the same figures to the last bit.
    constexpr std::size_t kRegions = 4;
    std::array<SpectralRegion, kRegions> regions{SpectralRegion::Uv180To315, SpectralRegion::Uv315To400,
                                                 SpectralRegion::Visible400To1400, SpectralRegion::Infrared1400To1mm};
    std::vector<SpectralRegion> regionOf(lines.size());
    std::array<bool, kRegions> present{};
    for (std::size_t i = 0; i < lines.size(); ++i) {
        regionOf[i] = spectralRegion(lines[i].wavelength);
        present[static_cast<std::size_t>(regionOf[i])] = true;
    }
    std::array<double, kRegions> sumFor{};
    for (std::size_t r = 0; r < kRegions; ++r) {
        if (!present[r])
            continue;
        for (std::size_t k = 0; k < lines.size(); ++k) {
            if (additive(target, regions[r], regionOf[k]))
                sumFor[r] += lines[k].exposureOverMpe;
        }
    }
    for (std::size_t i = 0; i < lines.size(); ++i) {
        result.combinedRatio[i] = sumFor[static_cast<std::size_t>(regionOf[i])];
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
    const SpectralRegion governing = regionOf[result.governingLine];
    for (std::size_t j = 0; j < lines.size(); ++j) {
        if (additive(target, governing, regionOf[j]))
            result.share[j] = lines[j].exposureOverMpe / result.governingSum;
    }
    return result;
}

} // namespace beamwarden::limits
