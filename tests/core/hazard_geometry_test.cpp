// Beam definitions, beam growth and the aperture convention (check-values.md C34, C35, C37, C38, P4;
// hazard-and-eyewear.md sections 1.3, 2, 3, 5.1).
#include <catch2/catch.hpp>

#include <cmath>
#include <numbers>
#include <string>

#include "beamwarden/hazard/geometry.hpp"
#include "beamwarden/hazard/hazard.hpp"
#include "beamwarden/units.hpp"

using namespace beamwarden;
using namespace beamwarden::units::literals;
using hazard::HazardRequest;
using hazard::HazardResult;
using model::BeamProfile;

namespace {

constexpr double kA7_m2 = std::numbers::pi * 7e-3 * 7e-3 / 4.0; // 3.848e-5 m2 (check-values.md section 0)

HazardResult evaluated(const HazardRequest& request)
{
    const auto result = hazard::evaluateHazard(request);
    INFO((result ? std::string{"accepted"} : result.error().message()));
    REQUIRE(result.has_value());
    return *result;
}

// A visible CW output at the exit, 0.25 s basis (MPE 25.46 W/m2, check-values.md P10).
HazardRequest visibleAtExit(double watts, double d63_m, BeamProfile profile)
{
    HazardRequest request;
    request.emission.spectrum = model::singleLine(632.8_nm);
    request.emission.averagePower = units::Power::fromSi(watts);
    request.beam.diameter = units::Length::fromSi(d63_m);
    request.beam.divergence = 1_mrad;
    request.beam.profile = profile;
    request.exposureCase.exposure = 0.25_s;
    return request;
}

} // namespace

TEST_CASE("hazard C37: 1/e2 diameter and divergence convert to 1/e", "[hazard][geometry][definition]")
{
    model::Beam beam;
    beam.diameter = 2_mm;
    beam.divergence = 2_mrad;
    beam.definition = model::BeamDefinition::OneOverESquared;
    // check-values.md C37: d86 = 2 mm -> d63 = 1.414 mm (computed from verified formulas, definitions; 1e-3)
    CHECK(beam.diameter63().millimetres() == Approx(1.414).epsilon(1e-3));
    // hazard-and-eyewear.md section 2: divergence converts the same way, 2 mrad / sqrt 2 = 1.414 mrad (computed; 1e-3)
    CHECK(beam.divergence63().milliradians() == Approx(1.414).epsilon(1e-3));
    // a 1/e beam is used as given (hazard-and-eyewear.md section 2; exact)
    model::Beam given = beam;
    given.definition = model::BeamDefinition::OneOverE;
    CHECK(given.diameter63().millimetres() == Approx(2.0).margin(1e-12));
    CHECK(given.divergence63().milliradians() == Approx(2.0).margin(1e-12));
}

TEST_CASE("hazard C37: the peak of a 1 W beam given at 1/e2", "[hazard][geometry][definition]")
{
    model::Beam beam;
    beam.diameter = 2_mm;
    beam.divergence = 0_mrad;
    beam.definition = model::BeamDefinition::OneOverESquared;
    const model::ExposureCase direct{};
    // check-values.md C37: peak 6.366e5 W/m2 for 1 W (computed from verified formulas; tolerance 1e-3)
    CHECK(1.0 * hazard::peakPerWatt(direct, beam, 0.0) == Approx(6.366e5).epsilon(1e-3));
    // check-values.md C37: taking the 2 mm for a 1/e value in 4P/(pi d^2) gives 3.183e5 W/m2 (tolerance 1e-3)
    beam.definition = model::BeamDefinition::OneOverE;
    CHECK(1.0 * hazard::peakPerWatt(direct, beam, 0.0) == Approx(3.183e5).epsilon(1e-3));
}

TEST_CASE("hazard beam growth: linear and quadrature diameters", "[hazard][geometry]")
{
    // hazard-and-eyewear.md section 5.1: linear a + phi r, quadrature sqrt(a^2 + phi^2 r^2). Computed:
    // a = 3 mm, phi = 2 mrad, r = 2 m: linear 3 + 4 = 7 mm, quadrature sqrt(9 + 16) = 5 mm (tolerance 1e-3)
    CHECK(hazard::diameterLinear(3e-3, 2e-3, 2.0) == Approx(7e-3).epsilon(1e-3));
    CHECK(hazard::diameterQuadrature(3e-3, 2e-3, 2.0) == Approx(5e-3).epsilon(1e-3));
    // at the exit both are a; the quadrature diameter is never the larger (section 5.1)
    for (const double r : {0.0, 0.1, 1.0, 10.0, 100.0, 1e4}) {
        INFO("r = " << r << " m");
        CHECK(hazard::diameterQuadrature(3e-3, 2e-3, r) <= hazard::diameterLinear(3e-3, 2e-3, r));
    }
    CHECK(hazard::diameterLinear(3e-3, 2e-3, 0.0) == Approx(3e-3).margin(1e-15));
    CHECK(hazard::diameterQuadrature(3e-3, 2e-3, 0.0) == Approx(3e-3).margin(1e-15));
}

