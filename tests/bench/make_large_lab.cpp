// make_large_lab: writes the benchmarks' large invented lab to a new lab file, for trying the GUI on it by hand
// (`beamwarden --lab OUT.bwlab`).
// Usage: make_large_lab OUT.bwlab [--lasers N] [--eyewear N] [--assessments N] [--full-results]
#include "largelab.hpp"

#include "beamwarden/store/labstore.hpp"

#include <chrono>
#include <cstdio>
#include <cstdlib>
#include <malloc.h>
#include <string_view>

namespace {

int usage()
{
    std::fputs("usage: make_large_lab OUT.bwlab [--lasers N] [--eyewear N] [--assessments N] [--full-results]\n"
               "  defaults: 1000 lasers, 10000 eyewear items, 100000 assessments storing their headline figures\n"
               "  --full-results: each assessment stores the engines' full results (about 30 kB each)\n",
               stderr);
    return 2;
}

bool readCount(const char* text, int& out)
{
    char* end = nullptr;
    const long value = std::strtol(text, &end, 10);
    if (end == text || *end != '\0' || value < 0 || value > 10'000'000)
        return false;
    out = static_cast<int>(value);
    return true;
}

} // namespace

int main(int argc, char* argv[])
{
    beamwarden::bench::LargeLabSize size;
    const char* out = nullptr;
    for (int i = 1; i < argc; ++i) {
        const std::string_view arg = argv[i];
        int* count = arg == "--lasers"        ? &size.lasers
                     : arg == "--eyewear"     ? &size.eyewear
                     : arg == "--assessments" ? &size.assessments
                                              : nullptr;
        if (count != nullptr) {
            if (i + 1 >= argc || !readCount(argv[++i], *count)) {
                std::fprintf(stderr, "make_large_lab: %s needs a count from 0 to 10000000\n", argv[i - 1]);
                return 2;
            }
        } else if (arg == "--full-results") {
            size.fullResults = true;
        } else if (out == nullptr && !arg.starts_with("-")) {
            out = argv[i];
        } else {
            return usage();
        }
    }
    if (out == nullptr)
        return usage();
    if (size.lasers == 0 && size.assessments > 0) {
        std::fputs("make_large_lab: assessments need at least one laser\n", stderr);
        return 2;
    }
    // Keep freed memory instead of handing it back to the system at once: SQLite allocates and frees a page cache
    // for every trigger program it runs, and the default lab's sign-offs run their triggers hundreds of thousands of
    // times, each time faulting in fresh pages from the system (about 20 s of system time).
    mallopt(M_TRIM_THRESHOLD, 256 << 20);
    mallopt(M_MMAP_THRESHOLD, 64 << 20);
    const auto start = std::chrono::steady_clock::now();
    if (auto written = beamwarden::bench::writeLargeLab(out, size); !written) {
        std::fprintf(stderr, "make_large_lab: %s\n", written.error().message().c_str());
        return written.error().field == beamwarden::store::kStorageField ? 1 : 2;
    }
    const double seconds = std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
    std::printf("%s: %d lasers, %d eyewear items, %d assessments in %.1f s\n", out, size.lasers, size.eyewear,
                size.assessments, seconds);
    return 0;
}
