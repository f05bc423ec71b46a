// EN 208 alignment eyewear (hazard-and-eyewear.md section 7): RB levels for visible beams, check-values.md C46, C47,
// P17, and the marking "1 W 2x10^-4 J 532 RB3". Power and pulse energy are taken through a 7 mm aperture; pulses
// 1 ns - 2e-4 s are corrected by N^(1/4) with N = pulses in 10 s.
// Tolerances: computed values relative 1e-3 (check-values.md section 0); P17 5 %; level numbers exact.
#include <catch2/catch.hpp>

#include <cmath>
#include <string>

#include "beamwarden/eyewear/en208.hpp"
#include "beamwarden/hazard/hazard.hpp"
#include "beamwarden/units.hpp"

using namespace beamwarden;
using namespace beamwarden::eyewear;
using namespace beamwarden::units::literals;
using hazard::HazardRequest;

namespace {

constexpr double kComputed = 1e-3;  // check-values.md section 0
constexpr double kA7_m2 = 3.848e-5; // check-values.md section 0 conventions: 7 mm pupil area

HazardRequest visibleCw(units::Power power, units::Duration exposure = units::Duration{})
{
    HazardRequest request;
    request.emission.spectrum = model::singleLine(532_nm);
    request.emission.pulsed = false;
    request.emission.averagePower = power;
    request.beam.diameter = 2_mm; // smaller than 7 mm: all the power passes the aperture
    request.beam.divergence = units::Angle::fromSi(0.0);
    request.exposureCase.exposure = exposure;
    return request;
}

AlignmentRequirement alignment(const HazardRequest& request)
{
    const auto result = requiredAlignmentLevel(request);
    INFO((result ? std::string{"accepted"} : result.error().message()));
    REQUIRE(result.has_value());
    return *result;
}

En208Marking parsed208(const std::string& text)
{
    const auto result = parseEn208(text);
    INFO("marking '" << text << "': " << (result ? std::string{"accepted"} : result.error().message()));
    REQUIRE(result.has_value());
    return *result;
}

} // namespace

TEST_CASE("eyewear EN 208: C46 532 nm CW 50 mW needs RB2", "[eyewear][en208]")
{
    const AlignmentRequirement r = alignment(visibleCw(50_mW));
    CHECK(r.visible);
    // check-values.md C46: beam < 7 mm, the whole 50 mW through 7 mm (computed; relative 1e-3)
    CHECK(r.powerThrough7mm == Approx(0.05).epsilon(kComputed));
    // check-values.md C46 (computed from reconstructed formulas): n = ceil(log10 0.05 + 3) = ceil(1.70) -> RB2
    CHECK(r.level == 2);
    // check-values.md C46: <= 0.5 mW behind the filter (RB2 tau <= 1e-2, hazard-and-eyewear.md §7), which meets
    // DGUV's 0.6 mW (our arithmetic on the requirement's power)
    const double behind = r.powerThrough7mm * std::pow(10.0, -r.level);
    CHECK(behind == Approx(0.5e-3).epsilon(kComputed));
    CHECK(behind <= 0.6e-3);
}

TEST_CASE("eyewear EN 208: C47 532 nm pulses need RB3", "[eyewear][en208]")
{
    HazardRequest request;
    request.emission.spectrum = model::singleLine(532_nm);
    request.emission.pulsed = true;
    request.emission.pulseEnergy = 10_uJ;
    request.emission.pulseDuration = 10_ns;
    request.emission.prf = 100_Hz;
    request.beam.diameter = 2_mm;
    request.beam.divergence = units::Angle::fromSi(0.0);
    const AlignmentRequirement r = alignment(request);
    // check-values.md C47 (computed from reconstructed formulas): N(10 s) = 1000 -> Q' = 5.623e-5 J
    CHECK(r.correctedPulseEnergy == Approx(5.623e-5).epsilon(kComputed));
    // check-values.md C47: mean 1 mW through 7 mm (relative 1e-3)
    CHECK(r.powerThrough7mm == Approx(1e-3).epsilon(kComputed));
    // check-values.md C47: n = ceil(2.45) -> RB3 from the pulses; mean 1 mW -> RB1; required RB3 (exact)
    CHECK(r.level == 3);
    CHECK(alignment(visibleCw(1_mW)).level == 1);
}

