// UV, infrared, skin and sub-100 fs single exposures (check-values.md section 2.4, C16-C24; the trains of C17, C19
// and C20 are in limits_pulsetrain_test.cpp). Tolerance relative 1e-3 (computed values) unless a line says otherwise.
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

MpeRequest singleExposure(double lambda_nm, double t_s, Target target, Choice choice, double skinArea_m2 = 0.0)
{
    MpeRequest request;
    request.wavelength = Wavelength::fromSi(lambda_nm / 1e9);
    request.target = target;
    request.duration = Duration::fromSi(t_s);
    request.sourceAngle = Angle::fromSi(0.0);
    request.skinArea = Area::fromSi(skinArea_m2);
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

double h(double lambda_nm, double t_s, Target target, Choice choice, double skinArea_m2 = 0.0)
{
    return evaluated(singleExposure(lambda_nm, t_s, target, choice, skinArea_m2)).radiantExposure().si();
}

double e(double lambda_nm, double t_s, Target target, Choice choice, double skinArea_m2 = 0.0)
{
    return evaluated(singleExposure(lambda_nm, t_s, target, choice, skinArea_m2)).irradiance().si();
}

} // namespace

TEST_CASE("C16: ArF 193 nm and KrF 248 nm, 30 J/m^2 total", "[limits][uv][C16]")
{
    // check-values.md C16: 30 J/m^2 (3 mJ/cm^2) total, any duration 1 ns - 3e4 s, eye or skin
    for (const Choice choice : kAllChoices) {
        for (const double lambda : {193.0, 248.0}) {
            for (const Target target : {Target::Eye, Target::Skin}) {
                for (const double t : {1e-9, 1e-6, 1e-3, 1.0, 10.0, 100.0, 1e4, 3e4}) {
                    INFO(choice.name << ", " << lambda << " nm, " << (target == Target::Eye ? "eye" : "skin") << ", "
                                     << t << " s");
                    CHECK(h(lambda, t, target, choice) == Approx(30.0).epsilon(1e-3));
                }
            }
        }
    }
}

TEST_CASE("C17: XeCl 308 nm, 20 ns pulse and the C2 dose", "[limits][uv][C17]")
{
    // check-values.md C17: T1(308) = 2.512e-5 s
    CHECK(factors::t1(308.0) == Approx(2.512e-5).epsilon(1e-3));
    // check-values.md C17: C2(308) = 398.1 J/m^2 (40 mJ/cm^2)
    CHECK(factors::c2(308.0) == Approx(398.1).epsilon(1e-3));
    for (const Choice choice : kAllChoices) {
        INFO(choice.name);
        // check-values.md C17: per pulse C1(20 ns) = 66.60 J/m^2
        CHECK(h(308.0, 20e-9, Target::Eye, choice) == Approx(66.60).epsilon(1e-3));
        // exposure-limits.md section 3.1: t > T1 -> H = C2 = 398.1 J/m^2 (here 1 s); section 3.2: 10-3e4 s H = C2
        CHECK(h(308.0, 1.0, Target::Eye, choice) == Approx(398.1).epsilon(1e-3));
        CHECK(h(308.0, 100.0, Target::Eye, choice) == Approx(398.1).epsilon(1e-3));
    }
}

TEST_CASE("C18: XeF 351 nm", "[limits][uv][C18]")
{
    for (const Choice choice : kAllChoices) {
        INFO(choice.name);
        // check-values.md C18: 20 ns pulse: 66.60 J/m^2
        CHECK(h(351.0, 20e-9, Target::Eye, choice) == Approx(66.60).epsilon(1e-3));
        // check-values.md C18: T = 100 s: 1e4 J/m^2
        CHECK(h(351.0, 100.0, Target::Eye, choice) == Approx(1e4).epsilon(1e-3));
        // check-values.md C18: T = 3e4 s: 10 W/m^2 (3e5 J/m^2)
        CHECK(e(351.0, 3e4, Target::Eye, choice) == Approx(10.0).epsilon(1e-3));
        CHECK(h(351.0, 3e4, Target::Eye, choice) == Approx(3e5).epsilon(1e-3));
    }
    // check-values.md C18 status: pulse computed from verified formulas (2007); long from reconstructed formulas
    CHECK_FALSE(evaluated(singleExposure(351.0, 20e-9, Target::Eye, k2007)).restsOnReconstructedRow());
    CHECK(evaluated(singleExposure(351.0, 100.0, Target::Eye, k2007)).restsOnReconstructedRow());
}

