#include "hazardverbs.hpp"

#include "beamwarden/caution.hpp"
#include "beamwarden/hazard/report.hpp"
#include "flagvalues.hpp"
#include "hazardrequest.hpp"
#include "verbs.hpp"

#include <fmt/core.h>
#include <nlohmann/json.hpp>

namespace beamwarden::cli {

namespace {

using namespace beamwarden::hazard;

enum class Focus { Distance, Density };

void printHelp(const char* verb, const char* summary)
{
    fmt::print("Usage: beamwarden-cli {} --wavelength L (--power P | --pulse-energy Q --duration T --prf F) "
               "--beam-diameter D --divergence A [FLAGS]\n\n{}\n\n",
               verb, summary);
    for (const FlagSpec& flag : hazardFlags())
        fmt::print("  --{:<19} {:<10} {}\n", flag.name, flag.meta, flag.help);
    fmt::print("\nExit codes: 0 done, 2 input refused (the message names the flag).\n");
}

std::string exposureText(double value, bool pulsed)
{
    return pulsed ? units::format(units::RadiantExposure::fromSi(value)) + " per pulse"
                  : units::format(units::Irradiance::fromSi(value));
}

std::string distanceText(const HazardDistance& d)
{
    switch (d.kind) {
    case DistanceKind::Zero:
        return "0 m (below the MPE from the exit on)";
    case DistanceKind::Unbounded:
        return "no finite distance (the hazard does not end within the model)";
    case DistanceKind::Finite:
        break;
    }
    return units::format(d.value);
}

void printSource(const HazardResult& r)
{
    const model::Emission& e = r.request.emission;
    std::string light;
    if (e.spectrum.isSingleLine())
        light = units::format(e.spectrum.samples.front().wavelength);
    else
        light = fmt::format("{} to {} ({} samples)", units::format(e.spectrum.shortest()),
                            units::format(e.spectrum.longest()), e.spectrum.samples.size());
    if (e.pulsed)
        fmt::print("  output          {}, {} pulses at {}, {} per pulse ({} mean)\n", light,
                   units::format(e.pulseDuration), units::format(e.prf), units::format(e.pulseEnergy),
                   units::format(e.averagePower));
    else
        fmt::print("  output          {}, CW {}\n", light, units::format(e.averagePower));
    const model::Beam& b = r.request.beam;
    fmt::print("  beam            {} at the exit, divergence {} ({}), profile {}\n", units::format(b.diameter),
               units::format(b.divergence), model::toString(b.definition), model::toString(b.profile));
    fmt::print("  viewing         {}, worst point {} away\n", model::toString(r.request.exposureCase.viewing),
               units::format(r.pointDistance));
    fmt::print("  exposure basis  {}\n\n", r.basis.reason);
}

void printResult(const HazardResult& r, Focus focus)
{
    fmt::print("{} ({})\n", focus == Focus::Distance ? "Nominal ocular hazard distance" : "Required optical density",
               limits::toString(r.request.rules));
    printSource(r);
    const LineResult& g = r.lines[r.governingLine];
    fmt::print("  exposure        {} at the worst point\n", exposureText(r.exposureAtPoint, r.pulsed));
    fmt::print(
        "  MPE             {} at {} ({}, {})\n", exposureText(r.limit, r.pulsed), units::format(g.sample.wavelength),
        r.pulsed ? limits::toString(r.governingRule) : std::string_view("single exposure"),
        g.mpe.setsTie ? std::string("both rule sets") : std::string(limits::ruleSet(g.mpe.governing().set).name));
    fmt::print("  exposure / MPE  {:.4g}{}\n", r.combinedRatio, r.lines.size() > 1 ? " (additive lines summed)" : "");
    fmt::print("  required OD     {} (exact {:.3f}; rounded up, never down)\n", fmt::format("{:.1f}", r.displayedOd),
               r.requiredOd);
    for (const RuleOd& rule : r.perRule) {
        if (rule.applies)
            fmt::print("    {:<14} OD {:.3f} against {} per pulse\n", limits::toString(rule.rule), rule.od,
                       units::format(units::RadiantExposure::fromSi(rule.perPulseLimit)));
    }
    if (r.bands.size() > 1 || r.lines.size() > 1) {
        fmt::print("  OD per band\n");
        for (const BandOd& band : r.bands) {
            const std::string where = band.from == band.to ? units::format(band.from)
                                                           : units::format(band.from) + " to " + units::format(band.to);
            fmt::print("    {:<26} OD {:.1f}\n", where, roundOdUp(band.requiredOd));
        }
    }
    const bool diffuse = r.request.exposureCase.viewing == model::Viewing::Diffuse;
    fmt::print("  {}  {}\n", diffuse ? "hazard radius " : "NOHD          ", distanceText(r.nohd));
    if (r.nohd.kind == DistanceKind::Finite) {
        fmt::print("    model         {}\n", r.nohd.model);
        if (r.nohd.linear.si() > 0.0)
            fmt::print("    linear growth {} (for comparison with printed examples)\n", units::format(r.nohd.linear));
        if (r.nohd.smallSource.si() > 0.0)
            fmt::print("    as a small source (no C6) {}\n", units::format(r.nohd.smallSource));
    }
    fmt::print("\nHow this was formed:\n");
    for (const std::string& c : r.conventions)
        fmt::print("  - {}\n", c);
    for (const std::string& note : r.notes)
        fmt::print("\nNote: {}\n", note);
    fmt::print("\n{}\n", caution());
}

int run(const std::vector<std::string>& argv, const char* verb, const char* summary, Focus focus)
{
    auto args = Arguments::parse(argv, hazardFlags());
    if (!args) {
        fmt::print(stderr, "beamwarden-cli {}: {}\n", verb, args.error().message());
        return kExitBadInput;
    }
    if (args->has("help")) {
        printHelp(verb, summary);
        return kExitOk;
    }
    auto request = hazardRequestFrom(*args);
    if (!request) {
        fmt::print(stderr, "beamwarden-cli {}: {}\n", verb, request.error().message());
        return kExitBadInput;
    }
    auto result = evaluateHazard(*request);
    if (!result) {
        fmt::print(stderr, "beamwarden-cli {}: {}\n", verb, asFlagError(result.error(), *args).message());
        return kExitBadInput;
    }
    if (args->has("json"))
        fmt::print("{}\n", toJson(*result).dump(2));
    else
        printResult(*result, focus);
    return kExitOk;
}

} // namespace

int runNohd(const std::vector<std::string>& args)
{
    return run(args, "nohd", "Nominal ocular hazard distance (or hazard radius of a diffuse reflection).",
               Focus::Distance);
}

int runOd(const std::vector<std::string>& args)
{
    return run(args, "od", "Optical density that eyewear must reach at the worst point a person can be.",
               Focus::Density);
}

} // namespace beamwarden::cli
