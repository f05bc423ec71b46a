#include "pulsetrain.hpp"

#include "beamwarden/limits/factors.hpp"

#include <algorithm>
#include <array>
#include <cmath>
#include <optional>

namespace beamwarden::limits {

namespace {

constexpr double kOneNanosecond = 1e-9;

// Integer counting for bursts; the tolerance keeps 8e7 Hz x 5 us from counting 401 pulses.
double countUp(double x)
{
    return std::max(1.0, std::ceil(x * (1.0 - 1e-12)));
}

bool isThermalForRule3(const RuleSet& set, Effect effect)
{
    if (set.rule3Scope == Rule3Scope::RetinalThermal400To1400nm)
        return effect == Effect::RetinalThermal;
    return effect == Effect::RetinalThermal || effect == Effect::CornealThermal;
}

// The lowest thermal limit in a set of limits, as the term it came from; row == nullptr if none is thermal.
LimitTerm lowestThermal(const RuleSet& set, const LimitSet& limits)
{
    LimitTerm best;
    for (const LimitTerm& term : limits.all()) {
        if (isThermalForRule3(set, term.row->effect) && (best.row == nullptr || term.wholeSource < best.wholeSource))
            best = term;
    }
    return best;
}

struct TrainShape {
    double tp = 0;
    double f = 0;
    double exposure = 0;
    bool isBurst = false;
    double pulsesPerBurst = 1;
    double burstRate = 0;
    double burstSpan = 0;

