#pragma once
// Workloads of the engine budgets (tests/bench/budgets.txt), built from the demo lab so that they are realistic
// sources: the 5-output ultrafast amplifier with every output's spectrum resampled finer and four exposure cases, and
// a shelf grown from the demo eyewear to any size.
#include "beamwarden/limits/mpe.hpp"
#include "beamwarden/model/records.hpp"
#include "beamwarden/store/labcontents.hpp"

#include <vector>

namespace beamwarden::bench {

// The demo lab (resources/demo.bwlab.json); aborts the benchmark with a message if it does not load.
[[nodiscard]] const store::LabContents& demoLab();

// The demo's "Amplifier A1" (800 nm, 35 fs, 1 kHz, with SHG, THG, signal and idler): every output's spectrum as a
// Gaussian band of `samples` samples around its centroid and `cases` exposure cases (direct at the exit, diffuse
// from a beam dump, specular from a window, behind a lens; repeated at growing distances beyond four).
[[nodiscard]] model::Laser ultrafastLaser(int outputs, int samples, int cases);

// `count` eyewear items: the demo shelf repeated under new names, with OD values varied so that items differ.
[[nodiscard]] std::vector<model::EyewearItem> shelf(int count);

// One request inside every row of both rule sets' eye and skin tables (single exposures, small and extended
// sources), for the per-evaluation budget.
[[nodiscard]] std::vector<limits::MpeRequest> oneRequestPerRow();

} // namespace beamwarden::bench
