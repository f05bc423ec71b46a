// Correction factors, times, angles and apertures (exposure-limits.md section 2; check-values.md K11, K14-K18,
// K20, K21). Tolerance relative 1e-3 (computed values) unless a line says otherwise; "exact" values are checked to
// relative 1e-9.
#include <catch2/catch.hpp>

#include <cmath>
#include <numbers>

#include "beamwarden/limits/factors.hpp"
#include "beamwarden/limits/mpe.hpp"
#include "beamwarden/limits/ruleset.hpp"
#include "beamwarden/units.hpp"

using namespace beamwarden::limits;
using beamwarden::units::Angle;
using beamwarden::units::Area;
using beamwarden::units::Duration;
using beamwarden::units::Wavelength;

namespace {

const RuleSet& set2007()
{
    return ruleSet(RuleSetId::Iec60825_1_2007);
}

const RuleSet& set2014()
{
    return ruleSet(RuleSetId::Iec60825_1_2014);
}

double area(double diameter_m)
{
    return std::numbers::pi * diameter_m * diameter_m / 4.0;
}

} // namespace

TEST_CASE("Rule sets are described by their data", "[limits][factors][ruleset]")
{
    // exposure-limits.md section 1 (names) and sections 2.2, 2.1, 3.5, 4.6 (edition-specific rules)
    CHECK(set2007().id == RuleSetId::Iec60825_1_2007);
    CHECK(set2014().id == RuleSetId::Iec60825_1_2014);
    CHECK(set2007().name == "iec60825-1:2007");
    CHECK(set2014().name == "iec60825-1:2014");
    CHECK(set2007().alphaMax == AlphaMaxRule::Constant100mrad);
    CHECK(set2014().alphaMax == AlphaMaxRule::TimeDependent2014);
    CHECK(set2007().c7 == C7Rule::Iec2007);
    CHECK(set2014().c7 == C7Rule::Iec2014);
    CHECK(set2007().rule3Scope == Rule3Scope::EyeThermal400nmTo1mm);
    CHECK(set2014().rule3Scope == Rule3Scope::RetinalThermal400To1400nm);
    CHECK(set2007().grouping == GroupingRule::OnlyPulsesLongerThan1ns);
    CHECK(set2014().grouping == GroupingRule::BothReadingsBelow1ns);
    // exposure-limits.md section 3.5: 2007 counts N over at most 10 s above 1400 nm
    CHECK(set2007().rule3CountCapAbove1400nm_s == Approx(10.0).epsilon(1e-9));
    CHECK_FALSE(set2007().hasC5Options);
    CHECK(set2014().hasC5Options);
    CHECK_FALSE(set2007().rows.empty());
    CHECK_FALSE(set2014().rows.empty());
    for (const RuleSet* set : {&set2007(), &set2014()}) {
        for (const LimitRow& row : set->rows) {
            INFO(row.id);
            CHECK(row.lambdaFrom_nm >= 180.0);
            CHECK(row.lambdaTo_nm <= 1e6);
            CHECK(row.lambdaFrom_nm < row.lambdaTo_nm);
            CHECK(row.durationFrom_s < row.durationTo_s);
            CHECK(row.coefficient > 0.0);
            CHECK_FALSE(row.id.empty());
        }
    }
}

TEST_CASE("UV factors C2 and T1 (K11, C17)", "[limits][factors][K11]")
{
    // check-values.md K11: T1(302.5) = 1e-9 s; T1(315) = 10 s; C2(302.5) = 31.62; C2(315) = 1e4
    CHECK(factors::t1(302.5) == Approx(1e-9).epsilon(1e-3));
    CHECK(factors::t1(315.0) == Approx(10.0).epsilon(1e-3));
    CHECK(factors::c2(302.5) == Approx(31.62).epsilon(1e-3));
    CHECK(factors::c2(315.0) == Approx(1e4).epsilon(1e-3));
    // check-values.md C17: T1(308) = 2.512e-5 s, C2(308) = 398.1
    CHECK(factors::t1(308.0) == Approx(2.512e-5).epsilon(1e-3));
    CHECK(factors::c2(308.0) == Approx(398.1).epsilon(1e-3));
    // check-values.md K11: C1(T1(lambda)) = 0.9958 C2(lambda) for every lambda; at t = T1 the limit is
    // min(C1, C2) = C1(T1) = 5600 T1^0.25 (exposure-limits.md section 3.1, 302.5-315 nm)
    for (const double lambda : {303.0, 305.0, 308.0, 310.0, 312.0, 314.5}) {
        INFO(lambda << " nm");
        const double t1 = factors::t1(lambda);
        CHECK(5600.0 * std::pow(t1, 0.25) == Approx(0.9958 * factors::c2(lambda)).epsilon(1e-3));
        for (const RuleSetId id : {RuleSetId::Iec60825_1_2007, RuleSetId::Iec60825_1_2014}) {
            const LimitSet limits = evaluateLimits(ruleSet(id), Target::Eye, Wavelength::fromSi(lambda / 1e9),
                                                   Duration::fromSi(t1), Angle::fromSi(0.0), Area::fromSi(0.0));
            CHECK(limits.value().si() == Approx(0.9958 * factors::c2(lambda)).epsilon(1e-3));
        }
    }
}

