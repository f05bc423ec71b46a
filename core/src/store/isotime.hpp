#pragma once
// The record's dates and times as ISO 8601 text: inspection dates "YYYY-MM-DD" and UTC times
// "YYYY-MM-DDTHH:MM:SSZ" (fractions of a second allowed).
#include <string>
#include <string_view>

namespace beamwarden::store {

[[nodiscard]] bool isIsoDate(std::string_view text);
[[nodiscard]] bool isIsoUtcTime(std::string_view text);
// The current time, to the second, e.g. "2026-12-01T14:03:00Z".
[[nodiscard]] std::string utcNow();

} // namespace beamwarden::store
