// Hazard distances (check-values.md section 3: P10, C25-C33; hazard-and-eyewear.md section 5). The MPE is computed by
// the engine, so each case picks the wavelength and exposure basis whose MPE the check value assumes:
//   25.46 W/m2 = visible (632.8 nm) at 0.25 s (check-values.md C25, P10: "1 W visible ... t = 0.25 s");
//   50 W/m2    = 1064 nm, small source, at exactly 10 s: the lower adjoining row 10 C4 C7 W/m2 with C4 = 5, C7 = 1
//                (check-values.md section 0 conventions; exposure-limits.md section 0.2 breakpoint rule);
//   50.61 W/m2 = 1064 nm just below 10 s, on the 90 t^0.75 side of the breakpoint (check-values.md C27).
// A beam diameter of zero is refused by model::validate, so the a = 0 cases use a = 1 um: it shortens a 223.6 m NOHD
// by 1 mm (computed: (sqrt(4P/(pi MPE)) - a)/phi), far inside the 1e-3 tolerance.
#include <catch2/catch.hpp>

#include <cmath>
#include <numbers>
#include <string>

#include "beamwarden/hazard/hazard.hpp"
#include "beamwarden/units.hpp"

using namespace beamwarden;
using namespace beamwarden::units::literals;
using hazard::DistanceKind;
using hazard::HazardRequest;
using hazard::HazardResult;
using model::BeamProfile;
using model::Viewing;

namespace {

constexpr double kTinyDiameter_m = 1e-6; // stands for a = 0 (see the file comment)

struct Choice {
    limits::RuleChoice rules;
    limits::C5Option c5;
    const char* name;
};

constexpr Choice kAllChoices[] = {
    {limits::RuleChoice::Iec60825_1_2007, limits::C5Option::Conservative, "iec60825-1:2007"},
    {limits::RuleChoice::Iec60825_1_2014, limits::C5Option::Conservative, "iec60825-1:2014 conservative"},
    {limits::RuleChoice::Iec60825_1_2014, limits::C5Option::Edition, "iec60825-1:2014 edition"},
    {limits::RuleChoice::Strictest, limits::C5Option::Conservative, "strictest"},
};

// A CW output of `watts` at `wavelength`, exit diameter a and full divergence phi (1/e), viewed directly from the exit
// with the exposure basis `exposure`.
HazardRequest cwBeam(units::Wavelength wavelength, double watts, double a_m, double phi_rad, units::Duration exposure)
{
    HazardRequest request;
    request.emission.spectrum = model::singleLine(wavelength);
    request.emission.pulsed = false;
    request.emission.averagePower = units::Power::fromSi(watts);
    request.beam.diameter = units::Length::fromSi(a_m);
    request.beam.divergence = units::Angle::fromSi(phi_rad);
    request.exposureCase.viewing = Viewing::Direct;
    request.exposureCase.exposure = exposure;
    return request;
}

// The visible 0.25 s case whose MPE is 25.46 W/m2 (check-values.md C25, P10).
HazardRequest visible(double watts, double a_m, double phi_rad)
{
    return cwBeam(632.8_nm, watts, a_m, phi_rad, 0.25_s);
}

// The 1064 nm, 10 s case whose MPE is 50 W/m2 (check-values.md section 0 conventions, C27).
HazardRequest nearInfrared(double watts, double a_m, double phi_rad)
{
    return cwBeam(1064_nm, watts, a_m, phi_rad, 10_s);
}

HazardResult evaluated(const HazardRequest& request)
{
    const auto result = hazard::evaluateHazard(request);
    INFO((result ? std::string{"accepted"} : result.error().message()));
    REQUIRE(result.has_value());
    return *result;
}

} // namespace

