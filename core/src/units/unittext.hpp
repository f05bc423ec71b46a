#pragma once
// Text helpers shared by the parser and the printer, so both agree on prefix letters and on what counts as text.
#include <array>
#include <optional>
#include <string>
#include <string_view>

namespace beamwarden::units::internal {

inline constexpr std::string_view kMicroSign = "\xC2\xB5";      // U+00B5, what we print
inline constexpr std::string_view kGreekMu = "\xCE\xBC";        // U+03BC, what some keyboards type
inline constexpr std::string_view kSuperscriptTwo = "\xC2\xB2"; // U+00B2
inline constexpr std::string_view kDegreeSign = "\xC2\xB0";     // U+00B0

struct SiPrefix {
    char letter;             // as typed; 'u' stands for µ
    std::string_view symbol; // as printed
    int exponent;            // power of ten
};

// Centi is left out: it is accepted only on metres, and never chosen when printing.
inline constexpr std::array<SiPrefix, 10> kPrefixes{{
    {'f', "f", -15},
    {'p', "p", -12},
    {'n', "n", -9},
    {'u', kMicroSign, -6},
    {'m', "m", -3},
    {'k', "k", 3},
    {'M', "M", 6},
    {'G', "G", 9},
    {'T', "T", 12},
    {'P', "P", 15},
}};

// The power of ten a prefix letter stands for; case matters ("m" milli, "M" mega).
[[nodiscard]] std::optional<int> prefixExponent(char letter, bool allowCenti);

// The printed symbol for a multiple of three between -15 and 15, "" for 0.
[[nodiscard]] std::string_view prefixSymbol(int exponent);

// value × 10^exponent, dividing for negative exponents so that exact decimal inputs round once.
[[nodiscard]] double scaleByPowerOfTen(double value, int exponent);

} // namespace beamwarden::units::internal
