#pragma once
// A small, strict parser for "verb --flag value --switch" command lines. Unknown flags are errors, so a typo never
// silently falls back to a default.
#include "beamwarden/error.hpp"

#include <map>
#include <optional>
#include <set>
#include <string>
#include <vector>

namespace beamwarden::cli {

struct FlagSpec {
    std::string name; // without the leading dashes, e.g. "wavelength"
    bool takesValue;  // false: a switch such as --json
    std::string meta; // shown in help, e.g. "LENGTH"
    std::string help; // one line
};

class Arguments {
public:
    // Parses argv[first..] against the flag specs. Accepts "--name value" and "--name=value".
    [[nodiscard]] static Result<Arguments> parse(const std::vector<std::string>& args,
                                                 const std::vector<FlagSpec>& specs);

    [[nodiscard]] bool has(const std::string& name) const
    {
        return m_values.contains(name) || m_switches.contains(name);
    }
    [[nodiscard]] std::optional<std::string> value(const std::string& name) const;
    [[nodiscard]] const std::vector<std::string>& positional() const { return m_positional; }

private:
    std::map<std::string, std::string> m_values;
    std::set<std::string> m_switches;
    std::vector<std::string> m_positional;
};

} // namespace beamwarden::cli
