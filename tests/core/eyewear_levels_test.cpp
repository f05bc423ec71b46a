// EN 207 protection levels: the density each level withstands per mode and wavelength column
// (hazard-and-eyewear.md section 6.2), the inverse (required level), the mode a pulse duration falls in (section 6.1),
// and check-values.md P14, P15, P16, K25 and C45.
// Level values are powers of ten times 1, 1.5, 3 or 5: "exact" is checked with a relative 1e-12, which only absorbs
// the rounding of a double power of ten. Level numbers are compared exactly.
#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <vector>

#include "beamwarden/eyewear/levels.hpp"

using namespace beamwarden::eyewear;

namespace {

constexpr double kExact = 1e-12; // relative: floating-point rounding of 10^k only

// One wavelength well inside each column of the section 6.2 table: 180-315 nm, > 315-1400 nm, > 1400 nm - 1000 um.
constexpr double kUv = 266.0;
constexpr double kVisNir = 1064.0;
constexpr double kFarIr = 10600.0;

// The section 6.2 formula table, written out here from hazard-and-eyewear.md section 6.2 for level n.
double formulaValue(Mode mode, int column, int n)
{
    const double p = static_cast<double>(n);
    switch (mode) {
    case Mode::D:
        return column == 0 ? std::pow(10.0, p - 3) : column == 1 ? std::pow(10.0, p + 1) : std::pow(10.0, p + 3);
    case Mode::I:
    case Mode::R:
        return column == 0   ? 3.0 * std::pow(10.0, p + 1)
               : column == 1 ? 5.0 * std::pow(10.0, p - 3)
                             : std::pow(10.0, p + 2);
    case Mode::M:
        return column == 0   ? 3.0 * std::pow(10.0, p + 10)
               : column == 1 ? 1.5 * std::pow(10.0, p - 4)
                             : std::pow(10.0, p + 11);
    }
    return 0.0;
}

constexpr Mode kModes[] = {Mode::D, Mode::I, Mode::R, Mode::M};
constexpr double kColumns[] = {kUv, kVisNir, kFarIr};

bool hasMode(const std::vector<Mode>& modes, Mode mode)
{
    return std::find(modes.begin(), modes.end(), mode) != modes.end();
}

} // namespace

TEST_CASE("eyewear levels: section 6.2 formulas at every level, mode and column", "[eyewear][levels]")
{
    for (const Mode mode : kModes) {
        for (int column = 0; column < 3; ++column) {
            for (int n = 1; n <= 10; ++n) {
                INFO("mode " << letter(mode) << ", column " << column << ", LB" << n);
                // hazard-and-eyewear.md §6.2 formula table (EN 207:2017, verified H3; exact)
                CHECK(levelValue(mode, kColumns[column], n) == Approx(formulaValue(mode, column, n)).epsilon(kExact));
            }
        }
    }
}

