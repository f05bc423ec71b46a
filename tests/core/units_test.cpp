// Quantity types, literals and parsing. Every expected number here follows from the SI definitions of the
// prefixes and units (common practice: SI prefixes and unit conversions, e.g. 1 J/cm² = 10^4 J/m²,
// 1 min = 60 s, 1° = π/180 rad), so no other source is needed.
#include <catch2/catch.hpp>

#include <cmath>
#include <numbers>
#include <random>
#include <string>
#include <type_traits>

#include "beamwarden/units.hpp"

using namespace beamwarden::units;
using namespace beamwarden::units::literals;
using Catch::Matchers::Contains;

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

template <typename T>
beamwarden::InputError refused(const beamwarden::Result<T>& result)
{
    INFO((result ? "accepted as " + format(*result, 17) : std::string{"refused"}));
    REQUIRE_FALSE(result.has_value());
    return result.error();
}

template <typename Q>
concept HasSeconds = requires(Q q)
{
    q.seconds();
};

template <typename A, typename B>
concept Addable = requires(A a, B b)
{
    a + b;
};

} // namespace

TEST_CASE("Quantities keep their dimension and their SI value", "[units]")
{
    // common practice: SI prefixes and unit conversions (definitions, exact to rounding)
    SECTION("same-type arithmetic and scaling")
    {
        const Energy sum = 2_mJ + 500_uJ;
        CHECK(sum.joules() == Approx(2.5e-3).epsilon(1e-12));
        CHECK((sum - 500_uJ).millijoules() == Approx(2.0).epsilon(1e-12));
        CHECK((3.0 * 2_W).watts() == Approx(6.0).epsilon(1e-12));
        CHECK((2_W * 3.0).watts() == Approx(6.0).epsilon(1e-12));
        CHECK((1_s / 4.0).milliseconds() == Approx(250.0).epsilon(1e-12));
        CHECK(1_ms / 1_us == Approx(1000.0).epsilon(1e-12));

        Duration t = 1_s;
        t += 500_ms;
        t -= 250_ms;
        t *= 2.0;
        t /= 5.0;
        CHECK(t.seconds() == Approx(0.5).epsilon(1e-12));
    }

    SECTION("comparisons")
    {
        CHECK(1_ms < 1_s);
        CHECK(80_MHz > 1_kHz);
        CHECK(800_nm == Wavelength::fromSi(800e-9));
        CHECK(800_nm != 801_nm);
        CHECK(Duration{} == 0_s);
    }

    SECTION("named accessors read out in the unit they name")
    {
        CHECK((800_nm).nanometres() == Approx(800.0).epsilon(1e-12));
        CHECK((10.6_um).micrometres() == Approx(10.6).epsilon(1e-12));
        CHECK((7_mm).millimetres() == Approx(7.0).epsilon(1e-12));
        CHECK((7_mm).metres() == Approx(7e-3).epsilon(1e-12));
        CHECK((2_km).metres() == Approx(2000.0).epsilon(1e-12));
        CHECK((35_fs).femtoseconds() == Approx(35.0).epsilon(1e-12));
        CHECK((35_fs).seconds() == Approx(35e-15).epsilon(1e-12));
        CHECK((8_h).minutes() == Approx(480.0).epsilon(1e-12));
        CHECK((90_min).hours() == Approx(1.5).epsilon(1e-12));
        CHECK((1.5_mrad).milliradians() == Approx(1.5).epsilon(1e-12));
        CHECK((180_deg).radians() == Approx(std::numbers::pi).epsilon(1e-12));
        CHECK((1_rad).degrees() == Approx(180.0 / std::numbers::pi).epsilon(1e-12));
        CHECK((1_kHz).hertz() == Approx(1000.0).epsilon(1e-12));
        CHECK((80_MHz).megahertz() == Approx(80.0).epsilon(1e-12));
        CHECK((2.5_mJ).joules() == Approx(2.5e-3).epsilon(1e-12));
        CHECK((20_W).milliwatts() == Approx(20000.0).epsilon(1e-12));
        CHECK((1_cm2).squareMillimetres() == Approx(100.0).epsilon(1e-12));
        CHECK(RadiantExposure::fromSi(30.0).joulesPerSquareCentimetre() == Approx(3e-3).epsilon(1e-12));
        CHECK(Irradiance::fromSi(25.5).wattsPerSquareCentimetre() == Approx(2.55e-3).epsilon(1e-12));
    }

    SECTION("cross-type operators follow the physics")
    {
        CHECK((2_W * 3_s).joules() == Approx(6.0).epsilon(1e-12));
        CHECK((3_s * 2_W).joules() == Approx(6.0).epsilon(1e-12));
        CHECK((1_mJ / 1_ms).watts() == Approx(1.0).epsilon(1e-12));
        // 1 J/cm² = 10^4 J/m² (definition), so 3 mJ over 1 cm² is 30 J/m².
        CHECK((3_mJ / 1_cm2).joulesPerSquareMetre() == Approx(30.0).epsilon(1e-12));
        CHECK((2.55_mW / 1_cm2).wattsPerSquareMetre() == Approx(25.5).epsilon(1e-12));
        CHECK((Irradiance::fromSi(10.0) * 2_s).joulesPerSquareMetre() == Approx(20.0).epsilon(1e-12));
        CHECK((RadiantExposure::fromSi(20.0) / 4_s).wattsPerSquareMetre() == Approx(5.0).epsilon(1e-12));
        CHECK((RadiantExposure::fromSi(30.0) * 1_cm2).millijoules() == Approx(3.0).epsilon(1e-12));
        CHECK((Irradiance::fromSi(25.5) * 1_cm2).milliwatts() == Approx(2.55).epsilon(1e-12));
        CHECK((7_mm * 7_mm).squareMillimetres() == Approx(49.0).epsilon(1e-12));
        CHECK(1_kHz * 0.25_s == Approx(250.0).epsilon(1e-12));
        CHECK(period(1_kHz) == 1_ms);
        CHECK(period(80_MHz).nanoseconds() == Approx(12.5).epsilon(1e-12));
    }

    SECTION("the types are compile-time values and do not mix")
    {
        STATIC_REQUIRE(2_W * 3_s == 6_J);
        STATIC_REQUIRE(1_kHz * 1_ms == 1.0);
        STATIC_REQUIRE(Wavelength::fromSi(1e-6).si() == 1e-6);
        STATIC_REQUIRE(std::is_same_v<decltype(800_nm), Wavelength>);
        STATIC_REQUIRE(std::is_same_v<decltype(10.6_um), Wavelength>);
        STATIC_REQUIRE(std::is_same_v<decltype(7_mm), Length>);
        STATIC_REQUIRE(std::is_same_v<decltype(1_m), Length>);
        STATIC_REQUIRE(std::is_same_v<decltype(1_kHz / 1_Hz), double>);
        STATIC_REQUIRE(HasSeconds<Duration>);
        STATIC_REQUIRE_FALSE(HasSeconds<Wavelength>);
        STATIC_REQUIRE_FALSE(Addable<Wavelength, Length>);
        STATIC_REQUIRE_FALSE(Addable<Energy, Power>);
        STATIC_REQUIRE_FALSE(std::is_convertible_v<double, Energy>);
        STATIC_REQUIRE_FALSE(std::is_convertible_v<Wavelength, Length>);
    }
}

