#pragma once
// An output's beam geometry. IEC hazard formulas work with 1/e (63 %) diameters and divergences; data sheets often
// give 1/e^2 (86 %) values, so the definition is stored with the numbers and converted when they are used
// (hazard-and-eyewear.md section 2: d63 = d86 / sqrt 2, divergence likewise).
#include "beamwarden/error.hpp"
#include "beamwarden/units.hpp"

#include <string_view>

namespace beamwarden::model {

enum class BeamDefinition : std::uint8_t { OneOverE, OneOverESquared };
// Unknown and flat-top are treated alike for exposure (full power through the aperture when the beam is smaller);
// only a declared Gaussian profile earns the exact, lower aperture fraction.
enum class BeamProfile : std::uint8_t { Unknown, Gaussian, FlatTop };

struct Beam {
    units::Length diameter;  // at the exit, by `definition`
    units::Angle divergence; // full angle, by `definition`
    BeamDefinition definition = BeamDefinition::OneOverE;
    BeamProfile profile = BeamProfile::Unknown;

    [[nodiscard]] units::Length diameter63() const;
    [[nodiscard]] units::Angle divergence63() const;
};

// Refuses non-finite or negative values and a zero diameter; a zero divergence is allowed (collimated model).
[[nodiscard]] Result<Beam> validate(const Beam& beam);

[[nodiscard]] std::string_view toString(BeamDefinition definition); // "1/e" or "1/e2"
[[nodiscard]] std::string_view toString(BeamProfile profile);       // "unknown", "gaussian", "flat-top"
[[nodiscard]] Result<BeamDefinition> parseBeamDefinition(std::string_view text);
[[nodiscard]] Result<BeamProfile> parseBeamProfile(std::string_view text);

} // namespace beamwarden::model
