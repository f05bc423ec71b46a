// Properties over many pseudo-random requests, and refusals of out-of-range input.
// Sources: exposure-limits.md section 6.1 (evaluation: refuse out-of-range input, collect every applicable limit,
// the per-pulse limit is the lowest of the rules), section 4.8 (strictest = the most protective of the sets, never
// above either), section 4.7 (the conservative C5 option is never less protective than the edition reading),
// section 0.2 / mpe.hpp (provenance: governing row and aperture always filled).
#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <limits>
#include <random>
#include <sstream>
#include <string>
#include <vector>

#include "beamwarden/limits/mpe.hpp"
#include "beamwarden/units.hpp"

using namespace beamwarden::limits;
using beamwarden::units::Angle;
using beamwarden::units::Area;
using beamwarden::units::Duration;
using beamwarden::units::Frequency;
using beamwarden::units::Wavelength;
using Catch::Matchers::Contains;

namespace {

MpeRequest baseRequest(double lambda_nm, double t_s)
{
    MpeRequest request;
    request.wavelength = Wavelength::fromSi(lambda_nm / 1e9);
    request.target = Target::Eye;
    request.duration = Duration::fromSi(t_s);
    request.sourceAngle = Angle::fromSi(0.0);
    request.skinArea = Area::fromSi(0.0);
    return request;
}

MpeRequest withTrain(MpeRequest request, double prf_Hz, double exposure_s)
{
    PulseTrain train;
    train.prf = Frequency::fromSi(prf_Hz);
    train.exposure = Duration::fromSi(exposure_s);
    request.train = train;
    return request;
}

std::string fieldOfRefusal(const MpeRequest& request)
{
    const auto result = evaluateMpe(request);
    INFO((result ? std::string{"accepted"} : result.error().message()));
    REQUIRE_FALSE(result.has_value());
    CHECK_FALSE(result.error().field.empty());
    CHECK_FALSE(result.error().allowed.empty());
    // validate() and evaluateMpe() refuse alike (mpe.hpp: "Evaluates the request (validated first)")
    const auto validated = validate(request);
    REQUIRE_FALSE(validated.has_value());
    CHECK(validated.error().field == result.error().field);
    return result.error().field;
}

void accepted(const MpeRequest& request)
{
    const auto result = evaluateMpe(request);
    INFO((result ? std::string{"accepted"} : result.error().message()));
    CHECK(result.has_value());
    CHECK(validate(request).has_value());
}

bool finitePositive(double x)
{
    return std::isfinite(x) && x > 0.0;
}

} // namespace

TEST_CASE("Out-of-range input is refused and names its field", "[limits][refusal]")
{
    constexpr double nan = std::numeric_limits<double>::quiet_NaN();
    constexpr double inf = std::numeric_limits<double>::infinity();
    const auto ci = Catch::CaseSensitive::No;
    // exposure-limits.md section 6.1 item 1: refuse lambda < 180 nm or > 1e6 nm, durations > 3e4 s, non-finite or
    // negative inputs; mpe.hpp validate(): durations > 0
    CHECK_THAT(fieldOfRefusal(baseRequest(179.0, 1.0)), Contains("wavelength", ci));
    CHECK_THAT(fieldOfRefusal(baseRequest(1.0000001e6, 1.0)), Contains("wavelength", ci));
    CHECK_THAT(fieldOfRefusal(baseRequest(nan, 1.0)), Contains("wavelength", ci));
    CHECK_THAT(fieldOfRefusal(baseRequest(inf, 1.0)), Contains("wavelength", ci));
    CHECK_THAT(fieldOfRefusal(baseRequest(-532.0, 1.0)), Contains("wavelength", ci));
    CHECK_THAT(fieldOfRefusal(baseRequest(532.0, 0.0)), Contains("duration", ci));
    CHECK_THAT(fieldOfRefusal(baseRequest(532.0, -1.0)), Contains("duration", ci));
    CHECK_THAT(fieldOfRefusal(baseRequest(532.0, 30001.0)), Contains("duration", ci));
    CHECK_THAT(fieldOfRefusal(baseRequest(532.0, nan)), Contains("duration", ci));
    CHECK_THAT(fieldOfRefusal(withTrain(baseRequest(532.0, 10e-9), -10.0, 10.0)), Contains("prf", ci));
    CHECK_THAT(fieldOfRefusal(withTrain(baseRequest(532.0, 10e-9), nan, 10.0)), Contains("prf", ci));
    {
        // the exposure to a train is an exposure duration: > 3e4 s is refused
        const std::string field = fieldOfRefusal(withTrain(baseRequest(532.0, 10e-9), 10.0, 30001.0));
        INFO(field);
        CHECK((field.find("exposure") != std::string::npos || field.find("duration") != std::string::npos));
    }
    {
        MpeRequest negativeAngle = baseRequest(532.0, 1.0);
        negativeAngle.sourceAngle = Angle::fromSi(-1e-3);
        CHECK_THAT(fieldOfRefusal(negativeAngle), Contains("angle", ci));
        MpeRequest nanAngle = baseRequest(532.0, 1.0);
        nanAngle.sourceAngle = Angle::fromSi(nan);
        CHECK_THAT(fieldOfRefusal(nanAngle), Contains("angle", ci));
        MpeRequest negativeArea = baseRequest(10600.0, 100.0);
        negativeArea.target = Target::Skin;
        negativeArea.skinArea = Area::fromSi(-0.05);
        CHECK_THAT(fieldOfRefusal(negativeArea), Contains("area", ci));
    }
}

