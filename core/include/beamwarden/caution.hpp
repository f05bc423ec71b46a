#pragma once
// The caution every output carries (GUI strip, hazard sheet, CLI). It lives in core so that all outputs say the
// same words; the app may show a translation of it.
#include <string_view>

namespace beamwarden {

// The caution in English, one paragraph.
[[nodiscard]] std::string_view caution() noexcept;

// The program's version, from the top-level CMake project() call.
[[nodiscard]] std::string_view programVersion() noexcept;

} // namespace beamwarden