TEST_CASE("hazard P10/C25: 1 W visible, a = 0, 1 mrad, 0.25 s", "[hazard][nohd]")
{
    const HazardResult r = evaluated(visible(1.0, kTinyDiameter_m, 1e-3));
    // the MPE the case assumes: check-values.md C25 / P10, 25.46 W/m2 (computed from verified formulas; 1e-3)
    CHECK(r.limit == Approx(25.46).epsilon(1e-3));
    REQUIRE(r.nohd.kind == DistanceKind::Finite);
    // check-values.md C25: NOHD 223.6 m, both models (computed from verified formulas; tolerance 1e-3)
    CHECK(r.nohd.value.metres() == Approx(223.6).epsilon(1e-3));
    CHECK(r.nohd.linear.metres() == Approx(223.6).epsilon(1e-3));
    CHECK(r.nohd.quadrature.metres() == Approx(223.6).epsilon(1e-3));
    // check-values.md P10: 223.6 m with 25.46 W/m2 (computed; tolerance 1 % as the row states)
    CHECK(r.nohd.value.metres() == Approx(223.6).epsilon(0.01));
    // check-values.md P10: published NOHD 225 m (secondary source; tolerance 1 % as the row states)
    CHECK(r.nohd.value.metres() == Approx(225.0).epsilon(0.01));
}

TEST_CASE("hazard C26: as C25 with a = 2 mm, linear and quadrature", "[hazard][nohd]")
{
    // hazard-and-eyewear.md section 5.2: the closed forms use the peak, so a declared profile changes nothing
    // (check-values.md section 3 conventions): both aperture conventions give the same NOHD.
    for (const BeamProfile profile : {BeamProfile::Unknown, BeamProfile::Gaussian}) {
        HazardRequest request = visible(1.0, 2e-3, 1e-3);
        request.beam.profile = profile;
        INFO("profile " << model::toString(profile));
        const HazardResult r = evaluated(request);
        REQUIRE(r.nohd.kind == DistanceKind::Finite);
        // check-values.md C26: linear 221.6 m (computed from verified formulas; tolerance 1e-3)
        CHECK(r.nohd.linear.metres() == Approx(221.6).epsilon(1e-3));
        // check-values.md C26: quadrature 223.6 m (computed, Gaussian-beam optics; tolerance 1e-3)
        CHECK(r.nohd.quadrature.metres() == Approx(223.6).epsilon(1e-3));
        // check-values.md C26 / hazard-and-eyewear.md section 5.1: the quadrature value is the one reported (1e-3)
        CHECK(r.nohd.value.metres() == Approx(223.6).epsilon(1e-3));
    }
}

TEST_CASE("hazard C27: 1064 nm, 10 W, a = 3 mm, 2 mrad, 10 s", "[hazard][nohd]")
{
    for (const BeamProfile profile : {BeamProfile::Unknown, BeamProfile::Gaussian}) {
        HazardRequest request = nearInfrared(10.0, 3e-3, 2e-3);
        request.beam.profile = profile;
        INFO("profile " << model::toString(profile));
        const HazardResult r = evaluated(request);
        // check-values.md C27 / section 0: MPE 50 W/m2 at exactly 10 s (breakpoint, lower row; tolerance 1e-3)
        CHECK(r.limit == Approx(50.0).epsilon(1e-3));
        REQUIRE(r.nohd.kind == DistanceKind::Finite);
        // check-values.md C27: linear 250.8 m (computed from verified formulas; tolerance 1e-3)
        CHECK(r.nohd.linear.metres() == Approx(250.8).epsilon(1e-3));
        // check-values.md C27: quadrature 252.3 m, reported (computed from verified formulas; tolerance 1e-3)
        CHECK(r.nohd.quadrature.metres() == Approx(252.3).epsilon(1e-3));
        CHECK(r.nohd.value.metres() == Approx(252.3).epsilon(1e-3));
    }
    SECTION("on the t^0.75 side of the breakpoint, MPE 50.61 W/m2")
    {
        // 9.999 s instead of 10 s: the 90 t^0.75 J/m2 side of the breakpoint, 90 x 10^-0.25 = 50.61 W/m2 (the value
        // check-values.md C27 quotes); the 1e-4 s shift changes it by 2.5e-6 relative (computed)
        const HazardResult r = evaluated(cwBeam(1064_nm, 10.0, 3e-3, 2e-3, 9.999_s));
        // check-values.md C27: 50.61 W/m2 (computed; tolerance 1e-3)
        CHECK(r.limit == Approx(50.61).epsilon(1e-3));
        // check-values.md C27: with 50.61 W/m2, linear 249.3 m, quadrature 250.8 m (computed; tolerance 1e-3)
        CHECK(r.nohd.linear.metres() == Approx(249.3).epsilon(1e-3));
        CHECK(r.nohd.quadrature.metres() == Approx(250.8).epsilon(1e-3));
    }
}

