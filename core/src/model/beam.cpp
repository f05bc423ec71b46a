#include "beamwarden/model/beam.hpp"

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
    const double d = beam.diameter.si();
    if (!std::isfinite(d) || d <= 0.0 || d > 10.0)
        return fail("beam-diameter", units::format(beam.diameter), "more than 0 m and at most 10 m");
    const double phi = beam.divergence.si();
    if (!std::isfinite(phi) || phi < 0.0 || phi > 3.2)
        return fail("divergence", units::format(beam.divergence), "0 (collimated) up to pi rad, full angle");
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
