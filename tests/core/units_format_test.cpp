// Printing quantities and reading the printed text back. The expected strings follow from the SI prefix
// definitions (common practice: SI prefixes and unit conversions, e.g. 1 µJ = 10^-6 J, 1 cm² = 10^-4 m²).
#include <catch2/catch.hpp>

#include <cmath>
#include <limits>
#include <random>
#include <string>

#include "beamwarden/units.hpp"

using namespace beamwarden::units;
using namespace beamwarden::units::literals;
using Catch::Matchers::WithinRel;

namespace Catch {
template <typename Tag>
struct StringMaker<beamwarden::units::Quantity<Tag>> {
    static std::string convert(const beamwarden::units::Quantity<Tag>& value)
    {
        return beamwarden::units::format(value, 17);
    }
};
} // namespace Catch

namespace {

template <typename T>
T accepted(const beamwarden::Result<T>& result)
{
    INFO((result ? std::string{"accepted"} : result.error().message()));
    REQUIRE(result.has_value());
    return *result;
}

// Rounding to n significant digits moves a value by at most half a unit in the n-th digit.
double roundingTolerance(int significant)
{
    return 0.5 * std::pow(10.0, 1 - significant) * 1.000001;
}

template <typename Q, typename Parse>
void checkRoundTrip(Q value, Parse parse, int significant)
{
    const std::string text = format(value, significant);
    INFO("SI value " << value.si() << " printed as '" << text << "' with " << significant << " digits");
    const auto parsed = parse(text, "round trip");
    INFO((parsed ? std::string{"parsed"} : parsed.error().message()));
    REQUIRE(parsed.has_value());
    CHECK_THAT(parsed->si(), WithinRel(value.si(), roundingTolerance(significant)));
    // Printing what was read must give the same text: nothing drifts over repeated edits.
    CHECK(format(*parsed, significant) == text);
}

template <typename Q, typename Parse>
void checkRoundTripsOverDecades(Parse parse)
{
    std::mt19937 random{7u}; // fixed seed: a failure must reproduce
    std::uniform_real_distribution<double> mantissa{1.0, 10.0};
    for (int decade = -15; decade <= 4; ++decade) {
        for (const double m : {1.0, 2.5, 3.14159265358979, 9.87654321, 9.9996, 9.99996, mantissa(random)}) {
            const Q value = Q::fromSi(m * std::pow(10.0, decade));
            for (const int significant : {1, 2, 4, 6, 15})
                checkRoundTrip(value, parse, significant);
        }
    }
}

} // namespace

