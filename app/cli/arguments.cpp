#include "arguments.hpp"

#include <algorithm>

namespace beamwarden::cli {

Result<Arguments> Arguments::parse(const std::vector<std::string>& args, const std::vector<FlagSpec>& specs)
{
    Arguments parsed;
    for (std::size_t i = 0; i < args.size(); ++i) {
        const std::string& arg = args[i];
        if (!arg.starts_with("--") || arg == "--") {
            parsed.m_positional.push_back(arg);
            continue;
        }
        std::string name = arg.substr(2);
        std::optional<std::string> inlineValue;
        if (const auto eq = name.find('='); eq != std::string::npos) {
            inlineValue = name.substr(eq + 1);
            name.resize(eq);
        }
        const auto spec = std::find_if(specs.begin(), specs.end(), [&](const FlagSpec& s) { return s.name == name; });
        if (spec == specs.end())
            return fail("command line", arg, "one of the flags listed by --help");
        if (parsed.has(name))
            return fail("--" + name, arg, "the flag once only");
        if (!spec->takesValue) {
            if (inlineValue)
                return fail("--" + name, arg, "--" + name + " without a value");
            parsed.m_switches.insert(name);
            continue;
        }
        if (inlineValue) {
            parsed.m_values[name] = *inlineValue;
        } else if (i + 1 < args.size()) {
            parsed.m_values[name] = args[++i];
        } else {
            return fail("--" + name, "", "a value (" + spec->meta + ") after --" + name);
        }
    }
    return parsed;
}

std::optional<std::string> Arguments::value(const std::string& name) const
{
    if (const auto it = m_values.find(name); it != m_values.end())
        return it->second;
    return std::nullopt;
}

} // namespace beamwarden::cli