TEST_CASE("hazard C28: a lens on the beam, hazard beyond the focus", "[hazard][nohd][lens]")
{
    HazardRequest request = nearInfrared(10.0, 3e-3, 0.0);
    request.exposureCase.viewing = Viewing::Lens;
    request.exposureCase.focalLength = 100_mm;
    const HazardResult r = evaluated(request);
    // MPE 50 W/m2 as C28 assumes (check-values.md section 0 conventions; tolerance 1e-3)
    CHECK(r.limit == Approx(50.0).epsilon(1e-3));
    REQUIRE(r.nohd.kind == DistanceKind::Finite);
    // check-values.md C28: 16.92 m from the lens, reported (computed from reconstructed formulas; tolerance 1e-3)
    CHECK(r.nohd.value.metres() == Approx(16.92).epsilon(1e-3));
    // check-values.md C28: 16.82 m beyond the focus; hazard-and-eyewear.md section 5.3: the reported distance adds f
    // (100 mm) to it (tolerance 1e-3)
    CHECK(r.nohd.value.metres() - 0.1 == Approx(16.82).epsilon(1e-3));
}

TEST_CASE("hazard C29: diffuse reflection, 10 W, rho = 1, theta = 0", "[hazard][nohd][diffuse]")
{
    HazardRequest request = nearInfrared(10.0, kTinyDiameter_m, 0.0);
    request.exposureCase.viewing = Viewing::Diffuse;
    request.exposureCase.reflectance = 1.0;
    request.exposureCase.viewingAngle = 0_deg;
    request.exposureCase.distance = 1_m; // closest approach; a 1 um spot is a small source from there
    const HazardResult r = evaluated(request);
    REQUIRE(r.nohd.kind == DistanceKind::Finite);
    // check-values.md C29: r_NHZ = 0.2523 m (computed from verified formulas, H10; tolerance 1e-3)
    CHECK(r.nohd.value.metres() == Approx(0.2523).epsilon(1e-3));
    CHECK(r.nohd.smallSource.metres() == Approx(0.2523).epsilon(1e-3));
}

TEST_CASE("hazard C30: diffuse reflection, 5 W, rho = 0.8, theta = 30 deg", "[hazard][nohd][diffuse]")
{
    HazardRequest request = visible(5.0, kTinyDiameter_m, 0.0);
    request.exposureCase.viewing = Viewing::Diffuse;
    request.exposureCase.reflectance = 0.8;
    request.exposureCase.viewingAngle = 30_deg;
    request.exposureCase.distance = 1_m;
    const HazardResult r = evaluated(request);
    REQUIRE(r.nohd.kind == DistanceKind::Finite);
    // check-values.md C30: r_NHZ = 0.2081 m (computed from verified formulas; tolerance 1e-3)
    CHECK(r.nohd.value.metres() == Approx(0.2081).epsilon(1e-3));
}

