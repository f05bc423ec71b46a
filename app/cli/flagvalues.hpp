#pragma once
// Reading typed values from flags: each helper refuses with the flag's name, so every verb reports alike.
#include "arguments.hpp"
#include "beamwarden/limits/types.hpp"
#include "beamwarden/units.hpp"

#include <optional>

namespace beamwarden::cli {

// The flag's value parsed by `parse`, std::nullopt if the flag is absent, or the parser's error under the flag name.
template <typename Q>
Result<std::optional<Q>> optionalQuantity(const Arguments& args, const std::string& flag,
                                          Result<Q> (*parse)(std::string_view, std::string_view))
{
    const auto text = args.value(flag);
    if (!text)
        return std::optional<Q>{};
    const std::string name = "--" + flag;
    auto value = parse(*text, name);
    if (!value)
        return std::unexpected(value.error());
    return std::optional<Q>{*value};
}

// --rules and --c5, shared by every verb that evaluates limits; absent flags keep the defaults (strictest,
// conservative).
struct RuleFlags {
    limits::RuleChoice rules = limits::RuleChoice::Strictest;
    limits::C5Option c5 = limits::C5Option::Conservative;
};
[[nodiscard]] Result<RuleFlags> ruleFlags(const Arguments& args);

// A core refusal in the command line's words: the field as its flag ("power" -> "--power") and, when the user gave
// that flag, the value quoted as typed rather than as the core prints the number. Fields that are no flag name
// ("lines[0].wavelength", "the eyewear: en207[0]: marking") keep their own text.
[[nodiscard]] InputError asFlagError(InputError error, const Arguments& args);

// A plain number in [lo, hi], e.g. a reflectance or a numerical aperture.
[[nodiscard]] Result<std::optional<double>> optionalNumber(const Arguments& args, const std::string& flag, double lo,
                                                           double hi, const std::string& allowed);

} // namespace beamwarden::cli
