// Opening a lab file: the input is the bytes of an SQLite file (seeded with small real lab files). Each run writes
// them to a private temporary folder and checks, opens and reads the file the way `lab check` and the GUI do.
#include "beamwarden/store/labexport.hpp"
#include "beamwarden/store/labstore.hpp"
#include "fuzzsupport.hpp"

#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <string>

namespace {

namespace fs = std::filesystem;

fs::path g_folder;

void removeFolder()
{
    std::error_code ignored;
    fs::remove_all(g_folder, ignored);
}

} // namespace

extern "C" int LLVMFuzzerInitialize(int*, char***)
{
    std::string pattern = (fs::temp_directory_path() / "bw-fuzz-labfile-XXXXXX").string();
    if (mkdtemp(pattern.data()) == nullptr)
        std::abort();
    g_folder = pattern;
    std::atexit(removeFolder);
    return 0;
}

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size)
{
    using namespace beamwarden;
    const fs::path path = g_folder / "fuzz.bwlab";
    std::error_code ignored;
    for (const char* suffix : {"", "-wal", "-shm", "-journal"})
        fs::remove(path.string() + suffix, ignored);
    {
        std::ofstream out(path, std::ios::binary);
        out.write(reinterpret_cast<const char*>(data), static_cast<std::streamsize>(size));
    }
    (void)store::checkLabFile(path);
    auto opened = store::LabStore::open(path);
    if (!opened)
        return 0;
    (void)opened->check();
    if (auto contents = opened->contents())
        (void)store::toLabExport(*contents);
    if (auto lab = opened->lab())
        (void)opened->saveLab(*lab);
    return 0;
}