TEST_CASE("Visible and near-infrared factors C3, C4, C7 (K18)", "[limits][factors][K18]")
{
    // exposure-limits.md section 2.1: C3 = 1 (400-450), 10^(0.02 (lambda - 450)) (450-600)
    CHECK(factors::c3(420.0) == Approx(1.0).epsilon(1e-9));
    CHECK(factors::c3(450.0) == Approx(1.0).epsilon(1e-9));    // check-values.md K18: C3(450) = 1
    CHECK(factors::c3(488.0) == Approx(5.754).epsilon(1e-3));  // check-values.md C4
    CHECK(factors::c3(500.0) == Approx(10.0).epsilon(1e-3));   // check-values.md C6 / K15: t_x(500) = 100 s
    CHECK(factors::c3(514.5) == Approx(19.50).epsilon(1e-3));  // check-values.md C3
    CHECK(factors::c3(600.0) == Approx(1000.0).epsilon(1e-3)); // 10^(0.02 * 150)
    // exposure-limits.md section 2.1: C4 = 1 (< 700), 10^(0.002 (lambda - 700)) (700-1050), 5 (1050-1400)
    CHECK(factors::c4(633.0) == Approx(1.0).epsilon(1e-9));
    CHECK(factors::c4(800.0) == Approx(1.585).epsilon(1e-3));   // check-values.md section 0: C4(800 nm) = 1.585
    CHECK(factors::c4(900.0) == Approx(2.512).epsilon(1e-3));   // 10^0.4
    CHECK(factors::c4(1049.99) == Approx(5.012).epsilon(1e-3)); // check-values.md K18: C4(1050-) = 5.012
    CHECK(factors::c4(1050.01) == Approx(5.0).epsilon(1e-9));   // check-values.md K18: vs 5
    CHECK(factors::c4(1064.0) == Approx(5.0).epsilon(1e-9));
    CHECK(factors::c4(1300.0) == Approx(5.0).epsilon(1e-9)); // check-values.md C11: C4 = 5
    // exposure-limits.md section 2.1: C7 = 1 (700-1150), 10^(0.018 (lambda - 1150)) (1150-1200),
    // 8 (2007) or 8 + 10^(0.04 (lambda - 1250)) (2014) at 1200-1400 nm
    for (const C7Rule rule : {C7Rule::Iec2007, C7Rule::Iec2014}) {
        CHECK(factors::c7(rule, 1064.0) == Approx(1.0).epsilon(1e-9));    // check-values.md section 0: C7(1064) = 1
        CHECK(factors::c7(rule, 1175.0) == Approx(2.818).epsilon(1e-3));  // 10^(0.018 * 25) = 10^0.45
        CHECK(factors::c7(rule, 1199.99) == Approx(7.943).epsilon(1e-3)); // check-values.md K18: C7(1200-) = 7.943
    }
    CHECK(factors::c7(C7Rule::Iec2007, 1200.01) == Approx(8.0).epsilon(1e-9));  // check-values.md K18: 8 (2007)
    CHECK(factors::c7(C7Rule::Iec2014, 1200.01) == Approx(8.01).epsilon(1e-3)); // check-values.md K18: 8.01 (2014)
    CHECK(factors::c7(C7Rule::Iec2007, 1300.0) == Approx(8.0).epsilon(1e-9));   // check-values.md C11: 8 (2007)
    CHECK(factors::c7(C7Rule::Iec2014, 1300.0) == Approx(108.0).epsilon(1e-3)); // check-values.md C11: 108 (2014)
    // exposure-limits.md section 2.1: C7(2014) reaches 1e6 at 1400 nm; 8 + 10^(0.04 * 149) = 9.120e5 at 1399 nm
    CHECK(factors::c7(C7Rule::Iec2014, 1399.0) == Approx(9.120e5).epsilon(1e-3));
}

