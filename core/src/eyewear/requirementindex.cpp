#include "requirementindex.hpp"

#include "beamwarden/limits/additivity.hpp"

#include <algorithm>
#include <limits>
#include <numeric>

namespace beamwarden::eyewear::detail {

namespace {

constexpr std::size_t kNone = std::numeric_limits<std::size_t>::max();

std::size_t treeSize(std::size_t n)
{
    std::size_t size = 1;
    while (size < n)
        size *= 2;
    return size;
}

Range at(const std::vector<double>& sorted, double lambda)
{
    const auto [lo, hi] = std::equal_range(sorted.begin(), sorted.end(), lambda);
    return {static_cast<std::size_t>(lo - sorted.begin()), static_cast<std::size_t>(hi - sorted.begin())};
}

Range between(const std::vector<double>& sorted, double from, double to)
{
    const auto lo = std::upper_bound(sorted.begin(), sorted.end(), from);
    const auto hi = std::lower_bound(lo, sorted.end(), to);
    return {static_cast<std::size_t>(lo - sorted.begin()), static_cast<std::size_t>(hi - sorted.begin())};
}

Range below(const std::vector<double>& sorted, double lambda)
{
    return {0, static_cast<std::size_t>(std::lower_bound(sorted.begin(), sorted.end(), lambda) - sorted.begin())};
}

Range above(const std::vector<double>& sorted, double lambda)
{
    return {static_cast<std::size_t>(std::upper_bound(sorted.begin(), sorted.end(), lambda) - sorted.begin()),
            sorted.size()};
}

} // namespace

RequirementIndex::RequirementIndex(const OutputRequirement& requirement)
{
    const auto& lines = requirement.hazard.lines;
    std::vector<std::size_t> order(lines.size());
    std::iota(order.begin(), order.end(), std::size_t{0});
    std::stable_sort(order.begin(), order.end(), [&](std::size_t a, std::size_t b) {
        return lines[a].sample.wavelength.nanometres() < lines[b].sample.wavelength.nanometres();
    });
    for (const std::size_t i : order) {
        const double lambda = lines[i].sample.wavelength.nanometres();
        m_lineLambda.push_back(lambda);
        m_lineRatio.push_back(lines[i].ratio);
        m_lineOrder.push_back(i);
        const auto region = static_cast<std::size_t>(limits::spectralRegion(lines[i].sample.wavelength));
        m_lineRegion.push_back(region);
        m_present[region] = true;
        if (lines[i].ratio > 1e-6)
            m_significantLambda.push_back(lambda);
    }

    const std::size_t n = m_lineLambda.size();
    m_sums.size = treeSize(n);
    m_sums.nodes.assign(2 * m_sums.size, std::array<double, kRegionCount>{});
    m_strongest.size = m_sums.size;
    m_strongest.nodes.assign(2 * m_strongest.size, kNone);
    for (std::size_t p = 0; p < n; ++p) {
        m_sums.nodes[m_sums.size + p][m_lineRegion[p]] = m_lineRatio[p];
        m_strongest.nodes[m_strongest.size + p] = p;
    }
    auto better = [&](std::size_t a, std::size_t b) {
        if (a == kNone)
            return b;
        if (b == kNone)
            return a;
        if (m_lineRatio[a] != m_lineRatio[b])
            return m_lineRatio[a] > m_lineRatio[b] ? a : b;
        return m_lineOrder[a] < m_lineOrder[b] ? a : b;
    };
    for (std::size_t node = m_sums.size - 1; node >= 1; --node) {
        for (std::size_t r = 0; r < kRegionCount; ++r)
            m_sums.nodes[node][r] = m_sums.nodes[2 * node][r] + m_sums.nodes[2 * node + 1][r];
        m_strongest.nodes[node] = better(m_strongest.nodes[2 * node], m_strongest.nodes[2 * node + 1]);
    }

    // Levels: per sample, per mode, the level required (0: none, or beyond LB10, which is reported on its own).
    const auto& levels = requirement.levels;
    std::vector<std::size_t> sampleOrder(levels.size());
    std::iota(sampleOrder.begin(), sampleOrder.end(), std::size_t{0});
    std::stable_sort(sampleOrder.begin(), sampleOrder.end(),
                     [&](std::size_t a, std::size_t b) { return levels[a].lambda_nm < levels[b].lambda_nm; });
    const std::size_t samples = levels.size();
    for (auto& tree : m_levels) {
        tree.size = treeSize(samples);
        tree.nodes.assign(2 * tree.size, 0);
    }
    for (std::size_t p = 0; p < samples; ++p) {
        const LevelRequirement& level = levels[sampleOrder[p]];
        m_sampleLambda.push_back(level.lambda_nm);
        correctionMissing = correctionMissing || level.beamDiameterCorrectionMissing;
        for (const ModeRequirement& m : level.modes) {
            const auto mode = static_cast<std::size_t>(m.mode);
            requiredLevels[mode] = std::max(requiredLevels[mode], m.level);
            if (m.level > 10) {
                beyondLb10 = true;
                continue;
            }
            auto& tree = m_levels[mode];
            tree.nodes[tree.size + p] = std::max(tree.nodes[tree.size + p], m.level);
        }
    }
    for (auto& tree : m_levels) {
        for (std::size_t node = tree.size - 1; node >= 1; --node)
            tree.nodes[node] = std::max(tree.nodes[2 * node], tree.nodes[2 * node + 1]);
    }
}

Range RequirementIndex::linesAt(double lambda_nm) const
{
    return at(m_lineLambda, lambda_nm);
}
Range RequirementIndex::linesBetween(double from_nm, double to_nm) const
{
    return between(m_lineLambda, from_nm, to_nm);
}
Range RequirementIndex::linesBelow(double lambda_nm) const
{
    return below(m_lineLambda, lambda_nm);
}
Range RequirementIndex::linesAbove(double lambda_nm) const
{
    return above(m_lineLambda, lambda_nm);
}
Range RequirementIndex::samplesAt(double lambda_nm) const
{
    return at(m_sampleLambda, lambda_nm);
}
Range RequirementIndex::samplesBetween(double from_nm, double to_nm) const
{
    return between(m_sampleLambda, from_nm, to_nm);
}
Range RequirementIndex::samplesBelow(double lambda_nm) const
{
    return below(m_sampleLambda, lambda_nm);
}
Range RequirementIndex::samplesAbove(double lambda_nm) const
{
    return above(m_sampleLambda, lambda_nm);
}

std::array<double, kRegionCount> RequirementIndex::ratioSums(Range range) const
{
    std::array<double, kRegionCount> sum{};
    std::size_t lo = range.begin + m_sums.size;
    std::size_t hi = range.end + m_sums.size;
    auto add = [&](std::size_t node) {
        for (std::size_t r = 0; r < kRegionCount; ++r)
            sum[r] += m_sums.nodes[node][r];
    };
    while (lo < hi) {
        if ((lo & 1U) != 0)
            add(lo++);
        if ((hi & 1U) != 0)
            add(--hi);
        lo /= 2;
        hi /= 2;
    }
    return sum;
}

std::size_t RequirementIndex::strongest(Range range) const
{
    std::size_t best = kNone;
    auto consider = [&](std::size_t node) {
        const std::size_t p = m_strongest.nodes[node];
        if (p == kNone)
            return;
        if (best == kNone || m_lineRatio[p] > m_lineRatio[best] ||
            (m_lineRatio[p] == m_lineRatio[best] && m_lineOrder[p] < m_lineOrder[best]))
            best = p;
    };
    std::size_t lo = range.begin + m_strongest.size;
    std::size_t hi = range.end + m_strongest.size;
    while (lo < hi) {
        if ((lo & 1U) != 0)
            consider(lo++);
        if ((hi & 1U) != 0)
            consider(--hi);
        lo /= 2;
        hi /= 2;
    }
    return best;
}

bool RequirementIndex::significantIn(Range range, double& first_nm, double& last_nm) const
{
    if (range.empty())
        return false;
    const double from = m_lineLambda[range.begin];
    const double to = m_lineLambda[range.end - 1];
    const auto lo = std::lower_bound(m_significantLambda.begin(), m_significantLambda.end(), from);
    const auto hi = std::upper_bound(lo, m_significantLambda.end(), to);
    if (lo == hi)
        return false;
    first_nm = *lo;
    last_nm = *(hi - 1);
    return true;
}

int RequirementIndex::highestLevel(int mode, Range range) const
{
    const auto& tree = m_levels[static_cast<std::size_t>(mode)];
    int best = 0;
    std::size_t lo = range.begin + tree.size;
    std::size_t hi = range.end + tree.size;
    while (lo < hi) {
        if ((lo & 1U) != 0)
            best = std::max(best, tree.nodes[lo++]);
        if ((hi & 1U) != 0)
            best = std::max(best, tree.nodes[--hi]);
        lo /= 2;
        hi /= 2;
    }
    return best;
}

std::size_t RequirementIndex::firstAbove(int mode, Range range, int level) const
{
    if (highestLevel(mode, range) <= level)
        return range.end;
    // The smallest k with a level above `level` in [begin, k]: binary search on the growing prefix.
    std::size_t lo = range.begin;
    std::size_t hi = range.end - 1;
    while (lo < hi) {
        const std::size_t mid = lo + (hi - lo) / 2;
        if (highestLevel(mode, {range.begin, mid + 1}) > level)
            hi = mid;
        else
            lo = mid + 1;
    }
    return lo;
}

std::size_t RequirementIndex::lastAbove(int mode, Range range, int level) const
{
    if (highestLevel(mode, range) <= level)
        return range.end;
    std::size_t lo = range.begin;
    std::size_t hi = range.end - 1;
    while (lo < hi) {
        const std::size_t mid = lo + (hi - lo + 1) / 2;
        if (highestLevel(mode, {mid, range.end}) > level)
            lo = mid;
        else
            hi = mid - 1;
    }
    return lo;
}

} // namespace beamwarden::eyewear::detail
