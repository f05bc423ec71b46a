// Extended sources (check-values.md section 2.3, C12-C15): a uniform disc of angle alpha; "whole source" is the
// exposure over the whole apparent source (exposure-limits.md section 2.2). Tolerance relative 1e-3 (computed values).
#include <catch2/catch.hpp>

#include <string>

#include "beamwarden/limits/factors.hpp"
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

MpeRequest extended(double lambda_nm, double t_s, double alpha_rad, Choice choice)
{
    MpeRequest request;
    request.wavelength = Wavelength::fromSi(lambda_nm / 1e9);
    request.target = Target::Eye;
    request.duration = Duration::fromSi(t_s);
    request.sourceAngle = Angle::fromSi(alpha_rad);
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

const SetOutcome& outcomeOf(const MpeResult& result, RuleSetId id)
{
    const SetOutcome* found = nullptr;
    for (const SetOutcome& outcome : result.allSets())
        if (outcome.set == id)
            found = &outcome;
    REQUIRE(found != nullptr);
    return *found;
}

const LimitTerm* termFor(const SetOutcome& outcome, Effect effect)
{
    for (const LimitTerm& term : outcome.single.all())
        if (term.row != nullptr && term.row->effect == effect)
            return &term;
    return nullptr;
}

} // namespace

TEST_CASE("C12: 532 nm single 10 ns pulse, alpha = 10 mrad", "[limits][extended][C12]")
{
    SECTION("iec60825-1:2007: C6 = 6.667 within alpha_max = 100 mrad")
    {
        const MpeResult r = evaluated(extended(532.0, 10e-9, 10e-3, k2007));
        const LimitTerm& term = r.governing().single.governingTerm();
        // check-values.md C12: 2007: C6 = 6.667 -> 3.333e-2 J/m^2 (whole source within 100 mrad)
        CHECK(r.radiantExposure().si() == Approx(3.333e-2).epsilon(1e-3));
        CHECK(term.wholeSource.si() == Approx(3.333e-2).epsilon(1e-3));
        CHECK(term.withinField.si() == Approx(3.333e-2).epsilon(1e-3));
        // exposure-limits.md section 2.2: alpha_max = 100 mrad for all t (2007)
        CHECK(term.alphaMax.si() == Approx(0.1).epsilon(1e-9));
        CHECK_FALSE(r.restsOnReconstructedRow()); // check-values.md C12: 2007 computed from verified formulas
    }
    SECTION("iec60825-1:2014, both options: alpha_max(10 ns) = 5 mrad")
    {
        for (const Choice choice : {k2014c, k2014e}) {
            INFO(choice.name);
            const MpeResult r = evaluated(extended(532.0, 10e-9, 10e-3, choice));
            const LimitTerm& term = r.governing().single.governingTerm();
            // check-values.md C12: 2014: alpha_max(10 ns) = 5 mrad, C6 = 3.333, limit 6.667e-3 J/m^2 within a 5 mrad
            // field = 2.667e-2 J/m^2 whole source
            CHECK(term.alphaMax.si() == Approx(5e-3).epsilon(1e-9));
            CHECK(term.fieldOfView.si() == Approx(5e-3).epsilon(1e-9));
            CHECK(term.withinField.si() == Approx(6.667e-3).epsilon(1e-3));
            CHECK(term.wholeSource.si() == Approx(2.667e-2).epsilon(1e-3));
            CHECK(r.radiantExposure().si() == Approx(2.667e-2).epsilon(1e-3));
        }
    }
    SECTION("strictest: 2014 governs on the whole-source comparison")
    {
        const MpeResult r = evaluated(extended(532.0, 10e-9, 10e-3, kStrictest));
        // check-values.md C12: strictest 2.667e-2 J/m^2 whole source, 2014 governs
        CHECK(r.radiantExposure().si() == Approx(2.667e-2).epsilon(1e-3));
        CHECK(r.governing().set == RuleSetId::Iec60825_1_2014);
        REQUIRE(r.setCount == 2);
        // check-values.md C12: on the same whole-source exposure the 2014 ratio exposure/limit is 1.25 x the 2007 one
        const double h2007 = outcomeOf(r, RuleSetId::Iec60825_1_2007).single.value().si();
        const double h2014 = outcomeOf(r, RuleSetId::Iec60825_1_2014).single.value().si();
        CHECK(h2007 / h2014 == Approx(1.25).epsilon(1e-3));
        // check-values.md C12: strictest computed from reconstructed formulas
        CHECK(r.restsOnReconstructedRow());
    }
}

TEST_CASE("C13: 633 nm CW, alpha = 20 mrad, T = 100 s", "[limits][extended][C13]")
{
    // check-values.md C13: T2 = 15.41 s
    CHECK(factors::t2(20e-3) == Approx(15.41).epsilon(1e-3));
    for (const Choice choice : kAllChoices) {
        INFO(choice.name);
        // check-values.md C13: E = 18 C6 T2^-0.25 = 121.1 W/m^2 (both sets)
        const MpeResult r = evaluated(extended(633.0, 100.0, 20e-3, choice));
        CHECK(r.irradiance().si() == Approx(121.1).epsilon(1e-3));
        CHECK(r.radiantExposure().si() == Approx(1.211e4).epsilon(1e-3));
    }
}

TEST_CASE("C14: 450 nm CW, alpha = 20 mrad, T = 100 s", "[limits][extended][C14]")
{
    for (const Choice choice : kAllChoices) {
        INFO(choice.name);
        const MpeResult r = evaluated(extended(450.0, 100.0, 20e-3, choice));
        // check-values.md C14: photochemical 100 J/m^2 within gamma_ph = 11 mrad = 3.306 W/m^2 whole source (governs)
        CHECK(r.irradiance().si() == Approx(3.306).epsilon(1e-3));
        const LimitTerm& governing = r.governing().single.governingTerm();
        REQUIRE(governing.row != nullptr);
        CHECK(governing.row->effect == Effect::RetinalPhotochemical);
        CHECK(governing.withinField.si() == Approx(100.0).epsilon(1e-3));
        CHECK(governing.fieldOfView.si() == Approx(11e-3).epsilon(1e-3));
        // check-values.md C14: thermal 121.1 W/m^2
        const LimitTerm* thermal = termFor(r.governing(), Effect::RetinalThermal);
        REQUIRE(thermal != nullptr);
        CHECK(thermal->wholeSource.si() / 100.0 == Approx(121.1).epsilon(1e-3));
    }
}

TEST_CASE("C15: 633 nm CW, alpha = 200 mrad, T = 100 s", "[limits][extended][C15]")
{
    // check-values.md C15: T2 = 100 s; C6_eff = alpha^2 / (alpha_min alpha_max) = 266.7
    CHECK(factors::t2(0.2) == Approx(100.0).epsilon(1e-3));
    CHECK(factors::c6WholeSource(0.2, 0.1) == Approx(266.7).epsilon(1e-3));
    for (const Choice choice : kAllChoices) {
        INFO(choice.name);
        const MpeResult r = evaluated(extended(633.0, 100.0, 0.2, choice));
        // check-values.md C15: 1518 W/m^2 whole source (= 379.5 W/m^2 within 100 mrad)
        CHECK(r.irradiance().si() == Approx(1518.0).epsilon(1e-3));
        const LimitTerm& term = r.governing().single.governingTerm();
        CHECK(term.wholeSource.si() / 100.0 == Approx(1518.0).epsilon(1e-3));
        CHECK(term.withinField.si() / 100.0 == Approx(379.5).epsilon(1e-3));
        CHECK(term.fieldOfView.si() == Approx(0.1).epsilon(1e-9));
    }
}