TEST_CASE("C21: CO2 10.6 um at the eye", "[limits][ir][C21]")
{
    for (const Choice choice : kAllChoices) {
        INFO(choice.name);
        // check-values.md C21: t >= 10 s: 1000 W/m^2 (here 100 s and 3e4 s)
        CHECK(e(10600.0, 100.0, Target::Eye, choice) == Approx(1000.0).epsilon(1e-3));
        CHECK(e(10600.0, 3e4, Target::Eye, choice) == Approx(1000.0).epsilon(1e-3));
        // check-values.md C21: t = 10 s: 9958 J/m^2 (breakpoint: lower row)
        CHECK(h(10600.0, 10.0, Target::Eye, choice) == Approx(9958.0).epsilon(1e-3));
        // check-values.md C21: 1 us: 177.1 J/m^2
        CHECK(h(10600.0, 1e-6, Target::Eye, choice) == Approx(177.1).epsilon(1e-3));
        // check-values.md C21: 100 ns: 99.58 J/m^2 (breakpoint: lower row)
        CHECK(h(10600.0, 100e-9, Target::Eye, choice) == Approx(99.58).epsilon(1e-3));
        // check-values.md C21: 1 ns: 100 J/m^2
        CHECK(h(10600.0, 1e-9, Target::Eye, choice) == Approx(100.0).epsilon(1e-3));
        // check-values.md C21: 100 fs: 0.01 J/m^2
        CHECK(h(10600.0, 100e-15, Target::Eye, choice) == Approx(0.01).epsilon(1e-3));
    }
    // check-values.md C21 status: t < 1 ns computed from verified formulas (2007); rest from reconstructed formulas
    CHECK_FALSE(evaluated(singleExposure(10600.0, 1e-10, Target::Eye, k2007)).restsOnReconstructedRow());
    CHECK(evaluated(singleExposure(10600.0, 1e-6, Target::Eye, k2007)).restsOnReconstructedRow());
}

TEST_CASE("C22: 1550 nm at the eye", "[limits][ir][C22]")
{
    for (const Choice choice : kAllChoices) {
        INFO(choice.name);
        // check-values.md C22: t < 1 ns: 1e13 W/m^2 (100 ps: 1e13 * 1e-10 = 1000 J/m^2)
        CHECK(e(1550.0, 100e-12, Target::Eye, choice) == Approx(1e13).epsilon(1e-3));
        CHECK(h(1550.0, 100e-12, Target::Eye, choice) == Approx(1000.0).epsilon(1e-3));
        // check-values.md C22: 1 ns - 10 s (e.g. 1 us): 1e4 J/m^2; also at 1 s
        CHECK(h(1550.0, 1e-6, Target::Eye, choice) == Approx(1e4).epsilon(1e-3));
        CHECK(h(1550.0, 1.0, Target::Eye, choice) == Approx(1e4).epsilon(1e-3));
        // check-values.md C22: t > 10 s: 1000 W/m^2 (100 s)
        CHECK(e(1550.0, 100.0, Target::Eye, choice) == Approx(1000.0).epsilon(1e-3));
    }
    // check-values.md C22 status: up to 10 s computed from verified formulas (2007); beyond from reconstructed
    CHECK_FALSE(evaluated(singleExposure(1550.0, 1e-6, Target::Eye, k2007)).restsOnReconstructedRow());
    CHECK(evaluated(singleExposure(1550.0, 100.0, Target::Eye, k2007)).restsOnReconstructedRow());
}

