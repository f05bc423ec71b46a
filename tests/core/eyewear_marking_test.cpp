// EN 207 markings: every published form parses, prints wavelength first and parses back to the same content
// (check-values.md P13; hazard-and-eyewear.md section 6.7 forms and grammar), and malformed markings are refused
// with the failing part named.
#include <catch2/catch.hpp>

#include <algorithm>
#include <cctype>
#include <string>
#include <vector>

#include "beamwarden/eyewear/marking.hpp"

using namespace beamwarden;
using namespace beamwarden::eyewear;

namespace {

En207Marking parsed(const std::string& text)
{
    const auto result = parseEn207(text);
    INFO("marking '" << text << "': " << (result ? std::string{"accepted"} : result.error().message()));
    REQUIRE(result.has_value());
    return *result;
}

std::uint8_t bits(std::initializer_list<Mode> modes)
{
    unsigned out = 0;
    for (const Mode m : modes)
        out |= 1U << static_cast<unsigned>(m);
    return static_cast<std::uint8_t>(out);
}

std::string lower(std::string text)
{
    std::transform(text.begin(), text.end(), text.begin(),
                   [](unsigned char c) { return static_cast<char>(std::tolower(c)); });
    return text;
}

WavelengthSpan span(double from, double to)
{
    return WavelengthSpan{from, to};
}

// The P13 strings and the remaining section 6.7 forms, as printed (en dash kept where the source has it).
const std::vector<std::string> kPublished = {
    "610 - 640 D LB4 + IR LB5",           // check-values.md P13; hazard-and-eyewear.md §6.7 (H1i)
    "900 - 1070 D LB7 + IR LB8 + M LB8Y", // P13; §6.7 (H1i)
    "9000 - 11000 D LB3 + IR LB4",        // P13; §6.7 (H1i)
    "10600 DI LB3",                       // P13; §6.7 (H1a)
    "488/514 DI LB5",                     // P13; §6.7 (H1a)
    "532 DI LB4",                         // P13; §6.7 (H1a)
    "650 nm D LB2 + 1064 nm R LB6",       // P13; §6.7 (H1a)
    "1000 - 1070 D LB5 + I LB6",          // P13; §6.7 (H1a)
    "1064 D LB7 + I LB8",                 // P13; §6.7 (H1a)
    "IR 315\xE2\x80\x93"
    "532 LB6",      // P13; §6.7 (H3), en dash U+2013
    "M 800 L8",     // P13; §6.7 (H4)
    "1064 D LB7",   // §6.7 (H1a)
    "10600 DI LB5", // §6.7 (H1a)
    "10600 DI LB4", // §6.7 (H1a)
    "D 1064 L6",    // §6.7 (secondary)
};

} // namespace

TEST_CASE("eyewear marking: P13 every published form parses, prints and parses back the same", "[eyewear][marking]")
{
    for (const std::string& text : kPublished) {
        INFO("marking '" << text << "'");
        const En207Marking first = parsed(text);
        CHECK_FALSE(first.terms.empty());
        const std::string printed = format(first);
        INFO("printed '" << printed << "'");
        // check-values.md P13: printed wavelength first (§6.7 "Print wavelength first, as DGUV and EN do")
        REQUIRE_FALSE(printed.empty());
        CHECK(std::isdigit(static_cast<unsigned char>(printed.front())) != 0);
        // check-values.md P13: parse again -> same content
        CHECK(parsed(printed) == first);
        // printing is stable once the content is fixed
        CHECK(format(parsed(printed)) == printed);
    }
}