TEST_CASE("hazard diffuse NHZ against a hand calculation", "[hazard][nohd][diffuse]")
{
    // computed (hazard-and-eyewear.md section 5.5): E = rho P cos(theta) / (pi r^2) = MPE solved for r:
    //   rho = 0.6, P = 3 W, theta = 45 deg, MPE 25.46 W/m2 (632.8 nm, 0.25 s):
    //   r = sqrt(0.6 * 3 * 0.70711 / (pi * 25.46)) = sqrt(1.27279 / 79.985) = sqrt(0.015913) = 0.12615 m
    HazardRequest request = visible(3.0, kTinyDiameter_m, 0.0);
    request.exposureCase.viewing = Viewing::Diffuse;
    request.exposureCase.reflectance = 0.6;
    request.exposureCase.viewingAngle = 45_deg;
    request.exposureCase.distance = 1_m;
    const HazardResult r = evaluated(request);
    REQUIRE(r.nohd.kind == DistanceKind::Finite);
    CHECK(r.nohd.value.metres() == Approx(0.12615).epsilon(1e-3));       // computed above; tolerance 1e-3
    CHECK(r.nohd.smallSource.metres() == Approx(0.12615).epsilon(1e-3)); // computed above; tolerance 1e-3
}

TEST_CASE("hazard diffuse near a wide spot: C6 shortens the radius, never lengthens it", "[hazard][nohd][diffuse]")
{
    // C29's output (10 W, rho = 1, theta = 0, 1064 nm, 10 s) on a 50 mm spot: near the 0.25 m small-source radius the
    // spot subtends about 50 mm / 0.25 m = 200 mrad (hazard-and-eyewear.md section 5.5: alpha = D_spot cos(theta) / r),
    // far above alpha_min = 1.5 mrad, so C6 > 1 relaxes the MPE (exposure-limits.md section 2.2) and the radius can
    // only be shorter than the small-source value 0.2523 m (check-values.md C29).
    HazardRequest request = nearInfrared(10.0, 50e-3, 0.0);
    request.exposureCase.viewing = Viewing::Diffuse;
    request.exposureCase.reflectance = 1.0;
    request.exposureCase.viewingAngle = 0_deg;
    request.exposureCase.distance = 1_m;
    const HazardResult r = evaluated(request);
    REQUIRE(r.nohd.kind != DistanceKind::Unbounded);
    CHECK(std::isfinite(r.nohd.value.metres()));
    CHECK(r.nohd.value.metres() >= 0.0);
    // never longer than the small-source radius, check-values.md C29 0.2523 m (tolerance 1e-3 on the bound)
    CHECK(r.nohd.value.metres() <= 0.2523 * (1.0 + 1e-3));
    // shorter here, since C6 > 1 at every r near 0.25 m (the argument above)
    CHECK(r.nohd.value.metres() < 0.2523 * (1.0 - 1e-3));
    // hazard.hpp: smallSource is the radius with the spot treated as a small source (no C6): check-values.md C29,
    // 0.2523 m (computed from verified formulas; tolerance 1e-3)
    CHECK(r.nohd.smallSource.metres() == Approx(0.2523).epsilon(1e-3));
}

TEST_CASE("hazard diffuse radius does not depend on the closest approach", "[hazard][nohd][diffuse]")
{
    // hazard-and-eyewear.md section 5.9: the hazard zone is where the exposure exceeds the MPE, a property of the
    // output and the spot; the closest approach (hazard.hpp: the worst point evaluated) only picks where the OD is
    // formed. So the radius for the wide-spot case above must be the same whether the person's closest approach is
    // 0.1 m or 1 m (definition; tolerance 1e-3). With the tiny spot of C29 the same holds trivially.
    for (const double spot : {kTinyDiameter_m, 50e-3}) {
        INFO("spot " << spot << " m");
        HazardRequest near = nearInfrared(10.0, spot, 0.0);
        near.exposureCase.viewing = Viewing::Diffuse;
        near.exposureCase.distance = units::Length::fromSi(0.1);
        HazardRequest far = near;
        far.exposureCase.distance = units::Length::fromSi(1.0);
        const HazardResult a = evaluated(near);
        const HazardResult b = evaluated(far);
        CHECK(a.nohd.kind == b.nohd.kind);
        CHECK(a.nohd.value.metres() == Approx(b.nohd.value.metres()).epsilon(1e-3));
    }
}

