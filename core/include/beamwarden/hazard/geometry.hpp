#pragma once
// Where the light goes for each exposure case: the beam's 1/e diameter and the power reaching a point at distance r,
// and the exposure compared with the MPE there (hazard-and-eyewear.md sections 1.3 and 5).
#include "beamwarden/model/beam.hpp"
#include "beamwarden/model/exposurecase.hpp"

namespace beamwarden::hazard {

// The exposure compared with the MPE per unit power (1/m^2): unless the profile is declared Gaussian,
// 1 / max(A_beam, A_aperture); for a Gaussian, the fraction through the centred aperture, (1 - exp(-(D/d63)^2)),
// over the aperture's area. The default is never below the Gaussian value (1 - e^-x <= min(1, x)).
[[nodiscard]] double exposurePerWatt(model::BeamProfile profile, double d63_m, double aperture_m);

// The fraction of a Gaussian beam's power inside a centred circle of diameter D: 1 - exp(-(D/d63)^2).
[[nodiscard]] double gaussianFraction(double d63_m, double aperture_m);

// One point of an exposure case, at distance r (m) from the exit, lens or reflecting spot.
struct PointGeometry {
    double powerFactor = 1;   // share of the output's power that reaches the point (reflectance, collection gain)
    double d63_m = 0;         // beam diameter there (beam cases)
    bool pointSource = false; // diffuse: irradiance rho P cos(theta) / (pi r^2), no beam
    double pointIrradiancePerWatt = 0; // diffuse only, 1/m^2
    double sourceAngle_rad = 0;        // apparent source angle alpha at the point (diffuse spot), 0 = small source
};

// Beam growth with the waist at the exit: quadrature sqrt(a^2 + (phi r)^2) (never larger, so the safer NOHD), and
// the linear form a + phi r the standards print.
[[nodiscard]] double diameterQuadrature(double a_m, double phi_rad, double r_m);
[[nodiscard]] double diameterLinear(double a_m, double phi_rad, double r_m);

[[nodiscard]] PointGeometry geometryAt(const model::ExposureCase& exposureCase, const model::Beam& beam, double r_m);

// The on-axis peak exposure per watt at r (no aperture averaging): what the closed NOHD forms use.
[[nodiscard]] double peakPerWatt(const model::ExposureCase& exposureCase, const model::Beam& beam, double r_m);

} // namespace beamwarden::hazard
