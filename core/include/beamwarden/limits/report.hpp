#pragma once
// Provenance in words and as JSON, so an LSO can check a figure by hand.
#include "beamwarden/limits/mpe.hpp"

#include <nlohmann/json_fwd.hpp>

#include <string>
#include <vector>

namespace beamwarden::limits {

// The row in words, e.g. "iec60825-1:2007, eye, 400-700 nm, 1 ns-18 us, retinal thermal: H = 5e-3 C6 J/m^2".
[[nodiscard]] std::string describeRow(const LimitRow& row);
// One term in words with its factor values, field of view and aperture.
[[nodiscard]] std::string describeTerm(const LimitTerm& term);

// Validity notes a reader must see beside the figure: a reconstructed row, a pulse below the tabulated durations,
// femtosecond near-infrared pulses (supercontinuum in the eye), the rule set's own note.
[[nodiscard]] std::vector<std::string> resultNotes(const MpeResult& result);

// The result as the JSON document of `beamwarden-cli mpe --json` (keys documented in core/src/limits/README.md).
[[nodiscard]] nlohmann::json toJson(const MpeResult& result);

} // namespace beamwarden::limits
