// The `strictest` choice for single exposures (check-values.md C48, K22, K24; exposure-limits.md section 4.8) and
// the provenance of reconstructed rows. Tolerance relative 1e-3 (computed values) unless a line says otherwise.
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
using beamwarden::units::Frequency;
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

MpeRequest singleExposure(double lambda_nm, double t_s, Choice choice, Target target = Target::Eye)
{
    MpeRequest request;
    request.wavelength = Wavelength::fromSi(lambda_nm / 1e9);
    request.target = target;
    request.duration = Duration::fromSi(t_s);
    request.sourceAngle = Angle::fromSi(0.0);
    request.skinArea = Area::fromSi(0.0);
    request.rules = choice.rules;
    request.c5 = choice.c5;
    return request;
}

MpeRequest pulseTrain(double lambda_nm, double tp_s, double prf_Hz, double exposure_s, Choice choice)
{
    MpeRequest request = singleExposure(lambda_nm, tp_s, choice);
    PulseTrain train;
    train.prf = Frequency::fromSi(prf_Hz);
    train.exposure = Duration::fromSi(exposure_s);
    request.train = train;
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

double a7Of(const MpeResult& result)
{
    const double d = result.governing().single.governingTerm().aperture.si();
    return std::numbers::pi * d * d / 4.0;
}

} // namespace

TEST_CASE("C48: 532 nm single pulse, small source, eye", "[limits][strictest][C48]")
{
    SECTION("(a) 150 fs: 2007 governs")
    {
        const MpeResult r2007 = evaluated(singleExposure(532.0, 150e-15, k2007));
        // check-values.md C48 (a): 2007 1.5e-4 J/m^2 (5.773e-9 J through 7 mm)
        CHECK(r2007.radiantExposure().si() == Approx(1.5e-4).epsilon(1e-3));
        CHECK(r2007.radiantExposure().si() * a7Of(r2007) == Approx(5.773e-9).epsilon(1e-3));
        for (const Choice choice : {k2014c, k2014e}) {
            INFO(choice.name);
            const MpeResult r = evaluated(singleExposure(532.0, 150e-15, choice));
            // check-values.md C48 (a): 2014 (both options) 1e-3 J/m^2 (3.848e-8 J)
            CHECK(r.radiantExposure().si() == Approx(1e-3).epsilon(1e-3));
            CHECK(r.radiantExposure().si() * a7Of(r) == Approx(3.848e-8).epsilon(1e-3));
        }
        const MpeResult s = evaluated(singleExposure(532.0, 150e-15, kStrictest));
        // check-values.md C48 (a): strictest 1.5e-4 J/m^2 (2007 governs; the 2014 value is shown beside it)
        CHECK(s.radiantExposure().si() == Approx(1.5e-4).epsilon(1e-3));
        CHECK(s.governing().set == RuleSetId::Iec60825_1_2007);
        CHECK_FALSE(s.setsTie);
        REQUIRE(s.setCount == 2);
        CHECK(outcomeOf(s, RuleSetId::Iec60825_1_2014).limit.si() == Approx(1e-3).epsilon(1e-3));
        // check-values.md C48 (a): 2007 and strictest computed from verified formulas
        CHECK_FALSE(s.restsOnReconstructedRow());
    }
    SECTION("(b) 10 ns: 2014 governs")
    {
        // check-values.md C48 (b): 2007 5e-3 J/m^2; 2014 2e-3 J/m^2; strictest 2e-3 J/m^2 (2014 governs)
        CHECK(evaluated(singleExposure(532.0, 10e-9, k2007)).radiantExposure().si() == Approx(5e-3).epsilon(1e-3));
        CHECK(evaluated(singleExposure(532.0, 10e-9, k2014c)).radiantExposure().si() == Approx(2e-3).epsilon(1e-3));
        CHECK(evaluated(singleExposure(532.0, 10e-9, k2014e)).radiantExposure().si() == Approx(2e-3).epsilon(1e-3));
        const MpeResult s = evaluated(singleExposure(532.0, 10e-9, kStrictest));
        CHECK(s.radiantExposure().si() == Approx(2e-3).epsilon(1e-3));
        CHECK(s.governing().set == RuleSetId::Iec60825_1_2014);
        CHECK(outcomeOf(s, RuleSetId::Iec60825_1_2007).limit.si() == Approx(5e-3).epsilon(1e-3));
        // check-values.md C48 (b): 2007 from verified formulas; 2014 and strictest from reconstructed formulas
        CHECK(s.restsOnReconstructedRow());
        CHECK_FALSE(evaluated(singleExposure(532.0, 10e-9, k2007)).restsOnReconstructedRow());
    }
    SECTION("(c) 0.25 s: equal, both named")
    {
        for (const Choice choice : {k2007, k2014c, k2014e, kStrictest}) {
            INFO(choice.name);
            // check-values.md C48 (c): 6.364 J/m^2 in both sets
            CHECK(evaluated(singleExposure(532.0, 0.25, choice)).radiantExposure().si() == Approx(6.364).epsilon(1e-3));
        }
        const MpeResult s = evaluated(singleExposure(532.0, 0.25, kStrictest));
        // check-values.md C48 (c): strictest 6.364 J/m^2, both sets named
        CHECK(s.setsTie);
        REQUIRE(s.setCount == 2);
        CHECK(outcomeOf(s, RuleSetId::Iec60825_1_2007).limit.si() == Approx(6.364).epsilon(1e-3));
        CHECK(outcomeOf(s, RuleSetId::Iec60825_1_2014).limit.si() == Approx(6.364).epsilon(1e-3));
    }
}

