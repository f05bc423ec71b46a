#include "beamwarden/error.hpp"

#include "beamwarden/text.hpp"

namespace beamwarden {

namespace {

// The value quoted back is the user's own input: enough of it to recognise, never a pasted page, and with bytes
// that are not UTF-8 or would steer a terminal shown as U+FFFD.
constexpr std::size_t kQuotedBytes = 300;

} // namespace

std::string InputError::message() const
{
    std::string out = field.empty() ? std::string{} : text::displayable(field, kQuotedBytes) + ": ";
    out += value.empty() ? std::string{"no value given"}
                         : "'" + text::displayable(value, kQuotedBytes) + "' is not accepted";
    if (!allowed.empty())
        out += "; expected " + text::displayable(allowed);
    return out;
}

} // namespace beamwarden
