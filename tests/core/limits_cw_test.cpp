// CW and long exposures (check-values.md section 2.1, C1-C6), under every rule-set choice ("both rule sets unless
// noted"). Expected values: check-values.md; tolerance relative 1e-3 (computed values) unless a line says otherwise.
#include <catch2/catch.hpp>

#include <cmath>
#include <numbers>
#include <string>

#include "beamwarden/limits/mpe.hpp"
#include "beamwarden/units.hpp"

using namespace beamwarden::limits;
using beamwarden::units::Angle;
using beamwarden::units::Area;
using beamwarden::units::Duration;
using beamwarden::units::Wavelength;

namespace {

struct Choice {
    RuleChoice rules;
    C5Option c5;
    const char* name;
};

constexpr Choice k2007{RuleChoice::Iec60825_1_2007, C5Option::Conservative, "iec60825-1:2007"};
constexpr Choice k2014c{RuleChoice::Iec60825_1_2014, C5Option::Conservative, "iec60825-1:2014 conservative"};
constexpr Choice k2014e{RuleChoice::Iec60825_1_2014, C5Option::Edition, "iec60825-1:2014 edition"};
constexpr Choice kStrictest{RuleChoice::Strictest, C5Option::Conservative, "strictest"};
constexpr Choice kAllChoices[] = {k2007, k2014c, k2014e, kStrictest};

MpeRequest singleExposure(double lambda_nm, double t_s, Choice choice)
{
    MpeRequest request;
    request.wavelength = Wavelength::fromSi(lambda_nm / 1e9);
    request.target = Target::Eye;
    request.duration = Duration::fromSi(t_s);
    request.sourceAngle = Angle::fromSi(0.0);
    request.skinArea = Area::fromSi(0.0);
    request.rules = choice.rules;
    request.c5 = choice.c5;
    return request;
}

MpeResult evaluated(const MpeRequest& request)
{
    const auto result = evaluateMpe(request);
    INFO((result ? std::string{"accepted"} : result.error().message()));
    REQUIRE(result.has_value());
    return *result;
}

// The term of the governing set's single-exposure limit set that protects against `effect`, or nullptr.
const LimitTerm* termFor(const MpeResult& result, Effect effect)
{
    for (const LimitTerm& term : result.governing().single.all())
        if (term.row != nullptr && term.row->effect == effect)
            return &term;
    return nullptr;
}

Effect governingEffect(const MpeResult& result)
{
    const LimitTerm& term = result.governing().single.governingTerm();
    REQUIRE(term.row != nullptr);
    return term.row->effect;
}

} // namespace

TEST_CASE("C1: HeNe 632.8 nm CW, small source", "[limits][cw][C1]")
{
    for (const Choice choice : kAllChoices) {
        INFO(choice.name);
        const MpeResult quarter = evaluated(singleExposure(632.8, 0.25, choice));
        // check-values.md C1: 0.25 s: 6.364 J/m^2 = 25.46 W/m^2 (18 t^0.75, exposure-limits.md section 3.1 / 4.1)
        CHECK(quarter.radiantExposure().si() == Approx(6.364).epsilon(1e-3));
        CHECK(quarter.irradiance().si() == Approx(25.46).epsilon(1e-3));
        // check-values.md C1: 2 s: 15.14 W/m^2
        CHECK(evaluated(singleExposure(632.8, 2.0, choice)).irradiance().si() == Approx(15.14).epsilon(1e-3));
        // check-values.md C1: 10 s: 10 W/m^2 (H = 100 J/m^2; 10.12 W/m^2 only on the t^0.75 side); the breakpoint
        // convention of exposure-limits.md section 0.2 (lower adjoining row)
        const MpeResult ten = evaluated(singleExposure(632.8, 10.0, choice));
        CHECK(ten.irradiance().si() == Approx(10.0).epsilon(1e-3));
        CHECK(ten.radiantExposure().si() == Approx(100.0).epsilon(1e-3));
        // check-values.md C1: just below 10 s the t^0.75 side gives 10.12 W/m^2 (18 * 10^0.75 / 10)
        CHECK(evaluated(singleExposure(632.8, 10.0 * (1.0 - 1e-9), choice)).irradiance().si() ==
              Approx(10.12).epsilon(1e-3));
        for (const double t : {100.0, 3.0e4}) {
            INFO(t << " s");
            const MpeResult longer = evaluated(singleExposure(632.8, t, choice));
            // check-values.md C1: 100 s and 3e4 s: 10 W/m^2
            CHECK(longer.irradiance().si() == Approx(10.0).epsilon(1e-3));
            // check-values.md C1: no photochemical limit (> 600 nm)
            CHECK(termFor(longer, Effect::RetinalPhotochemical) == nullptr);
            // check-values.md C1 status: >= 10 s computed from reconstructed formulas
            CHECK(longer.restsOnReconstructedRow());
        }
    }
    // check-values.md C1 status: 0.25 s computed from verified formulas (2007), from reconstructed formulas (2014)
    CHECK_FALSE(evaluated(singleExposure(632.8, 0.25, k2007)).restsOnReconstructedRow());
    CHECK(evaluated(singleExposure(632.8, 0.25, k2014c)).restsOnReconstructedRow());
}