TEST_CASE("K22: the 2007 / 2014 sub-ns crossover at 3.111e-10 s", "[limits][strictest][K22]")
{
    // check-values.md K22: 2.7e4 t^0.75 = 2e-3 at t = 3.111e-10 s; 2007 governs shorter retinal pulses, 2014 longer
    // ones up to 18 us at 400-1050 nm (exposure-limits.md section 4.8)
    SECTION("just below: 2007 governs")
    {
        // IEC 60825-1:2007 Table A.1 via exposure-limits.md section 3.1, 400-700 nm, 1e-11-1e-9 s:
        // 2.7e4 * (3.0e-10)^0.75 = 2.7e4 * 7.2084e-8 = 1.946e-3 J/m^2 < 2e-3 (2014 row)
        const MpeResult s = evaluated(singleExposure(532.0, 3.0e-10, kStrictest));
        CHECK(s.radiantExposure().si() == Approx(1.946e-3).epsilon(1e-3));
        CHECK(s.governing().set == RuleSetId::Iec60825_1_2007);
    }
    SECTION("just above: 2014 governs")
    {
        // 2.7e4 * (3.2e-10)^0.75 = 2.7e4 * 7.5659e-8 = 2.043e-3 > 2e-3 -> the 2014 row 2e-3 J/m^2 (section 4.1)
        const MpeResult s = evaluated(singleExposure(532.0, 3.2e-10, kStrictest));
        CHECK(s.radiantExposure().si() == Approx(2e-3).epsilon(1e-3));
        CHECK(s.governing().set == RuleSetId::Iec60825_1_2014);
    }
    SECTION("2014 governs up to 18 us, equal from there on")
    {
        // exposure-limits.md section 4.8 / D3: 10 us: 2014 18 * (1e-5)^0.75 = 18 * 1.7783e-4 = 3.201e-3 J/m^2
        // against 2007 5e-3
        const MpeResult ten = evaluated(singleExposure(532.0, 1e-5, kStrictest));
        CHECK(ten.radiantExposure().si() == Approx(3.201e-3).epsilon(1e-3));
        CHECK(ten.governing().set == RuleSetId::Iec60825_1_2014);
        // 20 us: both 18 * (2e-5)^0.75 = 18 * 2.9907e-4 = 5.383e-3 J/m^2 (exposure-limits.md section 4.8, "Equal")
        const MpeResult twenty = evaluated(singleExposure(532.0, 2e-5, kStrictest));
        CHECK(twenty.radiantExposure().si() == Approx(5.383e-3).epsilon(1e-3));
        CHECK(twenty.setsTie);
    }
}

