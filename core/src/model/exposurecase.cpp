#include "beamwarden/model/exposurecase.hpp"

#include "beamwarden/model/ranges.hpp"

#include <array>
#include <cmath>
#include <fmt/core.h>

namespace beamwarden::model {

namespace {

constexpr std::array<std::string_view, 6> kViewingNames{"direct", "lens", "fibre", "diffuse", "specular", "aided"};

} // namespace

std::string_view toString(Viewing viewing)
{
    return kViewingNames[static_cast<std::size_t>(viewing)];
}

Result<Viewing> parseViewing(std::string_view text)
{
    for (std::size_t i = 0; i < kViewingNames.size(); ++i) {
        if (text == kViewingNames[i])
            return static_cast<Viewing>(i);
    }
    if (text == "fiber")
        return Viewing::Fibre;
    return fail("viewing", std::string(text), "direct, lens, fibre, diffuse, specular or aided");
}

Result<ExposureCase> validate(const ExposureCase& c)
{
    // An exposure of 0 means "not given": the evaluation picks the basis (hazard::defaultBasis).
    if (c.exposure.si() != 0.0) {
        if (auto inRange = checkRange(Quantity::Exposure, c.exposure.si(), "exposure"); !inRange)
            return std::unexpected(inRange.error());
    }
    if (auto inRange = checkRange(Quantity::Distance, c.distance.si(), "distance"); !inRange)
        return std::unexpected(inRange.error());
    switch (c.viewing) {
    case Viewing::Direct:
        break;
    case Viewing::Lens:
        if (!std::isfinite(c.focalLength.si()) || c.focalLength.si() <= 0.0)
            return fail("focal-length", units::formatExact(c.focalLength), "the lens's focal length, above 0 m");
        break;
    case Viewing::Fibre:
        if (!std::isfinite(c.numericalAperture) || c.numericalAperture <= 0.0 || c.numericalAperture >= 1.0)
            return fail("na", fmt::format("{}", c.numericalAperture), "a numerical aperture above 0 and below 1");
        break;
    case Viewing::Diffuse:
        if (!std::isfinite(c.viewingAngle.si()) || c.viewingAngle.si() < 0.0 || c.viewingAngle.degrees() >= 90.0)
            return fail("angle", units::formatExact(c.viewingAngle),
                        "a viewing angle from the normal, 0 to below 90 deg");
        if (c.distance.si() <= 0.0)
            return fail("distance", units::formatExact(c.distance),
                        "the viewing distance from the diffuse spot, above 0 m (the irradiance grows without bound "
                        "at the spot)");
        [[fallthrough]];
    case Viewing::Specular:
        if (!std::isfinite(c.reflectance) || c.reflectance <= 0.0 || c.reflectance > 1.0)
            return fail("reflectance", fmt::format("{}", c.reflectance), "a reflectance above 0 and at most 1");
        break;
    case Viewing::Aided:
        if (!std::isfinite(c.magnification) || c.magnification < 1.0 || c.magnification > 1000.0)
            return fail("magnification", fmt::format("{}", c.magnification), "a magnification from 1 to 1000");
        if (!std::isfinite(c.objectiveDiameter.si()) || c.objectiveDiameter.si() <= 0.0 ||
            c.objectiveDiameter.si() > 10.0)
            return fail("objective-diameter", units::formatExact(c.objectiveDiameter),
                        "the objective's diameter, above 0 m (e.g. 50 mm)");
        if (!std::isfinite(c.transmission) || c.transmission <= 0.0 || c.transmission > 1.0)
            return fail("transmission", fmt::format("{}", c.transmission), "a transmission above 0 and at most 1");
        break;
    }
    return c;
}

} // namespace beamwarden::model
