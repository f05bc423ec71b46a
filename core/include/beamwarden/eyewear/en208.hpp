#pragma once
// EN 208 alignment eyewear (hazard-and-eyewear.md section 7): RB levels for visible beams, bringing them to the
// Class 2 level. RB1-RB2 values are secondary, RB3-RB5 reconstructed from the pattern P_max = 10^(n-3) W,
// Q_max = 2 10^(n-7) J.
#include "beamwarden/error.hpp"
#include "beamwarden/eyewear/marking.hpp"
#include "beamwarden/hazard/hazard.hpp"

#include <string>

namespace beamwarden::eyewear {

struct En208Marking {
    double maxPower_W = 0;
    double maxPulseEnergy_J = 0; // 0 when not marked
    std::vector<WavelengthSpan> wavelengths;
    int level = 0; // RB1..RB5
    friend bool operator==(const En208Marking&, const En208Marking&) = default;
};

// "1 W 2x10^-4 J 532 RB3", "0.1 W 2e-5 J 630-640 RB2", "632.8 RB2" (power and energy optional).
[[nodiscard]] Result<En208Marking> parseEn208(std::string_view text);
[[nodiscard]] std::string format(const En208Marking& marking);

struct AlignmentRequirement {
    int level = 0; // RB1..RB5, or 6 when beyond RB5
    double powerThrough7mm = 0;
    double correctedPulseEnergy = 0; // through 7 mm, x N^(1/4) with N = pulses in 10 s (pulses 1 ns - 2e-4 s)
    bool visible = true;             // false: EN 208 does not apply (outside 400-700 nm)
    std::string basis;
};

[[nodiscard]] Result<AlignmentRequirement> requiredAlignmentLevel(const hazard::HazardRequest& request);

} // namespace beamwarden::eyewear