TEST_CASE("C2: 1 mW visible beam much smaller than 7 mm, t = 0.25 s", "[limits][cw][C2]")
{
    for (const Choice choice : kAllChoices) {
        INFO(choice.name);
        const MpeResult result = evaluated(singleExposure(632.8, 0.25, choice));
        const double aperture = result.governing().single.governingTerm().aperture.si();
        // check-values.md C2: E = 1 mW / A7 = 25.98 W/m^2 (aperture convention of check-values.md section 0)
        const double exposure = 1e-3 / (std::numbers::pi * aperture * aperture / 4.0);
        CHECK(exposure == Approx(25.98).epsilon(1e-3));
        // check-values.md C2: ratio 1.021 ("over limit x1.0")
        CHECK(exposure / result.irradiance().si() == Approx(1.021).epsilon(1e-3));
    }
}

TEST_CASE("C3: argon 514.5 nm CW, small, 100 s - 3e4 s", "[limits][cw][C3]")
{
    for (const Choice choice : kAllChoices) {
        for (const double t : {100.0, 1000.0, 3.0e4}) {
            INFO(choice.name << " at " << t << " s");
            const MpeResult result = evaluated(singleExposure(514.5, t, choice));
            // check-values.md C3: MPE 10 W/m^2 (thermal)
            CHECK(result.irradiance().si() == Approx(10.0).epsilon(1e-3));
            CHECK(governingEffect(result) == Effect::RetinalThermal);
            // check-values.md C3: photochemical C3 = 19.50 -> 19.50 W/m^2
            const LimitTerm* photo = termFor(result, Effect::RetinalPhotochemical);
            REQUIRE(photo != nullptr);
            CHECK(photo->wholeSource.si() / t == Approx(19.50).epsilon(1e-3));
        }
    }
}

TEST_CASE("C4: argon 488 nm CW, small, 3e4 s", "[limits][cw][C4]")
{
    for (const Choice choice : kAllChoices) {
        INFO(choice.name);
        const MpeResult result = evaluated(singleExposure(488.0, 3.0e4, choice));
        // check-values.md C4: photochemical C3 = 5.754 -> 5.754 W/m^2 (H = 1.726e5 J/m^2) < thermal 10 W/m^2
        CHECK(result.irradiance().si() == Approx(5.754).epsilon(1e-3));
        CHECK(result.radiantExposure().si() == Approx(1.726e5).epsilon(1e-3));
        CHECK(governingEffect(result) == Effect::RetinalPhotochemical);
        const LimitTerm* thermal = termFor(result, Effect::RetinalThermal);
        REQUIRE(thermal != nullptr);
        CHECK(thermal->wholeSource.si() / 3.0e4 == Approx(10.0).epsilon(1e-3));
    }
}

