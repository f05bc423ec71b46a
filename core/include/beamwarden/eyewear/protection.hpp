#pragma once
// Does an eyewear item protect against a laser? Per output and exposure case: the optical density it provides at
// every wavelength of the output against the required OD (additive lines summed, hazard-and-eyewear.md section 1.4),
// and its EN 207 levels against the levels the output requires (section 6). Verdicts in vocabulary.md's words.
#include "beamwarden/eyewear/en208.hpp"
#include "beamwarden/eyewear/levels.hpp"
#include "beamwarden/eyewear/marking.hpp"
#include "beamwarden/hazard/hazard.hpp"
#include "beamwarden/model/records.hpp"

#include <array>
#include <string>
#include <vector>

namespace beamwarden::eyewear {

enum class Verdict : std::uint8_t { Covers, CannotTell, FallsShort }; // ordered from best to worst
[[nodiscard]] std::string_view toString(Verdict verdict);             // "covers", "cannot tell", "falls short"

// An eyewear item with its markings parsed once.
struct ParsedEyewear {
    model::EyewearItem item;
    std::vector<En207Marking> en207;
    std::vector<En208Marking> en208;

    [[nodiscard]] bool hasOdData() const { return !item.spectralOd.empty() || !en207.empty() || !en208.empty(); }
};
// Refuses a marking that does not parse, naming the item and the part that failed.
[[nodiscard]] Result<ParsedEyewear> parseEyewear(const model::EyewearItem& item);

struct ProvidedOd {
    double od = 0;
    bool rated = false; // some table row or marking covers the wavelength
    std::string source; // "OD table 740-1100 nm: 7", "marking 740-1100 D LB7: OD >= 7"
};
// The OD the item promises at lambda: the highest of its table rows and marked levels covering it (an LB n level
// promises OD >= n over its range; EN 208 RB n is read the same way, reconstructed).
[[nodiscard]] ProvidedOd providedOd(const ParsedEyewear& eyewear, double lambda_nm);

// What one output and exposure case requires, computed once and checked against any number of items.
struct OutputRequirement {
    std::string outputName;
    std::string caseName;
    hazard::HazardResult hazard;
    std::vector<LevelRequirement> levels;
    AlignmentRequirement alignment;
};
[[nodiscard]] Result<OutputRequirement> requirementFor(const hazard::HazardRequest& request, std::string outputName,
                                                       std::string caseName);
// Every output and exposure case of a laser (an output without cases is checked for direct viewing at the exit).
[[nodiscard]] Result<std::vector<OutputRequirement>> requirementsFor(const model::Laser& laser,
                                                                     limits::RuleChoice rules, limits::C5Option c5);

struct OutputCheck {
    std::string outputName;
    std::string caseName;
    Verdict verdict = Verdict::Covers;
    double requiredOd = 0; // the largest band requirement
    double providedOd = 0; // at the wavelength that leaves the least margin
    double marginOd = 0;   // -log10 of the residual exposure/MPE sum behind the eyewear; >= 0 when the OD suffices
    double worstWavelength_nm = 0;
    std::array<int, kModeCount> requiredLevels{}; // per mode D I R M, 0 = not required
    std::vector<std::string> reasons;
};

struct ProtectionCheck {
    Verdict verdict = Verdict::Covers;
    double marginOd = 0; // the smallest margin over all outputs
    std::vector<OutputCheck> outputs;
};

[[nodiscard]] OutputCheck checkOutput(const ParsedEyewear& eyewear, const OutputRequirement& requirement);
[[nodiscard]] ProtectionCheck checkAll(const ParsedEyewear& eyewear, const std::vector<OutputRequirement>& outputs);

} // namespace beamwarden::eyewear