TEST_CASE("eyewear marking: the content of each published form", "[eyewear][marking]")
{
    SECTION("610 - 640 D LB4 + IR LB5: range, later term inherits it")
    {
        // check-values.md P13; hazard-and-eyewear.md §6.7 grammar (exact level numbers)
        const En207Marking m = parsed("610 - 640 D LB4 + IR LB5");
        REQUIRE(m.terms.size() == 2);
        CHECK(m.terms[0].wavelengths == std::vector<WavelengthSpan>{span(610, 640)});
        CHECK(m.terms[0].modes == bits({Mode::D}));
        CHECK(m.terms[0].level == 4);
        CHECK(m.terms[1].modes == bits({Mode::I, Mode::R}));
        CHECK(m.terms[1].level == 5);
        // §6.7: "later ones inherit it unless they give their own"
        CHECK(m.terms[1].covers(625.0));
        CHECK(m.terms[1].covers(610.0));
        CHECK(m.terms[1].covers(640.0));
        CHECK_FALSE(m.terms[1].covers(650.0));
        CHECK_FALSE(m.terms[0].covers(600.0));
    }
    SECTION("900 - 1070 D LB7 + IR LB8 + M LB8Y: the Y suffix, inheritance over two terms")
    {
        // check-values.md P13; §6.7 (Y: not tested at low repetition rates) (exact level numbers)
        const En207Marking m = parsed("900 - 1070 D LB7 + IR LB8 + M LB8Y");
        REQUIRE(m.terms.size() == 3);
        CHECK(m.terms[0].level == 7);
        CHECK_FALSE(m.terms[0].notTestedAtLowRates);
        CHECK(m.terms[1].level == 8);
        CHECK_FALSE(m.terms[1].notTestedAtLowRates);
        CHECK(m.terms[2].modes == bits({Mode::M}));
        CHECK(m.terms[2].has(Mode::M));
        CHECK_FALSE(m.terms[2].has(Mode::D));
        CHECK(m.terms[2].level == 8);
        CHECK(m.terms[2].notTestedAtLowRates);
        CHECK(m.terms[2].covers(1064.0));
        CHECK(m.terms[1].covers(900.0));
        // the Y survives printing
        CHECK(format(m).find("LB8Y") != std::string::npos);
    }
    SECTION("650 nm D LB2 + 1064 nm R LB6: each term with its own wavelength")
    {
        // check-values.md P13; §6.7 grammar (exact level numbers)
        const En207Marking m = parsed("650 nm D LB2 + 1064 nm R LB6");
        REQUIRE(m.terms.size() == 2);
        CHECK(m.terms[0].wavelengths == std::vector<WavelengthSpan>{span(650, 650)});
        CHECK(m.terms[0].modes == bits({Mode::D}));
        CHECK(m.terms[0].level == 2);
        CHECK(m.terms[1].wavelengths == std::vector<WavelengthSpan>{span(1064, 1064)});
        CHECK(m.terms[1].modes == bits({Mode::R}));
        CHECK(m.terms[1].level == 6);
        CHECK_FALSE(m.terms[1].covers(650.0));
        CHECK_FALSE(m.terms[0].covers(1064.0));
        // both wavelengths survive printing
        const std::string printed = format(m);
        CHECK(printed.find("650") != std::string::npos);
        CHECK(printed.find("1064") != std::string::npos);
    }
    SECTION("488/514 DI LB5: a list of single wavelengths")
    {
        // check-values.md P13; §6.7 "λ1/λ2/…" (exact level numbers)
        const En207Marking m = parsed("488/514 DI LB5");
        REQUIRE(m.terms.size() == 1);
        CHECK(m.terms[0].wavelengths == std::vector<WavelengthSpan>{span(488, 488), span(514, 514)});
        CHECK(m.terms[0].modes == bits({Mode::D, Mode::I}));
        CHECK(m.terms[0].level == 5);
        CHECK(m.terms[0].covers(488.0));
        CHECK(m.terms[0].covers(514.0));
        CHECK_FALSE(m.terms[0].covers(500.0));
    }
    SECTION("IR 315-532 LB6 with an en dash, modes first")
    {
        // check-values.md P13; §6.7 (H3) and grammar "modes wavelength level" (exact level number)
        const En207Marking m = parsed("IR 315\xE2\x80\x93"
                                      "532 LB6");
        REQUIRE(m.terms.size() == 1);
        CHECK(m.terms[0].wavelengths == std::vector<WavelengthSpan>{span(315, 532)});
        CHECK(m.terms[0].modes == bits({Mode::I, Mode::R}));
        CHECK(m.terms[0].level == 6);
        // the en dash and the hyphen mean the same range (§6.7)
        CHECK(parsed("IR 315-532 LB6") == m);
        // printed wavelength first
        CHECK(format(m).rfind("315", 0) == 0);
    }
    SECTION("M 800 L8 reads as LB8")
    {
        // check-values.md P13: "`L8` reads as LB8" (exact level number)
        const En207Marking m = parsed("M 800 L8");
        REQUIRE(m.terms.size() == 1);
        CHECK(m.terms[0].wavelengths == std::vector<WavelengthSpan>{span(800, 800)});
        CHECK(m.terms[0].modes == bits({Mode::M}));
        CHECK(m.terms[0].level == 8);
        CHECK(m == parsed("800 M LB8"));
        const std::string printed = format(m);
        CHECK(printed.rfind("800", 0) == 0);
        CHECK(printed.find("LB8") != std::string::npos);
    }
    SECTION("D 1064 L6, the older mode-first form")
    {
        // §6.7 (secondary form); check-values.md P11 marking "D 1064 L6" (exact level number)
        const En207Marking m = parsed("D 1064 L6");
        REQUIRE(m.terms.size() == 1);
        CHECK(m.terms[0].level == 6);
        CHECK(m == parsed("1064 D LB6"));
    }
    SECTION("spaces around the range dash and the nm unit are optional")
    {
        // §6.7 grammar: "spaces around - optional, optional nm"
        CHECK(parsed("1000 - 1070 D LB5 + I LB6") == parsed("1000-1070 D LB5 + I LB6"));
        CHECK(parsed("1000-1070 nm D LB5 + I LB6") == parsed("1000-1070 D LB5 + I LB6"));
        CHECK(parsed("10600 DI LB3").terms[0].wavelengths == std::vector<WavelengthSpan>{span(10600, 10600)});
    }
    SECTION("modes in any order print as D I R M")
    {
        // §6.7 grammar: "letters from D, I, R, M without repeats (print in the order D I R M)"
        const En207Marking m = parsed("1064 RD LB5");
        CHECK(m.terms[0].modes == bits({Mode::D, Mode::R}));
        CHECK(m == parsed("1064 DR LB5"));
        CHECK(format(m).find("DR LB5") != std::string::npos);
        CHECK(format(parsed("532 MRID LB9")).find("DIRM LB9") != std::string::npos);
    }
    SECTION("the header's own printing example")
    {
        // marking.hpp contract for format(): prints "900-1070 D LB7 + IR LB8 + M LB8Y", inherited wavelengths once
        CHECK(format(parsed("900 - 1070 D LB7 + IR LB8 + M LB8Y")) == "900-1070 D LB7 + IR LB8 + M LB8Y");
    }
}

