#pragma once
// Tick labels for logarithmic axes: one label per power of ten, written the way a person reads it ("1 ns", "10 cm",
// "10⁻³"), and how many decades to skip between labels so they do not collide.
#include <QString>

#include <cstdint>

namespace beamwarden::gui {

// How the decades of an axis are written.
enum class TickStyle : std::uint8_t {
    PowerOfTen, // 10⁻³, 10⁻², 0.1 … written as powers of ten (the unit goes in the axis title)
    Duration,   // 1 fs, 10 fs, 100 fs, 1 ps … 1 s, 10 s, 1 ks, 10 ks
    Distance,   // 1 mm, 1 cm, 10 cm, 1 m, 10 m, 100 m, 1 km … 1000 km, then powers of ten in km
    Plain,      // linear axes: numbers as they are
};

// The label at 10^exponent.
[[nodiscard]] QString decadeLabel(int exponent, TickStyle style);

// "10" followed by the exponent in superscript digits, e.g. 10⁻¹³.
[[nodiscard]] QString powerOfTen(int exponent);

// The step (in decades) between labels so that at most `room` labels are shown over `decades` decades. Durations
// prefer steps of 3 so that every label is a whole prefix (1 fs, 1 ps, 1 ns).
[[nodiscard]] int decadeStep(int decades, int room, TickStyle style);

} // namespace beamwarden::gui
