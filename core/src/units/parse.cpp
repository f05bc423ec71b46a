#include <charconv>
#include <cmath>
#include <numbers>
#include <optional>
#include <string>
#include <system_error>

#include <fmt/format.h>

#include "beamwarden/text.hpp"
#include "beamwarden/units.hpp"
#include "units/unittext.hpp"

namespace beamwarden::units {

namespace {

// A refusal quotes at most this much of the text: enough to recognise it, never a pasted page.
constexpr std::size_t kShownBytes = 80;

enum class Kind {
    Wavelength,
    Length,
    Duration,
    Energy,
    Power,
    RadiantExposure,
    Irradiance,
    Angle,
    Frequency,
    Area,
};

struct KindText {
    std::string_view noun;     // with its article, to start a sentence fragment
    std::string_view example;  // valid input, shown in every refusal
    std::string_view unitHint; // what a wrong unit is told
};

KindText textFor(Kind kind)
{
    switch (kind) {
    case Kind::Wavelength:
        return {"a wavelength", "800 nm or 10.6 \xC2\xB5m", "a length unit such as nm, \xC2\xB5m or mm"};
    case Kind::Length:
        return {"a length", "7 mm or 2.5 m", "a length unit such as \xC2\xB5m, mm, cm, m or km"};
    case Kind::Duration:
        return {"a duration", "35 fs or 0.25 s", "a time unit: fs, ps, ns, \xC2\xB5s, ms, s, min or h"};
    case Kind::Energy:
        return {"an energy", "2.5 mJ", "an energy unit: fJ, pJ, nJ, \xC2\xB5J, mJ, J or kJ"};
    case Kind::Power:
        return {"a power", "20 W or 5 mW", "a power unit such as \xC2\xB5W, mW, W, kW, MW or GW"};
    case Kind::RadiantExposure:
        return {"a radiant exposure", "30 J/m\xC2\xB2 or 3 mJ/cm\xC2\xB2",
                "a radiant-exposure unit: J/m\xC2\xB2, J/cm\xC2\xB2 or J/mm\xC2\xB2, with a prefix on J if needed"};
    case Kind::Irradiance:
        return {"an irradiance", "25.5 W/m\xC2\xB2 or 2.55 mW/cm\xC2\xB2",
                "an irradiance unit: W/m\xC2\xB2, W/cm\xC2\xB2 or W/mm\xC2\xB2, with a prefix on W if needed"};
    case Kind::Angle:
        return {"an angle", "1.5 mrad or 2 deg", "an angle unit: \xC2\xB5rad, mrad, rad, deg or \xC2\xB0"};
    case Kind::Frequency:
        return {"a frequency", "1 kHz or 80 MHz",
                "a frequency unit: mHz, Hz, kHz, MHz, GHz or THz (m is milli, M is mega)"};
    case Kind::Area:
        return {"an area", "38.5 mm\xC2\xB2 or 1 cm\xC2\xB2",
                "an area unit: mm\xC2\xB2, cm\xC2\xB2 or m\xC2\xB2 (also written mm2 or mm^2)"};
    }
    return {"a value", "1", "a unit"};
}

// SI value = number × 10^exponent × factor; the factor is 1 except for min, h and degrees.
struct UnitScale {
    int exponent = 0;
    double factor = 1.0;
};

// ASCII whitespace plus the no-break and thin spaces that word processors and SI typography put between a
// number and its unit, so pasted values parse. Returns the byte length of the space at the start, or 0.
std::size_t spaceLength(std::string_view text)
{
    if (text.empty())
        return 0;
    const char c = text.front();
    if (c == ' ' || c == '\t' || c == '\n' || c == '\r' || c == '\v' || c == '\f')
        return 1;
    for (const std::string_view space : {"\xC2\xA0", "\xE2\x80\x89", "\xE2\x80\xAF"}) {
        if (text.starts_with(space))
            return space.size();
    }
    return 0;
}

std::string_view skipSpace(std::string_view text)
{
    while (const std::size_t length = spaceLength(text))
        text.remove_prefix(length);
    return text;
}

std::string_view trim(std::string_view text)
{
    text = skipSpace(text);
    for (bool trimmed = true; trimmed;) {
        trimmed = false;
        for (const std::string_view space :
             {" ", "\t", "\n", "\r", "\v", "\f", "\xC2\xA0", "\xE2\x80\x89", "\xE2\x80\xAF"}) {
            if (text.ends_with(space)) {
                text.remove_suffix(space.size());
                trimmed = true;
            }
        }
    }
    return text;
}

// Builds a new string rather than calling std::string::replace, which trips a false -Wrestrict in GCC 12 at -O2.
std::string replaceAll(std::string text, std::string_view from, std::string_view to)
{
    std::string out;
    out.reserve(text.size());
    std::size_t start = 0;
    for (std::size_t at = text.find(from); at != std::string::npos; at = text.find(from, start)) {
        out.append(text, start, at - start);
        out.append(to);
        start = at + from.size();
    }
    out.append(text, start, std::string::npos);
    return out;
}

// One spelling per unit before matching: both micro code points become 'u', and m², m^2 all become m2.
std::string normaliseUnit(std::string_view unit)
{
    std::string text{unit};
    text = replaceAll(std::move(text), internal::kMicroSign, "u");
    text = replaceAll(std::move(text), internal::kGreekMu, "u");
    text = replaceAll(std::move(text), internal::kSuperscriptTwo, "2");
    return replaceAll(std::move(text), "^2", "2");
}

bool equalsIgnoringAsciiCase(std::string_view a, std::string_view b)
{
    if (a.size() != b.size())
        return false;
    for (std::size_t i = 0; i < a.size(); ++i) {
        const auto lower = [](char c) { return (c >= 'A' && c <= 'Z') ? static_cast<char>(c - 'A' + 'a') : c; };
        if (lower(a[i]) != lower(b[i]))
            return false;
    }
    return true;
}

struct PrefixRule {
    std::string_view base;
    int minExponent = 0;
    int maxExponent = 0;
    bool allowCenti = false;
    bool baseIgnoresCase = false;
};

// The prefix may be absent or one letter; only the base symbol ever ignores case ("khz"), never the prefix.
std::optional<int> matchPrefixed(std::string_view unit, const PrefixRule& rule)
{
    if (unit.size() < rule.base.size())
        return std::nullopt;
    const std::string_view base = unit.substr(unit.size() - rule.base.size());
    if (rule.baseIgnoresCase ? !equalsIgnoringAsciiCase(base, rule.base) : base != rule.base)
        return std::nullopt;
    const std::string_view prefix = unit.substr(0, unit.size() - rule.base.size());
    if (prefix.empty())
        return 0;
    if (prefix.size() != 1)
        return std::nullopt;
    const std::optional<int> exponent = internal::prefixExponent(prefix.front(), rule.allowCenti);
    if (!exponent || *exponent < rule.minExponent || *exponent > rule.maxExponent)
        return std::nullopt;
    return exponent;
}

constexpr PrefixRule kMetre{"m", -12, 3, true, false};
constexpr PrefixRule kSquareMetre{"m2", -9, 3, true, false};
constexpr PrefixRule kSecond{"s", -15, 0, false, false};
constexpr PrefixRule kJoule{"J", -15, 3, false, false};
constexpr PrefixRule kJouleOverArea{"J", -15, 12, false, false};
constexpr PrefixRule kWatt{"W", -15, 15, false, false};
constexpr PrefixRule kHertz{"Hz", -3, 12, false, true};
constexpr PrefixRule kRadian{"rad", -9, 0, false, false};

std::optional<int> matchArea(std::string_view unit)
{
    // The prefix is squared with its metre: 1 cm² = (10^-2 m)² = 10^-4 m².
    if (const std::optional<int> exponent = matchPrefixed(unit, kSquareMetre))
        return 2 * *exponent;
    return std::nullopt;
}

std::optional<int> matchPerArea(std::string_view unit, const PrefixRule& numerator)
{
    const std::size_t slash = unit.find('/');
    if (slash == std::string_view::npos)
        return std::nullopt;
    const std::optional<int> top = matchPrefixed(unit.substr(0, slash), numerator);
    const std::optional<int> bottom = matchArea(unit.substr(slash + 1));
    if (!top || !bottom)
        return std::nullopt;
    return *top - *bottom;
}

std::optional<UnitScale> matchUnit(Kind kind, std::string_view unit)
{
    const auto scale = [](std::optional<int> exponent) {
        return exponent ? std::optional<UnitScale>{UnitScale{*exponent, 1.0}} : std::nullopt;
    };
    switch (kind) {
    case Kind::Wavelength:
    case Kind::Length:
        return scale(matchPrefixed(unit, kMetre));
    case Kind::Duration:
        if (unit == "min")
            return UnitScale{0, 60.0};
        if (unit == "h")
            return UnitScale{0, 3600.0};
        return scale(matchPrefixed(unit, kSecond));
    case Kind::Energy:
        return scale(matchPrefixed(unit, kJoule));
    case Kind::Power:
        return scale(matchPrefixed(unit, kWatt));
    case Kind::RadiantExposure:
        return scale(matchPerArea(unit, kJouleOverArea));
    case Kind::Irradiance:
        return scale(matchPerArea(unit, kWatt));
    case Kind::Angle:
        // Same factor as the _deg literal, so both give the same double.
        if (unit == "deg" || unit == internal::kDegreeSign)
            return UnitScale{0, std::numbers::pi / 180.0};
        return scale(matchPrefixed(unit, kRadian));
    case Kind::Frequency:
        return scale(matchPrefixed(unit, kHertz));
    case Kind::Area:
        return scale(matchArea(unit));
    }
    return std::nullopt;
}

bool isDigit(char c)
{
    return c >= '0' && c <= '9';
}

// The unit runs to the next space, except that spaces around a '/' belong to it ("mJ / cm²").
struct UnitSplit {
    std::string unit;
    std::string_view rest;
};

UnitSplit splitUnit(std::string_view text)
{
    UnitSplit split;
    while (!text.empty()) {
        if (spaceLength(text) == 0) {
            split.unit += text.front();
            text.remove_prefix(1);
            continue;
        }
        const std::string_view after = skipSpace(text);
        const bool joinsSlash = (!after.empty() && after.front() == '/') || split.unit.ends_with('/');
        if (!joinsSlash)
            break;
        text = after;
    }
    split.rest = skipSpace(text);
    return split;
}

Result<double> parseSi(std::string_view text, std::string_view field, Kind kind)
{
    const KindText words = textFor(kind);
    const std::string name{field};
    const std::string_view trimmed = trim(text);
    const std::string shown = beamwarden::text::displayable(trimmed, kShownBytes);
    const auto refuse = [&](std::string allowed) { return fail(name, shown, std::move(allowed)); };

    if (!beamwarden::text::isValidUtf8(text))
        return refuse(fmt::format("plain text (UTF-8), e.g. {}", words.example));
    if (trimmed.empty())
        return refuse(fmt::format("{} with its unit, e.g. {}", words.noun, words.example));

    std::string_view rest = trimmed;
    // from_chars takes no '+', but people write one; "+-5" is left for from_chars to refuse.
    if (rest.size() > 1 && rest.front() == '+' && (isDigit(rest[1]) || rest[1] == '.'))
        rest.remove_prefix(1);
    double number = 0.0;
    const auto [end, status] = std::from_chars(rest.data(), rest.data() + rest.size(), number);
    if (status == std::errc::invalid_argument)
        return refuse(fmt::format("a number followed by a unit, e.g. {}", words.example));
    const std::string outOfRange =
        fmt::format("a number between about 1e-300 and 1e300 in SI units, e.g. {}", words.example);
    if (status == std::errc::result_out_of_range)
        return refuse(outOfRange);
    // from_chars reads "inf", "infinity" and "nan" as numbers; none is a magnitude anyone can measure.
    if (!std::isfinite(number))
        return refuse(fmt::format("a finite number, e.g. {}", words.example));
    if (number < 0.0)
        return refuse(fmt::format("{} of zero or more, e.g. {}", words.noun, words.example));
    rest.remove_prefix(static_cast<std::size_t>(end - rest.data()));

    // "0,25 s" would otherwise read as 0 with a strange unit; say plainly that the comma is the problem.
    if (rest.size() > 1 && rest.front() == ',' && isDigit(rest[1]))
        return refuse(fmt::format("a decimal point rather than a comma, e.g. {}", words.example));

    rest = skipSpace(rest);
    if (rest.empty())
        return refuse(fmt::format("{} with its unit, e.g. {}", words.noun, words.example));

    const UnitSplit split = splitUnit(rest);
    const std::optional<UnitScale> scale = matchUnit(kind, normaliseUnit(split.unit));
    if (!scale)
        return refuse(fmt::format("{}, e.g. {}", words.unitHint, words.example));
    if (!split.rest.empty())
        return refuse(fmt::format("nothing after the unit, e.g. {}", words.example));

    const double si = internal::scaleByPowerOfTen(number, scale->exponent) * scale->factor;
    if (!std::isfinite(si) || (number != 0.0 && si == 0.0))
        return refuse(outOfRange);
    // "-0" passes the sign check; store +0 so it never prints as "-0".
    return si == 0.0 ? 0.0 : si;
}

template <typename Q>
Result<Q> parseAs(std::string_view text, std::string_view field, Kind kind)
{
    Result<double> si = parseSi(text, field, kind);
    if (!si)
        return std::unexpected(std::move(si.error()));
    return Q::fromSi(*si);
}

} // namespace

Result<Wavelength> parseWavelength(std::string_view text, std::string_view field)
{
    return parseAs<Wavelength>(text, field, Kind::Wavelength);
}

Result<Duration> parseDuration(std::string_view text, std::string_view field)
{
    return parseAs<Duration>(text, field, Kind::Duration);
}

Result<Energy> parseEnergy(std::string_view text, std::string_view field)
{
    return parseAs<Energy>(text, field, Kind::Energy);
}

Result<Power> parsePower(std::string_view text, std::string_view field)
{
    return parseAs<Power>(text, field, Kind::Power);
}

Result<RadiantExposure> parseRadiantExposure(std::string_view text, std::string_view field)
{
    return parseAs<RadiantExposure>(text, field, Kind::RadiantExposure);
}

Result<Irradiance> parseIrradiance(std::string_view text, std::string_view field)
{
    return parseAs<Irradiance>(text, field, Kind::Irradiance);
}

Result<Angle> parseAngle(std::string_view text, std::string_view field)
{
    return parseAs<Angle>(text, field, Kind::Angle);
}

Result<Frequency> parseFrequency(std::string_view text, std::string_view field)
{
    return parseAs<Frequency>(text, field, Kind::Frequency);
}

Result<Length> parseLength(std::string_view text, std::string_view field)
{
    return parseAs<Length>(text, field, Kind::Length);
}

Result<Area> parseArea(std::string_view text, std::string_view field)
{
    return parseAs<Area>(text, field, Kind::Area);
}

} // namespace beamwarden::units