    // Pulses in a window of the given length: real for regular trains, whole bursts otherwise.
    [[nodiscard]] double pulsesIn(double window) const
    {
        if (!isBurst)
            return std::max(1.0, f * window);
        return pulsesPerBurst * countUp(burstRate * window);
    }
};

bool rule3Applies(const RuleSet& set, const MpeRequest& request)
{
    if (request.target != Target::Eye)
        return false; // skin: rules 1 and 2 only
    const double lambda = request.wavelength.nanometres();
    if (lambda < 400.0)
        return false; // eye below 400 nm: rules 1 and 2 only
    if (set.rule3Scope == Rule3Scope::RetinalThermal400To1400nm && lambda > 1400.0)
        return false;
    return request.duration.seconds() < 0.25; // C5 applies only to pulses shorter than 0.25 s
}

} // namespace

TrainOutcome evaluateTrain(const RuleSet& set, const MpeRequest& request, C5Option c5Option, WavelengthFactors& at)
{
    const PulseTrain& train = *request.train;
    TrainShape shape;
    shape.tp = request.duration.seconds();
    shape.f = train.prf.hertz();
    shape.exposure = train.exposure.seconds();
    if (train.burst) {
        shape.isBurst = true;
        shape.pulsesPerBurst = train.burst->pulsesPerBurst;
        shape.burstRate = train.burst->burstRate.hertz();
        shape.burstSpan = (shape.pulsesPerBurst - 1) / shape.f + shape.tp;
    }

    const double lambda_nm = request.wavelength.nanometres();
    const double alpha = request.sourceAngle.radians();
    // The rules ask for the limits at the same duration more than once (rule 3 at the pulse and at Ti, as rule 1
    // does, where no alpha_max override applies): each distinct question is evaluated once.
    struct Known {
        double duration;
        double alphaMaxOverride;
        LimitSet limits;
    };
    std::array<std::optional<Known>, 6> known; // at most six distinct questions: t_p, Ti, T, the burst, rule 3 twice
    auto limitsAt = [&](double duration, double alphaMaxOverride = 0.0) -> const LimitSet& {
        std::size_t i = 0;
        for (; i < known.size() && known[i]; ++i) {
            if (known[i]->duration == duration && known[i]->alphaMaxOverride == alphaMaxOverride)
                return known[i]->limits;
        }
        // Six slots hold every distinct question; should one more ever come, the last slot is reused for it.
        std::optional<Known>& slot = known[std::min(i, known.size() - 1)];
        slot.emplace(Known{duration, alphaMaxOverride,
                           evaluateLimits(set, request.target, at, units::Duration::fromSi(duration),
                                          request.sourceAngle, request.skinArea, alphaMaxOverride)});
        return slot->limits;
    };

    TrainOutcome out;
    const double ti = request.target == Target::Eye ? factors::ti(set, lambda_nm) : 0.0;
    out.ti = units::Duration::fromSi(ti);
    const bool closerThanTi = ti > 0.0 && 1.0 / shape.f < ti;
    // 2007 groups only trains of pulses longer than 1 ns; 2014 keeps the lower of both readings below 1 ns.
    const bool longPulses = shape.tp > kOneNanosecond;
    const bool groupedReading = closerThanTi && (longPulses || set.grouping == GroupingRule::BothReadingsBelow1ns);
    const bool ungroupedReading = !closerThanTi || !longPulses;
    double groupSize = 1.0;
    if (groupedReading) {
        groupSize = shape.isBurst ? (shape.burstSpan <= ti ? shape.pulsesPerBurst
                                                           : std::min(shape.pulsesPerBurst, countUp(shape.f * ti)))
                                  : shape.f * ti;
    }

    // Rule 1: no single pulse (and no Ti group) above the MPE for its duration.
    const LimitSet& atPulse = limitsAt(shape.tp);
    out.singlePulse =
        RuleOutcome{PulseRule::SinglePulse, true, atPulse.value(), atPulse.governingTerm(), 1, 1, 1, false, false};
    if (groupedReading) {
        const LimitSet& atTi = limitsAt(ti);
        const units::RadiantExposure perPulse = atTi.value() / groupSize;
        if (perPulse < out.singlePulse.perPulse)
            out.singlePulse = RuleOutcome{
                PulseRule::SinglePulse, true, perPulse, atTi.governingTerm(), groupSize, groupSize, 1, true, false};
    }

    // Rule 2: the train (and each burst) no more than the MPE for its duration.
    out.pulsesInExposure = shape.pulsesIn(shape.exposure);
    const LimitSet& atExposure = limitsAt(shape.exposure);
    out.average = RuleOutcome{PulseRule::AveragePower,
                              true,
                              atExposure.value() / out.pulsesInExposure,
                              atExposure.governingTerm(),
                              out.pulsesInExposure,
                              1,
                              1,
                              false,
                              false};
    if (shape.isBurst && shape.pulsesPerBurst > 1) {
        const LimitSet& atBurst = limitsAt(shape.burstSpan);
        const units::RadiantExposure perPulse = atBurst.value() / shape.pulsesPerBurst;
        if (perPulse < out.average.perPulse)
            out.average = RuleOutcome{PulseRule::AveragePower,
                                      true,
                                      perPulse,
                                      atBurst.governingTerm(),
                                      shape.pulsesPerBurst,
                                      1,
                                      1,
                                      false,
                                      true};
    }

    // Rule 3: repeated pulses, thermal limits only, C5 by the set's rule; N over at most T2 (or the cap above 1400).
    out.repeated.rule = PulseRule::PulseTrain;
    if (rule3Applies(set, request)) {
        double countWindow = std::min(shape.exposure, factors::t2(alpha));
        if (lambda_nm > 1400.0 && set.rule3CountCapAbove1400nm_s > 0.0)
            countWindow = std::min(shape.exposure, set.rule3CountCapAbove1400nm_s);
        const bool conservative = !set.hasC5Options || c5Option == C5Option::Conservative;
        // Conservative 2014: C6 inside rule 3 with alpha_max = 100 mrad for all durations (section 4.7).
        const double alphaMaxOverride = set.hasC5Options && conservative ? 0.1 : 0.0;

        auto consider = [&](double duration, double n, double perGroup) {
            const LimitSet& limits = limitsAt(duration, alphaMaxOverride);
            const LimitTerm thermal = lowestThermal(set, limits);
            if (thermal.row == nullptr)
                return;
            const double c5Cons = factors::c5Conservative(n);
            const double c5Ed = factors::c5Edition(n, alpha, factors::alphaMax(set.alphaMax, duration));
            const double c5 = conservative ? c5Cons : c5Ed;
            const units::RadiantExposure perPulse = thermal.wholeSource * (c5 / perGroup);
            if (!out.repeated.applies || perPulse < out.repeated.perPulse) {
                out.repeated =
                    RuleOutcome{PulseRule::PulseTrain, true, perPulse, thermal, n, perGroup, c5, perGroup > 1.0, false};
                out.c5Conservative = c5Cons;
                out.c5Edition = c5Ed;
                out.hasBothC5 = set.hasC5Options;
            }
        };
        if (ungroupedReading)
            consider(shape.tp, shape.pulsesIn(countWindow), 1.0);
        if (groupedReading) {
            const double groups = shape.isBurst ? countUp(shape.burstRate * countWindow) *
                                                      (shape.burstSpan < ti ? 1.0 : countUp(shape.burstSpan / ti))
                                                : std::max(1.0, countWindow / ti);
            consider(ti, groups, groupSize);
        }
    }

    // The lowest governs. Values within 1e-9 (rounding noise, e.g. the identity of rules 2 and 3) are a tie, reported
    // as the first in the order single-pulse, average-power, pulse-train; the figure itself is still the minimum.
    out.perPulse = out.singlePulse.perPulse;
    out.perPulse = std::min(out.perPulse, out.average.perPulse);
    if (out.repeated.applies)
        out.perPulse = std::min(out.perPulse, out.repeated.perPulse);
    const auto ties = [&](const RuleOutcome& rule) { return rule.perPulse.si() <= out.perPulse.si() * (1.0 + 1e-9); };
    out.governingRule = ties(out.singlePulse) ? PulseRule::SinglePulse
                        : ties(out.average)   ? PulseRule::AveragePower
                                              : PulseRule::PulseTrain;
    return out;
}

} // namespace beamwarden::limits
