#include "flagvalues.hpp"

#include <charconv>
#include <cmath>

namespace beamwarden::cli {

Result<RuleFlags> ruleFlags(const Arguments& args)
{
    RuleFlags flags;
    if (const auto rules = args.value("rules")) {
        auto parsed = limits::parseRuleChoice(*rules);
        if (!parsed)
            return fail("--rules", *rules, "strictest, iec60825-1:2014 or iec60825-1:2007");
        flags.rules = *parsed;
    }
    if (const auto c5 = args.value("c5")) {
        auto parsed = limits::parseC5Option(*c5);
        if (!parsed)
            return fail("--c5", *c5, "conservative or edition");
        flags.c5 = *parsed;
    }
    return flags;
}

InputError asFlagError(InputError error, const Arguments& args)
{
    if (error.field.empty() || error.field.starts_with("--") || error.field.find_first_of(":[. ") != std::string::npos)
        return error;
    const std::string flag = error.field;
    error.field = "--" + flag;
    if (const auto given = args.value(flag); given && !error.value.empty())
        error.value = *given;
    return error;
}

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
