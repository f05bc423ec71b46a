#include "plots/curvesampling.hpp"

#include <cmath>

namespace beamwarden::gui::curves {

QString text(const std::string& s)
{
    return QString::fromStdString(s);
}

QString text(std::string_view s)
{
    return QString::fromUtf8(s.data(), static_cast<qsizetype>(s.size()));
}

std::vector<double> logSpaced(double from, double to, int count)
{
    std::vector<double> values;
    const double a = std::log10(from);
    const double b = std::log10(to);
    for (int i = 0; i < count; ++i)
        values.push_back(std::pow(10.0, a + (b - a) * i / (count - 1)));
    values.front() = from;
    values.back() = to;
    return values;
}

std::pair<double, double> decadeRange(const std::vector<double>& values, int minDecades)
{
    double lo = std::numeric_limits<double>::infinity();
    double hi = 0;
    for (const double v : values) {
        if (std::isfinite(v) && v > 0) {
            lo = std::min(lo, v);
            hi = std::max(hi, v);
        }
    }
    if (!(hi > 0))
        return {1e-3, 1e3};
    // Headroom: a value on an exact decade is not drawn on the frame.
    double a = std::ceil(std::log10(lo) - 1e-9) - 1;
    double b = std::floor(std::log10(hi) + 1e-9) + 1;
    while (b - a < minDecades) {
        a -= 1;
        b += 1;
    }
    return {std::pow(10.0, a), std::pow(10.0, b)};
}

} // namespace beamwarden::gui::curves
