#pragma once
// The rows of a rule set that can apply at a wavelength, found by a binary search instead of a scan of every row.
// The rows' wavelength bounds cut the spectrum into slots: each bound itself, and each open interval between two
// bounds. A row applies somewhere in a slot only if it applies everywhere in it, so each slot keeps its rows in
// table order and the evaluator still checks every row's full conditions (the index only skips rows that cannot
// apply, it never decides).
#include "beamwarden/limits/ruleset.hpp"

#include <span>
#include <vector>

namespace beamwarden::limits {

class RowIndex {
public:
    explicit RowIndex(std::span<const LimitRow> rows);

    // The rows (in table order) whose wavelength band holds lambda_nm.
    [[nodiscard]] std::span<const LimitRow* const> candidates(double lambda_nm) const;

private:
    std::vector<double> m_bounds;                      // sorted, unique row bounds in nm
    std::vector<std::vector<const LimitRow*>> m_slots; // 2 * bounds + 1: below, at b0, (b0, b1), at b1, ..., above
};

// The index of a rule set's rows, built once per set on first use.
[[nodiscard]] const RowIndex& rowIndex(const RuleSet& set);

} // namespace beamwarden::limits
