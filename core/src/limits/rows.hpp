#pragma once
// The MPE rows, grouped so that rows both editions share are written once (exposure-limits.md sections 3 and 4).
// Shared rows carry their 2007 status; the 2014 set marks them reconstructed when it assembles its table, because
// no public copy of the 2014 text confirms them.
#include "beamwarden/limits/ruleset.hpp"

#include <span>

namespace beamwarden::limits::rows {

// Rows both editions share: the eye below 400 nm and beyond 1400 nm, photochemical and long-exposure rows, skin.
[[nodiscard]] std::span<const LimitRow> sharedEye();
[[nodiscard]] std::span<const LimitRow> sharedSkin();

// Retinal thermal rows below 10 s that differ between the editions.
[[nodiscard]] std::span<const LimitRow> retinalShort2007();
[[nodiscard]] std::span<const LimitRow> retinalShort2014();
// 2014 only: the skin MPE as a second eye limit in 1250-1400 nm (section 4.4).
[[nodiscard]] std::span<const LimitRow> cornealSkinLimit2014();

[[nodiscard]] std::span<const TiRow> ti2007();
[[nodiscard]] std::span<const TiRow> ti2014();

} // namespace beamwarden::limits::rows