TEST_CASE("hazard aperture fill: full power counts for a beam smaller than the aperture", "[hazard][geometry]")
{
    // hazard-and-eyewear.md section 1.3, default (not declared Gaussian): X = P / max(A_beam, A_a).
    // A 2 mm beam inside a 7 mm aperture: the full power over A7 (check-values.md C34: X = P/A7)
    for (const BeamProfile profile : {BeamProfile::Unknown, BeamProfile::FlatTop}) {
        INFO("profile " << model::toString(profile));
        CHECK(hazard::exposurePerWatt(profile, 2e-3, 7e-3) * kA7_m2 == Approx(1.0).epsilon(1e-3));
        // check-values.md C34: 100 mW -> 2598 W/m2 (computed from verified formulas; tolerance 1e-3)
        CHECK(0.1 * hazard::exposurePerWatt(profile, 2e-3, 7e-3) == Approx(2598.0).epsilon(1e-3));
        // check-values.md P4: a beam wider than the aperture gives P/A_beam, 10 W in 1 cm = 1.273e5 W/m2 (0.5 %)
        CHECK(10.0 * hazard::exposurePerWatt(profile, 10e-3, 7e-3) == Approx(1.273e5).epsilon(0.005));
    }
    SECTION("end to end, default profile")
    {
        // computed: 1 mW in a 1 mm beam (smaller than 7 mm) counts in full over A7: 1e-3 / 3.848e-5 = 25.98 W/m2
        const HazardResult r = evaluated(visibleAtExit(1e-3, 1e-3, BeamProfile::Unknown));
        CHECK(r.aperture.millimetres() == Approx(7.0).epsilon(1e-3)); // hazard-and-eyewear.md section 4 (1e-3)
        CHECK(r.exposureAtPoint == Approx(25.98).epsilon(1e-3));      // computed above; tolerance 1e-3
    }
}

TEST_CASE("hazard aperture fill: a declared Gaussian gets the exact fraction", "[hazard][geometry]")
{
    // hazard-and-eyewear.md section 1.3: fraction 1 - exp(-(D/d63)^2) through the centred aperture
    // check-values.md C35: d63 = 6 mm, 7 mm aperture: f = 0.7436 (computed from verified formulas; tolerance 1e-3)
    CHECK(hazard::gaussianFraction(6e-3, 7e-3) == Approx(0.7436).epsilon(1e-3));
    // check-values.md C38: d63 = 6 mm, 3.5 mm aperture: f = 0.2884 (tolerance 1e-3)
    CHECK(hazard::gaussianFraction(6e-3, 3.5e-3) == Approx(0.2884).epsilon(1e-3));
    // check-values.md C34: d63 = 2 mm, 7 mm aperture: f = 1 - 4.8e-6, i.e. 1 - f = 4.8e-6 (tolerance 1e-2 on the
    // two figures given)
    CHECK(1.0 - hazard::gaussianFraction(2e-3, 7e-3) == Approx(4.8e-6).epsilon(1e-2));
    // check-values.md C35: X = f Q / A7 = 1932 J/m2 for 100 mJ (tolerance 1e-3)
    CHECK(0.1 * hazard::exposurePerWatt(BeamProfile::Gaussian, 6e-3, 7e-3) == Approx(1932.0).epsilon(1e-3));
    // check-values.md C38: X = 1.199e6 W/m2 for 40 W (tolerance 1e-3)
    CHECK(40.0 * hazard::exposurePerWatt(BeamProfile::Gaussian, 6e-3, 3.5e-3) == Approx(1.199e6).epsilon(1e-3));
    SECTION("end to end: a 7 mm Gaussian beam in the 7 mm aperture")
    {
        // computed: D/d63 = 1 -> f = 1 - e^-1 = 0.63212; 1 mW -> 0.63212 x 1e-3 / 3.8485e-5 = 16.425 W/m2;
        // the default convention counts the whole 1 mW over A7: 25.98 W/m2 (tolerance 1e-3)
        const HazardResult g = evaluated(visibleAtExit(1e-3, 7e-3, BeamProfile::Gaussian));
        CHECK(g.exposureAtPoint == Approx(16.425).epsilon(1e-3));
        const HazardResult d = evaluated(visibleAtExit(1e-3, 7e-3, BeamProfile::Unknown));
        CHECK(d.exposureAtPoint == Approx(25.98).epsilon(1e-3));
    }
}

