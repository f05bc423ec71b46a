#include <algorithm>
#include <array>
#include <charconv>
#include <cmath>
#include <string>

#include <fmt/format.h>

#include "beamwarden/units.hpp"
#include "units/unittext.hpp"

namespace beamwarden::units {

namespace {

// A rounded magnitude as decimal digits: value = d0.d1d2… × 10^exponent, no trailing zeros in `digits`.
// Working on the digit string, not on value / 1e-9, keeps binary noise such as 2.4999999 out of the output.
struct Decimal {
    std::string digits;
    int exponent = 0;
};

// fmt rounds correctly in scientific form, so 999.96 to four digits comes back as 1.000e+03 and lands in the
// next prefix up rather than printing as "1000 m…".
Decimal roundToSignificant(double magnitude, int significant)
{
    const std::string text = fmt::format("{:.{}e}", magnitude, significant - 1);
    const std::size_t e = text.find('e');
    Decimal decimal;
    for (std::size_t i = 0; i < e; ++i) {
        if (text[i] != '.')
            decimal.digits += text[i];
    }
    std::size_t exponentStart = e + 1;
    if (text[exponentStart] == '+')
        ++exponentStart;
    std::from_chars(text.data() + exponentStart, text.data() + text.size(), decimal.exponent);
    while (decimal.digits.size() > 1 && decimal.digits.back() == '0')
        decimal.digits.pop_back();
    return decimal;
}

// The digits written as a plain decimal in a unit of 10^unitExponent SI units.
std::string fixedIn(const Decimal& decimal, int unitExponent)
{
    const int leading = decimal.exponent - unitExponent; // power of ten of the first digit
    if (leading < 0)
        return "0." + std::string(static_cast<std::size_t>(-leading - 1), '0') + decimal.digits;
    const auto integerDigits = static_cast<std::size_t>(leading) + 1;
    if (decimal.digits.size() <= integerDigits)
        return decimal.digits + std::string(integerDigits - decimal.digits.size(), '0');
    return decimal.digits.substr(0, integerDigits) + "." + decimal.digits.substr(integerDigits);
}

std::string scientificIn(const Decimal& decimal, int unitExponent)
{
    std::string text = decimal.digits.substr(0, 1);
    if (decimal.digits.size() > 1)
        text += "." + decimal.digits.substr(1);
    return text + fmt::format("e{}", decimal.exponent - unitExponent);
}

// A fixed unit (nm, mm², plain seconds): plain decimals while they stay short, scientific beyond.
std::string inUnit(const Decimal& decimal, int unitExponent, std::string_view unit)
{
    const int leading = decimal.exponent - unitExponent;
    const bool plain = leading >= -3 && leading < 9;
    return fmt::format("{} {}", plain ? fixedIn(decimal, unitExponent) : scientificIn(decimal, unitExponent), unit);
}

// An engineering prefix puts the number in [1, 1000); outside the prefixes this quantity uses, the base unit
// with an exponent is clearer than a prefix nobody reads (or the parser would refuse).
std::string withPrefix(const Decimal& decimal, std::string_view base, int minExponent, int maxExponent)
{
    const int prefix = decimal.exponent >= 0 ? decimal.exponent / 3 * 3 : -((-decimal.exponent + 2) / 3 * 3);
    if (prefix < minExponent || prefix > maxExponent)
        return fmt::format("{} {}", scientificIn(decimal, 0), base);
    return fmt::format("{} {}{}", fixedIn(decimal, prefix), internal::prefixSymbol(prefix), base);
}

int clampSignificant(int significant)
{
    return std::clamp(significant, 1, 17);
}

// Zero, infinities and NaN have no digits to place, and a sign is put back in front of the magnitude.
template <typename Choose>
std::string render(double si, int significant, std::string_view plainUnit, Choose choose)
{
    if (std::isnan(si))
        return fmt::format("nan {}", plainUnit);
    if (std::isinf(si))
        return fmt::format("{}inf {}", si < 0.0 ? "-" : "", plainUnit);
    if (si == 0.0)
        return fmt::format("0 {}", plainUnit);
    const Decimal decimal = roundToSignificant(std::fabs(si), clampSignificant(significant));
    return (si < 0.0 ? "-" : "") + choose(decimal);
}

} // namespace

int exactDigits(double si)
{
    if (!std::isfinite(si) || si == 0.0)
        return 1;
    // to_chars without a precision writes the shortest form that reads back exactly: "1.0001e-03" has 5 digits.
    std::array<char, 64> buffer{};
    const auto [end, ec] =
        std::to_chars(buffer.data(), buffer.data() + buffer.size(), std::fabs(si), std::chars_format::scientific);
    if (ec != std::errc{})
        return 17;
    const std::string_view text(buffer.data(), static_cast<std::size_t>(end - buffer.data()));
    const std::string_view mantissa = text.substr(0, text.find('e'));
    const auto digits = static_cast<int>(mantissa.size()) - (mantissa.find('.') == std::string_view::npos ? 0 : 1);
    return clampSignificant(digits);
}

std::string formatSi(double value, std::string_view unit, int significant)
{
    return render(value, significant, unit, [unit](const Decimal& d) { return withPrefix(d, unit, -15, 15); });
}

std::string format(Wavelength value, int significant)
{
    // Wavelengths are quoted in nm through the near infrared, in µm for the mid and far infrared.
    return render(value.si(), significant, "nm", [](const Decimal& d) {
        if (d.exponent < -5)
            return inUnit(d, -9, "nm");
        if (d.exponent < -3)
            return inUnit(d, -6, "\xC2\xB5m");
        // Beyond any wavelength a rule covers, metres: "1e309 mm" would not read back as a double.
        if (d.exponent >= 0)
            return inUnit(d, 0, "m");
        return inUnit(d, -3, "mm");
    });
}

std::string format(Duration value, int significant)
{
    // Above 1000 s people think in seconds, minutes or hours, never in kiloseconds.
    return render(value.si(), significant, "s",
                  [](const Decimal& d) { return d.exponent >= 3 ? inUnit(d, 0, "s") : withPrefix(d, "s", -15, 0); });
}

std::string format(Energy value, int significant)
{
    return render(value.si(), significant, "J", [](const Decimal& d) { return withPrefix(d, "J", -15, 3); });
}

std::string format(Power value, int significant)
{
    return render(value.si(), significant, "W", [](const Decimal& d) { return withPrefix(d, "W", -15, 15); });
}

std::string format(RadiantExposure value, int significant)
{
    return render(value.si(), significant, "J/m\xC2\xB2",
                  [](const Decimal& d) { return withPrefix(d, "J/m\xC2\xB2", -15, 12); });
}

std::string format(Irradiance value, int significant)
{
    return render(value.si(), significant, "W/m\xC2\xB2",
                  [](const Decimal& d) { return withPrefix(d, "W/m\xC2\xB2", -15, 15); });
}

std::string format(Angle value, int significant)
{
    return render(value.si(), significant, "rad", [](const Decimal& d) { return withPrefix(d, "rad", -9, 0); });
}

std::string format(Frequency value, int significant)
{
    return render(value.si(), significant, "Hz", [](const Decimal& d) { return withPrefix(d, "Hz", -3, 12); });
}

std::string format(Length value, int significant)
{
    return render(value.si(), significant, "m", [](const Decimal& d) { return withPrefix(d, "m", -12, 3); });
}

std::string format(Area value, int significant)
{
    // Prefixes on a squared unit square too, so areas get their own steps: mm², cm², m².
    return render(value.si(), significant, "m\xC2\xB2", [](const Decimal& d) {
        if (d.exponent >= 0)
            return inUnit(d, 0, "m\xC2\xB2");
        if (d.exponent >= -4)
            return inUnit(d, -4, "cm\xC2\xB2");
        return inUnit(d, -6, "mm\xC2\xB2");
    });
}

} // namespace beamwarden::units
