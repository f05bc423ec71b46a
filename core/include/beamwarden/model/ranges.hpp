#pragma once
// The range each single quantity of a record must lie in, in one place: the model's validate functions refuse with
// these words, and the GUI marks a field with them as soon as a value is typed. Upper ends lie far beyond any
// laboratory laser (the largest CW lasers reach about a megawatt, the largest single pulses a few megajoules,
// petawatt-class peaks about 1e16 W; from memory): they catch slips such as 1e300 W and keep every later product
// finite, and never refuse a real source.
#include "beamwarden/error.hpp"

#include <cstdint>
#include <string>
#include <string_view>

namespace beamwarden::model {

inline constexpr double kMaxAveragePower_W = 1e9; // 1 GW, CW or mean power
inline constexpr double kMaxPulseEnergy_J = 1e8;  // 100 MJ per pulse
inline constexpr double kMaxPeakPower_W = 1e18;   // pulse energy / pulse duration (checked by the emission)
inline constexpr double kMaxPrf_Hz = 1e13;        // 10 THz, the limit engine's end too (limits/validate.cpp)

enum class Quantity : std::uint8_t {
    Wavelength,    // m, 180 nm to 1 mm (the rule sets' span)
    AveragePower,  // W, above 0, at most kMaxAveragePower_W
    PulseEnergy,   // J, above 0, at most kMaxPulseEnergy_J
    PulseDuration, // s, above 0, at most 30000 s
    Prf,           // Hz, above 0, at most kMaxPrf_Hz
    BeamDiameter,  // m, above 0, at most 10 m
    Divergence,    // rad, 0 (collimated) to 3.2 (full angle)
    Exposure,      // s, above 0, at most 30000 s (the tables' end)
    Distance,      // m, 0 (at the exit) to 1000 km
};

// What the quantity allows, in words, e.g. "a power above 0 W and at most 1 GW".
[[nodiscard]] std::string allowedRange(Quantity quantity);

// Refuses `si` (in the quantity's SI unit) outside its range or not finite, naming `field` and quoting the value
// with every digit it has.
[[nodiscard]] Result<void> checkRange(Quantity quantity, double si, std::string_view field);

} // namespace beamwarden::model
