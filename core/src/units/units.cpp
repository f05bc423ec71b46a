#include "units/unittext.hpp"

#include <cstddef>

namespace beamwarden::units::internal {

std::optional<int> prefixExponent(char letter, bool allowCenti)
{
    if (letter == 'c')
        return allowCenti ? std::optional<int>{-2} : std::nullopt;
    for (const SiPrefix& prefix : kPrefixes) {
        if (prefix.letter == letter)
            return prefix.exponent;
    }
    return std::nullopt;
}

std::string_view prefixSymbol(int exponent)
{
    for (const SiPrefix& prefix : kPrefixes) {
        if (prefix.exponent == exponent)
            return prefix.symbol;
    }
    return {};
}

double scaleByPowerOfTen(double value, int exponent)
{
    // Powers of ten up to 1e22 are exact doubles; larger shifts go in exact steps.
    constexpr int kExactLimit = 22;
    while (exponent != 0) {
        const int step = exponent > kExactLimit ? kExactLimit : (exponent < -kExactLimit ? -kExactLimit : exponent);
        double power = 1.0;
        for (int i = 0; i < (step < 0 ? -step : step); ++i)
            power *= 10.0;
        value = step < 0 ? value / power : value * power;
        exponent -= step;
    }
    return value;
}

} // namespace beamwarden::units::internal
