#include "beamwarden/model/beam.hpp"

#include "beamwarden/model/ranges.hpp"

#include <cmath>
#include <fmt/core.h>
#include <numbers>

namespace beamwarden::model {

units::Length Beam::diameter63() const
{
    return definition == BeamDefinition::OneOverE ? diameter : diameter / std::numbers::sqrt2;
}

units::Angle Beam::divergence63() const
{
    return definition == BeamDefinition::OneOverE ? divergence : divergence / std::numbers::sqrt2;
}

Result<Beam> validate(const Beam& beam)
{
    if (auto inRange = checkRange(Quantity::BeamDiameter, beam.diameter.si(), "beam-diameter"); !inRange)
        return std::unexpected(inRange.error());
    if (auto inRange = checkRange(Quantity::Divergence, beam.divergence.si(), "divergence"); !inRange)
        return std::unexpected(inRange.error());
    return beam;
}

std::string_view toString(BeamDefinition definition)
{
    return definition == BeamDefinition::OneOverE ? "1/e" : "1/e2";
}

std::string_view toString(BeamProfile profile)
{
    switch (profile) {
    case BeamProfile::Unknown:
        return "unknown";
    case BeamProfile::Gaussian:
        return "gaussian";
    case BeamProfile::FlatTop:
        return "flat-top";
    }
    return "unknown";
}

Result<BeamDefinition> parseBeamDefinition(std::string_view text)
{
    if (text == "1/e" || text == "63%" || text == "d63")
        return BeamDefinition::OneOverE;
    if (text == "1/e2" || text == "1/e^2" || text == "1/e²" || text == "86%" || text == "d86")
        return BeamDefinition::OneOverESquared;
    return fail("beam-definition", std::string(text), "1/e or 1/e2");
}

Result<BeamProfile> parseBeamProfile(std::string_view text)
{
    if (text == "gaussian")
        return BeamProfile::Gaussian;
    if (text == "flat-top")
        return BeamProfile::FlatTop;
    if (text == "unknown")
        return BeamProfile::Unknown;
    return fail("profile", std::string(text), "gaussian, flat-top or unknown");
}

} // namespace beamwarden::model
