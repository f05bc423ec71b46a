// The assessment as JSON (`beamwarden-cli assess --json`, the assessment snapshot of the store, the hazard sheet).
#include "beamwarden/hazard/report.hpp"
#include "beamwarden/assessment/assessment.hpp"
#include "beamwarden/caution.hpp"
#include "beamwarden/eyewear/marking.hpp"
#include "beamwarden/limits/report.hpp"

#include <cmath>
#include <nlohmann/json.hpp>

namespace beamwarden::assessment {

namespace {

using nlohmann::json;

json finite(double value)
{
    return std::isfinite(value) ? json(value) : json(nullptr);
}

json levelsJson(const std::array<int, eyewear::kModeCount>& levels)
{
    json out = json::object();
    for (int m = 0; m < eyewear::kModeCount; ++m) {
        if (levels[static_cast<std::size_t>(m)] > 0)
            out[std::string(1, eyewear::letter(static_cast<eyewear::Mode>(m)))] = levels[static_cast<std::size_t>(m)];
    }
    return out;
}

json checkJson(const eyewear::ProtectionCheck& check)
{
    json outputs = json::array();
    for (const eyewear::OutputCheck& o : check.outputs)
        outputs.push_back(json{{"output", o.outputName},
                               {"case", o.caseName},
                               {"verdict", eyewear::toString(o.verdict)},
                               {"required_od", o.requiredOd},
                               {"provided_od", o.providedOd},
                               {"margin_od", finite(o.marginOd)},
                               {"required_levels", levelsJson(o.requiredLevels)},
                               {"reasons", o.reasons}});
    return json{
        {"verdict", eyewear::toString(check.verdict)}, {"margin_od", finite(check.marginOd)}, {"outputs", outputs}};
}

} // namespace

nlohmann::json toJson(const LaserAssessment& a)
{
    json outputs = json::array();
    for (const OutputAssessment& o : a.outputs) {
        json cases = json::array();
        for (const CaseAssessment& c : o.cases) {
            json eye = hazard::toJson(c.eye);
            eye.erase("caution");
            cases.push_back(json{
                {"name", c.name},
                {"eye", eye},
                {"eye_verdict", exposureVerdict(c.eye.combinedRatio)},
                {"skin", json{{"exposure", c.skin.exposure},
                              {"mpe", c.skin.limit},
                              {"unit", c.eye.exposureUnit},
                              {"ratio", c.skin.ratio},
                              {"verdict", exposureVerdict(c.skin.ratio)},
                              {"provenance", limits::toJson(c.skin.mpe)["provenance"]["row"]}}},
            });
        }
        outputs.push_back(json{{"name", o.name}, {"cases", cases}});
    }
    json shelf = json::array();
    for (const EyewearOutcome& e : a.eyewear) {
        json item = checkJson(e.check);
        item["item"] = e.itemName;
        shelf.push_back(item);
    }
    auto choices = [&](const std::vector<eyewear::Choice>& list) {
        json out = json::array();
        for (const eyewear::Choice& c : list) {
            json items = json::array();
            for (const std::size_t i : c.items)
                items.push_back(a.eyewear[i].itemName);
            out.push_back(json{{"items", items}, {"visible_transmittance", c.visibleTransmittance}});
        }
        return out;
    };
    return json{
        {"laser", a.laser.name},
        {"maker_model", a.laser.makerModel},
        {"room", a.laser.room},
        {"class", model::toString(a.laser.laserClass)},
        {"rule_set", limits::toString(a.options.rules)},
        {"c5_option", limits::toString(a.options.c5)},
        {"outputs", outputs},
        {"eyewear", shelf},
        {"covering_eyewear", choices(a.selection.singles)},
        {"covering_pairs", choices(a.selection.pairs)},
        {"purchase_markings", a.selection.purchaseMarkings},
        {"notes", a.notes},
        {"caution", caution()},
    };
}

} // namespace beamwarden::assessment
