// The shelf check indexes an output's samples by wavelength and looks at each item's wavelength pieces only
// (core/src/eyewear/requirementindex.hpp). Its answers must be those of the plain reading of hazard-and-eyewear.md
// sections 1.2 and 6.3: at every sample, the OD the item promises there (providedOd), the residual exposure/MPE
// summed over additive lines, the worst sample, the samples no row or marking rates, and per mode the samples whose
// required EN 207 level the item's marking at that wavelength does not reach. This test computes those sample by
// sample (the reference) for random outputs and items, with row and span ends placed exactly on sample wavelengths,
// and compares. Source: computed (the reference is the definition itself).
#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <fmt/core.h>
#include <limits>
#include <random>
#include <string>
#include <vector>

#include "beamwarden/eyewear/protection.hpp"
#include "beamwarden/limits/additivity.hpp"
#include "beamwarden/units.hpp"

using namespace beamwarden;
using namespace beamwarden::eyewear;

namespace {

struct Reference {
    double margin = 0;
    double worst_nm = 0;
    double providedOd = 0;
    bool anyUnrated = false;
    double unratedFrom = 0;
    double unratedTo = 0;
    struct Gap {
        bool any = false;
        double from = 0;
        double to = 0;
        int needed = 0;
        int marked = 0;
    };
    std::array<Gap, kModeCount> unmarked{};
    std::array<Gap, kModeCount> tooLow{};
};

Reference reference(const ParsedEyewear& item, const OutputRequirement& req)
{
    Reference ref;
    std::vector<limits::LineRatio> residual;
    double worst = -1.0;
    for (const hazard::LineResult& line : req.hazard.lines) {
        const double lambda = line.sample.wavelength.nanometres();
        const ProvidedOd provided = providedOd(item, lambda);
        const double r = line.ratio * std::pow(10.0, -provided.od);
        residual.push_back({line.sample.wavelength, r});
        if (!provided.rated && line.ratio > 1e-6) {
            ref.unratedFrom = ref.anyUnrated ? std::min(ref.unratedFrom, lambda) : lambda;
            ref.unratedTo = ref.anyUnrated ? std::max(ref.unratedTo, lambda) : lambda;
            ref.anyUnrated = true;
        }
        if (r > worst) {
            worst = r;
            ref.worst_nm = lambda;
            ref.providedOd = provided.od;
        }
    }
    const double sum = limits::combineLines(limits::Target::Eye, residual).governingSum;
    ref.margin = sum > 0.0 ? -std::log10(sum) : std::numeric_limits<double>::infinity();
    for (const LevelRequirement& level : req.levels) {
        for (const ModeRequirement& m : level.modes) {
            if (m.level > 10)
                continue;
            int best = 0;
            for (const En207Marking& marking : item.en207)
                for (const MarkingTerm& term : marking.terms)
                    if (term.has(m.mode) && term.covers(level.lambda_nm))
                        best = std::max(best, term.level);
            if (best >= m.level)
                continue;
            Reference::Gap& gap = best == 0 ? ref.unmarked[static_cast<std::size_t>(m.mode)]
                                            : ref.tooLow[static_cast<std::size_t>(m.mode)];
            gap.from = gap.any ? std::min(gap.from, level.lambda_nm) : level.lambda_nm;
            gap.to = gap.any ? std::max(gap.to, level.lambda_nm) : level.lambda_nm;
            gap.needed = std::max(gap.needed, m.level);
            gap.marked = gap.any ? std::min(gap.marked, best) : best;
            gap.any = true;
        }
    }
    return ref;
}

std::string nm(double lambda)
{
    return fmt::format("{:g} nm", std::round(lambda * 10.0) / 10.0);
}

} // namespace

