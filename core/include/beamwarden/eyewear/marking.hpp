#pragma once
// EN 207 markings of laser protective eyewear, as printed on filters and frames (hazard-and-eyewear.md section
// 6.7): e.g. "1064 D LB7 + I LB8", "900 - 1070 D LB7 + IR LB8 + M LB8Y", "IR 315-532 LB6", "D 1064 L6".
#include "beamwarden/error.hpp"

#include <cstdint>
#include <string>
#include <string_view>
#include <vector>

namespace beamwarden::eyewear {

// EN 207 test modes: D continuous wave, I pulsed, R Q-switched, M mode-locked.
enum class Mode : std::uint8_t { D, I, R, M };
inline constexpr int kModeCount = 4;
[[nodiscard]] char letter(Mode mode);

// A single wavelength (from == to) or a closed range, in nm.
struct WavelengthSpan {
    double from_nm = 0;
    double to_nm = 0;
    [[nodiscard]] bool contains(double lambda_nm) const { return lambda_nm >= from_nm && lambda_nm <= to_nm; }
    friend bool operator==(const WavelengthSpan&, const WavelengthSpan&) = default;
};

// One term: wavelengths (a value, a range, or values joined by '/'), modes, protection level.
struct MarkingTerm {
    std::vector<WavelengthSpan> wavelengths;
    std::uint8_t modes = 0;           // bit (1 << Mode)
    int level = 0;                    // LB1..LB10
    bool notTestedAtLowRates = false; // the "Y" suffix
    [[nodiscard]] bool has(Mode mode) const { return (modes & (1U << static_cast<unsigned>(mode))) != 0; }
    [[nodiscard]] bool covers(double lambda_nm) const;
    friend bool operator==(const MarkingTerm&, const MarkingTerm&) = default;
};

// One marked line: terms joined by '+'; a term without wavelengths inherits the previous term's.
struct En207Marking {
    std::vector<MarkingTerm> terms;
    friend bool operator==(const En207Marking&, const En207Marking&) = default;
};

// Parses one line; an error names the part that failed and what was expected there.
[[nodiscard]] Result<En207Marking> parseEn207(std::string_view text);
// Prints wavelength first, as DGUV and EN print it: "900-1070 D LB7 + IR LB8 + M LB8Y". Inherited wavelengths are
// printed once, so the output parses back to the same content.
[[nodiscard]] std::string format(const En207Marking& marking);

} // namespace beamwarden::eyewear
