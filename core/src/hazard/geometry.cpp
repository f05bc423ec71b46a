// Exposure geometry per case (hazard-and-eyewear.md sections 1.3, 5.1-5.7).
#include "beamwarden/hazard/geometry.hpp"

#include <algorithm>
#include <cmath>
#include <numbers>

namespace beamwarden::hazard {

namespace {

constexpr double kPupil_m = 7e-3;
constexpr double kFibreCentreWeighting = 1.7; // multimode fibre far field (ANSI Z136.2 practice, reconstructed)

double area(double diameter)
{
    return std::numbers::pi * diameter * diameter / 4.0;
}

// Collection gain of magnifying optics (section 5.7): tau min(M^2, (min(d, D_o)/7 mm)^2) for beams wider than the
// pupil; below 7 mm the whole beam already enters the eye, so no gain (and no credit for the transmission).
double collectionGain(const model::ExposureCase& c, double d63)
{
    if (d63 <= kPupil_m)
        return 1.0;
    const double collected = std::min(d63, c.objectiveDiameter.si()) / kPupil_m;
    return c.transmission * std::min(c.magnification * c.magnification, collected * collected);
}

} // namespace

double gaussianFraction(double d63_m, double aperture_m)
{
    const double x = aperture_m / d63_m;
    return -std::expm1(-x * x);
}

double exposurePerWatt(model::BeamProfile profile, double d63_m, double aperture_m)
{
    if (profile == model::BeamProfile::Gaussian)
        return gaussianFraction(d63_m, aperture_m) / area(aperture_m);
    return 1.0 / std::max(area(d63_m), area(aperture_m));
}

double diameterQuadrature(double a_m, double phi_rad, double r_m)
{
    return std::hypot(a_m, phi_rad * r_m);
}

double diameterLinear(double a_m, double phi_rad, double r_m)
{
    return a_m + phi_rad * r_m;
}

PointGeometry geometryAt(const model::ExposureCase& c, const model::Beam& beam, double r)
{
    PointGeometry g;
    const double a = beam.diameter63().si();
    const double phi = beam.divergence63().si();
    switch (c.viewing) {
    case model::Viewing::Direct:
        g.d63_m = diameterQuadrature(a, phi, r);
        break;
    case model::Viewing::Specular:
        g.d63_m = diameterQuadrature(a, phi, r);
        g.powerFactor = c.reflectance;
        break;
    case model::Viewing::Lens: {
        // r from the lens; the beam converges to the focus and diverges beyond it with full angle b0/f.
        const double f = c.focalLength.si();
        g.d63_m = a * std::abs(r - f) / f;
        break;
    }
    case model::Viewing::Fibre:
        // Effective diameter so that 4P/(pi d^2) = 1.7^2 P / (pi NA^2 r^2), the centre-weighted multimode far field.
        g.d63_m = 2.0 * c.numericalAperture * r / kFibreCentreWeighting;
        break;
    case model::Viewing::Diffuse: {
        const double cosTheta = std::cos(c.viewingAngle.si());
        g.pointSource = true;
        g.powerFactor = c.reflectance;
        g.pointIrradiancePerWatt = cosTheta / (std::numbers::pi * r * r);
        // The lit spot seen from r: an extended source when it subtends more than alpha_min (section 5.5); the
        // spot is taken at the exit diameter, the smallest it can be, so alpha (and any C6 relaxation) is not
        // over-stated.
        // The full angle subtended, 2 atan(d cos(theta) / 2r): equal to d cos(theta)/r far away, never above pi near.
        g.sourceAngle_rad = 2.0 * std::atan(a * cosTheta / (2.0 * r));
        break;
    }
    case model::Viewing::Aided:
        g.d63_m = diameterQuadrature(a, phi, r);
        g.powerFactor = collectionGain(c, g.d63_m);
        break;
    }
    return g;
}

double peakPerWatt(const model::ExposureCase& c, const model::Beam& beam, double r)
{
    const PointGeometry g = geometryAt(c, beam, r);
    if (g.pointSource)
        return g.powerFactor * g.pointIrradiancePerWatt;
    if (g.d63_m <= 0.0)
        return std::numeric_limits<double>::infinity();
    return g.powerFactor / area(g.d63_m);
}

} // namespace beamwarden::hazard
