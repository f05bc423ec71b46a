// Several wavelengths at once (exposure-limits.md section 6.2): lines acting on the same tissue by the same
// mechanism add, sum(X_i / MPE_i) <= 1, with the additivity table (A = eye, S = skin; layout verified L1, cells
// reconstructed). Expected sums and shares are computed by hand from that rule; tolerance relative 1e-9 (sums of a
// few given ratios, exact to rounding) unless a line says otherwise.
#include <catch2/catch.hpp>

#include <vector>

#include "beamwarden/limits/additivity.hpp"
#include "beamwarden/units.hpp"

using namespace beamwarden::limits;
using beamwarden::units::Wavelength;

namespace {

constexpr SpectralRegion kUvC = SpectralRegion::Uv180To315;
constexpr SpectralRegion kUvA = SpectralRegion::Uv315To400;
constexpr SpectralRegion kVisNir = SpectralRegion::Visible400To1400;
constexpr SpectralRegion kIr = SpectralRegion::Infrared1400To1mm;

LineRatio line(double lambda_nm, double ratio)
{
    LineRatio l;
    l.wavelength = Wavelength::fromSi(lambda_nm / 1e9);
    l.exposureOverMpe = ratio;
    return l;
}

} // namespace

TEST_CASE("Spectral regions of the additivity table", "[limits][additivity]")
{
    // exposure-limits.md section 6.2, table columns: 180-315 nm, 315-400 nm, 400-1400 nm, 1400 nm-1 mm
    CHECK(spectralRegion(Wavelength::fromSi(193.0 / 1e9)) == kUvC);
    CHECK(spectralRegion(Wavelength::fromSi(267.0 / 1e9)) == kUvC);
    CHECK(spectralRegion(Wavelength::fromSi(351.0 / 1e9)) == kUvA);
    CHECK(spectralRegion(Wavelength::fromSi(532.0 / 1e9)) == kVisNir);
    CHECK(spectralRegion(Wavelength::fromSi(1300.0 / 1e9)) == kVisNir);
    CHECK(spectralRegion(Wavelength::fromSi(2000.0 / 1e9)) == kIr);
    CHECK(spectralRegion(Wavelength::fromSi(10600.0 / 1e9)) == kIr);
}

TEST_CASE("The additivity table, eye and skin", "[limits][additivity]")
{
    // exposure-limits.md section 6.2 additivity table (A = eye, S = skin), symmetric:
    //                180-315  315-400  400-1400  1400-1mm
    //   180-315       A,S      A,S       -         -
    //   315-400       A,S      A,S       S        A,S
    //   400-1400       -        S       A,S        S
    //   1400-1mm       -       A,S       S        A,S
    struct Cell {
        SpectralRegion a;
        SpectralRegion b;
        bool eye;
        bool skin;
    };
    constexpr Cell cells[] = {
        {kUvC, kUvC, true, true},  {kUvC, kUvA, true, true},       {kUvC, kVisNir, false, false},
        {kUvC, kIr, false, false}, {kUvA, kUvA, true, true},       {kUvA, kVisNir, false, true},
        {kUvA, kIr, true, true},   {kVisNir, kVisNir, true, true}, {kVisNir, kIr, false, true},
        {kIr, kIr, true, true},
    };
    for (const Cell& cell : cells) {
        INFO(static_cast<int>(cell.a) << " x " << static_cast<int>(cell.b));
        CHECK(additive(Target::Eye, cell.a, cell.b) == cell.eye);
        CHECK(additive(Target::Eye, cell.b, cell.a) == cell.eye);
        CHECK(additive(Target::Skin, cell.a, cell.b) == cell.skin);
        CHECK(additive(Target::Skin, cell.b, cell.a) == cell.skin);
    }
}