TEST_CASE("Printing picks the prefix that puts the number between 1 and 1000", "[units][format]")
{
    // common practice: SI prefixes and unit conversions (definitions)
    SECTION("the examples from the design")
    {
        CHECK(format(35_fs) == "35 fs");
        CHECK(format(1000_Hz) == "1 kHz");
        CHECK(format(2.5_mJ) == "2.5 mJ");
        CHECK(format(1.5_mrad) == "1.5 mrad");
        CHECK(format(Frequency::fromSi(8e7)) == "80 MHz");
        CHECK(format(0.25_s) == "250 ms");
        CHECK(format(20_W) == "20 W");
        CHECK(format(Power::fromSi(2e15)) == "2 PW");
        CHECK(format(Energy::fromSi(4e-5)) == "40 \xC2\xB5J");
        CHECK(format(7_mm) == "7 mm");
        CHECK(format(2.5_m) == "2.5 m");
    }

    SECTION("wavelengths in nm below 10 µm, µm below 1 mm, mm above")
    {
        CHECK(format(800_nm) == "800 nm");
        CHECK(format(1300_nm) == "1300 nm");
        CHECK(format(632.8_nm) == "632.8 nm");
        CHECK(format(9.999_um) == "9999 nm");
        CHECK(format(10.6_um) == "10.6 \xC2\xB5m");
        CHECK(format(Wavelength::fromSi(9.99996e-6)) == "10 \xC2\xB5m"); // rounds up into the next unit
        CHECK(format(Wavelength::fromSi(1e-3)) == "1 mm");
        CHECK(format(Wavelength::fromSi(3.2e-3)) == "3.2 mm");
    }

    SECTION("per-area quantities carry the prefix on J or W")
    {
        CHECK(format(RadiantExposure::fromSi(2.377e-5)) == "23.77 \xC2\xB5J/m\xC2\xB2");
        CHECK(format(RadiantExposure::fromSi(30.0)) == "30 J/m\xC2\xB2");
        CHECK(format(Irradiance::fromSi(25.5)) == "25.5 W/m\xC2\xB2");
        CHECK(format(Irradiance::fromSi(1e7)) == "10 MW/m\xC2\xB2");
    }

    SECTION("areas step through mm², cm² and m²")
    {
        CHECK(format(Area::fromSi(3.85e-5)) == "38.5 mm\xC2\xB2");
        CHECK(format(1_cm2) == "1 cm\xC2\xB2");
        CHECK(format(Area::fromSi(0.5)) == "5000 cm\xC2\xB2");
        CHECK(format(2_m2) == "2 m\xC2\xB2");
    }

    SECTION("long durations stay in plain seconds")
    {
        CHECK(format(30000_s) == "30000 s");
        CHECK(format(1000_s) == "1000 s");
        CHECK(format(8_h) == "28800 s");
        CHECK(format(Duration::fromSi(123456.0)) == "123500 s");
        CHECK(format(Duration::fromSi(999.96)) == "1000 s");
    }

    SECTION("significant digits, rounding and trailing zeros")
    {
        CHECK(format(Duration::fromSi(1.23456e-9), 2) == "1.2 ns");
        CHECK(format(Duration::fromSi(1.23456e-9), 6) == "1.23456 ns");
        CHECK(format(Duration::fromSi(1.23456e-9)) == "1.235 ns");
        CHECK(format(Duration::fromSi(0.99996)) == "1 s");
        CHECK(format(Duration::fromSi(999.96e-6)) == "1 ms");
        CHECK(format(Energy::fromSi(123e-3), 2) == "120 mJ");
        CHECK(format(2.5_mJ, 10) == "2.5 mJ");
        CHECK(format(2.5_mJ, 0) == "3 mJ"); // clamped to one digit
        // Clamped to seventeen, which shows the double nearest 2.5e-3 in full.
        CHECK(format(2.5_mJ, 99) == format(2.5_mJ, 17));
        CHECK(format(2.5_mJ, 17) == "2.5000000000000001 mJ");
    }

    SECTION("zero, negative and non-finite values")
    {
        constexpr double kInfinity = std::numeric_limits<double>::infinity();
        CHECK(format(0_s) == "0 s");
        CHECK(format(0_nm) == "0 nm");
        CHECK(format(RadiantExposure{}) == "0 J/m\xC2\xB2");
        CHECK(format(Area{}) == "0 m\xC2\xB2");
        CHECK(format(1_ms - 3_ms) == "-2 ms");
        CHECK(format(Power::fromSi(kInfinity)) == "inf W");
        CHECK(format(Power::fromSi(-kInfinity)) == "-inf W");
        CHECK(format(Power::fromSi(std::numeric_limits<double>::quiet_NaN())) == "nan W");
    }

    SECTION("outside a quantity's prefixes, scientific notation in the base unit")
    {
        CHECK(format(Duration::fromSi(2e-18)) == "2e-18 s");
        CHECK(format(Frequency::fromSi(1e-4)) == "1e-4 Hz");
        CHECK(format(Energy::fromSi(5e6)) == "5e6 J");
        CHECK(format(Angle::fromSi(5000.0)) == "5e3 rad");
        CHECK(format(Wavelength::fromSi(1e-15)) == "1e-6 nm");
    }

    SECTION("formatSi is the shared helper for any unit")
    {
        CHECK(formatSi(1.5e-3, "A") == "1.5 mA");
        CHECK(formatSi(2.377e-5, "J/m\xC2\xB2") == "23.77 \xC2\xB5J/m\xC2\xB2");
        CHECK(formatSi(-2.5e-3, "J") == "-2.5 mJ");
        CHECK(formatSi(0.0, "V") == "0 V");
        CHECK(formatSi(3.3e4, "V", 2) == "33 kV");
        CHECK(formatSi(1e-20, "s") == "1e-20 s");
    }
}

TEST_CASE("Printed text parses back to the value within the printed precision", "[units][format][parse]")
{
    // common practice: SI prefixes and unit conversions; the tolerance is half a unit in the last printed digit
    SECTION("wavelength")
    {
        checkRoundTripsOverDecades<Wavelength>(parseWavelength);
    }
    SECTION("duration")
    {
        checkRoundTripsOverDecades<Duration>(parseDuration);
    }
    SECTION("energy")
    {
        checkRoundTripsOverDecades<Energy>(parseEnergy);
    }
    SECTION("power")
    {
        checkRoundTripsOverDecades<Power>(parsePower);
    }
    SECTION("radiant exposure")
    {
        checkRoundTripsOverDecades<RadiantExposure>(parseRadiantExposure);
    }
    SECTION("irradiance")
    {
        checkRoundTripsOverDecades<Irradiance>(parseIrradiance);
    }
    SECTION("angle")
    {
        checkRoundTripsOverDecades<Angle>(parseAngle);
    }
    SECTION("frequency")
    {
        checkRoundTripsOverDecades<Frequency>(parseFrequency);
    }
    SECTION("length")
    {
        checkRoundTripsOverDecades<Length>(parseLength);
    }
    SECTION("area")
    {
        checkRoundTripsOverDecades<Area>(parseArea);
    }

    SECTION("the design's examples survive a round trip unchanged")
    {
        CHECK(format(accepted(parseDuration("35fs"))) == "35 fs");
        CHECK(format(accepted(parseRadiantExposure("3 mJ/cm\xC2\xB2"))) == "30 J/m\xC2\xB2");
        CHECK(format(accepted(parseIrradiance("2.55 mW/cm2"))) == "25.5 W/m\xC2\xB2");
        CHECK(format(accepted(parseWavelength("10.6 \xCE\xBCm"))) == "10.6 \xC2\xB5m");
    }
}
