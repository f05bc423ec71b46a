// Provenance in words and JSON (keys listed in core/src/limits/README.md).
#include "beamwarden/limits/report.hpp"

#include "beamwarden/caution.hpp"

#include <fmt/core.h>
#include <nlohmann/json.hpp>

namespace beamwarden::limits {

namespace {

using nlohmann::json;

std::string durationBand(const LimitRow& row)
{
    const std::string to = units::format(units::Duration::fromSi(row.durationTo_s));
    if (row.durationFrom_s <= 0.0)
        return "up to " + to;
    return units::format(units::Duration::fromSi(row.durationFrom_s)) + " to " + to;
}

std::string wavelengthBand(const LimitRow& row)
{
    return units::format(units::Wavelength::fromSi(row.lambdaFrom_nm * 1e-9)) + " to " +
           units::format(units::Wavelength::fromSi(row.lambdaTo_nm * 1e-9));
}

json termJson(const LimitTerm& term)
{
    json factorsJson = json::object();
    for (const AppliedFactor& f : term.appliedFactors())
        factorsJson[std::string(toString(f.factor))] = f.value;
    return json{
        {"row_id", term.row->id},
        {"row", describeRow(*term.row)},
        {"effect", toString(term.row->effect)},
        {"formula", term.row->formula},
        {"source", term.row->source_},
        {"status", toString(term.row->status)},
        {"duration_s", term.duration.seconds()},
        {"within_field_J_m2", term.withinField.si()},
        {"whole_source_J_m2", term.wholeSource.si()},
        {"field_of_view_rad", term.fieldOfView.si()},
        {"alpha_max_rad", term.alphaMax.si()},
        {"aperture_m", term.aperture.si()},
        {"factors", factorsJson},
        {"below_tabulated_duration", term.belowTable},
    };
}

json ruleJson(const RuleOutcome& rule)
{
    json out{{"rule", toString(rule.rule)}, {"applies", rule.applies}};
    if (!rule.applies)
        return out;
    out["per_pulse_radiant_exposure_J_m2"] = rule.perPulse.si();
    out["pulses_counted"] = rule.pulsesCounted;
    out["group_size"] = rule.groupSize;
    out["grouped"] = rule.grouped;
    if (rule.rule == PulseRule::PulseTrain)
        out["c5"] = rule.c5;
    if (rule.rule == PulseRule::AveragePower)
        out["over_one_burst"] = rule.overBurst;
    out["basis"] = termJson(rule.basis);
    return out;
}

const RuleOutcome& governingRule(const TrainOutcome& train)
{
    switch (train.governingRule) {
    case PulseRule::SinglePulse:
        return train.singlePulse;
    case PulseRule::AveragePower:
        return train.average;
    case PulseRule::PulseTrain:
        return train.repeated;
    }
    return train.singlePulse;
}

json setJson(const SetOutcome& set)
{
    const RuleSet& rules = ruleSet(set.set);
    json limits = json::array();
    for (const LimitTerm& term : set.single.all())
        limits.push_back(termJson(term));
    json out{
        {"rule_set", rules.name},
        {"title", rules.title},
        {"note", rules.validityNote},
        {"limit_J_m2", set.limit.si()},
        {"status", toString(set.weakestStatus)},
        {"limits_at_duration", limits},
        {"governing_limit_at_duration", termJson(set.single.governingTerm())},
    };
    if (rules.hasC5Options)
        out["c5_option"] = toString(set.c5);
    if (set.train) {
        const TrainOutcome& t = *set.train;
        out["train"] = json{
            {"governing_rule", toString(t.governingRule)},
            {"per_pulse_radiant_exposure_J_m2", t.perPulse.si()},
            {"ti_s", t.ti.seconds()},
            {"pulses_in_exposure", t.pulsesInExposure},
            {"single_pulse", ruleJson(t.singlePulse)},
            {"average_power", ruleJson(t.average)},
            {"pulse_train", ruleJson(t.repeated)},
        };
        if (t.hasBothC5)
            out["train"]["c5_side_by_side"] = json{{"conservative", t.c5Conservative}, {"edition", t.c5Edition}};
    }
    return out;
}

} // namespace

std::vector<std::string> resultNotes(const MpeResult& result)
{
    std::vector<std::string> notes;
    const SetOutcome& governing = result.governing();
    if (result.restsOnReconstructedRow())
        notes.emplace_back("This figure rests on a row reconstructed from public material, not read from the "
                           "standard's text: verify it against the standard before relying on it.");
    if (governing.belowTable)
        notes.emplace_back("The pulse is shorter than the shortest tabulated duration (100 fs): the shortest row's "
                           "form is used (constant radiant exposure, or constant irradiance where the row gives one), "
                           "not an extrapolated formula.");
    const double lambda = result.request.wavelength.nanometres();
    const double pulse = result.request.duration.seconds();
    if ((result.request.train || pulse < 1e-9) && pulse < 1e-12 && lambda >= 700.0 && lambda <= 1400.0 &&
        result.request.target == Target::Eye)
        notes.emplace_back("Femtosecond near-infrared pulses can generate a visible supercontinuum inside the eye; "
                           "treat visible exposure as possible and consult your laser safety officer.");
    if (governing.train && governing.train->hasBothC5 && governing.train->governingRule == PulseRule::PulseTrain)
        notes.emplace_back(fmt::format("IEC 60825-1:2014 C5: conservative reading {:.4g}, edition reading {:.4g}; "
                                       "the {} reading is used.",
                                       governing.train->c5Conservative, governing.train->c5Edition,
                                       toString(result.request.c5)));
    return notes;
}

std::string describeRow(const LimitRow& row)
{
    std::string text = fmt::format("{}, {}, {}, {}: {}", toString(row.target), wavelengthBand(row), durationBand(row),
                                   describe(row.effect), row.formula);
    if (row.source == SourceSize::Small)
        text += " (small source)";
    else if (row.source == SourceSize::Extended)
        text += " (extended source)";
    return text;
}

std::string describeTerm(const LimitTerm& term)
{
    std::string text = describeRow(*term.row);
    std::string factorText;
    for (const AppliedFactor& f : term.appliedFactors()) {
        factorText += factorText.empty() ? "" : ", ";
        factorText += fmt::format("{} = {:.4g}", toString(f.factor), f.value);
        if (f.factor == Factor::T1 || f.factor == Factor::T2)
            factorText += " s";
    }
    if (!factorText.empty())
        text += "; " + factorText;
    if (term.alphaMax.si() > 0.0)
        text += fmt::format("; alpha_max = {}", units::format(term.alphaMax));
    if (term.row->effect == Effect::RetinalPhotochemical)
        text += fmt::format("; gamma_ph = {}", units::format(term.fieldOfView));
    text += fmt::format("; aperture {}; {}", units::format(term.aperture), toString(term.row->status));
    if (term.belowTable)
        text += "; below the tabulated duration (1e-13 s): the shortest row's form is used";
    return text;
}

nlohmann::json toJson(const MpeResult& result)
{
    const MpeRequest& request = result.request;
    const SetOutcome& governing = result.governing();
    double pulsesCounted = 1.0;
    std::string_view rule = toString(PulseRule::SinglePulse);
    if (governing.train) {
        const RuleOutcome& g = governingRule(*governing.train);
        pulsesCounted = g.pulsesCounted;
        rule = toString(g.rule);
    }

    json sets = json::array();
    for (const SetOutcome& set : result.allSets())
        sets.push_back(setJson(set));
    json provenance{
        {"rule_choice", toString(request.rules)},
        {"c5_option", toString(request.c5)},
        {"governing_rule_set", result.setsTie ? std::string("both") : std::string(ruleSet(governing.set).name)},
        {"sets_tie", result.setsTie},
        {"row",
         describeTerm(governing.train ? governingRule(*governing.train).basis : governing.single.governingTerm())},
        {"status", toString(governing.weakestStatus)},
        {"rests_on_reconstructed_row", result.restsOnReconstructedRow()},
        {"sets", sets},
    };

    json out{
        {"rule_set", toString(request.rules)},
        {"target", toString(request.target)},
        {"wavelength_m", request.wavelength.si()},
        {"duration_s", request.duration.si()},
        {"source_angle_rad", request.sourceAngle.si()},
        {"radiant_exposure_J_m2", result.radiantExposure().si()},
        {"irradiance_W_m2", result.irradiance().si()},
        {"per_pulse_radiant_exposure_J_m2", result.perPulse().si()},
        {"governing_rule", rule},
        {"pulses_counted", pulsesCounted},
        {"below_tabulated_duration", governing.belowTable},
        {"provenance", provenance},
        {"caution", caution()},
    };
    if (request.train) {
        out["prf_Hz"] = request.train->prf.si();
        out["exposure_s"] = request.train->exposure.si();
        if (request.train->burst) {
            out["burst_count"] = request.train->burst->pulsesPerBurst;
            out["burst_rate_Hz"] = request.train->burst->burstRate.si();
        }
    }
    json notes = json::array();
    for (const std::string& note : resultNotes(result))
        notes.push_back(note);
    out["notes"] = notes;
    return out;
}

} // namespace beamwarden::limits