TEST_CASE("hazard aperture fill: the default is never below the Gaussian value", "[hazard][geometry]")
{
    // hazard-and-eyewear.md section 1.3: 1 - e^-x <= min(1, x), x = (D_a/d63)^2, so the default never lies below the
    // exact Gaussian value; in the small-aperture limit the Gaussian value tends to the peak P/A_beam
    for (const double d63 : {0.1e-3, 1e-3, 3.5e-3, 7e-3, 10e-3, 50e-3}) {
        for (const double aperture : {1e-3, 3.5e-3, 7e-3, 11e-3}) {
            INFO("d63 = " << d63 << " m, aperture = " << aperture << " m");
            const double gaussian = hazard::exposurePerWatt(BeamProfile::Gaussian, d63, aperture);
            const double fallback = hazard::exposurePerWatt(BeamProfile::Unknown, d63, aperture);
            CHECK(gaussian <= fallback * (1.0 + 1e-12));
            const double fraction = hazard::gaussianFraction(d63, aperture);
            CHECK(fraction > 0.0);
            CHECK(fraction <= 1.0);
        }
    }
    // computed: D = 10 um in a 10 mm beam, x = 1e-6: f/A_a = (1 - e^-x)/A_a -> 1/A_beam to 5e-7 relative
    const double beamArea = std::numbers::pi * 10e-3 * 10e-3 / 4.0;
    CHECK(hazard::exposurePerWatt(BeamProfile::Gaussian, 10e-3, 10e-6) * beamArea == Approx(1.0).epsilon(1e-3));
}

TEST_CASE("hazard default exposure basis", "[hazard][geometry][basis]")
{
    // hazard-and-eyewear.md section 3: default 100 s for lambda >= 400 nm, 30 000 s below 400 nm (IEC TR 60825-14)
    const hazard::ExposureBasis visible = hazard::defaultBasis(model::singleLine(532_nm));
    CHECK(visible.isDefault);
    CHECK(visible.duration.seconds() == Approx(100.0).margin(1e-9));
    CHECK_FALSE(visible.reason.empty());
    const hazard::ExposureBasis ultraviolet = hazard::defaultBasis(model::singleLine(355_nm));
    CHECK(ultraviolet.isDefault);
    CHECK(ultraviolet.duration.seconds() == Approx(3e4).margin(1e-9));
    // an explicit basis is kept and is not called the default
    const HazardResult chosen = evaluated(visibleAtExit(1e-3, 1e-3, BeamProfile::Unknown));
    CHECK_FALSE(chosen.basis.isDefault);
    CHECK(chosen.basis.duration.seconds() == Approx(0.25).margin(1e-12));
}

TEST_CASE("hazard refuses impossible geometry and names the field", "[hazard][geometry][refusal]")
{
    // beam.hpp / exposurecase.hpp: a zero or negative diameter, a negative divergence, a reflectance above 1 and a
    // numerical aperture of 1 or more are refused; the error names the field
    struct Case {
        HazardRequest request;
        std::string field;
    };
    HazardRequest zeroDiameter = visibleAtExit(1e-3, 0.0, BeamProfile::Unknown);
    HazardRequest negativeDiameter = visibleAtExit(1e-3, -2e-3, BeamProfile::Unknown);
    HazardRequest negativeDivergence = visibleAtExit(1e-3, 2e-3, BeamProfile::Unknown);
    negativeDivergence.beam.divergence = units::Angle::fromSi(-1e-3);
    HazardRequest mirror = visibleAtExit(1e-3, 2e-3, BeamProfile::Unknown);
    mirror.exposureCase.viewing = model::Viewing::Specular;
    mirror.exposureCase.reflectance = 1.5;
    HazardRequest fibre = visibleAtExit(1e-3, 2e-3, BeamProfile::Unknown);
    fibre.exposureCase.viewing = model::Viewing::Fibre;
    fibre.exposureCase.numericalAperture = 1.0;
    const Case cases[] = {
        {zeroDiameter, "beam-diameter"},
        {negativeDiameter, "beam-diameter"},
        {negativeDivergence, "divergence"},
        {mirror, "reflectance"},
        {fibre, "na"},
    };
    for (const Case& c : cases) {
        INFO("expecting a refusal naming " << c.field);
        const auto result = hazard::evaluateHazard(c.request);
        REQUIRE_FALSE(result.has_value());
        CHECK(result.error().field.find(c.field) != std::string::npos);
    }
    // a zero divergence is allowed (beam.hpp: the collimated model); check-values.md C33: no finite NOHD
    HazardRequest collimated = visibleAtExit(1.0, 2e-3, BeamProfile::Unknown);
    collimated.beam.divergence = units::Angle::fromSi(0.0);
    const HazardResult r = evaluated(collimated);
    CHECK(r.nohd.kind == hazard::DistanceKind::Unbounded);
}
