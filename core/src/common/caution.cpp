#include "beamwarden/caution.hpp"

#include "beamwarden_version.hpp"

namespace beamwarden {

std::string_view caution() noexcept
{
    return "Caution: these figures follow the published formula structure of the rule set named with them. "
           "They support, and never replace, the judgement of your institution's laser safety officer; local "
           "regulations and the manufacturer's data take precedence. Check every input before relying on a figure.";
}

std::string_view programVersion() noexcept
{
    return build::kVersion;
}

} // namespace beamwarden
