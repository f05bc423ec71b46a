#pragma once
// Where the demo lab's export (resources/demo.bwlab.json) is found.
#include <filesystem>
#include <optional>

namespace beamwarden::cli {

// An installed program looks in ../share/beamwarden next to its bin directory; a build tree uses the source
// tree's resources folder (BEAMWARDEN_RESOURCE_DIR).
[[nodiscard]] std::optional<std::filesystem::path> demoLabExport();

} // namespace beamwarden::cli
