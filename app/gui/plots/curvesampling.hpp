#pragma once
// Small helpers shared by the limit-curve builders: sampling grids, decade-rounded ranges, text from core.
#include <QString>

#include <limits>
#include <string>
#include <string_view>
#include <utility>
#include <vector>

namespace beamwarden::gui::curves {

inline constexpr int kCurvePoints = 200;
inline const double kNaN = std::numeric_limits<double>::quiet_NaN(); // a break in a curve: no data there

[[nodiscard]] QString text(const std::string& s);
[[nodiscard]] QString text(std::string_view s);

// Log-spaced values from `from` to `to`, both included exactly.
[[nodiscard]] std::vector<double> logSpaced(double from, double to, int count);

// The decades that hold every finite positive value, with a decade of headroom on each side of an exact decade and at
// least `minDecades` between them.
[[nodiscard]] std::pair<double, double> decadeRange(const std::vector<double>& values, int minDecades = 2);

} // namespace beamwarden::gui::curves