TEST_CASE("eyewear EN 208: P17 the Class 2 level behind the filter", "[eyewear][en208]")
{
    // check-values.md P17 (published, DGUV 203-042 §2.2): 1 mW behind the filter (0.25 s), <= 0.6 mW (2 s).
    // A beam of 1 mW or 0.6 mW needs the least filter, RB1 (hazard-and-eyewear.md §7 pattern: n = ceil(log10 P + 3),
    // at least 1; exact level numbers)
    CHECK(alignment(visibleCw(1_mW)).level == 1);
    CHECK(alignment(visibleCw(0.6_mW)).level == 1);
    // hazard-and-eyewear.md §7 table: RB1 up to 0.01 W, RB2 up to 0.1 W (secondary); an RB level's value is its
    // maximum (exact level numbers)
    CHECK(alignment(visibleCw(10_mW)).level == 1);
    CHECK(alignment(visibleCw(11_mW)).level == 2);
    CHECK(alignment(visibleCw(100_mW)).level == 2);
    CHECK(alignment(visibleCw(1_W)).level == 3);
    // check-values.md P17: MPE(0.25 s) A7 = 0.980 mW; MPE(2 s) A7 = 0.583 mW (tolerance 5 %)
    for (const auto& [exposure, expected_W] : {std::pair{0.25_s, 0.980e-3}, std::pair{2_s, 0.583e-3}}) {
        const auto evaluated = hazard::evaluateHazard(visibleCw(1_mW, exposure));
        REQUIRE(evaluated.has_value());
        CHECK(evaluated->limit * kA7_m2 == Approx(expected_W).epsilon(0.05));
    }
}

TEST_CASE("eyewear EN 208: outside 400-700 nm EN 208 does not apply", "[eyewear][en208]")
{
    // hazard-and-eyewear.md §7: "Scope: 400-700 nm only"
    HazardRequest request = visibleCw(1_mW);
    request.emission.spectrum = model::singleLine(1064_nm);
    CHECK_FALSE(alignment(request).visible);
    CHECK(alignment(visibleCw(1_mW)).visible);
}

TEST_CASE("eyewear EN 208: marking 1 W 2x10^-4 J 532 RB3 parses and prints back", "[eyewear][en208]")
{
    // hazard-and-eyewear.md §7 marking example "1 W 2x10^-4 J 532 RB3": maximum power, maximum pulse energy,
    // wavelength, RB number (reconstructed); RB3 row: 1 W, 2e-4 J
    const En208Marking m = parsed208("1 W 2x10^-4 J 532 RB3");
    CHECK(m.maxPower_W == Approx(1.0).epsilon(1e-12));
    CHECK(m.maxPulseEnergy_J == Approx(2e-4).epsilon(1e-12));
    REQUIRE(m.wavelengths.size() == 1);
    CHECK(m.wavelengths[0] == WavelengthSpan{532, 532});
    CHECK(m.level == 3);
    const std::string printed = format(m);
    INFO("printed '" << printed << "'");
    CHECK(parsed208(printed) == m);
    CHECK(printed.find("RB3") != std::string::npos);
    CHECK(printed.find("532") != std::string::npos);
}

TEST_CASE("eyewear EN 208: the other marking forms of the contract", "[eyewear][en208]")
{
    // en208.hpp contract forms; §7 RB2 row: 0.1 W, 2e-5 J (exact level number)
    const En208Marking range = parsed208("0.1 W 2e-5 J 630-640 RB2");
    CHECK(range.maxPower_W == Approx(0.1).epsilon(1e-12));
    CHECK(range.maxPulseEnergy_J == Approx(2e-5).epsilon(1e-12));
    REQUIRE(range.wavelengths.size() == 1);
    CHECK(range.wavelengths[0] == WavelengthSpan{630, 640});
    CHECK(range.level == 2);
    CHECK(parsed208(format(range)) == range);
    // power and energy optional
    const En208Marking bare = parsed208("632.8 RB2");
    CHECK(bare.level == 2);
    CHECK(bare.maxPulseEnergy_J == 0.0);
    REQUIRE(bare.wavelengths.size() == 1);
    CHECK(bare.wavelengths[0].from_nm == Approx(632.8).epsilon(1e-12));
    CHECK(parsed208(format(bare)) == bare);
    // not an RB marking
    CHECK_FALSE(parseEn208("").has_value());
    CHECK_FALSE(parseEn208("532 LB3").has_value());
}
