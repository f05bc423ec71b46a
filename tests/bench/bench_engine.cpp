// The engine budgets of tests/bench/budgets.txt: one MPE evaluation, a full assessment of a 5-output ultrafast
// laser with fine spectra, a protection check against a large shelf, and one limit curve; plus the scaling runs
// (samples, outputs, shelf size) that show nothing grows faster than it must.
#include "benchfixtures.hpp"

#include "beamwarden/assessment/assessment.hpp"
#include "beamwarden/eyewear/protection.hpp"
#include "beamwarden/eyewear/selection.hpp"
#include "beamwarden/limits/mpe.hpp"

#include <benchmark/benchmark.h>

#include <cmath>
#include <cstdio>
#include <cstdlib>

namespace bw = beamwarden;

namespace {

template <typename T>
const T& orDie(const bw::Result<T>& result, const char* what)
{
    if (!result) {
        std::fprintf(stderr, "%s refused: %s\n", what, result.error().message().c_str());
        std::exit(1);
    }
    return *result;
}

// One evaluation at a time, cycling through a point inside every row of both editions (single exposures).
void BM_MpeOneEvaluationEveryRow(benchmark::State& state)
{
    const auto requests = bw::bench::oneRequestPerRow();
    std::size_t next = 0;
    for (auto _ : state) {
        auto result = bw::limits::evaluateMpe(requests[next]);
        benchmark::DoNotOptimize(result);
        next = next + 1 == requests.size() ? 0 : next + 1;
    }
    state.counters["rows"] = static_cast<double>(requests.size());
}
BENCHMARK(BM_MpeOneEvaluationEveryRow);

// The heaviest single request: a kHz femtosecond train, both editions, all three pulse rules, an extended source.
void BM_MpeOneEvaluationTrainStrictest(benchmark::State& state)
{
    bw::limits::MpeRequest request;
    request.wavelength = bw::units::Wavelength::fromSi(800e-9);
    request.duration = bw::units::Duration::fromSi(35e-15);
    request.train = bw::limits::PulseTrain{bw::units::Frequency::fromSi(1e3), bw::units::Duration::fromSi(100), {}};
    request.sourceAngle = bw::units::Angle::fromSi(0.01);
    request.rules = bw::limits::RuleChoice::Strictest;
    for (auto _ : state) {
        auto result = bw::limits::evaluateMpe(request);
        benchmark::DoNotOptimize(result);
    }
}
BENCHMARK(BM_MpeOneEvaluationTrainStrictest);

// The whole assessment, eye and skin, every pulse rule, without a shelf. Args: outputs, samples per spectrum, cases.
void BM_AssessUltrafastLaser(benchmark::State& state)
{
    const auto laser = bw::bench::ultrafastLaser(static_cast<int>(state.range(0)), static_cast<int>(state.range(1)),
                                                 static_cast<int>(state.range(2)));
    const std::vector<bw::model::EyewearItem> noShelf;
    orDie(bw::assessment::assessLaser(laser, noShelf), "the assessment");
    for (auto _ : state) {
        auto result = bw::assessment::assessLaser(laser, noShelf);
        benchmark::DoNotOptimize(result);
    }
}
BENCHMARK(BM_AssessUltrafastLaser)
    ->ArgNames({"outputs", "samples", "cases"})
    ->Args({5, 256, 4}) // the budget
    ->Args({5, 16, 4})
    ->Args({5, 64, 4})
    ->Args({5, 1024, 4})
    ->Args({1, 256, 4})
    ->Args({2, 256, 4})
    ->Args({5, 256, 1})
    ->Unit(benchmark::kMicrosecond);

// Every item of a shelf checked against the demo's 5-output amplifier (its own spectra and cases), with the leanest
// choice, as the Eyewear panel does after every edit; the markings are parsed as part of it. Arg: shelf size.
void BM_ProtectionCheckShelf(benchmark::State& state)
{
    const auto laser = bw::bench::ultrafastLaser(5, 256, 4);
    const auto items = bw::bench::shelf(static_cast<int>(state.range(0)));
    const auto computed =
        bw::eyewear::requirementsFor(laser, bw::limits::RuleChoice::Strictest, bw::limits::C5Option::Conservative);
    const auto& requirements = orDie(computed, "the requirements");
    for (auto _ : state) {
        std::vector<bw::eyewear::ParsedEyewear> parsed;
        parsed.reserve(items.size());
        for (const auto& item : items) {
            auto p = bw::eyewear::parseEyewear(item);
            if (p)
                parsed.push_back(std::move(*p));
        }
        auto selection = bw::eyewear::leanestEyewear(parsed, requirements); // checks every item, then chooses
        benchmark::DoNotOptimize(selection);
    }
}
BENCHMARK(BM_ProtectionCheckShelf)->Arg(10000)->Arg(1000)->Arg(100)->Unit(benchmark::kMillisecond);

// One MPE curve against exposure duration as the Limit curves panel draws it: at each of `durations` log-spaced
// durations from 1e-13 s to 3e4 s, the eye under the strictest choice (every edition) and the skin.
void BM_LimitCurve(benchmark::State& state)
{
    const auto count = static_cast<int>(state.range(0));
    bw::limits::MpeRequest eye;
    eye.wavelength = bw::units::Wavelength::fromSi(800e-9);
    eye.sourceAngle = bw::units::Angle::fromSi(0.0);
    eye.rules = bw::limits::RuleChoice::Strictest;
    bw::limits::MpeRequest skin = eye;
    skin.target = bw::limits::Target::Skin;
    std::vector<double> durations;
    for (int i = 0; i < count; ++i)
        durations.push_back(1e-13 * std::pow(3e17, static_cast<double>(i) / (count - 1)));
    for (auto _ : state) {
        double sum = 0;
        for (const double t : durations) {
            eye.duration = bw::units::Duration::fromSi(t);
            skin.duration = eye.duration;
            const auto e = bw::limits::evaluateMpe(eye);
            const auto s = bw::limits::evaluateMpe(skin);
            sum += (e ? e->radiantExposure().si() : 0) + (s ? s->radiantExposure().si() : 0);
        }
        benchmark::DoNotOptimize(sum);
    }
}
BENCHMARK(BM_LimitCurve)->Arg(2000)->Unit(benchmark::kMicrosecond);

} // namespace

BENCHMARK_MAIN();