TEST_CASE("The indexed shelf check gives the sample-by-sample answers", "[eyewear][shelf]")
{
    std::mt19937_64 random(20261201); // fixed seed: the same cases every run
    auto uniform = [&](double lo, double hi) { return std::uniform_real_distribution<double>(lo, hi)(random); };
    auto pick = [&](std::size_t n) { return std::uniform_int_distribution<std::size_t>(0, n - 1)(random); };

    int compared = 0;
    int fallsShort = 0;
    for (int trial = 0; trial < 60; ++trial) {
        // An output: a band of 5 to 129 samples somewhere in 300-2000 nm, CW or pulsed.
        hazard::HazardRequest request;
        const int samples = 2 * static_cast<int>(pick(63)) + 5;
        const double centre = uniform(300.0, 2000.0);
        auto band = model::gaussianBand(units::Wavelength::fromSi(centre * 1e-9),
                                        units::Wavelength::fromSi(uniform(0.5, 60.0) * 1e-9), samples);
        REQUIRE(band.has_value());
        request.emission.spectrum = *band;
        request.emission.pulsed = trial % 3 != 0;
        request.emission.averagePower = units::Power::fromSi(std::pow(10.0, uniform(-3.0, 2.0)));
        if (request.emission.pulsed) {
            request.emission.prf = units::Frequency::fromSi(std::pow(10.0, uniform(0.0, 7.0)));
            request.emission.pulseDuration = units::Duration::fromSi(std::pow(10.0, uniform(-13.5, -7.5)));
        }
        request.beam.diameter = units::Length::fromSi(uniform(1e-3, 8e-3));
        request.beam.divergence = units::Angle::fromSi(uniform(0.2e-3, 2e-3));
        const auto req = requirementFor(request, "output", "case");
        INFO((req ? std::string("accepted") : req.error().message()));
        REQUIRE(req.has_value());
        const auto& lines = req->hazard.lines;

        for (int i = 0; i < 8; ++i) {
            // An item: OD rows and EN 207 terms whose ends are sample wavelengths (the pieces' edge cases) or not.
            auto edge = [&] {
                return pick(2) == 0 ? lines[pick(lines.size())].sample.wavelength.nanometres()
                                    : uniform(centre - 80.0, centre + 80.0);
            };
            model::EyewearItem raw;
            raw.name = "item";
            const std::size_t rows = pick(3);
            for (std::size_t r = 0; r < rows; ++r) {
                double a = edge();
                double b = edge();
                if (a > b)
                    std::swap(a, b);
                model::OdRow row;
                row.from = units::Wavelength::fromSi(a * 1e-9);
                row.to = units::Wavelength::fromSi(b * 1e-9);
                row.od = std::round(uniform(0.0, 9.0) * 10.0) / 10.0;
                raw.spectralOd.push_back(row);
            }
            auto parsed = parseEyewear(raw);
            REQUIRE(parsed.has_value());
            ParsedEyewear item = *parsed;
            const std::size_t terms = pick(4);
            En207Marking marking;
            for (std::size_t t = 0; t < terms; ++t) {
                double a = edge();
                double b = pick(3) == 0 ? a : edge();
                if (a > b)
                    std::swap(a, b);
                MarkingTerm term;
                term.wavelengths.push_back(WavelengthSpan{a, b});
                term.modes = static_cast<std::uint8_t>(1U + pick(15));
                term.level = static_cast<int>(1 + pick(10));
                marking.terms.push_back(term);
            }
            if (!marking.terms.empty())
                item.en207.push_back(marking);

            const OutputCheck check = checkOutput(item, *req);
            const Reference ref = reference(item, *req);
            if (!item.hasOdData())
                continue;
            ++compared;
            INFO("trial " << trial << " item " << i);
            if (std::isinf(ref.margin))
                CHECK(std::isinf(check.marginOd));
            else
                CHECK(check.marginOd == Approx(ref.margin).epsilon(1e-12).margin(1e-12));
            CHECK(check.worstWavelength_nm == ref.worst_nm);
            CHECK(check.providedOd == ref.providedOd);
            const bool shortOnOd = ref.margin < 0.0;
            fallsShort += shortOnOd ? 1 : 0;
            auto has = [&](const std::string& words) {
                return std::find(check.reasons.begin(), check.reasons.end(), words) != check.reasons.end();
            };
            if (shortOnOd && ref.anyUnrated)
                CHECK(has(fmt::format("wavelength range: not rated at {}{}, where output emits", nm(ref.unratedFrom),
                                      ref.unratedFrom == ref.unratedTo ? "" : " to " + nm(ref.unratedTo))));
            if (item.en207.empty())
                continue;
            for (int m = 0; m < kModeCount; ++m) {
                const char mode = letter(static_cast<Mode>(m));
                auto where = [](const Reference::Gap& g) {
                    return g.from == g.to ? nm(g.from) : nm(g.from) + " to " + nm(g.to);
                };
                const auto& missing = ref.unmarked[static_cast<std::size_t>(m)];
                const auto& low = ref.tooLow[static_cast<std::size_t>(m)];
                if (missing.any)
                    CHECK(has(fmt::format("damage level: no mode {} marking covers {} (output needs {} LB{})", mode,
                                          where(missing), mode, missing.needed)));
                if (low.any)
                    CHECK(has(fmt::format("damage level: output needs {} LB{} at {}, marked LB{}", mode, low.needed,
                                          where(low), low.marked)));
            }
            const bool anyGap = std::any_of(ref.unmarked.begin(), ref.unmarked.end(), [](auto& g) { return g.any; }) ||
                                std::any_of(ref.tooLow.begin(), ref.tooLow.end(), [](auto& g) { return g.any; });
            if (shortOnOd || anyGap)
                CHECK(check.verdict == Verdict::FallsShort);
        }
    }
    // The random cases must have exercised both outcomes.
    CHECK(compared > 200);
    CHECK(fallsShort > 20);
}
