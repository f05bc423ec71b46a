#include "verbs.hpp"

#include "assessverb.hpp"
#include "backupverb.hpp"
#include "beamwarden/caution.hpp"
#include "eyewearverbs.hpp"
#include "hazardverbs.hpp"
#include "labverbs.hpp"
#include "mpeverb.hpp"
#include "sheetverb.hpp"

#include <fmt/core.h>

#include <algorithm>
#include <cstdio>

namespace beamwarden::cli {

namespace {

void printVersion()
{
    fmt::print("beamwarden-cli {}\n", programVersion());
}

void printHelp()
{
    fmt::print("beamwarden-cli {}: exposure limits, hazard distances and eyewear checks for laser labs.\n\n",
               programVersion());
    fmt::print("Usage: beamwarden-cli VERB [FLAGS]\n       beamwarden-cli --help | --version\n\nVerbs:\n");
    for (const Verb& verb : verbs())
        fmt::print("  {:<10} {}\n", verb.name, verb.summary);
    fmt::print("\nRun 'beamwarden-cli VERB --help' for a verb's flags.\n\n{}\n", caution());
}

} // namespace

const std::vector<Verb>& verbs()
{
    static const std::vector<Verb> all = {
        {"mpe", "maximum permissible exposure: one wavelength, single exposure or pulse train", runMpe},
        {"nohd", "nominal ocular hazard distance for one output and exposure case", runNohd},
        {"od", "optical density eyewear must reach for one output and exposure case", runOd},
        {"assess", "assess a lab's lasers: every output and case, eye and skin, the shelf checked", runAssess},
        {"eyewear", "EN 207 levels a source requires (level) and protection checks of an item (check)", runEyewear},
        {"sheet", "a laser's hazard sheet from a lab file, as PDF (no display needed)", runSheet},
        {"lab", "lab files: new [--demo], export, import, check, import-eyewear", runLab},
        {"backup", "copy a lab file safely, even while it is open", runBackup},
        {"help", "show this overview",
         [](const std::vector<std::string>&) {
             printHelp();
             return kExitOk;
         }},
        {"version", "show the program version",
         [](const std::vector<std::string>&) {
             printVersion();
             return kExitOk;
         }},
    };
    return all;
}

int run(const std::vector<std::string>& args)
{
    if (args.empty()) {
        printHelp();
        return kExitBadInput;
    }
    const std::string& first = args.front();
    if (first == "--help" || first == "-h") {
        printHelp();
        return kExitOk;
    }
    if (first == "--version") {
        printVersion();
        return kExitOk;
    }
    const auto& all = verbs();
    const auto verb = std::find_if(all.begin(), all.end(), [&](const Verb& v) { return v.name == first; });
    if (verb == all.end()) {
        fmt::print(stderr, "beamwarden-cli: unknown verb '{}'; run 'beamwarden-cli --help' for the list\n", first);
        return kExitBadInput;
    }
    return verb->run(std::vector<std::string>(args.begin() + 1, args.end()));
}

} // namespace beamwarden::cli