TEST_CASE("T2, alpha_max, C6 and gamma_ph (K14, K16)", "[limits][factors][K14][K16]")
{
    // check-values.md K16: T2(1.5 mrad) = 10 s; T2(100 mrad) = 100 s; check-values.md C13: T2(20 mrad) = 15.41 s
    CHECK(factors::t2(1.5e-3) == Approx(10.0).epsilon(1e-3));
    CHECK(factors::t2(0.1) == Approx(100.0).epsilon(1e-3));
    CHECK(factors::t2(20e-3) == Approx(15.41).epsilon(1e-3));
    // exposure-limits.md section 2.1: 10 s for alpha <= 1.5 mrad, 100 s for alpha > 100 mrad
    CHECK(factors::t2(0.0) == Approx(10.0).epsilon(1e-9));
    CHECK(factors::t2(0.2) == Approx(100.0).epsilon(1e-9));
    // check-values.md K16: alpha_max(625 us) = 5 mrad; alpha_max(0.25 s) = 100 mrad (2014); exposure-limits.md 2.2
    CHECK(factors::alphaMax(AlphaMaxRule::TimeDependent2014, 625e-6) == Approx(5e-3).epsilon(1e-3));
    CHECK(factors::alphaMax(AlphaMaxRule::TimeDependent2014, 0.25) == Approx(0.1).epsilon(1e-3));
    CHECK(factors::alphaMax(AlphaMaxRule::TimeDependent2014, 10e-9) == Approx(5e-3).epsilon(1e-9)); // C12
    CHECK(factors::alphaMax(AlphaMaxRule::TimeDependent2014, 0.01) == Approx(20e-3).epsilon(1e-3)); // 200 * 0.1 mrad
    CHECK(factors::alphaMax(AlphaMaxRule::TimeDependent2014, 10.0) == Approx(0.1).epsilon(1e-9));
    for (const double t : {1e-12, 1e-6, 1e-3, 1.0, 100.0})
        CHECK(factors::alphaMax(AlphaMaxRule::Constant100mrad, t) == Approx(0.1).epsilon(1e-9)); // 2007: 100 mrad
    // exposure-limits.md section 2.2: C6 = 1 (alpha <= alpha_min), alpha / alpha_min, alpha_max / alpha_min
    CHECK(factors::kAlphaMin_rad == Approx(1.5e-3).epsilon(1e-12));
    CHECK(factors::c6(1e-3, 0.1) == Approx(1.0).epsilon(1e-9));
    CHECK(factors::c6(10e-3, 0.1) == Approx(6.667).epsilon(1e-3));  // check-values.md C12, 2007
    CHECK(factors::c6(10e-3, 5e-3) == Approx(3.333).epsilon(1e-3)); // check-values.md C12, 2014
    CHECK(factors::c6(0.2, 0.1) == Approx(66.67).epsilon(1e-3));    // alpha_max / alpha_min
    // exposure-limits.md section 2.2: whole-source C6 = alpha^2 / (alpha_min alpha_max) beyond alpha_max
    CHECK(factors::c6WholeSource(10e-3, 5e-3) == Approx(13.33).epsilon(1e-3)); // check-values.md C12: 2.667e-2/2e-3
    CHECK(factors::c6WholeSource(0.2, 0.1) == Approx(266.7).epsilon(1e-3));    // check-values.md C15
    CHECK(factors::c6WholeSource(10e-3, 0.1) == Approx(6.667).epsilon(1e-3));  // = C6 within alpha_max
    // check-values.md K14: gamma_ph 11 mrad (10-100 s) -> 1.1 * 100^0.5 = 11 -> 1.1 * (1e4)^0.5 = 110 mrad
    CHECK(factors::gammaPh(10.0) == Approx(11e-3).epsilon(1e-3));
    CHECK(factors::gammaPh(50.0) == Approx(11e-3).epsilon(1e-3));
    CHECK(factors::gammaPh(100.0) == Approx(11e-3).epsilon(1e-3));
    CHECK(factors::gammaPh(1000.0) == Approx(34.79e-3).epsilon(1e-3)); // 1.1 * 1000^0.5 = 34.79 mrad
    CHECK(factors::gammaPh(1e4) == Approx(110e-3).epsilon(1e-3));
    CHECK(factors::gammaPh(3e4) == Approx(110e-3).epsilon(1e-3));
}

