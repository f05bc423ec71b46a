#include "demolocation.hpp"

namespace beamwarden::cli {

namespace {

constexpr const char* kDemoFile = "demo.bwlab.json";

bool isFile(const std::filesystem::path& path)
{
    std::error_code error;
    return std::filesystem::is_regular_file(path, error);
}

} // namespace

std::optional<std::filesystem::path> demoLabExport()
{
    std::error_code error;
    const auto executable = std::filesystem::read_symlink("/proc/self/exe", error);
    if (!error) {
        const auto installed = executable.parent_path().parent_path() / "share" / "beamwarden" / kDemoFile;
        if (isFile(installed))
            return installed;
    }
#ifdef BEAMWARDEN_RESOURCE_DIR
    const auto source = std::filesystem::path(BEAMWARDEN_RESOURCE_DIR) / kDemoFile;
    if (isFile(source))
        return source;
#endif
    return std::nullopt;
}

} // namespace beamwarden::cli
