#include "mpeverb.hpp"

#include "arguments.hpp"
#include "beamwarden/caution.hpp"
#include "beamwarden/limits/mpe.hpp"
#include "beamwarden/limits/report.hpp"
#include "flagvalues.hpp"
#include "verbs.hpp"

#include <charconv>
#include <fmt/core.h>
#include <nlohmann/json.hpp>

namespace beamwarden::cli {

namespace {

using namespace beamwarden::limits;

const std::vector<FlagSpec>& mpeFlags()
{
    static const std::vector<FlagSpec> flags = {
        {"wavelength", true, "LENGTH", "wavelength, 180 nm to 1 mm (e.g. 800nm, 10.6um)"},
        {"duration", true, "TIME", "exposure duration; with --prf, the duration of one pulse (e.g. 0.25s, 35fs)"},
        {"target", true, "eye|skin", "what is exposed (default eye)"},
        {"prf", true, "FREQUENCY", "pulse repetition rate: evaluate a pulse train (e.g. 1kHz)"},
        {"exposure", true, "TIME", "with --prf: duration of the exposure to the train (e.g. 10s)"},
        {"burst-count", true, "N", "with --prf: pulses per burst, pulses at the prf within a burst"},
        {"burst-rate", true, "FREQUENCY", "with --burst-count: rate at which the bursts repeat"},
        {"source-angle", true, "ANGLE", "apparent source angle alpha (default 0: small source)"},
        {"skin-area", true, "AREA", "irradiated skin area, for the large-area skin limit beyond 1400 nm"},
        {"rules", true, "SET", "strictest (default), iec60825-1:2014 or iec60825-1:2007"},
        {"c5", true, "OPTION", "2014 repeated-pulse factor: conservative (default) or edition"},
        {"json", false, "", "print the result as JSON"},
        {"help", false, "", "show these flags"},
    };
    return flags;
}

void printMpeHelp()
{
    fmt::print("Usage: beamwarden-cli mpe --wavelength L --duration T [FLAGS]\n\n"
               "Maximum permissible exposure for one wavelength, for a single exposure or a pulse train.\n\n");
    for (const FlagSpec& flag : mpeFlags())
        fmt::print("  --{:<13} {:<10} {}\n", flag.name, flag.meta, flag.help);
    fmt::print("\nExit codes: 0 done, 2 input refused (the message names the flag).\n");
}

int refuse(const InputError& error)
{
    fmt::print(stderr, "beamwarden-cli mpe: {}\n", error.message());
    return kExitBadInput;
}

Result<int> parseCount(const std::string& text)
{
    int value = 0;
    const auto [end, ec] = std::from_chars(text.data(), text.data() + text.size(), value);
    if (ec != std::errc{} || end != text.data() + text.size() || value < 1)
        return fail("--burst-count", text, "a whole number of pulses, 1 or more");
    return value;
}

// Reads the flags into a request; every missing or bad value is refused with the flag's name.
Result<MpeRequest> requestFrom(const Arguments& args)
{
    MpeRequest request;
    const auto wavelength = args.value("wavelength");
    if (!wavelength)
        return fail("--wavelength", "", "a wavelength such as 800nm (180 nm to 1 mm)");
    auto lambda = units::parseWavelength(*wavelength, "--wavelength");
    if (!lambda)
        return std::unexpected(lambda.error());
    request.wavelength = *lambda;

    const auto duration = args.value("duration");
    if (!duration)
        return fail("--duration", "", "a duration such as 0.25s (with --prf: the pulse duration, e.g. 35fs)");
    auto t = units::parseDuration(*duration, "--duration");
    if (!t)
        return std::unexpected(t.error());
    request.duration = *t;

    if (const auto target = args.value("target")) {
        auto parsed = parseTarget(*target);
        if (!parsed)
            return fail("--target", *target, "eye or skin");
        request.target = *parsed;
    }
    auto flags = ruleFlags(args);
    if (!flags)
        return std::unexpected(flags.error());
    request.rules = flags->rules;
    request.c5 = flags->c5;
    if (const auto angle = args.value("source-angle")) {
        auto parsed = units::parseAngle(*angle, "--source-angle");
        if (!parsed)
            return std::unexpected(parsed.error());
        request.sourceAngle = *parsed;
    }
    if (const auto area = args.value("skin-area")) {
        auto parsed = units::parseArea(*area, "--skin-area");
        if (!parsed)
            return std::unexpected(parsed.error());
        request.skinArea = *parsed;
    }

    const auto prf = args.value("prf");
    const auto exposure = args.value("exposure");
    const auto burstCount = args.value("burst-count");
    const auto burstRate = args.value("burst-rate");
    if (!prf) {
        if (exposure)
            return fail("--exposure", *exposure, "--exposure together with --prf (a single exposure uses --duration)");
        if (burstCount || burstRate)
            return fail(burstCount ? "--burst-count" : "--burst-rate", burstCount ? *burstCount : *burstRate,
                        "bursts together with --prf and --exposure");
        return request;
    }
    PulseTrain train;
    auto f = units::parseFrequency(*prf, "--prf");
    if (!f)
        return std::unexpected(f.error());
    train.prf = *f;
    if (!exposure)
        return fail("--exposure", "", "the duration of the exposure to the train, e.g. 10s (no default is assumed)");
    auto te = units::parseDuration(*exposure, "--exposure");
    if (!te)
        return std::unexpected(te.error());
    train.exposure = *te;
    if (burstCount || burstRate) {
        if (!burstCount || !burstRate)
            return fail(burstCount ? "--burst-rate" : "--burst-count", "",
                        "both --burst-count and --burst-rate for a burst train");
        auto n = parseCount(*burstCount);
        if (!n)
            return std::unexpected(n.error());
        auto fb = units::parseFrequency(*burstRate, "--burst-rate");
        if (!fb)
            return std::unexpected(fb.error());
        train.burst = Burst{*n, *fb};
    }
    request.train = train;
    return request;
}

void printText(const MpeResult& result)
{
    const MpeRequest& r = result.request;
    const SetOutcome& governing = result.governing();
    fmt::print("Maximum permissible exposure ({}, {})\n", toString(r.target), toString(r.rules));
    fmt::print("  wavelength          {}\n", units::format(r.wavelength));
    if (r.train) {
        fmt::print("  pulse duration      {}\n  repetition rate     {}\n  exposure            {}\n",
                   units::format(r.duration), units::format(r.train->prf), units::format(r.train->exposure));
        if (r.train->burst)
            fmt::print("  bursts              {} pulses, repeated at {}\n", r.train->burst->pulsesPerBurst,
                       units::format(r.train->burst->burstRate));
    } else {
        fmt::print("  exposure duration   {}\n", units::format(r.duration));
    }
    fmt::print("  source angle        {}\n\n", r.sourceAngle.si() > 0 ? units::format(r.sourceAngle) : "small source");

    if (r.train) {
        fmt::print("  MPE per pulse       {}  ({})\n", units::format(result.perPulse()),
                   toString(governing.train->governingRule));
        fmt::print("  MPE over exposure   {}  = {} average\n", units::format(result.radiantExposure()),
                   units::format(result.irradiance()));
    } else {
        fmt::print("  MPE                 {}  = {}\n", units::format(result.radiantExposure()),
                   units::format(result.irradiance()));
    }
    fmt::print("  governing set       {}\n\n",
               result.setsTie ? std::string("both sets give this figure") : std::string(fullName(governing.set)));

    for (const SetOutcome& set : result.allSets()) {
        fmt::print("  {}: {}{}\n", ruleSet(set.set).name, units::format(set.limit), set.train ? " per pulse" : "");
        if (set.train) {
            const TrainOutcome& t = *set.train;
            fmt::print("    single pulse    {}{}\n", units::format(t.singlePulse.perPulse),
                       t.singlePulse.grouped ? fmt::format(" (Ti group of {:.4g} pulses)", t.singlePulse.groupSize)
                                             : "");
            fmt::print("    average power   {}  ({:.4g} pulses{})\n", units::format(t.average.perPulse),
                       t.average.pulsesCounted, t.average.overBurst ? " in one burst" : " in the exposure");
            if (t.repeated.applies)
                fmt::print("    pulse train     {}  (N = {:.4g}, C5 = {:.4g}{})\n", units::format(t.repeated.perPulse),
                           t.repeated.pulsesCounted, t.repeated.c5, t.repeated.grouped ? ", Ti groups" : "");
            else
                fmt::print("    pulse train     does not apply here\n");
        }
        const LimitTerm& basis = set.single.governingTerm();
        fmt::print("    row             {}\n", describeTerm(basis));
    }
    for (const std::string& note : resultNotes(result))
        fmt::print("\nNote: {}\n", note);
    fmt::print("\n{}\n", caution());
}

} // namespace

int runMpe(const std::vector<std::string>& argv)
{
    auto args = Arguments::parse(argv, mpeFlags());
    if (!args)
        return refuse(args.error());
    if (args->has("help")) {
        printMpeHelp();
        return kExitOk;
    }
    if (!args->positional().empty())
        return refuse(InputError{"command line", args->positional().front(), "flags only (see --help)"});
    auto request = requestFrom(*args);
    if (!request)
        return refuse(request.error());
    auto result = evaluateMpe(*request);
    if (!result)
        return refuse(asFlagError(result.error(), *args));
    if (args->has("json"))
        fmt::print("{}\n", toJson(*result).dump(2));
    else
        printText(*result);
    return kExitOk;
}

} // namespace beamwarden::cli
