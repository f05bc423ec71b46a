#include "beamwarden/hazard/report.hpp"

#include "beamwarden/caution.hpp"
#include "beamwarden/limits/report.hpp"

#include <nlohmann/json.hpp>

namespace beamwarden::hazard {

namespace {

using nlohmann::json;

json distanceJson(const HazardDistance& d)
{
    json out{{"kind", toString(d.kind)}, {"model", d.model}};
    out["value_m"] = d.kind == DistanceKind::Unbounded ? json(nullptr) : json(d.value.si());
    if (d.linear.si() > 0.0)
        out["linear_m"] = d.linear.si();
    if (d.quadrature.si() > 0.0)
        out["quadrature_m"] = d.quadrature.si();
    if (d.smallSource.si() > 0.0)
        out["small_source_m"] = d.smallSource.si();
    return out;
}

} // namespace

std::string_view toString(DistanceKind kind)
{
    switch (kind) {
    case DistanceKind::Zero:
        return "zero";
    case DistanceKind::Finite:
        return "finite";
    case DistanceKind::Unbounded:
        return "unbounded";
    }
    return "?";
}

nlohmann::json toJson(const HazardResult& result)
{
    const HazardRequest& request = result.request;
    const LineResult& governing = result.lines[result.governingLine];
    const char* unit = result.pulsed ? "J/m2" : "W/m2";

    json lines = json::array();
    for (const LineResult& line : result.lines)
        lines.push_back(
            json{{"wavelength_m", line.sample.wavelength.si()},
                 {"power_fraction", line.sample.powerFraction},
                 {"exposure", line.exposure},
                 {"mpe", line.limit},
                 {"ratio", line.ratio},
                 {"rule_set",
                  line.mpe.setsTie ? std::string("both") : std::string(limits::ruleSet(line.mpe.governing().set).name)},
                 {"rests_on_reconstructed_row", line.mpe.restsOnReconstructedRow()}});
    json bands = json::array();
    for (const BandOd& band : result.bands)
        bands.push_back(json{{"from_m", band.from.si()},
                             {"to_m", band.to.si()},
                             {"ratio", band.ratio},
                             {"required_od", band.requiredOd},
                             {"required_od_displayed", roundOdUp(band.requiredOd)}});
    json perRule = json::array();
    for (const RuleOd& rule : result.perRule) {
        json r{{"rule", limits::toString(rule.rule)}, {"applies", rule.applies}};
        if (rule.applies) {
            r["per_pulse_mpe_J_m2"] = rule.perPulseLimit;
            r["required_od"] = rule.od;
        }
        perRule.push_back(r);
    }

    json out{
        {"viewing", model::toString(request.exposureCase.viewing)},
        {"rule_set", limits::toString(request.rules)},
        {"nohd_m", result.nohd.kind == DistanceKind::Unbounded ? json(nullptr) : json(result.nohd.value.si())},
        {"nohd", distanceJson(result.nohd)},
        {"required_od", result.requiredOd},
        {"required_od_displayed", result.displayedOd},
        {"exposure_at_point", json{{"value", result.exposureAtPoint},
                                   {"unit", unit},
                                   {"per_pulse", result.pulsed},
                                   {"distance_m", result.pointDistance.si()},
                                   {"aperture_m", result.aperture.si()},
                                   {"source_angle_rad", result.sourceAngleAtPoint.si()}}},
        {"mpe",
         json{{"value", result.limit},
              {"unit", unit},
              {"governing_rule", limits::toString(result.governingRule)},
              {"wavelength_m", governing.sample.wavelength.si()},
              {"rule_set", governing.mpe.setsTie ? std::string("both")
                                                 : std::string(limits::ruleSet(governing.mpe.governing().set).name)},
              {"provenance", limits::toJson(governing.mpe)["provenance"]}}},
        {"exposure_over_mpe", result.combinedRatio},
        {"exposure_basis", json{{"duration_s", result.basis.duration.seconds()},
                                {"default", result.basis.isDefault},
                                {"reason", result.basis.reason}}},
        {"od_per_rule", perRule},
        {"bands", bands},
        {"lines", lines},
        {"conventions", result.conventions},
        {"notes", result.notes},
        {"caution", caution()},
    };
    return out;
}

} // namespace beamwarden::hazard