TEST_CASE("hazard C31: aided viewing with 7x50 binoculars", "[hazard][nohd][aided]")
{
    HazardRequest request = visible(1.0, kTinyDiameter_m, 1e-3);
    request.exposureCase.viewing = Viewing::Aided;
    request.exposureCase.magnification = 7.0;
    request.exposureCase.objectiveDiameter = 50_mm;
    request.exposureCase.transmission = 1.0;
    const HazardResult r = evaluated(request);
    REQUIRE(r.nohd.kind == DistanceKind::Finite);
    // check-values.md C31: ENOHD 1565.5 m = 7 x NOHD, K = 49 (computed from reconstructed formulas; tolerance 1e-3)
    CHECK(r.nohd.value.metres() == Approx(1565.5).epsilon(1e-3));
}

TEST_CASE("hazard C32: multimode fibre end, NA 0.2", "[hazard][nohd][fibre]")
{
    HazardRequest request = visible(1.0, kTinyDiameter_m, 0.0);
    request.exposureCase.viewing = Viewing::Fibre;
    request.exposureCase.numericalAperture = 0.2;
    const HazardResult r = evaluated(request);
    REQUIRE(r.nohd.kind == DistanceKind::Finite);
    // check-values.md C32: 0.9505 m, the 1.7/NA form reported (computed from reconstructed formulas; tolerance 1e-3)
    CHECK(r.nohd.value.metres() == Approx(0.9505).epsilon(1e-3));
    // check-values.md C32: the uniform cone gives 0.5591 m; hazard-and-eyewear.md section 5.4: the two forms differ by
    // the factor 1.7 alone, so the reported value is 1.7 x 0.5591 (computed; tolerance 1e-3)
    CHECK(r.nohd.value.metres() / 1.7 == Approx(0.5591).epsilon(1e-3));
}

TEST_CASE("hazard C33: zero divergence has no finite NOHD", "[hazard][nohd][limits]")
{
    // check-values.md C33: phi = 0 -> "no finite NOHD" (definitions); hazard-and-eyewear.md section 5.2
    const HazardResult r = evaluated(visible(1.0, 2e-3, 0.0));
    CHECK(r.nohd.kind == DistanceKind::Unbounded);
    CHECK_FALSE(r.notes.empty());
}

TEST_CASE("hazard C33: below the MPE from the exit on, NOHD 0", "[hazard][nohd][limits]")
{
    // check-values.md C33: 0.5 mW, a = 7 mm, MPE 25.46 W/m2: 4P/(pi MPE) = 2.50e-5 m2 < a^2 = 4.9e-5 m2 -> NOHD 0
    // (computed from verified formulas, definitions; exact)
    for (const BeamProfile profile : {BeamProfile::Unknown, BeamProfile::Gaussian}) {
        HazardRequest request = visible(0.5e-3, 7e-3, 1e-3);
        request.beam.profile = profile;
        INFO("profile " << model::toString(profile));
        const HazardResult r = evaluated(request);
        CHECK(r.nohd.kind == DistanceKind::Zero);
        CHECK(r.nohd.value.metres() == 0.0);
        CHECK_FALSE(std::isnan(r.nohd.linear.metres()));
        CHECK_FALSE(std::isnan(r.nohd.quadrature.metres()));
        CHECK(r.nohd.linear.metres() >= 0.0);
        CHECK(r.nohd.quadrature.metres() >= 0.0);
        // below the MPE at the exit: nothing to attenuate (hazard-and-eyewear.md section 1.1: X <= MPE -> OD 0)
        CHECK(r.requiredOd == 0.0);
    }
}

