#include "assessverb.hpp"

#include "arguments.hpp"
#include "beamwarden/assessment/assessment.hpp"
#include "beamwarden/caution.hpp"
#include "beamwarden/hazard/report.hpp"
#include "beamwarden/store/labstore.hpp"
#include "flagvalues.hpp"
#include "verbs.hpp"

#include <fmt/core.h>
#include <nlohmann/json.hpp>

namespace beamwarden::cli {

namespace {

const std::vector<FlagSpec>& assessFlags()
{
    static const std::vector<FlagSpec> flags = {
        {"laser", true, "NAME", "assess only this laser"},
        {"rules", true, "SET", "strictest (default), iec60825-1:2014 or iec60825-1:2007"},
        {"c5", true, "OPTION", "2014 repeated-pulse factor: conservative (default) or edition"},
        {"json", false, "", "print {\"lasers\": [...]} as JSON"},
        {"help", false, "", "show these flags"},
    };
    return flags;
}

int refuse(const InputError& error)
{
    fmt::print(stderr, "beamwarden-cli assess: {}\n", error.message());
    return error.field == store::kStorageField ? kExitFailed : kExitBadInput;
}

std::string distance(const hazard::HazardDistance& d)
{
    switch (d.kind) {
    case hazard::DistanceKind::Zero:
        return "0 m";
    case hazard::DistanceKind::Unbounded:
        return "no finite distance";
    case hazard::DistanceKind::Finite:
        break;
    }
    return units::format(d.value);
}

void printText(const assessment::LaserAssessment& a)
{
    fmt::print("{} ({}; class {}; {})\n", a.laser.name, a.laser.room.empty() ? "no room" : a.laser.room,
               model::toString(a.laser.laserClass), limits::toString(a.options.rules));
    for (const assessment::OutputAssessment& o : a.outputs) {
        for (const assessment::CaseAssessment& c : o.cases) {
            const hazard::HazardResult& h = c.eye;
            const std::string mpe = h.pulsed ? units::format(units::RadiantExposure::fromSi(h.limit)) + " per pulse"
                                             : units::format(units::Irradiance::fromSi(h.limit));
            fmt::print("  {:<12} {:<24} MPE {:<22} eye {:<22} skin {:<18} NOHD {:<12} OD {:.1f}\n", o.name, c.name, mpe,
                       assessment::exposureVerdict(h.combinedRatio), assessment::exposureVerdict(c.skin.ratio),
                       distance(h.nohd), h.displayedOd);
        }
    }
    for (const assessment::EyewearOutcome& e : a.eyewear)
        fmt::print("  eyewear {:<34} {}\n", e.itemName, eyewear::toString(e.check.verdict));
    for (const std::string& m : a.selection.purchaseMarkings)
        fmt::print("  purchase: {}\n", m);
    for (const std::string& n : a.notes)
        fmt::print("  note: {}\n", n);
}

} // namespace

int runAssess(const std::vector<std::string>& argv)
{
    auto args = Arguments::parse(argv, assessFlags());
    if (!args)
        return refuse(args.error());
    if (args->has("help")) {
        fmt::print("Usage: beamwarden-cli assess LAB [--laser NAME] [--json]\n\nEvery output and exposure case of the "
                   "lab's lasers: MPE, exposure verdicts, NOHD, required OD, and the shelf's eyewear checked.\n");
        return kExitOk;
    }
    if (args->positional().size() != 1)
        return refuse(InputError{"LAB", "", "one lab file (.bwlab)"});
    assessment::AssessmentOptions options;
    const auto flags = ruleFlags(*args);
    if (!flags)
        return refuse(flags.error());
    options.rules = flags->rules;
    options.c5 = flags->c5;
    auto store = store::LabStore::open(args->positional().front());
    if (!store)
        return refuse(store.error());
    auto lasers = store->lasers();
    if (!lasers)
        return refuse(lasers.error());
    auto shelf = store->eyewear();
    if (!shelf)
        return refuse(shelf.error());

    const auto only = args->value("laser");
    nlohmann::json out{{"lasers", nlohmann::json::array()}};
    bool found = !only;
    for (const model::Laser& laser : *lasers) {
        if (only && laser.name != *only)
            continue;
        found = true;
        auto result = assessment::assessLaser(laser, *shelf, options);
        if (!result)
            return refuse(result.error());
        if (args->has("json")) {
            nlohmann::json one = assessment::toJson(*result);
            one.erase("caution");
            out["lasers"].push_back(one);
        } else {
            printText(*result);
            fmt::print("\n");
        }
    }
    if (!found) {
        std::string names;
        for (const model::Laser& laser : *lasers)
            names += (names.empty() ? "" : ", ") + laser.name;
        return refuse(InputError{"--laser", *only, "one of the lab's lasers: " + names});
    }
    if (args->has("json")) {
        out["caution"] = caution();
        fmt::print("{}\n", out.dump(2));
    } else {
        fmt::print("{}\n", caution());
    }
    return kExitOk;
}

} // namespace beamwarden::cli
