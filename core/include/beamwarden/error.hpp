#pragma once
// Errors are values at the core's API: every refusal names the field, the value given and what is allowed.
#include <expected>
#include <string>

namespace beamwarden {

struct InputError {
    std::string field;   // which input, e.g. "wavelength" or "outputs[2].beam.divergence"
    std::string value;   // the offending text or number as the user gave it
    std::string allowed; // what would have been accepted, e.g. "180 nm to 1 mm"

    // One line for a person: "wavelength: '5 kg' is not accepted; expected a length such as 800 nm". Bytes that
    // are not UTF-8 and control characters show as U+FFFD (line breaks as spaces); a long value is cut with "…".
    [[nodiscard]] std::string message() const;
};

template <typename T>
using Result = std::expected<T, InputError>;

[[nodiscard]] inline std::unexpected<InputError> fail(std::string field, std::string value, std::string allowed)
{
    return std::unexpected(InputError{std::move(field), std::move(value), std::move(allowed)});
}

} // namespace beamwarden
