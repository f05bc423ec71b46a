#include "beamwarden/eyewear/selection.hpp"

#include <algorithm>
#include <fmt/core.h>

namespace beamwarden::eyewear {

namespace {

std::vector<bool> coveredOutputs(const ProtectionCheck& check)
{
    std::vector<bool> covered;
    for (const OutputCheck& output : check.outputs)
        covered.push_back(output.verdict == Verdict::Covers);
    return covered;
}

std::vector<std::string> namesOf(const ProtectionCheck& check)
{
    std::vector<std::string> names;
    for (const OutputCheck& output : check.outputs) {
        if (output.verdict == Verdict::Covers)
            names.push_back(output.outputName + " (" + output.caseName + ")");
    }
    return names;
}

} // namespace

Selection leanestEyewear(const std::vector<ParsedEyewear>& shelf, const std::vector<OutputRequirement>& outputs)
{
    Selection selection;
    for (const ParsedEyewear& item : shelf)
        selection.checks.push_back(checkAll(item, outputs));

    for (std::size_t i = 0; i < shelf.size(); ++i) {
        if (selection.checks[i].verdict == Verdict::Covers)
            selection.singles.push_back(
                Choice{{i}, shelf[i].item.visibleTransmittance, {namesOf(selection.checks[i])}});
    }
    auto brighterFirst = [](const Choice& a, const Choice& b) {
        return a.visibleTransmittance > b.visibleTransmittance;
    };
    std::stable_sort(selection.singles.begin(), selection.singles.end(), brighterFirst);

    if (selection.singles.empty() && !outputs.empty()) {
        // Two items for different tasks: together they must cover every output and case.
        for (std::size_t i = 0; i < shelf.size(); ++i) {
            const std::vector<bool> a = coveredOutputs(selection.checks[i]);
            if (std::none_of(a.begin(), a.end(), [](bool v) { return v; }))
                continue;
            for (std::size_t j = i + 1; j < shelf.size(); ++j) {
                const std::vector<bool> b = coveredOutputs(selection.checks[j]);
                bool all = true;
                for (std::size_t k = 0; k < a.size(); ++k)
                    all = all && (a[k] || b[k]);
                if (all)
                    selection.pairs.push_back(
                        Choice{{i, j},
                               std::min(shelf[i].item.visibleTransmittance, shelf[j].item.visibleTransmittance),
                               {namesOf(selection.checks[i]), namesOf(selection.checks[j])}});
            }
        }
        std::stable_sort(selection.pairs.begin(), selection.pairs.end(), brighterFirst);
    }

    if (selection.singles.empty() && selection.pairs.empty()) {
        for (const OutputRequirement& requirement : outputs) {
            const auto marking = impliedMarking(requirement.levels);
            const std::string od = fmt::format("OD >= {:.1f}", hazard::roundOdUp(requirement.hazard.requiredOd));
            if (marking)
                selection.purchaseMarkings.push_back(
                    fmt::format("{} ({}): {}, {}", requirement.outputName, requirement.caseName, format(*marking), od));
            else
                selection.purchaseMarkings.push_back(fmt::format("{} ({}): beyond LB10, no EN 207 eyewear is adequate; "
                                                                 "enclose the beam",
                                                                 requirement.outputName, requirement.caseName));
        }
        selection.notes.emplace_back("Nothing on the shelf covers every output; a purchase must carry at least these "
                                     "markings (and the OD over the whole wavelength range).");
    }
    return selection;
}

} // namespace beamwarden::eyewear
