#pragma once
// How a person could be exposed to an output, with each case's own geometry.
#include "beamwarden/error.hpp"
#include "beamwarden/units.hpp"

#include <string_view>

namespace beamwarden::model {

enum class Viewing : std::uint8_t { Direct, Lens, Fibre, Diffuse, Specular, Aided };

struct ExposureCase {
    Viewing viewing = Viewing::Direct;
    // Exposure duration basis; 0 selects the default (100 s from 400 nm, 30 000 s below: IEC TR 60825-14 5.1).
    units::Duration exposure;
    // Closest approach: from the exit (direct, fibre, aided), the lens, or the reflecting spot (diffuse, specular).
    units::Length distance;
    units::Length focalLength;       // lens
    double numericalAperture = 0;    // fibre
    double reflectance = 1;          // diffuse, specular (0..1)
    units::Angle viewingAngle;       // diffuse: angle from the surface normal
    double magnification = 1;        // aided
    units::Length objectiveDiameter; // aided
    double transmission = 1;         // aided (0..1)
};

[[nodiscard]] Result<ExposureCase> validate(const ExposureCase& exposureCase);

[[nodiscard]] std::string_view toString(Viewing viewing); // "direct", "lens", "fibre", ...
[[nodiscard]] Result<Viewing> parseViewing(std::string_view text);

} // namespace beamwarden::model