TEST_CASE("K14 / K15: photochemical continuity and the crossover time", "[limits][factors][K14][K15]")
{
    // check-values.md K14: 100 C3 J/m^2 at 100 s = C3 W/m^2 x 100 s (continuous); at 480 nm C3 = 10^0.6 = 3.981
    for (const RuleSetId id : {RuleSetId::Iec60825_1_2007, RuleSetId::Iec60825_1_2014}) {
        const auto photochemical = [&](double lambda, double t) {
            const LimitSet limits = evaluateLimits(ruleSet(id), Target::Eye, Wavelength::fromSi(lambda / 1e9),
                                                   Duration::fromSi(t), Angle::fromSi(0.0), Area::fromSi(0.0));
            double h = -1.0;
            for (const LimitTerm& term : limits.all())
                if (term.row != nullptr && term.row->effect == Effect::RetinalPhotochemical)
                    h = term.wholeSource.si();
            return h;
        };
        const auto thermal = [&](double lambda, double t) {
            const LimitSet limits = evaluateLimits(ruleSet(id), Target::Eye, Wavelength::fromSi(lambda / 1e9),
                                                   Duration::fromSi(t), Angle::fromSi(0.0), Area::fromSi(0.0));
            double h = -1.0;
            for (const LimitTerm& term : limits.all())
                if (term.row != nullptr && term.row->effect == Effect::RetinalThermal)
                    h = term.wholeSource.si();
            return h;
        };
        CHECK(photochemical(480.0, 100.0 * (1.0 - 1e-6)) == Approx(398.1).epsilon(1e-3));
        CHECK(photochemical(480.0, 100.0) == Approx(398.1).epsilon(1e-3));
        CHECK(photochemical(480.0, 100.0 * (1.0 + 1e-6)) == Approx(398.1).epsilon(1e-3));
        // check-values.md K15: t_x = 10 C3 s equals the EU visible T1 formula 10 * 10^(0.02 (lambda - 450)) s at
        // every lambda in 450-500 nm; at t_x the photochemical 100 C3 and the thermal 10 W/m^2 * t_x meet
        for (const double lambda : {455.0, 465.0, 475.0, 488.0, 495.0}) {
            INFO(lambda << " nm");
            const double tx = 10.0 * std::pow(10.0, 0.02 * (lambda - 450.0));
            CHECK(tx == Approx(10.0 * factors::c3(lambda)).epsilon(1e-9));
            CHECK(photochemical(lambda, tx) == Approx(100.0 * factors::c3(lambda)).epsilon(1e-3));
            CHECK(thermal(lambda, tx) == Approx(100.0 * factors::c3(lambda)).epsilon(1e-3));
        }
        // check-values.md K15: at 500 nm, 100 s
        CHECK(photochemical(500.0, 100.0) == Approx(1000.0).epsilon(1e-3));
        CHECK(thermal(500.0, 100.0) == Approx(1000.0).epsilon(1e-3));
    }
}