TEST_CASE("Literals give the SI value of their unit", "[units]")
{
    // common practice: SI prefixes and unit conversions (definitions)
    SECTION("integer and floating literals agree")
    {
        CHECK(35_fs == 35.0_fs);
        CHECK(1_kHz == 1.0_kHz);
        CHECK(800_nm == 800.0_nm);
    }

    SECTION("each prefix is its power of ten")
    {
        CHECK((1_fs).si() == Approx(1e-15).epsilon(1e-12));
        CHECK((1_ps).si() == Approx(1e-12).epsilon(1e-12));
        CHECK((1_ns).si() == Approx(1e-9).epsilon(1e-12));
        CHECK((1_us).si() == Approx(1e-6).epsilon(1e-12));
        CHECK((1_ms).si() == Approx(1e-3).epsilon(1e-12));
        CHECK((1_min).si() == Approx(60.0).epsilon(1e-12));
        CHECK((1_h).si() == Approx(3600.0).epsilon(1e-12));
        CHECK((1_nJ).si() == Approx(1e-9).epsilon(1e-12));
        CHECK((1_uJ).si() == Approx(1e-6).epsilon(1e-12));
        CHECK((1_kW).si() == Approx(1e3).epsilon(1e-12));
        CHECK((1_GHz).si() == Approx(1e9).epsilon(1e-12));
        CHECK((1_urad).si() == Approx(1e-6).epsilon(1e-12));
        CHECK((1_cm).si() == Approx(1e-2).epsilon(1e-12));
        CHECK((1_um).si() == Approx(1e-6).epsilon(1e-12));
        CHECK((1_mm2).si() == Approx(1e-6).epsilon(1e-12));
        CHECK((1_m2).si() == Approx(1.0).epsilon(1e-12));
    }

    SECTION("literals divide by exact powers of ten, so they match the parser bit for bit")
    {
        CHECK(accepted(parseWavelength("800 nm")) == 800_nm);
        CHECK(accepted(parseDuration("35 fs")) == 35_fs);
        CHECK(accepted(parseEnergy("2.5 mJ")) == 2.5_mJ);
        CHECK(accepted(parseAngle("45 deg")) == 45_deg);
        CHECK(accepted(parseDuration("3 min")) == 3_min);
    }
}

