#include "store/textfile.hpp"

#include "beamwarden/store/labstore.hpp"

#include <fstream>
#include <sstream>

namespace beamwarden::store {

Result<std::string> readTextFile(const std::filesystem::path& path, std::size_t limit)
{
    std::error_code error;
    if (!std::filesystem::is_regular_file(path, error))
        return fail("file", path.string(), "an existing file");
    const auto size = std::filesystem::file_size(path, error);
    if (error)
        return fail(std::string(kStorageField), path.string() + ": " + error.message(), "");
    if (size > limit)
        return fail("file", path.string(), "a file of at most " + std::to_string(limit >> 20) + " MiB");
    std::ifstream in(path, std::ios::binary);
    std::ostringstream text;
    text << in.rdbuf();
    if (!in && !in.eof())
        return fail(std::string(kStorageField), path.string() + ": could not be read", "");
    return text.str();
}

Result<void> writeTextFileAtomically(const std::filesystem::path& path, std::string_view text)
{
    const std::filesystem::path partial(path.string() + ".partial");
    {
        std::ofstream out(partial, std::ios::binary | std::ios::trunc);
        out.write(text.data(), static_cast<std::streamsize>(text.size()));
        out.flush();
        if (!out) {
            std::error_code ignored;
            std::filesystem::remove(partial, ignored);
            return fail(std::string(kStorageField), partial.string() + ": could not be written", "");
        }
    }
    std::error_code error;
    std::filesystem::rename(partial, path, error);
    if (error) {
        std::filesystem::remove(partial, error);
        return fail(std::string(kStorageField), path.string() + ": " + error.message(), "");
    }
    return {};
}

} // namespace beamwarden::store