TEST_CASE("C5 at its bounds (K17)", "[limits][factors][c5][K17]")
{
    // check-values.md K17: 40^-0.25 = 0.3976; 625^-0.25 = 0.2000; 5 * 625^-0.25 = 1.000 (continuous)
    // exposure-limits.md section 4.6 table, with alpha_max = 100 mrad here:
    //   alpha <= 5 mrad: N <= 625 -> 1; N > 625 -> 5 N^-0.25
    //   5 mrad < alpha <= alpha_max: N <= 40 -> N^-0.25; N > 40 -> 0.4
    //   alpha > alpha_max: N <= 625 -> N^-0.25; N > 625 -> 0.2
    constexpr double alphaMax = 0.1;
    struct C5Case {
        double n;
        double small;  // alpha = 1 mrad
        double medium; // alpha = 50 mrad
        double large;  // alpha = 200 mrad
    };
    // hand computation: 39^-0.25 = 0.4002, 41^-0.25 = 0.3952, 624^-0.25 = 0.20008, 5 * 626^-0.25 = 0.99960
    constexpr C5Case cases[] = {
        {39.0, 1.0, 0.4002, 0.4002}, {40.0, 1.0, 0.3976, 0.3976}, {41.0, 1.0, 0.4, 0.3952},
        {624.0, 1.0, 0.4, 0.2001},   {625.0, 1.0, 0.4, 0.2000},   {626.0, 0.9996, 0.4, 0.2},
    };
    for (const C5Case& c : cases) {
        INFO("N = " << c.n);
        CHECK(factors::c5Edition(c.n, 1e-3, alphaMax) == Approx(c.small).epsilon(1e-3));
        CHECK(factors::c5Edition(c.n, 50e-3, alphaMax) == Approx(c.medium).epsilon(1e-3));
        CHECK(factors::c5Edition(c.n, 0.2, alphaMax) == Approx(c.large).epsilon(1e-3));
        // exposure-limits.md section 4.7: the conservative C5 is N^-0.25 for every alpha and N
        CHECK(factors::c5Conservative(c.n) == Approx(std::pow(c.n, -0.25)).epsilon(1e-9));
    }
    // check-values.md K17 values themselves
    CHECK(factors::c5Conservative(40.0) == Approx(0.3976).epsilon(1e-3));
    CHECK(factors::c5Conservative(625.0) == Approx(0.2000).epsilon(1e-3));
    CHECK(factors::c5Edition(625.0 * (1.0 + 1e-9), 1e-3, alphaMax) == Approx(1.000).epsilon(1e-3));
    // exposure-limits.md section 4.6: the branch limits are inclusive (alpha <= 5 mrad, alpha <= alpha_max)
    CHECK(factors::c5Edition(1000.0, 5e-3, alphaMax) == Approx(5.0 * std::pow(1000.0, -0.25)).epsilon(1e-9));
    CHECK(factors::c5Edition(1000.0, alphaMax, alphaMax) == Approx(0.4).epsilon(1e-9));
    // check-values.md C8 / C9 / C10 edition values: 5 N^-0.25 = 0.5 (N = 1e4), 0.1330 (N = 2e6), 0.334 (N = 5e4)
    CHECK(factors::c5Edition(1e4, 0.0, 5e-3) == Approx(0.5).epsilon(1e-3));
    CHECK(factors::c5Edition(2e6, 0.0, 5e-3) == Approx(0.1330).epsilon(1e-3));
    CHECK(factors::c5Edition(5e4, 0.0, 5e-3) == Approx(0.334).margin(0.0005)); // three figures: +-0.0005
    // exposure-limits.md section 4.7 item 1: every candidate C5 is >= N^-0.25 where it applies
    for (const double n : {1.0, 2.0, 10.0, 39.0, 40.0, 41.0, 100.0, 624.0, 625.0, 626.0, 1e4, 1e8}) {
        for (const double alpha : {0.0, 3e-3, 5e-3, 20e-3, 0.1, 0.2}) {
            INFO("N = " << n << ", alpha = " << alpha);
            CHECK(factors::c5Edition(n, alpha, alphaMax) >= factors::c5Conservative(n) * (1.0 - 1e-12));
        }
    }
}

TEST_CASE("Ti by wavelength and rule set", "[limits][factors][ti]")
{
    // exposure-limits.md section 2.3
    CHECK(factors::ti(set2007(), 532.0) == Approx(18e-6).epsilon(1e-9));
    CHECK(factors::ti(set2014(), 532.0) == Approx(5e-6).epsilon(1e-9));
    CHECK(factors::ti(set2007(), 800.0) == Approx(18e-6).epsilon(1e-9));
    CHECK(factors::ti(set2014(), 800.0) == Approx(5e-6).epsilon(1e-9));
    CHECK(factors::ti(set2007(), 1064.0) == Approx(50e-6).epsilon(1e-9));
    CHECK(factors::ti(set2014(), 1064.0) == Approx(13e-6).epsilon(1e-9));
    for (const RuleSet* set : {&set2007(), &set2014()}) {
        CHECK(factors::ti(*set, 1450.0) == Approx(1e-3).epsilon(1e-9));
        CHECK(factors::ti(*set, 1600.0) == Approx(10.0).epsilon(1e-9));
        CHECK(factors::ti(*set, 2000.0) == Approx(1e-3).epsilon(1e-9));
        CHECK(factors::ti(*set, 10600.0) == Approx(100e-9).epsilon(1e-9));
        CHECK(factors::ti(*set, 350.0) == 0.0); // no Ti below 400 nm
    }
}

