#include "beamwarden/eyewear/selection.hpp"

#include "requirementindex.hpp"

#include <algorithm>
#include <fmt/core.h>
#include <iterator>
#include <map>
#include <utility>

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

// Two items for different tasks must together cover every output and case. A shelf of thousands would give
// millions of pairs, so items are grouped by what they cover, only groups that complete each other are paired, and
// the kMaxPairs brightest pairs are kept (the others are counted in a note).
constexpr std::size_t kMaxPairs = 10;

void coveringPairs(const std::vector<ParsedEyewear>& shelf, Selection& selection)
{
    std::map<std::vector<bool>, std::vector<std::size_t>> groups; // what an item covers -> its items, shelf order
    for (std::size_t i = 0; i < shelf.size(); ++i) {
        std::vector<bool> covered = coveredOutputs(selection.checks[i]);
        if (std::any_of(covered.begin(), covered.end(), [](bool v) { return v; }))
            groups[std::move(covered)].push_back(i);
    }
    auto brighter = [&](std::size_t a, std::size_t b) {
        return shelf[a].item.visibleTransmittance > shelf[b].item.visibleTransmittance;
    };
    std::map<std::vector<bool>, std::size_t> groupSize; // before trimming, to count every covering pair
    for (auto& [covered, items] : groups) {
        groupSize[covered] = items.size();
        std::stable_sort(items.begin(), items.end(), brighter);
        if (items.size() > kMaxPairs) // a pair with a dimmer item of a group is never brighter than these
            items.resize(kMaxPairs);
    }
    std::vector<std::pair<std::size_t, std::size_t>> candidates;
    std::size_t total = 0;
    for (auto a = groups.begin(); a != groups.end(); ++a) {
        for (auto b = std::next(a); b != groups.end(); ++b) {
            bool all = true;
            for (std::size_t k = 0; k < a->first.size(); ++k)
                all = all && (a->first[k] || b->first[k]);
            if (!all)
                continue;
            total += groupSize[a->first] * groupSize[b->first];
            for (const std::size_t i : a->second) {
                for (const std::size_t j : b->second)
                    candidates.emplace_back(std::min(i, j), std::max(i, j));
            }
        }
    }
    auto pairLight = [&](const std::pair<std::size_t, std::size_t>& p) {
        return std::min(shelf[p.first].item.visibleTransmittance, shelf[p.second].item.visibleTransmittance);
    };
    // Brightest first; among equals, in shelf order.
    std::sort(candidates.begin(), candidates.end(), [&](const auto& x, const auto& y) {
        const double lx = pairLight(x);
        const double ly = pairLight(y);
        return lx != ly ? lx > ly : x < y;
    });
    if (candidates.size() > kMaxPairs)
        candidates.resize(kMaxPairs);
    for (const auto& [i, j] : candidates)
        selection.pairs.push_back(
            Choice{{i, j}, pairLight({i, j}), {namesOf(selection.checks[i]), namesOf(selection.checks[j])}});
    if (total > selection.pairs.size())
        selection.notes.push_back(fmt::format("{} pairs of items cover every output together; the {} with the best "
                                              "visible transmittance are listed.",
                                              total, selection.pairs.size()));
}

} // namespace

Selection leanestEyewear(const std::vector<ParsedEyewear>& shelf, const std::vector<OutputRequirement>& outputs)
{
    Selection selection;
    std::vector<detail::RequirementIndex> indices; // built once, shared by every item of the shelf
    if (!shelf.empty()) {
        indices.reserve(outputs.size());
        for (const OutputRequirement& requirement : outputs)
            indices.emplace_back(requirement);
    }
    selection.checks.reserve(shelf.size());
    for (const ParsedEyewear& item : shelf)
        selection.checks.push_back(detail::checkAll(item, outputs, indices));

    for (std::size_t i = 0; i < shelf.size(); ++i) {
        if (selection.checks[i].verdict == Verdict::Covers)
            selection.singles.push_back(
                Choice{{i}, shelf[i].item.visibleTransmittance, {namesOf(selection.checks[i])}});
    }
    auto brighterFirst = [](const Choice& a, const Choice& b) {
        return a.visibleTransmittance > b.visibleTransmittance;
    };
    std::stable_sort(selection.singles.begin(), selection.singles.end(), brighterFirst);

    if (selection.singles.empty() && !outputs.empty())
        coveringPairs(shelf, selection);

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
