// Numeric safety at the hazard layer (issue 10), over pseudo-random outputs and exposure cases with fixed seeds:
//   - the MPE never falls as the exposure duration grows, except by the tables' own steps (check-values.md section 5),
//     and the required OD follows it;
//   - the NOHD never falls as the power (or pulse energy) grows;
//   - the required OD is never negative and never smaller for a stronger source;
//   - no figure of an accepted evaluation is NaN.
// limits_continuity_test.cpp checks H(t) of the limit engine alone; hazard_od_test.cpp (K26) checks OD growth for one
// 1064 nm beam and one pulsed case. These go through hazard::evaluateHazard for every viewing kind and wavelength.
#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <limits>
#include <random>
#include <sstream>
#include <string>
#include <vector>

#include "../fuzz/promises.hpp"
#include "beamwarden/hazard/hazard.hpp"
#include "beamwarden/units.hpp"

using namespace beamwarden;
using hazard::DistanceKind;
using hazard::HazardRequest;
using hazard::HazardResult;
using model::Viewing;

namespace {

constexpr Viewing kViewings[] = {Viewing::Direct,  Viewing::Lens,     Viewing::Fibre,
                                 Viewing::Diffuse, Viewing::Specular, Viewing::Aided};

struct Choice {
    limits::RuleChoice rules;
    limits::C5Option c5;
};
constexpr Choice kChoices[] = {{limits::RuleChoice::Iec60825_1_2007, limits::C5Option::Conservative},
                               {limits::RuleChoice::Iec60825_1_2014, limits::C5Option::Conservative},
                               {limits::RuleChoice::Iec60825_1_2014, limits::C5Option::Edition},
                               {limits::RuleChoice::Strictest, limits::C5Option::Conservative}};

class Random {
public:
    explicit Random(std::uint64_t seed) : m_engine(seed) {}
    double uniform(double lo, double hi) { return std::uniform_real_distribution<double>(lo, hi)(m_engine); }
    double logUniform(double lo, double hi) { return std::exp(uniform(std::log(lo), std::log(hi))); }
    bool chance(double p) { return uniform(0.0, 1.0) < p; }
    template <typename T, std::size_t N>
    const T& pick(const T (&items)[N])
    {
        return items[std::uniform_int_distribution<std::size_t>(0, N - 1)(m_engine)];
    }

private:
    std::mt19937_64 m_engine;
};

// A random spectrum from 180 nm to 1 mm: mostly one line, sometimes a sampled band or two lines.
model::Spectrum randomSpectrum(Random& random)
{
    const auto centre = units::Wavelength::fromSi(random.logUniform(190e-9, 0.9e-3));
    if (random.chance(0.15)) {
        auto band =
            model::gaussianBand(centre, units::Wavelength::fromSi(centre.si() * random.uniform(0.001, 0.05)), 7);
        if (band)
            return *band;
    }
    if (random.chance(0.15)) {
        const auto second = units::Wavelength::fromSi(random.logUniform(190e-9, 0.9e-3));
        auto lines = model::lines({{centre, random.uniform(0.1, 0.9), {}}, {second, random.uniform(0.1, 0.9), {}}});
        if (lines)
            return *lines;
    }
    return model::singleLine(centre);
}

// One output and one exposure case; the power (CW) or pulse energy (pulsed) is set by the caller.
HazardRequest randomRequest(Random& random, Viewing viewing, bool pulsed)
{
    HazardRequest r;
    r.emission.spectrum = randomSpectrum(random);
    r.emission.pulsed = pulsed;
    r.emission.averagePower = units::Power::fromSi(random.logUniform(1e-6, 1e3));
    if (pulsed) {
        r.emission.averagePower = units::Power{};
        r.emission.prf = units::Frequency::fromSi(random.logUniform(1.0, 1e8));
        r.emission.pulseDuration = units::Duration::fromSi(random.logUniform(1e-14, 0.5 / r.emission.prf.si()));
        r.emission.pulseEnergy = units::Energy::fromSi(random.logUniform(1e-9, 1.0));
    }
    r.beam.diameter = units::Length::fromSi(random.logUniform(1e-5, 0.1));
    r.beam.divergence = units::Angle::fromSi(random.chance(0.1) ? 0.0 : random.logUniform(1e-5, 0.1));
    r.beam.definition = random.chance(0.5) ? model::BeamDefinition::OneOverE : model::BeamDefinition::OneOverESquared;
    r.beam.profile = random.chance(0.5) ? model::BeamProfile::Unknown : model::BeamProfile::Gaussian;
    model::ExposureCase& c = r.exposureCase;
    c.viewing = viewing;
    if (random.chance(0.7))
        c.exposure = units::Duration::fromSi(random.logUniform(1e-3, 3e4));
    if (random.chance(0.7))
        c.distance = units::Length::fromSi(random.logUniform(1e-2, 1e4));
    switch (viewing) {
    case Viewing::Lens:
        c.focalLength = units::Length::fromSi(random.logUniform(1e-2, 1.0));
        break;
    case Viewing::Fibre:
        c.numericalAperture = random.uniform(0.01, 0.9);
        break;
    case Viewing::Diffuse:
        c.reflectance = random.uniform(0.01, 1.0);
        c.viewingAngle = units::Angle::fromSi(random.uniform(0.0, 1.5));
        break;
    case Viewing::Specular:
        c.reflectance = random.uniform(0.01, 1.0);
        break;
    case Viewing::Aided:
        c.magnification = random.uniform(1.0, 50.0);
        c.objectiveDiameter = units::Length::fromSi(random.logUniform(5e-3, 0.2));
        c.transmission = random.uniform(0.1, 1.0);
        break;
    case Viewing::Direct:
        break;
    }
    const Choice& choice = random.pick(kChoices);
    r.rules = choice.rules;
    r.c5 = choice.c5;
    return r;
}

std::string describe(const HazardRequest& r)
{
    std::ostringstream out;
    out << model::toString(r.exposureCase.viewing) << ", " << limits::toString(r.rules) << "/" << limits::toString(r.c5)
        << ", " << r.emission.spectrum.samples.size() << " sample(s) from "
        << units::format(r.emission.spectrum.shortest(), 6) << ", "
        << (r.emission.pulsed ? units::format(r.emission.pulseEnergy, 6) + " at " + units::format(r.emission.prf, 6) +
                                    ", " + units::format(r.emission.pulseDuration, 6)
                              : units::format(r.emission.averagePower, 6))
        << ", beam " << units::format(r.beam.diameter, 6) << " / " << units::format(r.beam.divergence, 6)
        << ", exposure " << units::format(r.exposureCase.exposure, 6) << ", distance "
        << units::format(r.exposureCase.distance, 6);
    return out.str();
}

// Orders NOHDs: none < a finite distance (by value) < no finite distance.
double nohdRank(const hazard::HazardDistance& d)
{
    switch (d.kind) {
    case DistanceKind::Zero:
        return -1.0;
    case DistanceKind::Finite:
        return d.value.si();
    case DistanceKind::Unbounded:
        return std::numeric_limits<double>::infinity();
    }
    return 0.0;
}

// Powers (or energies) from a tenth to 1e4 times the random one, each step a factor of 3.
std::vector<double> strengths(double base)
{
    std::vector<double> out;
    for (double f = 0.1; f <= 1.01e4; f *= 3.0)
        out.push_back(base * f);
    return out;
}

HazardRequest withStrength(HazardRequest r, double strength)
{
    if (r.emission.pulsed)
        r.emission.pulseEnergy = units::Energy::fromSi(strength);
    else
        r.emission.averagePower = units::Power::fromSi(strength);
    return r;
}

double strengthOf(const HazardRequest& r)
{
    return r.emission.pulsed ? r.emission.pulseEnergy.si() : r.emission.averagePower.si();
}

// Durations where a row of the tables begins or ends, alpha_max or an aperture changes (exposure-limits.md sections
// 2-4; the same list as limits_continuity_test.cpp), from 1 ms on, plus T2 for the source angle at the point.
std::vector<double> breakpoints(double alpha_rad)
{
    std::vector<double> b = {1e-3, 0.25, 0.35, 10, 100, 1e3, 1e4};
    if (alpha_rad > 1.5e-3) // T2 = 10 * 10^((alpha - 1.5 mrad) / 98.5 mrad) s, 100 s beyond 100 mrad (section 2.1)
        b.push_back(alpha_rad > 0.1 ? 100.0 : 10.0 * std::pow(10.0, (alpha_rad * 1e3 - 1.5) / 98.5));
    return b;
}

} // namespace

