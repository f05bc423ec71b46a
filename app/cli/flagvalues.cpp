#include "flagvalues.hpp"

#include <charconv>
#include <cmath>

namespace beamwarden::cli {

Result<std::optional<double>> optionalNumber(const Arguments& args, const std::string& flag, double lo, double hi,
                                             const std::string& allowed)
{
    const auto text = args.value(flag);
    if (!text)
        return std::optional<double>{};
    double value = 0.0;
    const char* begin = text->data();
    const char* end = begin + text->size();
    const auto [stop, ec] = std::from_chars(begin, end, value);
    if (ec != std::errc{} || stop != end || !std::isfinite(value) || value < lo || value > hi)
        return fail("--" + flag, *text, allowed);
    return std::optional<double>{value};
}

} // namespace beamwarden::cli