TEST_CASE("Strictest, 1050-1400 nm single pulses (exposure-limits.md section 4.8)", "[limits][strictest]")
{
    SECTION("1064 nm between 45.7 us and 50 us: 2007 governs")
    {
        // 2014: 90 * (4.8e-5)^0.75 = 90 * 5.7667e-4 = 5.190e-2 J/m^2 (section 4.1); 2007: 5e-2 (section 3.1, to 50 us)
        const MpeResult s = evaluated(singleExposure(1064.0, 4.8e-5, kStrictest));
        CHECK(s.radiantExposure().si() == Approx(5e-2).epsilon(1e-3));
        CHECK(s.governing().set == RuleSetId::Iec60825_1_2007);
    }
    SECTION("1064 nm at 40 us: 2014 governs")
    {
        // 2014: 90 * (4e-5)^0.75 = 90 * 5.0297e-4 = 4.527e-2 J/m^2 < 5e-2 (2007)
        const MpeResult s = evaluated(singleExposure(1064.0, 4e-5, kStrictest));
        CHECK(s.radiantExposure().si() == Approx(4.527e-2).epsilon(1e-3));
        CHECK(s.governing().set == RuleSetId::Iec60825_1_2014);
    }
    SECTION("1260 nm, 1 us: 2014 governs; 1300 nm, 1 us: 2007 governs")
    {
        // 2014: 2e-2 C7, C7 = 8 + 10^(0.04 (1260 - 1250)) = 8 + 2.512 = 10.51 -> 0.2102 J/m^2 (sections 2.1, 4.1);
        // 2007: 5e-2 * 8 = 0.4 J/m^2 (section 3.1). Section 4.8: above 1277 nm 2007 governs.
        const MpeResult at1260 = evaluated(singleExposure(1260.0, 1e-6, kStrictest));
        CHECK(at1260.radiantExposure().si() == Approx(0.2102).epsilon(1e-3));
        CHECK(at1260.governing().set == RuleSetId::Iec60825_1_2014);
        // 2014 at 1300 nm: retinal 2e-2 * 108 = 2.16, corneal skin limit 1.1e4 C4 t^0.25 = 5.5e4 * 0.031623 = 1739;
        // 2007: 0.4 J/m^2 governs
        const MpeResult at1300 = evaluated(singleExposure(1300.0, 1e-6, kStrictest));
        CHECK(at1300.radiantExposure().si() == Approx(0.4).epsilon(1e-3));
        CHECK(at1300.governing().set == RuleSetId::Iec60825_1_2007);
        CHECK(outcomeOf(at1300, RuleSetId::Iec60825_1_2014).limit.si() == Approx(2.16).epsilon(1e-3));
    }
}

