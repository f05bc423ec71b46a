#pragma once
// One laser assessed as a whole: every output and exposure case through the limit, hazard and eyewear engines,
// eye and skin, and the shelf checked against it. The result is a value; views only display it.
#include "beamwarden/eyewear/selection.hpp"
#include "beamwarden/hazard/hazard.hpp"
#include "beamwarden/limits/mpe.hpp"
#include "beamwarden/model/records.hpp"

#include <nlohmann/json_fwd.hpp>

#include <string>
#include <vector>

namespace beamwarden::assessment {

struct AssessmentOptions {
    limits::RuleChoice rules = limits::RuleChoice::Strictest;
    limits::C5Option c5 = limits::C5Option::Conservative;
};

// The skin at the worst point of a case: 3.5 mm aperture (11 mm beyond 0.1 mm), skin MPE, rules 1 and 2 only.
struct SkinResult {
    double exposure = 0; // per pulse J/m^2 or W/m^2, as the eye figure
    double limit = 0;
    double ratio = 0;
    limits::MpeResult mpe; // of the line with the largest ratio
};

struct CaseAssessment {
    std::string name;
    hazard::HazardResult eye;
    SkinResult skin;
};

struct OutputAssessment {
    std::string name;
    std::vector<CaseAssessment> cases;
};

struct EyewearOutcome {
    std::string itemName;
    eyewear::ProtectionCheck check;
};

struct LaserAssessment {
    model::Laser laser;
    AssessmentOptions options;
    std::vector<OutputAssessment> outputs;
    std::vector<EyewearOutcome> eyewear; // every shelf item, in shelf order
    eyewear::Selection selection;
    std::vector<std::string> notes;
};

// Refuses (naming laser / output / case / field) anything the engines refuse; never returns half a result.
[[nodiscard]] Result<LaserAssessment> assessLaser(const model::Laser& laser,
                                                  const std::vector<model::EyewearItem>& shelf,
                                                  const AssessmentOptions& options = {});

// vocabulary.md verdict for an exposure: "within limit", or "over limit xN" with N to two significant figures.
[[nodiscard]] std::string exposureVerdict(double ratio);

[[nodiscard]] nlohmann::json toJson(const LaserAssessment& assessment);

} // namespace beamwarden::assessment