TEST_CASE("eyewear levels: spot values from the printed section 6.2 table", "[eyewear][levels]")
{
    // hazard-and-eyewear.md §6.2 table, LB1 row: D 1e-2 / 1e2 / 1e4; I,R 3e2 / 5e-2 / 1e3; M 3e11 / 1.5e-3 / 1e12
    CHECK(levelValue(Mode::D, kUv, 1) == Approx(1e-2).epsilon(kExact));
    CHECK(levelValue(Mode::D, kVisNir, 1) == Approx(1e2).epsilon(kExact));
    CHECK(levelValue(Mode::D, kFarIr, 1) == Approx(1e4).epsilon(kExact));
    CHECK(levelValue(Mode::I, kUv, 1) == Approx(3e2).epsilon(kExact));
    CHECK(levelValue(Mode::R, kVisNir, 1) == Approx(5e-2).epsilon(kExact));
    CHECK(levelValue(Mode::I, kFarIr, 1) == Approx(1e3).epsilon(kExact));
    CHECK(levelValue(Mode::M, kUv, 1) == Approx(3e11).epsilon(kExact));
    CHECK(levelValue(Mode::M, kVisNir, 1) == Approx(1.5e-3).epsilon(kExact));
    CHECK(levelValue(Mode::M, kFarIr, 1) == Approx(1e12).epsilon(kExact));
    // hazard-and-eyewear.md §6.2 table, LB4 row: D 10 / 1e5 / 1e7; I,R 3e5 / 50 / 1e6; M 3e14 / 1.5 / 1e15
    CHECK(levelValue(Mode::D, kUv, 4) == Approx(10.0).epsilon(kExact));
    CHECK(levelValue(Mode::D, kVisNir, 4) == Approx(1e5).epsilon(kExact));
    CHECK(levelValue(Mode::D, kFarIr, 4) == Approx(1e7).epsilon(kExact));
    CHECK(levelValue(Mode::R, kUv, 4) == Approx(3e5).epsilon(kExact));
    CHECK(levelValue(Mode::I, kVisNir, 4) == Approx(50.0).epsilon(kExact));
    CHECK(levelValue(Mode::R, kFarIr, 4) == Approx(1e6).epsilon(kExact));
    CHECK(levelValue(Mode::M, kUv, 4) == Approx(3e14).epsilon(kExact));
    CHECK(levelValue(Mode::M, kVisNir, 4) == Approx(1.5).epsilon(kExact));
    CHECK(levelValue(Mode::M, kFarIr, 4) == Approx(1e15).epsilon(kExact));
    // hazard-and-eyewear.md §6.2 table, LB7 row: D 1e4 / 1e8 / 1e10; I,R 3e8 / 5e4 / 1e9; M 3e17 / 1.5e3 / 1e18
    CHECK(levelValue(Mode::D, kUv, 7) == Approx(1e4).epsilon(kExact));
    CHECK(levelValue(Mode::D, kVisNir, 7) == Approx(1e8).epsilon(kExact));
    CHECK(levelValue(Mode::D, kFarIr, 7) == Approx(1e10).epsilon(kExact));
    CHECK(levelValue(Mode::I, kUv, 7) == Approx(3e8).epsilon(kExact));
    CHECK(levelValue(Mode::R, kVisNir, 7) == Approx(5e4).epsilon(kExact));
    CHECK(levelValue(Mode::I, kFarIr, 7) == Approx(1e9).epsilon(kExact));
    CHECK(levelValue(Mode::M, kUv, 7) == Approx(3e17).epsilon(kExact));
    CHECK(levelValue(Mode::M, kVisNir, 7) == Approx(1.5e3).epsilon(kExact));
    CHECK(levelValue(Mode::M, kFarIr, 7) == Approx(1e18).epsilon(kExact));
    // hazard-and-eyewear.md §6.2 table, LB10 row: D 1e7 / 1e11 / 1e13; I,R 3e11 / 5e7 / 1e12; M 3e20 / 1.5e6 / 1e21
    CHECK(levelValue(Mode::D, kUv, 10) == Approx(1e7).epsilon(kExact));
    CHECK(levelValue(Mode::D, kVisNir, 10) == Approx(1e11).epsilon(kExact));
    CHECK(levelValue(Mode::D, kFarIr, 10) == Approx(1e13).epsilon(kExact));
    CHECK(levelValue(Mode::R, kUv, 10) == Approx(3e11).epsilon(kExact));
    CHECK(levelValue(Mode::I, kVisNir, 10) == Approx(5e7).epsilon(kExact));
    CHECK(levelValue(Mode::R, kFarIr, 10) == Approx(1e12).epsilon(kExact));
    CHECK(levelValue(Mode::M, kUv, 10) == Approx(3e20).epsilon(kExact));
    CHECK(levelValue(Mode::M, kVisNir, 10) == Approx(1.5e6).epsilon(kExact));
    CHECK(levelValue(Mode::M, kFarIr, 10) == Approx(1e21).epsilon(kExact));
}

