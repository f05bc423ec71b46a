// evaluateMpe: one rule set, or the strictest of all implemented sets (exposure-limits.md sections 4.8, 6.1).
#include "beamwarden/limits/factors.hpp"
#include "beamwarden/limits/mpe.hpp"
#include "beamwarden/limits/mpememo.hpp"
#include "pulsetrain.hpp"

#include <algorithm>

namespace beamwarden::limits {

namespace {

RowStatus weaker(RowStatus a, RowStatus b)
{
    return std::max(a, b);
}

RowStatus tiStatus(const RuleSet& set, double lambda_nm)
{
    RowStatus status = RowStatus::Verified;
    for (const TiRow& row : set.ti) {
        if (lambda_nm >= row.lambdaFrom_nm && lambda_nm <= row.lambdaTo_nm)
            status = weaker(status, row.status);
    }
    return status;
}

// Fills `out` in place (a set's outcome is large; copying it was a good part of an evaluation's cost).
Result<void> evaluateSet(const RuleSet& set, const MpeRequest& request, SetOutcome& out)
{
    out.set = set.id;
    out.c5 = request.c5;
    WavelengthFactors at(request.wavelength.nanometres());
    out.single = evaluateLimits(set, request.target, at, request.duration, request.sourceAngle, request.skinArea);
    if (out.single.count == 0) // a gap in the table is a defect, never a silent zero
        return fail("wavelength", units::formatExact(request.wavelength),
                    "a wavelength and duration covered by a row of " + std::string(set.name));
    out.belowTable = out.single.governingTerm().belowTable;

    if (!request.train) {
        out.limit = out.single.value();
        out.weakestStatus = out.single.governingTerm().row->status;
        return {};
    }
    const TrainOutcome& train = out.train.emplace(evaluateTrain(set, request, request.c5, at));
    const RuleOutcome& governing = train.governingRule == PulseRule::SinglePulse    ? train.singlePulse
                                   : train.governingRule == PulseRule::AveragePower ? train.average
                                                                                    : train.repeated;
    out.limit = train.perPulse;
    out.weakestStatus = governing.basis.row != nullptr ? governing.basis.row->status : RowStatus::Reconstructed;
    if (governing.grouped || governing.rule == PulseRule::PulseTrain)
        out.weakestStatus = weaker(out.weakestStatus, tiStatus(set, request.wavelength.nanometres()));
    if (set.hasC5Options && governing.rule == PulseRule::PulseTrain && request.c5 == C5Option::Edition)
        out.weakestStatus = RowStatus::Reconstructed; // the C5 conditions are reconstructed (section 4.6)
    return {};
}

Result<MpeResult> evaluateAfresh(const MpeRequest& raw);

} // namespace

Result<MpeResult> evaluateMpe(const MpeRequest& request)
{
    MpeMemo* memo = MpeMemo::active();
    if (memo == nullptr)
        return evaluateAfresh(request);
    if (const Result<MpeResult>* known = memo->find(request))
        return *known;
    Result<MpeResult> result = evaluateAfresh(request);
    memo->remember(request, result);
    return result;
}

namespace {

Result<MpeResult> evaluateAfresh(const MpeRequest& raw)
{
    // Built in the returned object itself, which every path returns (so the compiler elides the copy): a result is
    // a few kilobytes, and copying it was a fifth of the work of a single-exposure evaluation.
    Result<MpeResult> out{std::in_place};
    auto checked = validate(raw);
    if (!checked) {
        out = std::unexpected(checked.error());
        return out;
    }
    const MpeRequest& request = *checked;
    MpeResult& result = *out;
    result.request = request;
    auto add = [&](RuleSetId id) -> Result<void> {
        auto outcome = evaluateSet(ruleSet(id), request, result.sets[result.setCount]);
        if (!outcome)
            return std::unexpected(outcome.error());
        ++result.setCount;
        return {};
    };
    Result<void> done;
    switch (request.rules) {
    case RuleChoice::Strictest:
        done = add(RuleSetId::Iec60825_1_2007);
        if (done)
            done = add(RuleSetId::Iec60825_1_2014);
        break;
    case RuleChoice::Iec60825_1_2007:
        done = add(RuleSetId::Iec60825_1_2007);
        break;
    case RuleChoice::Iec60825_1_2014:
        done = add(RuleSetId::Iec60825_1_2014);
        break;
    }
    if (!done) {
        out = std::unexpected(done.error());
        return out;
    }

    // The lowest limit governs; every figure is compared as the whole-source equivalent, so sets that measure an
    // extended source in different fields of view compare on the same exposure.
    for (std::uint8_t i = 1; i < result.setCount; ++i) {
        if (result.sets[i].limit < result.sets[result.governingSet].limit)
            result.governingSet = i;
    }
    const double lowest = result.governing().limit.si();
    result.setsTie =
        result.setCount > 1 && std::all_of(result.sets.begin(), result.sets.begin() + result.setCount,
                                           [&](const SetOutcome& s) { return s.limit.si() <= lowest * (1.0 + 1e-9); });
    return out;
}

} // namespace

units::RadiantExposure MpeResult::perPulse() const
{
    return governing().limit;
}

units::RadiantExposure MpeResult::radiantExposure() const
{
    const SetOutcome& g = governing();
    if (!g.train)
        return g.limit;
    return g.limit * g.train->pulsesInExposure;
}

units::Irradiance MpeResult::irradiance() const
{
    const double duration = request.train ? request.train->exposure.seconds() : request.duration.seconds();
    return units::Irradiance::fromSi(radiantExposure().si() / duration);
}

bool MpeResult::restsOnReconstructedRow() const
{
    if (setsTie) // equal figures: the figure stands if any set rests on verified rows
        return std::all_of(sets.begin(), sets.begin() + setCount,
                           [](const SetOutcome& s) { return s.weakestStatus == RowStatus::Reconstructed; });
    return governing().weakestStatus == RowStatus::Reconstructed;
}

} // namespace beamwarden::limits
