#pragma once
// The three pulse-train rules under one rule set (exposure-limits.md sections 3.5, 4.6, 4.7, 6.1 items 3-4).
#include "beamwarden/limits/mpe.hpp"
#include "wavelengthfactors.hpp"

namespace beamwarden::limits {

// `at` holds the request's wavelength factors for this set (shared with the single-exposure evaluation).
[[nodiscard]] TrainOutcome evaluateTrain(const RuleSet& set, const MpeRequest& request, C5Option c5,
                                         WavelengthFactors& at);

} // namespace beamwarden::limits
