#include "eyewearverbs.hpp"

#include "beamwarden/caution.hpp"
#include "beamwarden/eyewear/odtable.hpp"
#include "beamwarden/eyewear/protection.hpp"
#include "flagvalues.hpp"
#include "hazardrequest.hpp"
#include "verbs.hpp"

#include <fmt/core.h>
#include <nlohmann/json.hpp>

#include <cmath>

namespace beamwarden::cli {

namespace {

using namespace beamwarden::eyewear;
using nlohmann::json;

std::vector<FlagSpec> checkFlags()
{
    std::vector<FlagSpec> flags = hazardFlags();
    flags.insert(flags.end() - 2, {
                                      {"marking", true, "TEXT", "EN 207 marking(s), lines separated by ';'"},
                                      {"en208", true, "TEXT", "EN 208 alignment marking(s), separated by ';'"},
                                      {"od-table", true, "FILE", "spectral OD table: lines 'FROM-TO OD' in nm"},
                                      {"name", true, "TEXT", "the item's name, for the report"},
                                  });
    return flags;
}

std::vector<std::string> splitLines(const std::string& text)
{
    std::vector<std::string> out;
    std::size_t start = 0;
    while (start <= text.size()) {
        const auto semi = text.find(';', start);
        std::string part = text.substr(start, semi == std::string::npos ? std::string::npos : semi - start);
        if (part.find_first_not_of(' ') != std::string::npos)
            out.push_back(part);
        if (semi == std::string::npos)
            break;
        start = semi + 1;
    }
    return out;
}

int refuse(const InputError& error)
{
    InputError e = error;
    if (!e.field.starts_with("--") && e.field.find(':') == std::string::npos)
        e.field = "--" + e.field;
    fmt::print(stderr, "beamwarden-cli eyewear: {}\n", e.message());
    return kExitBadInput;
}

json levelsJson(const std::array<int, kModeCount>& levels)
{
    json out = json::object();
    for (int m = 0; m < kModeCount; ++m) {
        const int n = levels[static_cast<std::size_t>(m)];
        if (n > 0)
            out[std::string(1, letter(static_cast<Mode>(m)))] = n;
    }
    return out;
}

std::array<int, kModeCount> maxLevels(const std::vector<LevelRequirement>& levels)
{
    std::array<int, kModeCount> out{};
    for (const LevelRequirement& l : levels) {
        for (const ModeRequirement& m : l.modes)
            out[static_cast<std::size_t>(m.mode)] = std::max(out[static_cast<std::size_t>(m.mode)], m.level);
    }
    return out;
}

std::string levelsText(const std::array<int, kModeCount>& levels)
{
    std::string out;
    for (int m = 0; m < kModeCount; ++m) {
        const int n = levels[static_cast<std::size_t>(m)];
        if (n == 0)
            continue;
        out += out.empty() ? "" : ", ";
        out += n > 10 ? fmt::format("{} beyond LB10", letter(static_cast<Mode>(m)))
                      : fmt::format("{} LB{}", letter(static_cast<Mode>(m)), n);
    }
    return out;
}

std::vector<std::string> levelNotes(const std::vector<LevelRequirement>& levels)
{
    std::vector<std::string> notes;
    for (const LevelRequirement& l : levels) {
        for (const std::string& n : l.notes) {
            if (std::find(notes.begin(), notes.end(), n) == notes.end())
                notes.push_back(n);
        }
    }
    return notes;
}

int runLevel(const std::vector<std::string>& argv)
{
    auto args = Arguments::parse(argv, hazardFlags());
    if (!args)
        return refuse(args.error());
    if (args->has("help")) {
        fmt::print("Usage: beamwarden-cli eyewear level SOURCE-FLAGS (as for 'od') [--json]\n\nThe EN 207 level each "
                   "test mode requires at the eyewear, and the marking it implies.\n");
        return kExitOk;
    }
    auto request = hazardRequestFrom(*args);
    if (!request)
        return refuse(request.error());
    auto requirement = requirementFor(*request, "output", "as given");
    if (!requirement)
        return refuse(asFlagError(requirement.error(), *args));
    const auto levels = maxLevels(requirement->levels);
    const auto marking = impliedMarking(requirement->levels);
    const std::string markingText = marking ? format(*marking) : "none: a level beyond LB10 is required";
    const std::vector<std::string> notes = levelNotes(requirement->levels);
    if (args->has("json")) {
        json basis = json::array();
        for (const LevelRequirement& l : requirement->levels) {
            for (const ModeRequirement& m : l.modes)
                basis.push_back(json{{"wavelength_nm", l.lambda_nm},
                                     {"mode", std::string(1, letter(m.mode))},
                                     {"level", m.level},
                                     {"density", m.density},
                                     {"basis", m.basis}});
        }
        json out{
            {"required_levels", levelsJson(levels)},
            {"marking", marking ? json(format(*marking)) : json(nullptr)},
            {"required_od", requirement->hazard.requiredOd},
            {"alignment_level", requirement->alignment.visible ? json(requirement->alignment.level) : json(nullptr)},
            {"basis", basis},
            {"complete", notes.empty()},
            {"notes", notes},
            {"caution", caution()}};
        fmt::print("{}\n", out.dump(2));
        return kExitOk;
    }
    fmt::print("EN 207 levels required at the eyewear ({})\n", limits::toString(request->rules));
    fmt::print("  required levels  {}\n  implied marking  {}\n  required OD      {:.1f} (and over every wavelength of "
               "the output)\n",
               levelsText(levels), markingText, hazard::roundOdUp(requirement->hazard.requiredOd));
    for (const LevelRequirement& l : requirement->levels) {
        if (requirement->levels.size() > 3)
            break;
        for (const ModeRequirement& m : l.modes)
            fmt::print("    {} at {:g} nm: LB{} from {}\n", letter(m.mode), l.lambda_nm, m.level, m.basis);
    }
    if (requirement->alignment.visible)
        fmt::print("  EN 208 (alignment) RB{}: {}\n", requirement->alignment.level, requirement->alignment.basis);
    for (const std::string& n : notes)
        fmt::print("\nNote: {}\n", n);
    fmt::print("\n{}\n", caution());
    return kExitOk;
}

int runCheck(const std::vector<std::string>& argv)
{
    auto args = Arguments::parse(argv, checkFlags());
    if (!args)
        return refuse(args.error());
    if (args->has("help")) {
        fmt::print("Usage: beamwarden-cli eyewear check (--marking TEXT | --en208 TEXT | --od-table FILE) "
                   "SOURCE-FLAGS [--json]\n\nWhether an eyewear item protects against the output: covers, falls "
                   "short or cannot tell, with the reasons and the margin in OD.\n");
        return kExitOk;
    }
    model::EyewearItem item;
    item.name = args->value("name").value_or("the eyewear");
    // A flag given empty is refused, never dropped: the check would otherwise run as if the item had no marking.
    if (const auto m = args->value("marking")) {
        item.en207Markings = splitLines(*m);
        if (item.en207Markings.empty())
            return refuse(
                InputError{"--marking", "", "an EN 207 marking such as '1064 D LB7' (lines separated by ';')"});
    }
    if (const auto m = args->value("en208")) {
        item.en208Markings = splitLines(*m);
        if (item.en208Markings.empty())
            return refuse(InputError{"--en208", "", "an EN 208 marking such as '532 RB3' (lines separated by ';')"});
    }
    if (const auto table = args->value("od-table")) {
        auto rows = readOdTable(*table);
        if (!rows) {
            // The reader names the file and line; the flag goes in front so the message says where it came from.
            InputError error = rows.error();
            error.field = error.field == "od-table" ? "--od-table" : "--od-table " + error.field;
            return refuse(error);
        }
        item.spectralOd = *rows;
    }
    auto eyewear = parseEyewear(item);
    if (!eyewear)
        return refuse(eyewear.error());
    auto request = hazardRequestFrom(*args);
    if (!request)
        return refuse(request.error());
    auto requirement = requirementFor(*request, "the output", "as given");
    if (!requirement)
        return refuse(asFlagError(requirement.error(), *args));
    const OutputCheck check = checkOutput(*eyewear, *requirement);
    const auto marking = impliedMarking(requirement->levels);
    std::vector<std::string> reasons = check.reasons;
    for (const std::string& n : levelNotes(requirement->levels)) {
        if (std::find(reasons.begin(), reasons.end(), n) == reasons.end())
            reasons.push_back(n);
    }
    const bool odKnown = !std::isnan(check.marginOd);
    if (args->has("json")) {
        json out{{"verdict", toString(check.verdict)},
                 {"reasons", reasons},
                 {"required_od", check.requiredOd},
                 {"provided_od", odKnown ? json(check.providedOd) : json(nullptr)},
                 {"margin_od", std::isfinite(check.marginOd) ? json(check.marginOd) : json(nullptr)},
                 {"worst_wavelength_nm", odKnown ? json(check.worstWavelength_nm) : json(nullptr)},
                 {"required_levels", levelsJson(check.requiredLevels)},
                 {"marking", marking ? json(format(*marking)) : json(nullptr)},
                 {"caution", caution()}};
        fmt::print("{}\n", out.dump(2));
        return kExitOk;
    }
    fmt::print("Eyewear check: {}\n  verdict          {}\n", item.name, toString(check.verdict));
    // A margin that is not a number means the provided OD is not known: say so rather than print "nan".
    if (std::isnan(check.marginOd))
        fmt::print("  required OD      {:.1f}; provided: not known; margin: cannot tell\n",
                   hazard::roundOdUp(check.requiredOd));
    else
        fmt::print("  required OD      {:.1f}; provided {:.1f} at {:.1f} nm; margin {:+.2f}\n",
                   hazard::roundOdUp(check.requiredOd), check.providedOd, check.worstWavelength_nm, check.marginOd);
    fmt::print("  required levels  {}\n  implied marking  {}\n", levelsText(check.requiredLevels),
               marking ? format(*marking) : "none: a level beyond LB10 is required");
    for (const std::string& r : reasons)
        fmt::print("  - {}\n", r);
    fmt::print("\n{}\n", caution());
    return kExitOk;
}

} // namespace

int runEyewear(const std::vector<std::string>& args)
{
    if (args.empty() || args.front() == "--help") {
        fmt::print("Usage: beamwarden-cli eyewear level|check [FLAGS]\n  level   EN 207 levels and marking a source "
                   "requires\n  check   whether an eyewear item protects against a source\n");
        return args.empty() ? kExitBadInput : kExitOk;
    }
    const std::vector<std::string> rest(args.begin() + 1, args.end());
    if (args.front() == "level")
        return runLevel(rest);
    if (args.front() == "check")
        return runCheck(rest);
    fmt::print(stderr, "beamwarden-cli eyewear: unknown sub-command '{}'; expected level or check\n", args.front());
    return kExitBadInput;
}

} // namespace beamwarden::cli