TEST_CASE("eyewear levels: column edges at 315 nm and 1400 nm", "[eyewear][levels]")
{
    // hazard-and-eyewear.md §6.2 column heads "180-315 nm | > 315-1400 nm | > 1400 nm": 315 nm itself is in the UV
    // column, 1400 nm itself in the 315-1400 nm column (D, LB1: 1e-2 / 1e2 / 1e4 W/m2; exact)
    CHECK(levelValue(Mode::D, 315.0, 1) == Approx(1e-2).epsilon(kExact));
    CHECK(levelValue(Mode::D, 316.0, 1) == Approx(1e2).epsilon(kExact));
    CHECK(levelValue(Mode::D, 1400.0, 1) == Approx(1e2).epsilon(kExact));
    CHECK(levelValue(Mode::D, 1401.0, 1) == Approx(1e4).epsilon(kExact));
    // the columns reach the table's ends: 180 nm and 1000 um (= 1e6 nm), §6.2 (D LB1 1e-2 and 1e4 W/m2; exact)
    CHECK(levelValue(Mode::D, 180.0, 1) == Approx(1e-2).epsilon(kExact));
    CHECK(levelValue(Mode::D, 1e6, 1) == Approx(1e4).epsilon(kExact));
}

TEST_CASE("eyewear levels: P14 and K25, the n = 0 values are DGUV's base values", "[eyewear][levels]")
{
    // check-values.md P14 (published: DGUV 203-042 Annex 6 Table A6.1; exact): D 0.001 / 10 / 1000 W/m2;
    // I,R 30 / 0.005 / 100 J/m2; M 3e10 W/m2, 1.5e-4 J/m2, 1e11 W/m2
    const double expected[4][3] = {{1e-3, 10.0, 1e3}, {30.0, 5e-3, 100.0}, {30.0, 5e-3, 100.0}, {3e10, 1.5e-4, 1e11}};
    for (std::size_t m = 0; m < 4; ++m) {
        for (std::size_t c = 0; c < 3; ++c) {
            INFO("mode " << letter(kModes[m]) << ", column " << c);
            // check-values.md P14 (exact): levelValue accepts n = 0 and gives the base value
            CHECK(levelValue(kModes[m], kColumns[c], 0) == Approx(expected[m][c]).epsilon(kExact));
            // check-values.md P14 (exact): the same base from the LB1 value, one decade lower (§6.2 formulas 10^n)
            CHECK(levelValue(kModes[m], kColumns[c], 1) / 10.0 == Approx(expected[m][c]).epsilon(kExact));
        }
    }
    // check-values.md K25 (consistency; exact): D 315-1400 nm base 10 W/m2 = the long-exposure visible MPE;
    // I,R base 5e-3 J/m2 = the 2007 ns retinal MPE; M base 1.5e-4 J/m2 = the 2007 sub-10 ps retinal MPE
    CHECK(levelValue(Mode::D, 532.0, 0) == Approx(10.0).epsilon(kExact));
    CHECK(levelValue(Mode::R, 532.0, 0) == Approx(5e-3).epsilon(kExact));
    CHECK(levelValue(Mode::I, 532.0, 0) == Approx(5e-3).epsilon(kExact));
    CHECK(levelValue(Mode::M, 532.0, 0) == Approx(1.5e-4).epsilon(kExact));
}

TEST_CASE("eyewear levels: P15 and P16, published single levels", "[eyewear][levels]")
{
    // check-values.md P15 (published, Optique-Ingenieur exercise; exact): M, 315-1400 nm, LB7 = 1.5e3 J/m2
    CHECK(levelValue(Mode::M, 800.0, 7) == Approx(1.5e3).epsilon(kExact));
    // check-values.md P16 (published, secondary; exact): D, 1064 nm, LB6 withstands "up to 1e7" W/m2
    CHECK(levelValue(Mode::D, 1064.0, 6) == Approx(1e7).epsilon(kExact));
}