TEST_CASE("numeric safety: no figure of an accepted hazard evaluation is NaN (random outputs, fixed seed)",
          "[hazard][safety][nan]")
{
    Random random(20261201);
    int accepted = 0;
    int total = 0;
    std::vector<std::string> failures;
    for (int i = 0; i < 4000; ++i) {
        const HazardRequest request = randomRequest(random, random.pick(kViewings), random.chance(0.5));
        ++total;
        const auto result = hazard::evaluateHazard(request);
        if (!result)
            continue; // a refusal names its field; refused combinations are not what this checks
        ++accepted;
        // computed: no NaN anywhere, OD >= 0 and displayed >= exact (check-values.md K26)
        if (const std::string bad = fuzzpromise::hazardResult(*result); !bad.empty())
            failures.push_back(bad + ": " + describe(request));
    }
    INFO(accepted << " of " << total << " random requests accepted");
    INFO((failures.empty() ? std::string("no NaN") : failures.front()));
    CHECK(failures.empty());
    CHECK(accepted > total / 2); // or the test proved little
}

TEST_CASE("numeric safety: NOHD and required OD never fall as the power or pulse energy grows", "[hazard][safety]")
{
    Random random(424242);
    std::vector<std::string> failures;
    int ladders = 0;
    for (int i = 0; i < 600; ++i) {
        const HazardRequest base = randomRequest(random, kViewings[i % 6], i % 2 == 1);
        double previousRank = -2.0;
        double previousOd = -1.0;
        double previousDisplayed = -1.0;
        int steps = 0;
        for (const double strength : strengths(strengthOf(base))) {
            const HazardRequest request = withStrength(base, strength);
            const auto result = hazard::evaluateHazard(request);
            if (!result)
                continue;
            ++steps;
            const HazardResult& r = *result;
            const double rank = nohdRank(r.nohd);
            // common practice: a stronger source is never safer; relative 1e-9 for rounding (computed)
            if (rank < previousRank - 1e-9 * std::abs(previousRank))
                failures.push_back("NOHD fell to " + std::to_string(rank) + " m from " + std::to_string(previousRank) +
                                   " m: " + describe(request));
            // check-values.md K26: OD_req >= 0, never smaller for a stronger source, displayed never below exact
            if (r.requiredOd < 0.0)
                failures.push_back("negative OD: " + describe(request));
            if (r.requiredOd < previousOd - 1e-9)
                failures.push_back("OD fell to " + std::to_string(r.requiredOd) + " from " +
                                   std::to_string(previousOd) + ": " + describe(request));
            if (r.displayedOd < previousDisplayed || r.displayedOd < r.requiredOd)
                failures.push_back("displayed OD fell or is below the exact OD: " + describe(request));
            for (const hazard::BandOd& band : r.bands) {
                if (band.requiredOd < 0.0)
                    failures.push_back("negative band OD: " + describe(request));
            }
            previousRank = rank;
            previousOd = r.requiredOd;
            previousDisplayed = r.displayedOd;
        }
        if (steps > 3)
            ++ladders;
    }
    INFO(failures.size() << " failures over " << ladders << " power ladders");
    INFO((failures.empty() ? std::string("none") : failures.front()));
    CHECK(failures.empty());
    CHECK(ladders > 300);
}

