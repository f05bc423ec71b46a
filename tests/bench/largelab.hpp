#pragma once
// The large lab of the store and GUI budgets: an invented laboratory (no real people, institutions or products) with
// lasers of every common kind, an eyewear shelf with EN 207 markings and OD tables, and years of assessments with
// their sign-offs. Generated from a fixed seed, so every run of every program sees the same records.
#include "beamwarden/error.hpp"
#include "beamwarden/store/labcontents.hpp"

#include <filesystem>

namespace beamwarden::bench {

struct LargeLabSize {
    int lasers = 1000;
    int eyewear = 10000;
    int assessments = 100000;
    // Each assessment stores the engines' full results (about 30 kB, as the History panel records them) rather than
    // their headline figures (about 1 kB); full results make the default lab a 3 GB file that takes minutes to write.
    bool fullResults = false;
};

// The records, identical for identical sizes.
[[nodiscard]] store::LabContents makeLargeLab(const LargeLabSize& size);

// Writes a new lab file at `path` through the store's API, in one transaction; refuses an existing path.
[[nodiscard]] Result<void> writeLargeLab(const std::filesystem::path& path, const LargeLabSize& size);

// The lab file for `size` in `folder` (created if missing): generated on first use by running `generator`
// (make_large_lab) and kept, so later runs reuse it. The name carries the sizes and the generator's version, so a
// changed generator never reads a stale file. A child process keeps the generator's memory and allocator settings
// out of the measuring process.
[[nodiscard]] Result<std::filesystem::path>
cachedLargeLab(const std::filesystem::path& folder, const LargeLabSize& size, const std::filesystem::path& generator);

// Where programs without a scratch argument keep their files: $BEAMWARDEN_BENCH_SCRATCH, else the build's
// bench-scratch folder.
[[nodiscard]] std::filesystem::path defaultScratchFolder();

} // namespace beamwarden::bench
