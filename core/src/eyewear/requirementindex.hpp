#pragma once
// Checking a shelf of thousands of items against an output looks at every spectral sample once per item unless the
// samples are indexed. An item's OD and levels are constant over a few wavelength pieces (its table rows and marked
// spans), so the check asks, per piece: the samples' exposure/MPE sums per additive region, the strongest sample, the
// samples that matter but are not rated, and the highest level required per mode. This index answers those questions
// for one output requirement in a few steps each; it is built once and serves every item.
#include "beamwarden/eyewear/protection.hpp"

#include <array>
#include <cstddef>
#include <vector>

namespace beamwarden::eyewear::detail {

inline constexpr std::size_t kRegionCount = 4;

// Positions [begin, end) in a wavelength-sorted list.
struct Range {
    std::size_t begin = 0;
    std::size_t end = 0;
    [[nodiscard]] bool empty() const { return begin >= end; }
};

class RequirementIndex {
public:
    explicit RequirementIndex(const OutputRequirement& requirement);

    // Lines (hazard samples), sorted by wavelength; ties keep the hazard's order.
    [[nodiscard]] std::size_t lineCount() const { return m_lineLambda.size(); }
    [[nodiscard]] Range linesAt(double lambda_nm) const;                         // exactly at lambda
    [[nodiscard]] Range linesBetween(double from_nm, double to_nm) const;        // strictly between
    [[nodiscard]] Range linesBelow(double lambda_nm) const;                      // strictly below
    [[nodiscard]] Range linesAbove(double lambda_nm) const;                      // strictly above
    [[nodiscard]] std::array<double, kRegionCount> ratioSums(Range range) const; // exposure/MPE per region
    [[nodiscard]] std::size_t strongest(Range range) const; // position of the largest ratio (first in hazard order)
    [[nodiscard]] double ratioAt(std::size_t position) const { return m_lineRatio[position]; }
    [[nodiscard]] std::size_t hazardIndexAt(std::size_t position) const { return m_lineOrder[position]; }
    [[nodiscard]] double lambdaAt(std::size_t position) const { return m_lineLambda[position]; }
    [[nodiscard]] const std::array<bool, kRegionCount>& regionsPresent() const { return m_present; }
    // The first and last wavelengths in the range of lines whose ratio exceeds 1e-6 (those that need rating).
    [[nodiscard]] bool significantIn(Range range, double& first_nm, double& last_nm) const;

    // Level samples (EN 207 requirements), sorted by wavelength.
    [[nodiscard]] Range samplesAt(double lambda_nm) const;
    [[nodiscard]] Range samplesBetween(double from_nm, double to_nm) const;
    [[nodiscard]] Range samplesBelow(double lambda_nm) const;
    [[nodiscard]] Range samplesAbove(double lambda_nm) const;
    [[nodiscard]] std::size_t sampleCount() const { return m_sampleLambda.size(); }
    [[nodiscard]] double sampleLambdaAt(std::size_t position) const { return m_sampleLambda[position]; }
    // The highest level of `mode` required in the range (LB1..LB10; 0 where none is, or beyond LB10).
    [[nodiscard]] int highestLevel(int mode, Range range) const;
    // The first / last position in the range needing `mode` above `level`; the range's end if none.
    [[nodiscard]] std::size_t firstAbove(int mode, Range range, int level) const;
    [[nodiscard]] std::size_t lastAbove(int mode, Range range, int level) const;

    // Item-independent facts of the requirement.
    std::array<int, kModeCount> requiredLevels{}; // per mode, the highest over all samples (beyond LB10 included)
    bool beyondLb10 = false;
    bool correctionMissing = false;

private:
    template <typename T>
    struct Tree { // a bottom-up segment tree over positions
        std::size_t size = 1;
        std::vector<T> nodes;
    };

    std::vector<double> m_lineLambda;
    std::vector<double> m_lineRatio;
    std::vector<std::size_t> m_lineOrder;
    std::vector<std::size_t> m_lineRegion;
    std::array<bool, kRegionCount> m_present{};
    Tree<std::array<double, kRegionCount>> m_sums;
    Tree<std::size_t> m_strongest;           // positions; npos for padding
    std::vector<double> m_significantLambda; // sorted

    std::vector<double> m_sampleLambda;
    std::array<Tree<int>, kModeCount> m_levels;
};

// checkAll (protection.hpp) with the requirements' indices built once for a whole shelf.
[[nodiscard]] ProtectionCheck checkAll(const ParsedEyewear& eyewear, const std::vector<OutputRequirement>& outputs,
                                       const std::vector<RequirementIndex>& indices);

} // namespace beamwarden::eyewear::detail