TEST_CASE("The ends of the ranges are accepted", "[limits][refusal]")
{
    // exposure-limits.md: 180 nm - 1 mm; 1e-13 s - 3e4 s (shorter pulses: section 6.3, flagged, not refused)
    accepted(baseRequest(180.0, 1.0));
    accepted(baseRequest(1e6, 1.0));
    accepted(baseRequest(532.0, 3e4));
    accepted(baseRequest(532.0, 1e-14));
    accepted(withTrain(baseRequest(800.0, 100e-15), 80e6, 3e4));
}

TEST_CASE("Pseudo-random requests: every result is finite, positive and traceable", "[limits][properties]")
{
    std::mt19937 rng(0x5eed2025U);
    const auto uniform = [&](double lo, double hi) { return std::uniform_real_distribution<double>(lo, hi)(rng); };
    const auto logUniform = [&](double lo, double hi) {
        return std::pow(10.0, uniform(std::log10(lo), std::log10(hi)));
    };
    const auto chance = [&](double p) { return uniform(0.0, 1.0) < p; };

    struct Choice {
        RuleChoice rules;
        C5Option c5;
    };
    constexpr Choice choices[] = {{RuleChoice::Iec60825_1_2007, C5Option::Conservative},
                                  {RuleChoice::Iec60825_1_2014, C5Option::Conservative},
                                  {RuleChoice::Iec60825_1_2014, C5Option::Edition},
                                  {RuleChoice::Strictest, C5Option::Conservative},
                                  {RuleChoice::Strictest, C5Option::Edition}};

    std::vector<std::string> failures;
    int evaluatedCount = 0;
    int trains = 0;
    int bursts = 0;
    for (int i = 0; i < 3000; ++i) {
        MpeRequest request;
        request.wavelength = Wavelength::fromSi(logUniform(180.0, 1e6) / 1e9);
        request.target = chance(0.5) ? Target::Eye : Target::Skin;
        request.sourceAngle = Angle::fromSi(chance(0.25) ? 0.0 : uniform(0.0, 0.3));
        request.skinArea = Area::fromSi(chance(0.7) ? 0.0 : logUniform(1e-3, 1.0));
        const Choice choice = choices[std::uniform_int_distribution<int>(0, 4)(rng)];
        request.rules = choice.rules;
        request.c5 = choice.c5;
        if (chance(0.4)) {
            const double prf = logUniform(1.0, 1e9);
            const double tp = logUniform(1e-14, std::min(0.5 / prf, 1.0));
            const double exposure = logUniform(2.0 / prf, 3e4);
            request.duration = Duration::fromSi(tp);
            PulseTrain train;
            train.prf = Frequency::fromSi(prf);
            train.exposure = Duration::fromSi(exposure);
            if (chance(0.15)) {
                const int perBurst = std::uniform_int_distribution<int>(2, 50)(rng);
                const double lowest = 2.0 / exposure;
                const double highest = 0.5 * prf / perBurst;
                if (lowest < highest) {
                    Burst burst;
                    burst.pulsesPerBurst = perBurst;
                    burst.burstRate = Frequency::fromSi(logUniform(lowest, highest));
                    train.burst = burst;
                    ++bursts;
                }
            }
            request.train = train;
            ++trains;
        } else {
            request.duration = Duration::fromSi(logUniform(1e-14, 3e4));
        }

        std::ostringstream what;
        what << "#" << i << ": " << request.wavelength.nanometres() << " nm, "
             << (request.target == Target::Eye ? "eye" : "skin") << ", t " << request.duration.seconds() << " s, alpha "
             << request.sourceAngle.radians() << " rad, area " << request.skinArea.si() << " m^2, rules "
             << static_cast<int>(request.rules) << ", c5 " << static_cast<int>(request.c5);
        if (request.train)
            what << ", prf " << request.train->prf.hertz() << " Hz, T " << request.train->exposure.seconds() << " s"
                 << (request.train->burst ? ", burst " + std::to_string(request.train->burst->pulsesPerBurst) : "");
        const auto fail = [&](const std::string& why) { failures.push_back(what.str() + ": " + why); };

        const auto result = evaluateMpe(request);
        if (!result) {
            fail("refused: " + result.error().message());
            continue;
        }
        ++evaluatedCount;
        const MpeResult& r = *result;
        // mpe.hpp / exposure-limits.md section 6.1: a limit is a finite positive number
        if (!finitePositive(r.radiantExposure().si()) || !finitePositive(r.perPulse().si()) ||
            !finitePositive(r.irradiance().si()) || !finitePositive(r.governing().limit.si()))
            fail("limit not finite and positive: H = " + std::to_string(r.radiantExposure().si()) +
                 ", per pulse = " + std::to_string(r.perPulse().si()));
        // exposure-limits.md section 6.1 item 6: provenance with row and aperture
        for (const SetOutcome& set : r.allSets()) {
            if (set.single.count == 0 || set.single.governingTerm().row == nullptr)
                fail("no governing row in set " + std::to_string(static_cast<int>(set.set)));
            else if (!finitePositive(set.single.governingTerm().aperture.si()))
                fail("no aperture in set " + std::to_string(static_cast<int>(set.set)));
            if (request.train && !set.train)
                fail("train without a train outcome");
        }
        // exposure-limits.md section 6.1 item 3: the per-pulse limit is the lowest of the applicable rules
        if (request.train && r.governing().train) {
            const TrainOutcome& t = *r.governing().train;
            double lowest = std::min(t.singlePulse.perPulse.si(), t.average.perPulse.si());
            if (t.repeated.applies)
                lowest = std::min(lowest, t.repeated.perPulse.si());
            if (std::abs(t.perPulse.si() - lowest) > 1e-9 * lowest)
                fail("per-pulse limit " + std::to_string(t.perPulse.si()) + " is not the lowest rule " +
                     std::to_string(lowest));
        }
        if (request.rules == RuleChoice::Strictest) {
            if (r.setCount != 2) {
                fail("strictest evaluated " + std::to_string(r.setCount) + " sets");
                continue;
            }
            // exposure-limits.md section 4.8: never above either set, with the same C5 option
            MpeRequest alone = request;
            double lowest = std::numeric_limits<double>::infinity();
            for (const RuleChoice single : {RuleChoice::Iec60825_1_2007, RuleChoice::Iec60825_1_2014}) {
                alone.rules = single;
                const auto other = evaluateMpe(alone);
                if (!other) {
                    fail("a single set refused what strictest accepted");
                    continue;
                }
                lowest = std::min(lowest, other->perPulse().si());
                if (r.perPulse().si() > other->perPulse().si() * (1.0 + 1e-9))
                    fail("strictest " + std::to_string(r.perPulse().si()) + " above set " +
                         std::to_string(static_cast<int>(single)) + " " + std::to_string(other->perPulse().si()));
            }
            if (std::isfinite(lowest) && std::abs(r.perPulse().si() - lowest) > 1e-9 * lowest)
                fail("strictest " + std::to_string(r.perPulse().si()) + " is not the lower set value " +
                     std::to_string(lowest));
        } else {
            if (r.setCount != 1)
                fail("a single rule set evaluated " + std::to_string(r.setCount) + " sets");
            const RuleSetId expected =
                request.rules == RuleChoice::Iec60825_1_2007 ? RuleSetId::Iec60825_1_2007 : RuleSetId::Iec60825_1_2014;
            if (r.governing().set != expected)
                fail("governing set is not the chosen one");
        }
        // exposure-limits.md section 4.7: conservative is never less protective than the edition reading
        if (request.rules == RuleChoice::Iec60825_1_2014) {
            MpeRequest conservative = request;
            MpeRequest edition = request;
            conservative.c5 = C5Option::Conservative;
            edition.c5 = C5Option::Edition;
            const auto c = evaluateMpe(conservative);
            const auto e = evaluateMpe(edition);
            if (c && e && c->perPulse().si() > e->perPulse().si() * (1.0 + 1e-9))
                fail("conservative " + std::to_string(c->perPulse().si()) + " above edition " +
                     std::to_string(e->perPulse().si()));
        }
    }
    std::ostringstream report;
    report << failures.size() << " failures in " << evaluatedCount << " evaluated requests (" << trains << " trains, "
           << bursts << " with bursts)";
    for (std::size_t i = 0; i < failures.size() && i < 25; ++i)
        report << "\n  " << failures[i];
    INFO(report.str());
    CHECK(evaluatedCount > 2900);
    CHECK(trains > 1000);
    CHECK(failures.empty());
}