TEST_CASE("Ratios add over lines that act alike", "[limits][additivity]")
{
    // lines: 250 nm 0.2, 350 nm 0.3, 800 nm 0.4, 2000 nm 0.1 (X_i / MPE_i)
    const std::vector<LineRatio> lines = {line(250, 0.2), line(350, 0.3), line(800, 0.4), line(2000, 0.1)};
    SECTION("eye")
    {
        const AdditivityResult r = combineLines(Target::Eye, lines);
        REQUIRE(r.combinedRatio.size() == 4);
        REQUIRE(r.share.size() == 4);
        // by the table: 250 adds with 250, 350 -> 0.5; 350 adds with 250, 350, 2000 -> 0.6; 800 alone -> 0.4;
        // 2000 adds with 350, 2000 -> 0.4
        CHECK(r.combinedRatio[0] == Approx(0.5).epsilon(1e-9));
        CHECK(r.combinedRatio[1] == Approx(0.6).epsilon(1e-9));
        CHECK(r.combinedRatio[2] == Approx(0.4).epsilon(1e-9));
        CHECK(r.combinedRatio[3] == Approx(0.4).epsilon(1e-9));
        CHECK(r.governingSum == Approx(0.6).epsilon(1e-9));
        CHECK(r.governingLine == 1);
        // shares of the governing sum 0.6: 0.2/0.6, 0.3/0.6, 0 (does not add with 350 nm for the eye), 0.1/0.6
        CHECK(r.share[0] == Approx(0.2 / 0.6).epsilon(1e-9));
        CHECK(r.share[1] == Approx(0.5).epsilon(1e-9));
        CHECK(r.share[2] == Approx(0.0).margin(1e-12));
        CHECK(r.share[3] == Approx(0.1 / 0.6).epsilon(1e-9));
    }
    SECTION("skin")
    {
        const AdditivityResult r = combineLines(Target::Skin, lines);
        REQUIRE(r.combinedRatio.size() == 4);
        REQUIRE(r.share.size() == 4);
        // by the table: 250 adds with 250, 350 -> 0.5; 350 adds with all -> 1.0; 800 with 350, 800, 2000 -> 0.8;
        // 2000 with 350, 800, 2000 -> 0.8
        CHECK(r.combinedRatio[0] == Approx(0.5).epsilon(1e-9));
        CHECK(r.combinedRatio[1] == Approx(1.0).epsilon(1e-9));
        CHECK(r.combinedRatio[2] == Approx(0.8).epsilon(1e-9));
        CHECK(r.combinedRatio[3] == Approx(0.8).epsilon(1e-9));
        CHECK(r.governingSum == Approx(1.0).epsilon(1e-9));
        CHECK(r.governingLine == 1);
        CHECK(r.share[0] == Approx(0.2).epsilon(1e-9));
        CHECK(r.share[1] == Approx(0.3).epsilon(1e-9));
        CHECK(r.share[2] == Approx(0.4).epsilon(1e-9));
        CHECK(r.share[3] == Approx(0.1).epsilon(1e-9));
    }
    SECTION("over the limit when the sum exceeds 1")
    {
        // exposure-limits.md section 6.2: sum X_i / MPE_i <= 1; 532 nm 0.7 and 1064 nm 0.6 both 400-1400 nm -> 1.3
        const AdditivityResult r = combineLines(Target::Eye, {line(532, 0.7), line(1064, 0.6)});
        CHECK(r.governingSum == Approx(1.3).epsilon(1e-9));
        REQUIRE(r.share.size() == 2);
        CHECK(r.share[0] == Approx(0.7 / 1.3).epsilon(1e-9));
        CHECK(r.share[1] == Approx(0.6 / 1.3).epsilon(1e-9));
    }
    SECTION("one line alone")
    {
        const AdditivityResult r = combineLines(Target::Eye, {line(10600, 0.25)});
        REQUIRE(r.combinedRatio.size() == 1);
        CHECK(r.combinedRatio[0] == Approx(0.25).epsilon(1e-9));
        CHECK(r.governingSum == Approx(0.25).epsilon(1e-9));
        CHECK(r.governingLine == 0);
        CHECK(r.share[0] == Approx(1.0).epsilon(1e-9));
    }
}