TEST_CASE("eyewear levels: required level inverts the table, a level's value is its maximum", "[eyewear][levels]")
{
    for (const Mode mode : kModes) {
        for (int column = 0; column < 3; ++column) {
            for (int n = 1; n <= 10; ++n) {
                INFO("mode " << letter(mode) << ", column " << column << ", LB" << n);
                const double value = formulaValue(mode, column, n); // hazard-and-eyewear.md §6.2 formula
                // hazard-and-eyewear.md §6.2 "an exposure exactly equal to a level's value belongs to that level"
                // (exact level number)
                CHECK(requiredLevelFor(mode, kColumns[column], value) == n);
                // §6.2: 1 % above the value needs the next level, or "exceeds LB10" past LB10 (exact level number)
                CHECK(requiredLevelFor(mode, kColumns[column], value * 1.01) == (n < 10 ? n + 1 : kExceedsLb10));
                // §6.2: half-way between LB n-1 and LB n (in decades) needs LB n (exact level number)
                CHECK(requiredLevelFor(mode, kColumns[column], value / std::sqrt(10.0)) == n);
            }
            // §6.2 "n = ceil(value), at least 1": a density far below LB1 still requires LB1 (exact level number)
            CHECK(requiredLevelFor(mode, kColumns[column], formulaValue(mode, column, 1) * 1e-6) == 1);
        }
    }
}

TEST_CASE("eyewear levels: C45 level formula edges", "[eyewear][levels]")
{
    // check-values.md C45 (computed from verified formulas; exact level numbers)
    // D 315-1400 nm, E = 1e5 W/m2 exactly -> LB4 (a level's value is its maximum)
    CHECK(requiredLevelFor(Mode::D, 1064.0, 1e5) == 4);
    CHECK(requiredLevelFor(Mode::D, 532.0, 1e5) == 4);
    // E = 1e13 W/m2 -> "exceeds LB10"
    CHECK(requiredLevelFor(Mode::D, 1064.0, 1e13) == kExceedsLb10);
    CHECK(kExceedsLb10 > 10);
    // I,R 315-1400 nm, H = 5 J/m2 -> LB3
    CHECK(requiredLevelFor(Mode::I, 1064.0, 5.0) == 3);
    CHECK(requiredLevelFor(Mode::R, 1064.0, 5.0) == 3);
}

TEST_CASE("eyewear levels: the pulsed mode of a pulse duration, both modes on a boundary", "[eyewear][levels]")
{
    // hazard-and-eyewear.md §6.1: I > 1 us to 0.25 s, R > 1 ns to 1 us, M < 1 ns; a duration exactly on a boundary
    // is evaluated in both modes (Beamwarden choice)
    const auto at1ns = pulsedModesFor(1e-9);
    CHECK(hasMode(at1ns, Mode::R));
    CHECK(hasMode(at1ns, Mode::M));
    CHECK_FALSE(hasMode(at1ns, Mode::I));
    const auto at1us = pulsedModesFor(1e-6);
    CHECK(hasMode(at1us, Mode::I));
    CHECK(hasMode(at1us, Mode::R));
    CHECK_FALSE(hasMode(at1us, Mode::M));
    // §6.1, inside each mode's range: exactly one mode
    CHECK(pulsedModesFor(50e-15) == std::vector<Mode>{Mode::M});
    CHECK(pulsedModesFor(0.5e-9) == std::vector<Mode>{Mode::M});
    CHECK(pulsedModesFor(10e-9) == std::vector<Mode>{Mode::R});
    CHECK(pulsedModesFor(100e-6) == std::vector<Mode>{Mode::I});
    CHECK(pulsedModesFor(20e-3) == std::vector<Mode>{Mode::I});
    // §6.1: I runs to 0.25 s inclusive
    CHECK(hasMode(pulsedModesFor(0.25), Mode::I));
}