TEST_CASE("eyewear marking: malformed markings are refused, naming the part that failed", "[eyewear][marking]")
{
    struct Bad {
        std::string text;
        std::string mentions; // what the error must name (lower case)
    };
    // hazard-and-eyewear.md §6.7 grammar: a term is "[wavelength] modes level"; modes from D I R M without repeats;
    // level LB or L 1-10; the first term must carry a wavelength
    const std::vector<Bad> cases = {
        {"1064 LB7", "mode"},    // no modes
        {"1064 DD LB7", "dd"},   // repeated mode
        {"1064 D LB11", "lb11"}, // level beyond 10
        {"1064 D LB0", "lb0"},   // level below 1
        {"D LB5", "wavelength"}, // no wavelength on the first term
        {"1064 D LB7 extra", "extra"},
        {"1064 D", "level"}, // no level
        {"1064 X LB5", ""},  // not a test mode
        {"", ""},            // empty
        {"   ", ""},         // blank
    };
    for (const Bad& bad : cases) {
        INFO("marking '" << bad.text << "'");
        const auto result = parseEn207(bad.text);
        REQUIRE_FALSE(result.has_value());
        const std::string message = lower(result.error().message());
        INFO("error: " << message);
        CHECK_FALSE(message.empty());
        if (!bad.mentions.empty())
            CHECK(message.find(bad.mentions) != std::string::npos);
    }
}