TEST_CASE("hazard C33: with a = 0, four times the power doubles the NOHD", "[hazard][nohd][limits]")
{
    const HazardResult one = evaluated(visible(1.0, kTinyDiameter_m, 1e-3));
    const HazardResult four = evaluated(visible(4.0, kTinyDiameter_m, 1e-3));
    REQUIRE(one.nohd.kind == DistanceKind::Finite);
    REQUIRE(four.nohd.kind == DistanceKind::Finite);
    // check-values.md C33: NOHD proportional to sqrt(P) for a = 0 (definitions; tolerance 1e-3)
    CHECK(four.nohd.value.metres() / one.nohd.value.metres() == Approx(2.0).epsilon(1e-3));
    // computed: 2 x 223.6 m (check-values.md C25) = 447.2 m (tolerance 1e-3)
    CHECK(four.nohd.value.metres() == Approx(447.2).epsilon(1e-3));
}

TEST_CASE("hazard specular reflection is direct viewing with rho P", "[hazard][nohd][specular]")
{
    // hazard-and-eyewear.md section 5.6: a flat mirror folds the beam, the section 5.2 hazard with P -> rho P.
    // rho = 0.25 on 4 W is C25's 1 W: NOHD 223.6 m (check-values.md C25; tolerance 1e-3)
    HazardRequest request = visible(4.0, kTinyDiameter_m, 1e-3);
    request.exposureCase.viewing = Viewing::Specular;
    request.exposureCase.reflectance = 0.25;
    const HazardResult r = evaluated(request);
    REQUIRE(r.nohd.kind == DistanceKind::Finite);
    CHECK(r.nohd.value.metres() == Approx(223.6).epsilon(1e-3));
    // and C26's set-up (a = 2 mm) the same way: linear 221.6 m, quadrature 223.6 m (check-values.md C26; 1e-3)
    HazardRequest wide = visible(4.0, 2e-3, 1e-3);
    wide.exposureCase.viewing = Viewing::Specular;
    wide.exposureCase.reflectance = 0.25;
    const HazardResult w = evaluated(wide);
    REQUIRE(w.nohd.kind == DistanceKind::Finite);
    CHECK(w.nohd.linear.metres() == Approx(221.6).epsilon(1e-3));
    CHECK(w.nohd.quadrature.metres() == Approx(223.6).epsilon(1e-3));
}

TEST_CASE("hazard C37: a 1/e2 beam is converted before the NOHD is formed", "[hazard][nohd][definition]")
{
    // hazard-and-eyewear.md section 2: d63 = d86 / sqrt 2, divergence likewise. C26's 1/e values (a = 2 mm,
    // phi = 1 mrad) given as 1/e2: a = 2 sqrt 2 mm = 2.8284 mm, phi = sqrt 2 mrad = 1.4142 mrad (computed)
    HazardRequest request = visible(1.0, 2e-3 * std::numbers::sqrt2, 1e-3 * std::numbers::sqrt2);
    request.beam.definition = model::BeamDefinition::OneOverESquared;
    const HazardResult r = evaluated(request);
    REQUIRE(r.nohd.kind == DistanceKind::Finite);
    // check-values.md C26: linear 221.6 m, quadrature 223.6 m (computed from verified formulas; tolerance 1e-3)
    CHECK(r.nohd.linear.metres() == Approx(221.6).epsilon(1e-3));
    CHECK(r.nohd.quadrature.metres() == Approx(223.6).epsilon(1e-3));
}

TEST_CASE("hazard NOHD is finite and non-negative under every rule-set choice", "[hazard][nohd][limits]")
{
    // check-values.md C27: the 1064 nm, 10 s MPE is 50 W/m2 under every choice (C34: "all rule-set choices"), so the
    // quadrature NOHD is 252.3 m for each (computed from verified formulas; tolerance 1e-3)
    for (const Choice& choice : kAllChoices) {
        HazardRequest request = nearInfrared(10.0, 3e-3, 2e-3);
        request.rules = choice.rules;
        request.c5 = choice.c5;
        INFO(choice.name);
        const HazardResult r = evaluated(request);
        REQUIRE(r.nohd.kind == DistanceKind::Finite);
        CHECK(r.nohd.value.metres() == Approx(252.3).epsilon(1e-3));
    }
}