TEST_CASE("Parsing accepts numbers with their units", "[units][parse]")
{
    // common practice: SI prefixes and unit conversions (definitions)
    SECTION("wavelengths, with either micro sign")
    {
        CHECK(accepted(parseWavelength("800 nm")).nanometres() == Approx(800.0).epsilon(1e-12));
        CHECK(accepted(parseWavelength("632.8nm")).nanometres() == Approx(632.8).epsilon(1e-12));
        CHECK(accepted(parseWavelength("10.6 um")).micrometres() == Approx(10.6).epsilon(1e-12));
        CHECK(accepted(parseWavelength("10.6 \xC2\xB5m")).micrometres() == Approx(10.6).epsilon(1e-12)); // U+00B5
        CHECK(accepted(parseWavelength("10.6 \xCE\xBCm")).micrometres() == Approx(10.6).epsilon(1e-12)); // U+03BC
        CHECK(accepted(parseWavelength("1.3E3 nm")).nanometres() == Approx(1300.0).epsilon(1e-12));
        CHECK(accepted(parseWavelength("0.5 mm")).metres() == Approx(5e-4).epsilon(1e-12));
    }

    SECTION("durations")
    {
        CHECK(accepted(parseDuration("35fs")).femtoseconds() == Approx(35.0).epsilon(1e-12));
        CHECK(accepted(parseDuration("0.25 s")).seconds() == Approx(0.25).epsilon(1e-12));
        CHECK(accepted(parseDuration(".5 s")).seconds() == Approx(0.5).epsilon(1e-12));
        CHECK(accepted(parseDuration("10 ns")).seconds() == Approx(1e-8).epsilon(1e-12));
        CHECK(accepted(parseDuration("100 \xC2\xB5s")).seconds() == Approx(1e-4).epsilon(1e-12));
        CHECK(accepted(parseDuration("30 min")).seconds() == Approx(1800.0).epsilon(1e-12));
        CHECK(accepted(parseDuration("8 h")).seconds() == Approx(28800.0).epsilon(1e-12));
    }

    SECTION("frequencies: the prefix keeps its case, the Hz does not have to")
    {
        CHECK(accepted(parseFrequency("1 kHz")).hertz() == Approx(1000.0).epsilon(1e-12));
        CHECK(accepted(parseFrequency("80 MHz")).hertz() == Approx(8e7).epsilon(1e-12));
        CHECK(accepted(parseFrequency("80 mHz")).hertz() == Approx(0.08).epsilon(1e-12));
        CHECK(accepted(parseFrequency("1 khz")).hertz() == Approx(1000.0).epsilon(1e-12));
        CHECK(accepted(parseFrequency("2 MHZ")).hertz() == Approx(2e6).epsilon(1e-12));
        CHECK(accepted(parseFrequency("2.5E4 Hz")).hertz() == Approx(25000.0).epsilon(1e-12));
    }

    SECTION("energies and powers")
    {
        CHECK(accepted(parseEnergy("2.5 mJ")).joules() == Approx(2.5e-3).epsilon(1e-12));
        CHECK(accepted(parseEnergy("40 \xC2\xB5J")).joules() == Approx(4e-5).epsilon(1e-12));
        CHECK(accepted(parseEnergy("1 kJ")).joules() == Approx(1000.0).epsilon(1e-12));
        CHECK(accepted(parsePower("20 W")).watts() == Approx(20.0).epsilon(1e-12));
        CHECK(accepted(parsePower("1e-3 W")).watts() == Approx(1e-3).epsilon(1e-12));
        CHECK(accepted(parsePower("+5 mW")).watts() == Approx(5e-3).epsilon(1e-12));
        CHECK(accepted(parsePower("2 TW")).watts() == Approx(2e12).epsilon(1e-12));
    }

    SECTION("angles")
    {
        CHECK(accepted(parseAngle("1.5 mrad")).radians() == Approx(1.5e-3).epsilon(1e-12));
        CHECK(accepted(parseAngle("20 urad")).radians() == Approx(2e-5).epsilon(1e-12));
        CHECK(accepted(parseAngle("20 \xC2\xB5rad")).radians() == Approx(2e-5).epsilon(1e-12));
        CHECK(accepted(parseAngle("90 deg")).radians() == Approx(std::numbers::pi / 2.0).epsilon(1e-12));
        CHECK(accepted(parseAngle("90\xC2\xB0")).radians() == Approx(std::numbers::pi / 2.0).epsilon(1e-12));
    }

    SECTION("radiant exposure and irradiance: 1 J/cm² = 10^4 J/m² by definition")
    {
        for (const char* text : {"3 mJ/cm\xC2\xB2", "3 mJ/cm2", "3 mJ/cm^2", "3 mJ / cm\xC2\xB2", "30 J/m2", "30 J/m^2",
                                 "30 J/m\xC2\xB2", "0.03 mJ/mm2"}) {
            INFO(text);
            CHECK(accepted(parseRadiantExposure(text)).joulesPerSquareMetre() == Approx(30.0).epsilon(1e-12));
        }
        CHECK(accepted(parseIrradiance("2.55 mW/cm2")).wattsPerSquareMetre() == Approx(25.5).epsilon(1e-12));
        CHECK(accepted(parseIrradiance("1 W/m\xC2\xB2")).wattsPerSquareMetre() == Approx(1.0).epsilon(1e-12));
        CHECK(accepted(parseIrradiance("1 kW/cm^2")).wattsPerSquareMetre() == Approx(1e7).epsilon(1e-12));
    }

    SECTION("lengths and areas")
    {
        CHECK(accepted(parseLength("7 mm")).metres() == Approx(7e-3).epsilon(1e-12));
        CHECK(accepted(parseLength("2.5 cm")).metres() == Approx(0.025).epsilon(1e-12));
        CHECK(accepted(parseLength("1.2 km")).metres() == Approx(1200.0).epsilon(1e-12));
        CHECK(accepted(parseArea("1 cm\xC2\xB2")).squareMetres() == Approx(1e-4).epsilon(1e-12));
        CHECK(accepted(parseArea("38.5 mm2")).squareMetres() == Approx(3.85e-5).epsilon(1e-12));
        CHECK(accepted(parseArea("2 m^2")).squareMetres() == Approx(2.0).epsilon(1e-12));
    }

    SECTION("surrounding and separating spaces, including no-break and thin spaces")
    {
        CHECK(accepted(parseWavelength("  800 nm\t\n")).nanometres() == Approx(800.0).epsilon(1e-12));
        CHECK(accepted(parseWavelength("800\xC2\xA0nm")).nanometres() == Approx(800.0).epsilon(1e-12));
        CHECK(accepted(parseWavelength("800\xE2\x80\xAFnm")).nanometres() == Approx(800.0).epsilon(1e-12));
        CHECK(accepted(parseWavelength("\xE2\x80\x89"
                                       "800\xE2\x80\x89nm"))
                  .nanometres() == Approx(800.0).epsilon(1e-12));
    }

    SECTION("zero is left to the caller's range check, and -0 is stored as +0")
    {
        CHECK(accepted(parseEnergy("0 J")).joules() == 0.0);
        const Wavelength negativeZero = accepted(parseWavelength("-0 nm"));
        CHECK(negativeZero.si() == 0.0);
        CHECK_FALSE(std::signbit(negativeZero.si()));
    }
}

