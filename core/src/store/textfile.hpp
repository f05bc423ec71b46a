#pragma once
// Whole-file text input and output for imports and exports.
#include "beamwarden/error.hpp"

#include <filesystem>
#include <string>
#include <string_view>

namespace beamwarden::store {

// Refuses files over `limit` bytes: an import is a lab's worth of records, never gigabytes.
[[nodiscard]] Result<std::string> readTextFile(const std::filesystem::path& path, std::size_t limit = 256u << 20);

// Writes `text` to a temporary file next to `path`, flushes it and renames it over `path`, so a reader never sees
// half a file and a failed write leaves the old one.
[[nodiscard]] Result<void> writeTextFileAtomically(const std::filesystem::path& path, std::string_view text);

} // namespace beamwarden::store
