#include "beamwarden/error.hpp"

namespace beamwarden {

std::string InputError::message() const
{
    std::string text = field.empty() ? std::string{} : field + ": ";
    text += value.empty() ? std::string{"no value given"} : "'" + value + "' is not accepted";
    if (!allowed.empty())
        text += "; expected " + allowed;
    return text;
}

} // namespace beamwarden