TEST_CASE("Limiting apertures (K20, K21)", "[limits][factors][aperture][K20][K21]")
{
    // exposure-limits.md section 2.4, column "Beamwarden uses"
    for (const double t : {1e-9, 1.0, 100.0}) {
        INFO(t << " s");
        CHECK(factors::apertureDiameter(Target::Eye, 250.0, t) == Approx(1e-3).epsilon(1e-9)); // 1 mm for all t
        CHECK(factors::apertureDiameter(Target::Skin, 250.0, t) == Approx(3.5e-3).epsilon(1e-9));
        CHECK(factors::apertureDiameter(Target::Eye, 633.0, t) == Approx(7e-3).epsilon(1e-9));
        CHECK(factors::apertureDiameter(Target::Skin, 633.0, t) == Approx(3.5e-3).epsilon(1e-9));
        CHECK(factors::apertureDiameter(Target::Skin, 2000.0, t) == Approx(3.5e-3).epsilon(1e-9));
        CHECK(factors::apertureDiameter(Target::Eye, 5e5, t) == Approx(11e-3).epsilon(1e-9));
        CHECK(factors::apertureDiameter(Target::Skin, 5e5, t) == Approx(11e-3).epsilon(1e-9));
    }
    // 1400 nm - 1e5 nm eye: 1 mm (t <= 0.35 s); 1.5 t^0.375 mm (0.35 s < t < 10 s); 3.5 mm (t >= 10 s)
    CHECK(factors::apertureDiameter(Target::Eye, 2000.0, 1e-3) == Approx(1e-3).epsilon(1e-9));
    CHECK(factors::apertureDiameter(Target::Eye, 2000.0, 0.35) == Approx(1e-3).epsilon(1e-9));
    // check-values.md K20: 1.5 * 0.35^0.375 = 1.012 mm just above 0.35 s
    CHECK(factors::apertureDiameter(Target::Eye, 2000.0, 0.35 * (1.0 + 1e-6)) == Approx(1.012e-3).epsilon(1e-3));
    CHECK(factors::apertureDiameter(Target::Eye, 2000.0, 5.0) == Approx(2.743e-3).epsilon(1e-3)); // 1.5 * 5^0.375
    // check-values.md K20: 1.5 * 10^0.375 = 3.557 mm just below 10 s -> 3.5 mm at 10 s (step -1.6 %)
    CHECK(factors::apertureDiameter(Target::Eye, 10600.0, 10.0 * (1.0 - 1e-6)) == Approx(3.557e-3).epsilon(1e-3));
    CHECK(factors::apertureDiameter(Target::Eye, 10600.0, 10.0) == Approx(3.5e-3).epsilon(1e-9));
    CHECK(factors::apertureDiameter(Target::Eye, 10600.0, 100.0) == Approx(3.5e-3).epsilon(1e-9)); // check-values C38
    // check-values.md K21: areas 1 mm: 7.854e-7 m^2; 3.5 mm: 9.621e-6; 7 mm: 3.848e-5; 11 mm: 9.503e-5
    CHECK(area(factors::apertureDiameter(Target::Eye, 250.0, 1.0)) == Approx(7.854e-7).epsilon(1e-3));
    CHECK(area(factors::apertureDiameter(Target::Eye, 10600.0, 100.0)) == Approx(9.621e-6).epsilon(1e-3));
    CHECK(area(factors::apertureDiameter(Target::Eye, 633.0, 1.0)) == Approx(3.848e-5).epsilon(1e-3));
    CHECK(area(factors::apertureDiameter(Target::Eye, 5e5, 1.0)) == Approx(9.503e-5).epsilon(1e-3));
    // the engine reports the same aperture with its governing term (mpe.hpp LimitTerm::aperture)
    const LimitSet visible = evaluateLimits(set2007(), Target::Eye, Wavelength::fromSi(633.0 / 1e9),
                                            Duration::fromSi(0.25), Angle::fromSi(0.0), Area::fromSi(0.0));
    CHECK(visible.governingTerm().aperture.si() == Approx(7e-3).epsilon(1e-9));
    const LimitSet co2 = evaluateLimits(set2014(), Target::Eye, Wavelength::fromSi(10600.0 / 1e9),
                                        Duration::fromSi(100.0), Angle::fromSi(0.0), Area::fromSi(0.0));
    CHECK(co2.governingTerm().aperture.si() == Approx(3.5e-3).epsilon(1e-9));
}