TEST_CASE("numeric safety: the MPE never falls as the exposure duration grows, except at the tables' own steps",
          "[hazard][safety][monotonic]")
{
    // check-values.md section 5: across a breakpoint H may fall by the kept steps (K8 -1.2 %, K12 -0.4 %, and at most
    // 6 % over all of section 5); inside a row it never falls (relative 1e-9 for rounding, computed). In the hazard
    // layer the figure is the MPE as radiant exposure over the exposure: limit x t for CW, limit x N for trains
    // (per-pulse limit times the pulses in the exposure). With a 7 mm aperture at every duration (400-1400 nm) the
    // exposure at the point does not depend on t, so the CW required OD may fall only where H(t)/t rises: at no
    // breakpoint by more than log10(1.06) (computed from the same 6 %).
    Random random(7321);
    std::vector<std::string> failures;
    std::size_t comparisons = 0;
    for (int i = 0; i < 300; ++i) {
        const bool pulsed = i % 3 == 2;
        const HazardRequest base = randomRequest(random, kViewings[i % 6], pulsed);
        if (!base.emission.spectrum.isSingleLine())
            continue; // with several lines the governing one may change with t: each line's H is what is monotone
        const auto probe = hazard::evaluateHazard(base);
        if (!probe)
            continue;
        const std::vector<double> bps = breakpoints(probe->sourceAngleAtPoint.si());
        std::vector<double> grid;
        for (double t = 1e-3; t <= 3e4; t *= std::pow(10.0, 1.0 / 8.0))
            grid.push_back(t);
        for (const double b : bps) {
            for (const double t : {b * (1.0 - 1e-9), b, b * (1.0 + 1e-9)})
                grid.push_back(t);
        }
        std::sort(grid.begin(), grid.end());
        const double lambda = base.emission.spectrum.shortest().si();
        const bool fixedAperture = lambda >= 400e-9 && base.emission.spectrum.longest().si() <= 1400e-9;

        double previousT = 0.0;
        double previousH = 0.0;
        double previousOd = 0.0;
        for (const double t : grid) {
            if (pulsed && t <= base.emission.pulseDuration.si())
                continue;
            HazardRequest request = base;
            request.exposureCase.exposure = units::Duration::fromSi(t);
            const auto result = hazard::evaluateHazard(request);
            if (!result)
                continue;
            const double pulses = pulsed ? std::max(1.0, request.emission.pulsesPerSecond() * t) : 0.0;
            const double h = pulsed ? result->limit * pulses : result->limit * t;
            if (previousT > 0.0) {
                ++comparisons;
                const bool across =
                    std::any_of(bps.begin(), bps.end(), [&](double b) { return b >= previousT && b <= t; });
                const double allowedDrop = across ? 0.06 : 1e-9;
                if (!(h >= previousH * (1.0 - allowedDrop)))
                    failures.push_back("H(" + std::to_string(previousT) + " s) = " + std::to_string(previousH) +
                                       " -> H(" + std::to_string(t) + " s) = " + std::to_string(h) +
                                       (across ? " across a breakpoint: " : " inside a row: ") + describe(request));
                const double odDrop = across ? std::log10(1.06) : 1e-9;
                if (!pulsed && fixedAperture && result->requiredOd < previousOd - odDrop)
                    failures.push_back("OD fell from " + std::to_string(previousOd) + " to " +
                                       std::to_string(result->requiredOd) + " at " + std::to_string(t) +
                                       " s: " + describe(request));
            }
            previousT = t;
            previousH = h;
            previousOd = result->requiredOd;
        }
    }
    INFO(failures.size() << " falls in " << comparisons << " comparisons");
    INFO((failures.empty() ? std::string("none") : failures.front()));
    CHECK(comparisons > 10000);
    CHECK(failures.empty());
}