TEST_CASE("Parsing refuses what is not a non-negative quantity of the right kind", "[units][parse]")
{
    SECTION("empty and blank text")
    {
        for (const char* text : {"", "   ", "\t\n"}) {
            const auto error = refused(parseWavelength(text));
            CHECK(error.field == "wavelength");
            CHECK(error.value.empty());
            CHECK_THAT(error.message(), Contains("no value given"));
            CHECK_THAT(error.allowed, Contains("800 nm"));
        }
    }

    SECTION("a number without a unit")
    {
        const auto error = refused(parseWavelength(" 800 "));
        CHECK(error.field == "wavelength");
        CHECK(error.value == "800");
        CHECK_THAT(error.message(), Contains("'800'"));
        CHECK(error.allowed == "a wavelength with its unit, e.g. 800 nm or 10.6 \xC2\xB5m");
    }

    SECTION("a unit of the wrong kind says which kind is wanted")
    {
        const auto kg = refused(parseWavelength("5 kg"));
        CHECK(kg.field == "wavelength");
        CHECK_THAT(kg.message(), Contains("5 kg"));
        CHECK_THAT(kg.allowed, Contains("length unit"));

        const auto watts = refused(parseEnergy("3 W"));
        CHECK(watts.field == "energy");
        CHECK_THAT(watts.message(), Contains("3 W"));
        CHECK_THAT(watts.allowed, Contains("energy unit"));

        CHECK_THAT(refused(parsePower("20 J")).allowed, Contains("power unit"));
        CHECK_THAT(refused(parseDuration("1 kHz")).allowed, Contains("time unit"));
        CHECK_THAT(refused(parseRadiantExposure("3 W/cm2")).allowed, Contains("radiant-exposure unit"));
        CHECK_THAT(refused(parseIrradiance("3 mJ/cm2")).allowed, Contains("irradiance unit"));
        CHECK_THAT(refused(parseArea("3 mm")).allowed, Contains("area unit"));
        CHECK_THAT(refused(parseFrequency("3 s")).allowed, Contains("frequency unit"));
        CHECK_THAT(refused(parseAngle("3 m")).allowed, Contains("angle unit"));
    }

    SECTION("prefixes are case-sensitive and limited to sensible ones")
    {
        CHECK_THAT(refused(parseFrequency("1 KHz")).message(), Contains("1 KHz"));
        CHECK_THAT(refused(parseWavelength("800 NM")).message(), Contains("800 NM"));
        CHECK_THAT(refused(parseDuration("5 Ms")).message(), Contains("5 Ms"));
        CHECK_THAT(refused(parsePower("5 cW")).message(), Contains("5 cW"));
        CHECK_THAT(refused(parseEnergy("5 mmJ")).message(), Contains("5 mmJ"));
    }

    SECTION("the field name given by the caller is the one reported")
    {
        const auto error = refused(parseWavelength("5 kg", "outputs[2].wavelength"));
        CHECK(error.field == "outputs[2].wavelength");
        CHECK_THAT(error.message(), Contains("outputs[2].wavelength: '5 kg' is not accepted"));
    }

    SECTION("NaN and infinity")
    {
        for (const char* text : {"nan nm", "NaN nm", "inf nm", "infinity nm", "-inf nm"}) {
            const auto error = refused(parseWavelength(text));
            CHECK(error.field == "wavelength");
            CHECK_THAT(error.message(), Contains(text));
            CHECK_THAT(error.allowed, Contains("finite"));
        }
    }

    SECTION("negative numbers")
    {
        const auto error = refused(parsePower("-1e-3 W"));
        CHECK(error.field == "power");
        CHECK_THAT(error.message(), Contains("-1e-3 W"));
        CHECK_THAT(error.allowed, Contains("zero or more"));
        CHECK_THAT(refused(parseWavelength("-800 nm")).allowed, Contains("zero or more"));
    }

    SECTION("numbers beyond a double, before or after the prefix is applied")
    {
        for (const char* text : {"1e400 J", "1e-400 J", "1e308 kJ", "1e-320 fJ"}) {
            const auto error = refused(parseEnergy(text));
            CHECK(error.field == "energy");
            CHECK_THAT(error.message(), Contains(text));
            CHECK_THAT(error.allowed, Contains("1e300"));
        }
    }

    SECTION("text after the unit")
    {
        const auto error = refused(parseWavelength("800 nm x"));
        CHECK(error.field == "wavelength");
        CHECK_THAT(error.message(), Contains("800 nm x"));
        CHECK_THAT(error.allowed, Contains("nothing after the unit"));
        CHECK_THAT(refused(parseEnergy("2.5 mJ per pulse")).allowed, Contains("nothing after the unit"));
    }

    SECTION("no number at all, or a decimal comma")
    {
        for (const char* text : {"nm", "abc", ". nm", "+-5 nm", "--5 nm"}) {
            const auto error = refused(parseWavelength(text));
            CHECK_THAT(error.message(), Contains(text));
            CHECK_THAT(error.allowed, Contains("a number"));
        }
        CHECK_THAT(refused(parseDuration("0,25 s")).allowed, Contains("decimal point"));
    }

    SECTION("bytes that are not UTF-8 are refused and never echoed raw")
    {
        for (const char* text : {"\xFF nm",
                                 "800 \xC0\xAE"
                                 "m",
                                 "800 \xED\xA0\x80m", "800 n\xC2", "\xF5\x80\x80\x80"}) {
            const auto error = refused(parseWavelength(text));
            CHECK(error.field == "wavelength");
            CHECK_THAT(error.message(), Contains("\xEF\xBF\xBD")); // U+FFFD stands in for the bad bytes
            CHECK_THAT(error.allowed, Contains("UTF-8"));
        }
    }

    SECTION("long text is cut in the message")
    {
        const std::string text = "800 nm " + std::string(500, 'x');
        const auto error = refused(parseWavelength(text));
        CHECK(error.value.size() < 100);
        CHECK_THAT(error.value, Contains("800 nm xxx"));
    }

    SECTION("arbitrary bytes never crash a parser and never give a negative or non-finite value")
    {
        constexpr std::string_view alphabet = "0123456789.eE+-, nmuskJWHzradgc/2^\xC2\xB5\xB2\xB0\xCE\xBC\xFF\x80\t";
        std::mt19937 random{20240601u}; // fixed seed: a failure must reproduce
        std::uniform_int_distribution<std::size_t> pick{0, alphabet.size() - 1};
        std::uniform_int_distribution<int> length{0, 14};
        for (int i = 0; i < 5000; ++i) {
            std::string text;
            for (int n = length(random); n > 0; --n)
                text += alphabet[pick(random)];
            const auto check = [&](const auto& result) {
                if (result) {
                    CHECK(std::isfinite(result->si()));
                    CHECK(result->si() >= 0.0);
                } else {
                    CHECK_FALSE(result.error().field.empty());
                }
            };
            check(parseWavelength(text));
            check(parseDuration(text));
            check(parseEnergy(text));
            check(parsePower(text));
            check(parseRadiantExposure(text));
            check(parseIrradiance(text));
            check(parseAngle(text));
            check(parseFrequency(text));
            check(parseLength(text));
            check(parseArea(text));
        }
    }
}