TEST_CASE("K24: the 2014 corneal limit at 1400 nm", "[limits][strictest][K24]")
{
    for (const Choice choice : {k2014c, k2014e}) {
        INFO(choice.name);
        // check-values.md K24: 1399 nm, 1 ns: skin 200 C4 = 1000 J/m^2 (retinal 2e-2 C7 ~ 1.8e4 does not govern)
        const MpeResult r = evaluated(singleExposure(1399.0, 1e-9, choice));
        CHECK(r.radiantExposure().si() == Approx(1000.0).epsilon(1e-3));
        const LimitTerm& governing = r.governing().single.governingTerm();
        REQUIRE(governing.row != nullptr);
        CHECK(governing.row->effect == Effect::CornealSkinLimit);
        const LimitTerm* retinal = nullptr;
        for (const LimitTerm& term : r.governing().single.all())
            if (term.row != nullptr && term.row->effect == Effect::RetinalThermal)
                retinal = &term;
        REQUIRE(retinal != nullptr);
        // 2e-2 * (8 + 10^(0.04 * 149)) = 2e-2 * 912019 = 1.824e4 J/m^2 (exposure-limits.md sections 2.1, 4.1)
        CHECK(retinal->wholeSource.si() == Approx(1.824e4).epsilon(1e-3));
        // check-values.md K24: vs 1400 nm eye 1e3 J/m^2: continuous in 2014
        CHECK(evaluated(singleExposure(1400.0, 1e-9, choice)).radiantExposure().si() == Approx(1000.0).epsilon(1e-3));
        CHECK(evaluated(singleExposure(1401.0, 1e-9, choice)).radiantExposure().si() == Approx(1000.0).epsilon(1e-3));
    }
    // check-values.md K24: strictest: the 2007 retinal value governs at 1399 nm, 2.7e5 (1e-9)^0.75 * 8 = 0.3841 J/m^2
    // (lower adjoining row at exactly 1 ns; 5e-2 * 8 = 0.4 just above), a step as in 2007
    const MpeResult s = evaluated(singleExposure(1399.0, 1e-9, kStrictest));
    CHECK(s.radiantExposure().si() == Approx(0.3841).epsilon(1e-3));
    CHECK(s.governing().set == RuleSetId::Iec60825_1_2007);
    CHECK(evaluated(singleExposure(1399.0, 1e-9 * (1.0 + 1e-6), kStrictest)).radiantExposure().si() ==
          Approx(0.4).epsilon(1e-3));
    // the step: 1401 nm, 1 ns: 1e12 * 1e-9 = 1e3 J/m^2 in both sets (exposure-limits.md section 3.1, 1400-1500 nm)
    CHECK(evaluated(singleExposure(1401.0, 1e-9, kStrictest)).radiantExposure().si() == Approx(1000.0).epsilon(1e-3));
}

TEST_CASE("Provenance: figures that rest on reconstructed rows", "[limits][strictest][provenance]")
{
    // check-values.md C7 strictest: 2014 conservative governs, computed from reconstructed formulas
    const MpeResult c7 = evaluated(pulseTrain(1064.0, 10e-9, 10.0, 10.0, kStrictest));
    CHECK(c7.governing().set == RuleSetId::Iec60825_1_2014);
    CHECK(c7.restsOnReconstructedRow());
    CHECK(c7.governing().weakestStatus == RowStatus::Reconstructed);
    // check-values.md C8 strictest: 2007 governs, computed from verified formulas
    const MpeResult c8 = evaluated(pulseTrain(800.0, 100e-15, 1e3, 10.0, kStrictest));
    CHECK(c8.governing().set == RuleSetId::Iec60825_1_2007);
    CHECK_FALSE(c8.restsOnReconstructedRow());
    CHECK(c8.governing().weakestStatus != RowStatus::Reconstructed);
    // check-values.md C12 strictest: computed from reconstructed formulas
    MpeRequest c12 = singleExposure(532.0, 10e-9, kStrictest);
    c12.sourceAngle = Angle::fromSi(10e-3);
    CHECK(evaluated(c12).restsOnReconstructedRow());
    // exposure-limits.md section 0.1: the governing row's status is recorded; every 2014-governed 400-1400 nm
    // sub-ms row is reconstructed (section 4.1)
    const MpeResult p7 = evaluated(singleExposure(1064.0, 1e-9, kStrictest));
    CHECK(p7.governing().set == RuleSetId::Iec60825_1_2014);
    CHECK(p7.restsOnReconstructedRow());
    const LimitTerm& term = p7.governing().single.governingTerm();
    REQUIRE(term.row != nullptr);
    CHECK(term.row->status == RowStatus::Reconstructed);
}