TEST_CASE("C5: 450 nm CW, small", "[limits][cw][C5]")
{
    for (const Choice choice : kAllChoices) {
        INFO(choice.name);
        // check-values.md C5: 10 s: 100 J/m^2 (photochemical 100 C3 = 100; thermal also 100 by the breakpoint rule)
        const MpeResult ten = evaluated(singleExposure(450.0, 10.0, choice));
        CHECK(ten.radiantExposure().si() == Approx(100.0).epsilon(1e-3));
        const LimitTerm* photoTen = termFor(ten, Effect::RetinalPhotochemical);
        const LimitTerm* thermalTen = termFor(ten, Effect::RetinalThermal);
        REQUIRE(photoTen != nullptr);
        REQUIRE(thermalTen != nullptr);
        CHECK(photoTen->wholeSource.si() == Approx(100.0).epsilon(1e-3));
        CHECK(thermalTen->wholeSource.si() == Approx(100.0).epsilon(1e-3));
        // check-values.md C5: 100 s: 1 W/m^2 (photochemical; thermal 10 W/m^2)
        const MpeResult hundred = evaluated(singleExposure(450.0, 100.0, choice));
        CHECK(hundred.irradiance().si() == Approx(1.0).epsilon(1e-3));
        CHECK(governingEffect(hundred) == Effect::RetinalPhotochemical);
        const LimitTerm* thermal = termFor(hundred, Effect::RetinalThermal);
        REQUIRE(thermal != nullptr);
        CHECK(thermal->wholeSource.si() / 100.0 == Approx(10.0).epsilon(1e-3));
    }
}

TEST_CASE("C6: photochemical/thermal crossover time 10 C3 s", "[limits][cw][C6]")
{
    for (const Choice choice : kAllChoices) {
        INFO(choice.name);
        // check-values.md C6: 488 nm t_x = 57.54 s; at t_x both limits give 10 W/m^2 * t_x = 100 C3 = 575.4 J/m^2
        // (exposure-limits.md section 3.2, dual limits: 100 C3 J/m^2 = 10 W/m^2 t at t = 10 C3 s)
        CHECK(evaluated(singleExposure(488.0, 57.54, choice)).radiantExposure().si() == Approx(575.4).epsilon(1e-3));
        // below t_x thermal governs, above it photochemical (exposure-limits.md section 3.2, dual limits)
        CHECK(governingEffect(evaluated(singleExposure(488.0, 0.8 * 57.54, choice))) == Effect::RetinalThermal);
        CHECK(governingEffect(evaluated(singleExposure(488.0, 1.25 * 57.54, choice))) == Effect::RetinalPhotochemical);
        // check-values.md C6: 500 nm t_x = 100 s -> H = 1000 J/m^2
        CHECK(evaluated(singleExposure(500.0, 100.0, choice)).radiantExposure().si() == Approx(1000.0).epsilon(1e-3));
        // check-values.md C6: 514.5 nm t_x = 195.0 s, but beyond 100 s the photochemical limit is 19.5 W/m^2, so
        // thermal governs throughout (10 W/m^2)
        for (const double t : {150.0, 195.0, 1000.0}) {
            INFO(t << " s");
            const MpeResult result = evaluated(singleExposure(514.5, t, choice));
            CHECK(governingEffect(result) == Effect::RetinalThermal);
            CHECK(result.irradiance().si() == Approx(10.0).epsilon(1e-3));
        }
    }
}

TEST_CASE("The MPE inputs of the hazard cases C27, C34 and C38", "[limits][cw][C34][C38]")
{
    for (const Choice choice : kAllChoices) {
        INFO(choice.name);
        // check-values.md C34 / C27: 1064 nm CW, t = 10 s, small source: MPE 50 W/m^2 (all rule-set choices); 50.61
        // W/m^2 only on the t^0.75 side of 10 s (exposure-limits.md section 7: 50.6 W/m^2)
        CHECK(evaluated(singleExposure(1064.0, 10.0, choice)).irradiance().si() == Approx(50.0).epsilon(1e-3));
        CHECK(evaluated(singleExposure(1064.0, 10.0 * (1.0 - 1e-9), choice)).irradiance().si() ==
              Approx(50.61).epsilon(1e-3));
        // check-values.md C38: CO2 10.6 um, t >= 10 s: aperture 3.5 mm, MPE 1000 W/m^2 (all rule-set choices)
        const MpeResult co2 = evaluated(singleExposure(10600.0, 100.0, choice));
        CHECK(co2.irradiance().si() == Approx(1000.0).epsilon(1e-3));
        CHECK(co2.governing().single.governingTerm().aperture.si() == Approx(3.5e-3).epsilon(1e-9));
    }
}
