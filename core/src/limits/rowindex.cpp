#include "rowindex.hpp"

#include <algorithm>
#include <array>

namespace beamwarden::limits {

RowIndex::RowIndex(std::span<const LimitRow> rows)
{
    for (const LimitRow& row : rows) {
        m_bounds.push_back(row.lambdaFrom_nm);
        m_bounds.push_back(row.lambdaTo_nm);
    }
    std::sort(m_bounds.begin(), m_bounds.end());
    m_bounds.erase(std::unique(m_bounds.begin(), m_bounds.end()), m_bounds.end());
    m_slots.resize(2 * m_bounds.size() + 1);
    for (std::size_t slot = 0; slot < m_slots.size(); ++slot) {
        // Odd slots are the bounds themselves; even slots the open intervals around them.
        const bool atBound = slot % 2 == 1;
        for (const LimitRow& row : rows) {
            bool holds = false;
            if (atBound) {
                const double lambda = m_bounds[slot / 2];
                holds = row.lambdaFrom_nm <= lambda && lambda <= row.lambdaTo_nm;
            } else if (slot > 0 && slot + 1 < m_slots.size()) {
                const double from = m_bounds[slot / 2 - 1];
                const double to = m_bounds[slot / 2];
                holds = row.lambdaFrom_nm <= from && to <= row.lambdaTo_nm;
            }
            if (holds)
                m_slots[slot].push_back(&row);
        }
    }
}

std::span<const LimitRow* const> RowIndex::candidates(double lambda_nm) const
{
    // First bound above lambda; lambda equal to the bound before it is that bound's own slot.
    const auto above = std::upper_bound(m_bounds.begin(), m_bounds.end(), lambda_nm);
    const auto k = static_cast<std::size_t>(above - m_bounds.begin());
    const bool atBound = k > 0 && m_bounds[k - 1] == lambda_nm;
    const std::size_t slot = atBound ? 2 * k - 1 : 2 * k;
    return m_slots[slot];
}

const RowIndex& rowIndex(const RuleSet& set)
{
    static const std::array<RowIndex, kRuleSetCount> indices{RowIndex(ruleSet(RuleSetId::Iec60825_1_2007).rows),
                                                             RowIndex(ruleSet(RuleSetId::Iec60825_1_2014).rows)};
    return indices[static_cast<std::size_t>(set.id)];
}

} // namespace beamwarden::limits