TEST_CASE("C23: skin", "[limits][skin][C23]")
{
    for (const Choice choice : kAllChoices) {
        INFO(choice.name);
        // check-values.md C23: 1064 nm 10 ns: 200 C4 = 1000 J/m^2
        CHECK(h(1064.0, 10e-9, Target::Skin, choice) == Approx(1000.0).epsilon(1e-3));
        // check-values.md C23: 532 nm 0.1 s: 1.1e4 * 0.1^0.25 = 6186 J/m^2
        CHECK(h(532.0, 0.1, Target::Skin, choice) == Approx(6186.0).epsilon(1e-3));
        // check-values.md C23: 633 nm CW >= 10 s: 2000 W/m^2 (here 100 s and 3e4 s)
        CHECK(e(633.0, 100.0, Target::Skin, choice) == Approx(2000.0).epsilon(1e-3));
        CHECK(e(633.0, 3e4, Target::Skin, choice) == Approx(2000.0).epsilon(1e-3));
        // check-values.md C23: 10.6 um, t > 10 s, 0.05 m^2 irradiated: 10 / 0.05 = 200 W/m^2; 0.2 m^2: 100 W/m^2
        CHECK(e(10600.0, 100.0, Target::Skin, choice, 0.05) == Approx(200.0).epsilon(1e-3));
        CHECK(e(10600.0, 100.0, Target::Skin, choice, 0.2) == Approx(100.0).epsilon(1e-3));
        // exposure-limits.md section 3.4, large areas: below 0.01 m^2 (and area not given) the 1000 W/m^2 row holds;
        // at 0.01 m^2 10 / 0.01 = 1000 W/m^2
        CHECK(e(10600.0, 100.0, Target::Skin, choice, 0.0) == Approx(1000.0).epsilon(1e-3));
        CHECK(e(10600.0, 100.0, Target::Skin, choice, 0.005) == Approx(1000.0).epsilon(1e-3));
        CHECK(e(10600.0, 100.0, Target::Skin, choice, 0.01) == Approx(1000.0).epsilon(1e-3));
    }
}

TEST_CASE("C24: single pulses shorter than 1e-13 s", "[limits][ultrafast][C24]")
{
    SECTION("800 nm, 20 fs")
    {
        const MpeResult r2007 = evaluated(singleExposure(800.0, 20e-15, Target::Eye, k2007));
        // check-values.md C24: 2007 2.377e-4 J/m^2
        CHECK(r2007.radiantExposure().si() == Approx(2.377e-4).epsilon(1e-3));
        for (const Choice choice : {k2014c, k2014e}) {
            INFO(choice.name);
            // check-values.md C24: 2014 (both options) 1.585e-3 J/m^2
            CHECK(h(800.0, 20e-15, Target::Eye, choice) == Approx(1.585e-3).epsilon(1e-3));
        }
        const MpeResult strictest = evaluated(singleExposure(800.0, 20e-15, Target::Eye, kStrictest));
        // check-values.md C24: strictest 2.377e-4 J/m^2 (2007 governs)
        CHECK(strictest.radiantExposure().si() == Approx(2.377e-4).epsilon(1e-3));
        CHECK(strictest.governing().set == RuleSetId::Iec60825_1_2007);
    }
    SECTION("267 nm, 20 fs")
    {
        // check-values.md C24: 3e10 * 2e-14 = 6e-4 J/m^2 (all)
        for (const Choice choice : kAllChoices) {
            INFO(choice.name);
            CHECK(h(267.0, 20e-15, Target::Eye, choice) == Approx(6e-4).epsilon(1e-3));
        }
    }
    SECTION("all flagged below the tabulated duration")
    {
        // check-values.md C24: all flagged "below tabulated duration" (exposure-limits.md section 6.3)
        for (const Choice choice : kAllChoices) {
            for (const double lambda : {800.0, 267.0}) {
                INFO(choice.name << " at " << lambda << " nm");
                const MpeResult r = evaluated(singleExposure(lambda, 20e-15, Target::Eye, choice));
                CHECK(r.governing().belowTable);
                CHECK(r.governing().single.governingTerm().belowTable);
            }
        }
        // at the table's shortest duration, 1e-13 s, the table itself applies (exposure-limits.md section 6.3)
        const MpeResult atTable = evaluated(singleExposure(800.0, 1e-13, Target::Eye, k2007));
        CHECK_FALSE(atTable.governing().belowTable);
        CHECK_FALSE(atTable.governing().single.governingTerm().belowTable);
    }
}
