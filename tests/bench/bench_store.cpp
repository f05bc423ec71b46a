// The store's budget: open the large lab file and list its lasers (tests/bench/budgets.txt store_open_large_lab),
// and how opening and reading grow with the number of records. The lab files are generated once into the scratch
// folder ($BEAMWARDEN_BENCH_SCRATCH, else <build>/bench-scratch) and reused; the page cache is warm, as it is
// for a file opened again during a working day.
#include "largelab.hpp"

#include "beamwarden/store/labstore.hpp"

#include <benchmark/benchmark.h>

#include <map>
#include <tuple>

namespace {

using beamwarden::bench::LargeLabSize;
using beamwarden::store::LabStore;

// Generated on first use (outside the timed loop) and kept for the process.
const std::filesystem::path* labFile(benchmark::State& state, const LargeLabSize& size)
{
    static std::map<std::tuple<int, int, int>, std::filesystem::path> files;
    const auto key = std::make_tuple(size.lasers, size.eyewear, size.assessments);
    if (const auto found = files.find(key); found != files.end())
        return &found->second;
    // make_large_lab sits beside this program in the build's bin folder.
    const auto generator = std::filesystem::read_symlink("/proc/self/exe").parent_path() / "make_large_lab";
    auto path = beamwarden::bench::cachedLargeLab(beamwarden::bench::defaultScratchFolder(), size, generator);
    if (!path) {
        state.SkipWithError(path.error().message().c_str());
        return nullptr;
    }
    return &files.emplace(key, *path).first->second;
}

LargeLabSize sizeFrom(const benchmark::State& state)
{
    return LargeLabSize{static_cast<int>(state.range(0)), static_cast<int>(state.range(1)),
                        static_cast<int>(state.range(2))};
}

// Open (with the checks before any write) and list the lasers with their outputs and cases.
void openAndList(benchmark::State& state, const std::filesystem::path& path)
{
    for (auto _ : state) {
        auto store = LabStore::open(path);
        if (!store) {
            state.SkipWithError(store.error().message().c_str());
            return;
        }
        auto lasers = store->lasers();
        if (!lasers) {
            state.SkipWithError(lasers.error().message().c_str());
            return;
        }
        benchmark::DoNotOptimize(lasers->data());
    }
}

// The budget: the default large lab.
void BM_StoreOpenLargeLab(benchmark::State& state)
{
    if (const auto* path = labFile(state, LargeLabSize{}))
        openAndList(state, *path);
}
BENCHMARK(BM_StoreOpenLargeLab)->Unit(benchmark::kMillisecond);

// The two halves of the budget, to see which one grows.
void BM_StoreOpenOnly(benchmark::State& state)
{
    const auto* path = labFile(state, LargeLabSize{});
    if (path == nullptr)
        return;
    for (auto _ : state) {
        auto store = LabStore::open(*path);
        if (!store) {
            state.SkipWithError(store.error().message().c_str());
            return;
        }
        benchmark::DoNotOptimize(store->path());
    }
}
BENCHMARK(BM_StoreOpenOnly)->Unit(benchmark::kMillisecond);

void BM_StoreListLasers(benchmark::State& state)
{
    const auto* path = labFile(state, LargeLabSize{});
    if (path == nullptr)
        return;
    auto store = LabStore::open(*path);
    if (!store) {
        state.SkipWithError(store.error().message().c_str());
        return;
    }
    for (auto _ : state) {
        auto lasers = store->lasers();
        if (!lasers) {
            state.SkipWithError(lasers.error().message().c_str());
            return;
        }
        benchmark::DoNotOptimize(lasers->data());
    }
}
BENCHMARK(BM_StoreListLasers)->Unit(benchmark::kMillisecond);

// Scaling: lasers, eyewear items, assessments. Each laser has 1 to 4 outputs with 1 to 4 cases.
void BM_StoreOpenScaling(benchmark::State& state)
{
    if (const auto* path = labFile(state, sizeFrom(state)))
        openAndList(state, *path);
}
BENCHMARK(BM_StoreOpenScaling)
    ->ArgNames({"lasers", "eyewear", "assessments"})
    ->Args({100, 10000, 1000})
    ->Args({100, 10000, 10000})
    ->Args({100, 10000, 100000})
    ->Args({1000, 10000, 1000})
    ->Args({1000, 10000, 10000})
    ->Args({1000, 10000, 100000})
    ->Args({1000, 1000, 100000})
    ->Unit(benchmark::kMillisecond);

// What the desktop application reads on opening (LabDocument): the records without the assessments, which it reads
// a laser at a time.
void BM_StoreRecordsLargeLab(benchmark::State& state)
{
    const auto* path = labFile(state, LargeLabSize{});
    if (path == nullptr)
        return;
    for (auto _ : state) {
        auto store = LabStore::open(*path);
        if (!store) {
            state.SkipWithError(store.error().message().c_str());
            return;
        }
        auto records = store->records();
        if (!records) {
            state.SkipWithError(records.error().message().c_str());
            return;
        }
        benchmark::DoNotOptimize(records->eyewear.data());
    }
}
BENCHMARK(BM_StoreRecordsLargeLab)->Unit(benchmark::kMillisecond);

// Everything the file holds, as an export reads it.
void BM_StoreContentsScaling(benchmark::State& state)
{
    const auto* path = labFile(state, sizeFrom(state));
    if (path == nullptr)
        return;
    for (auto _ : state) {
        auto store = LabStore::open(*path);
        if (!store) {
            state.SkipWithError(store.error().message().c_str());
            return;
        }
        auto contents = store->contents();
        if (!contents) {
            state.SkipWithError(contents.error().message().c_str());
            return;
        }
        benchmark::DoNotOptimize(contents->lasers.data());
    }
}
BENCHMARK(BM_StoreContentsScaling)
    ->ArgNames({"lasers", "eyewear", "assessments"})
    ->Args({1000, 10000, 1000})
    ->Args({1000, 10000, 10000})
    ->Args({1000, 10000, 100000})
    ->Unit(benchmark::kMillisecond);

} // namespace

BENCHMARK_MAIN();
