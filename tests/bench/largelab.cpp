// Assembles the large lab and keeps its file between runs.
#include "largelab.hpp"

#include "beamwarden/assessment/assessment.hpp"
#include "beamwarden/store/labstore.hpp"
#include "childprocess.hpp"
#include "largelabparts.hpp"

#include <fmt/core.h>
#include <nlohmann/json.hpp>

#include <cstdlib>
#include <unistd.h>

namespace beamwarden::bench {

namespace {

constexpr std::uint64_t kSeed = 0x6265616d77617264ULL; // any fixed number; this one spells "beamward"
// Raise with every change to what the generator writes, so cached files of the old content are not reused.
constexpr int kGeneratorVersion = 1;
// The eyewear an assessment's stored results were checked against: a few items from the shelf, so that a stored
// result has the size of a real one without carrying the whole shelf.
constexpr int kCheckedEyewear = 3;
// A full-results lab of the default size takes minutes on the reference machine; anything beyond this is stuck.
constexpr double kGeneratorTimeout_s = 1800;

// The headline of a result: every scalar of the result, its cases and its eye and skin figures, and the eyewear
// verdicts, without the provenance (rows, terms, conventions) that makes a full result about 30 kB.
nlohmann::json headline(const nlohmann::json& full)
{
    const auto scalars = [](const nlohmann::json& object) {
        nlohmann::json out = nlohmann::json::object();
        for (const auto& [key, value] : object.items()) {
            if (!value.is_object() && !value.is_array())
                out[key] = value;
        }
        return out;
    };
    nlohmann::json out = scalars(full);
    for (const char* key : {"covering_eyewear", "covering_pairs", "purchase_markings", "notes"}) {
        if (full.contains(key))
            out[key] = full[key];
    }
    for (const auto& output : full.value("outputs", nlohmann::json::array())) {
        nlohmann::json cases = nlohmann::json::array();
        for (const auto& c : output.value("cases", nlohmann::json::array())) {
            nlohmann::json kept = scalars(c);
            for (const char* part : {"eye", "skin"}) {
                if (c.contains(part) && c[part].is_object())
                    kept[part] = scalars(c[part]);
            }
            cases.push_back(std::move(kept));
        }
        out["outputs"].push_back(nlohmann::json{{"name", output.value("name", "")}, {"cases", std::move(cases)}});
    }
    for (const auto& item : full.value("eyewear", nlohmann::json::array()))
        out["eyewear"].push_back(scalars(item));
    return out;
}

// The figures stored with each of a laser's assessments: the laser assessed by the engines, as the History panel
// records them (in full, or their headline to keep a 100 000-assessment file near 200 MB instead of 3 GB).
std::string resultsOf(const model::Laser& laser, const std::vector<model::EyewearItem>& checked, bool full)
{
    auto assessed = assessment::assessLaser(laser, checked);
    if (!assessed)
        return nlohmann::json{{"refused", assessed.error().message()}}.dump();
    const nlohmann::json results = assessment::toJson(*assessed);
    return full ? results.dump() : headline(results).dump();
}

} // namespace

model::Lab makeLargeLabRecord(int roomCount)
{
    model::Lab lab;
    lab.name = "Harrowgate Applied Optics Laboratory";
    lab.lsoName = "Dr. T. Quennell";
    lab.notes = "An invented laboratory for Beamwarden's benchmarks; none of its people, lasers or eyewear exist.";
    for (int i = 0; i < roomCount; ++i) {
        const bool teaching = i % 10 == 9;
        lab.rooms.push_back(model::Room{0, fmt::format("{}{:03}", teaching ? 'T' : 'B', 101 + i),
                                        teaching ? "teaching laboratory" : "research laboratory"});
    }
    return lab;
}

store::LabContents makeLargeLab(const LargeLabSize& size)
{
    Random random(kSeed);
    store::LabContents contents;
    contents.lab = makeLargeLabRecord(std::max(4, size.lasers / 25));
    const auto& rooms = contents.lab.rooms;
    contents.eyewear.reserve(static_cast<std::size_t>(size.eyewear));
    for (int i = 0; i < size.eyewear; ++i) {
        contents.eyewear.push_back(makeEyewear(random, i + 1, rooms));
        contents.eyewear.back().id = i + 1;
    }
    contents.lasers.reserve(static_cast<std::size_t>(size.lasers));
    contents.assessments.reserve(static_cast<std::size_t>(size.assessments));
    const int each = size.lasers > 0 ? size.assessments / size.lasers : 0;
    const int extra = size.lasers > 0 ? size.assessments % size.lasers : 0;
    for (int i = 0; i < size.lasers; ++i) {
        model::Laser laser = makeLaser(random, i + 1, rooms);
        laser.id = i + 1;
        std::vector<model::EyewearItem> checked;
        for (int k = 0; k < kCheckedEyewear && !contents.eyewear.empty(); ++k)
            checked.push_back(random.pick(contents.eyewear));
        const std::string snapshot =
            nlohmann::json{{"laser", laser.name}, {"rule_set", "strictest"}, {"c5_option", "conservative"}}.dump();
        const std::string results = resultsOf(laser, checked, size.fullResults);
        for (model::Assessment& a : makeHistory(random, laser, each + (i < extra ? 1 : 0), snapshot, results))
            contents.assessments.push_back(std::move(a));
        contents.lasers.push_back(std::move(laser));
    }
    return contents;
}

Result<void> writeLargeLab(const std::filesystem::path& path, const LargeLabSize& size)
{
    auto store = store::LabStore::create(path, makeLargeLab(size));
    if (!store)
        return std::unexpected(store.error());
    return {};
}

Result<std::filesystem::path> cachedLargeLab(const std::filesystem::path& folder, const LargeLabSize& size,
                                             const std::filesystem::path& generator)
{
    const auto path =
        folder / fmt::format("large-lab-v{}-{}-lasers-{}-eyewear-{}-assessments{}.bwlab", kGeneratorVersion,
                             size.lasers, size.eyewear, size.assessments, size.fullResults ? "-full" : "");
    std::error_code error;
    if (std::filesystem::exists(path, error))
        return path;
    std::filesystem::create_directories(folder, error);
    // Written under a private name and renamed when complete: an interrupted run leaves no file that looks done,
    // and two programs generating at once do not write into each other's file.
    auto partial = path;
    partial += fmt::format(".partial-{}", ::getpid());
    std::filesystem::remove(partial, error);
    std::vector<std::string> arguments{partial.string(),
                                       "--lasers",
                                       std::to_string(size.lasers),
                                       "--eyewear",
                                       std::to_string(size.eyewear),
                                       "--assessments",
                                       std::to_string(size.assessments)};
    if (size.fullResults)
        arguments.emplace_back("--full-results");
    const ChildRun run = runChild(generator.string(), arguments, {}, "", kGeneratorTimeout_s);
    if (run.exitCode != 0) {
        std::filesystem::remove(partial, error);
        return fail("large lab", generator.string() + " " + partial.string(),
                    "a generator that writes the file (it said: " + run.output + ")");
    }
    std::filesystem::rename(partial, path, error);
    if (error)
        return fail("scratch folder", folder.string(), "a folder where the large lab file can be written");
    return path;
}

std::filesystem::path defaultScratchFolder()
{
    if (const char* folder = std::getenv("BEAMWARDEN_BENCH_SCRATCH"); folder != nullptr && *folder != '\0')
        return folder;
    return BEAMWARDEN_BENCH_SCRATCH_DEFAULT;
}

} // namespace beamwarden::bench
