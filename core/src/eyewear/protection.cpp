// Protection checks of eyewear against outputs (hazard-and-eyewear.md sections 1.2, 1.4, 6.3-6.6).
#include "beamwarden/eyewear/protection.hpp"

#include "beamwarden/limits/additivity.hpp"
#include "requirementindex.hpp"

#include <algorithm>
#include <array>
#include <cmath>
#include <fmt/core.h>
#include <limits>

namespace beamwarden::eyewear {

namespace {

// What gives an item's OD at a wavelength, found without writing any words: a shelf check asks this for every
// spectral sample of every output, and only the worst wavelength's source is ever shown.
struct OdWinner {
    enum class Kind : std::uint8_t { None, TableRow, En207Term, En208Span } kind = Kind::None;
    std::size_t index = 0; // table row, or marking
    std::size_t part = 0;  // term of an EN 207 marking
    double od = 0;
};

OdWinner bestOd(const ParsedEyewear& eyewear, double lambda_nm)
{
    OdWinner best;
    auto consider = [&](double od, OdWinner::Kind kind, std::size_t index, std::size_t part) {
        if (best.kind == OdWinner::Kind::None || od > best.od)
            best = OdWinner{kind, index, part, od};
    };
    const auto& table = eyewear.item.spectralOd;
    for (std::size_t i = 0; i < table.size(); ++i) {
        if (lambda_nm >= table[i].from.nanometres() && lambda_nm <= table[i].to.nanometres())
            consider(table[i].od, OdWinner::Kind::TableRow, i, 0);
    }
    for (std::size_t m = 0; m < eyewear.en207.size(); ++m) {
        const auto& terms = eyewear.en207[m].terms;
        for (std::size_t t = 0; t < terms.size(); ++t) {
            if (terms[t].covers(lambda_nm))
                consider(terms[t].level, OdWinner::Kind::En207Term, m, t);
        }
    }
    for (std::size_t m = 0; m < eyewear.en208.size(); ++m) {
        for (const WavelengthSpan& span : eyewear.en208[m].wavelengths) {
            if (span.contains(lambda_nm)) {
                consider(eyewear.en208[m].level, OdWinner::Kind::En208Span, m, 0);
                break;
            }
        }
    }
    return best;
}

std::string sourceOf(const ParsedEyewear& eyewear, const OdWinner& winner)
{
    switch (winner.kind) {
    case OdWinner::Kind::None:
        return {};
    case OdWinner::Kind::TableRow: {
        const model::OdRow& row = eyewear.item.spectralOd[winner.index];
        return fmt::format("OD table {:g}-{:g} nm: {}{:g}", row.from.nanometres(), row.to.nanometres(),
                           row.atLeast ? ">= " : "", row.od);
    }
    case OdWinner::Kind::En207Term: {
        const En207Marking& marking = eyewear.en207[winner.index];
        const int level = marking.terms[winner.part].level;
        return fmt::format("marking {}: LB{} promises OD >= {}", format(marking), level, level);
    }
    case OdWinner::Kind::En208Span: {
        const En208Marking& marking = eyewear.en208[winner.index];
        return fmt::format("alignment marking {}: RB{} read as OD >= {} (reconstructed)", format(marking),
                           marking.level, marking.level);
    }
    }
    return {};
}

std::string nm(double lambda)
{
    return fmt::format("{:g} nm", std::round(lambda * 10.0) / 10.0);
}

void worsen(Verdict& verdict, Verdict candidate)
{
    verdict = std::max(verdict, candidate);
}

// An item's wavelength pieces: its table rows' and marked spans' ends, and the open intervals between and beyond
// them. Over each piece the item's OD and its marked levels are constant, so each is found once per item.
struct ItemPieces {
    std::vector<double> bounds; // sorted, unique, nm
    // Per slot (0: below bounds[0]; 2k+1: at bounds[k]; 2k+2: between bounds[k] and bounds[k+1], or above the last):
    std::vector<OdWinner> od;
    std::vector<std::array<int, kModeCount>> level; // the highest EN 207 level marked per mode, 0 if none

    explicit ItemPieces(const ParsedEyewear& eyewear)
    {
        for (const model::OdRow& row : eyewear.item.spectralOd) {
            bounds.push_back(row.from.nanometres());
            bounds.push_back(row.to.nanometres());
        }
        for (const En207Marking& marking : eyewear.en207)
            for (const MarkingTerm& term : marking.terms)
                for (const WavelengthSpan& span : term.wavelengths) {
                    bounds.push_back(span.from_nm);
                    bounds.push_back(span.to_nm);
                }
        for (const En208Marking& marking : eyewear.en208)
            for (const WavelengthSpan& span : marking.wavelengths) {
                bounds.push_back(span.from_nm);
                bounds.push_back(span.to_nm);
            }
        std::sort(bounds.begin(), bounds.end());
        bounds.erase(std::unique(bounds.begin(), bounds.end()), bounds.end());
        const std::size_t slots = 2 * bounds.size() + 1;
        od.resize(slots);
        level.resize(slots);
        for (std::size_t slot = 0; slot < slots; ++slot) {
            const double lambda = representative(slot);
            od[slot] = bestOd(eyewear, lambda);
            for (const En207Marking& marking : eyewear.en207)
                for (const MarkingTerm& term : marking.terms)
                    if (term.covers(lambda))
                        for (int m = 0; m < kModeCount; ++m)
                            if (term.has(static_cast<Mode>(m)))
                                level[slot][static_cast<std::size_t>(m)] =
                                    std::max(level[slot][static_cast<std::size_t>(m)], term.level);
        }
    }

    // A wavelength inside the slot (every wavelength of a slot has the same covering rows and terms).
    [[nodiscard]] double representative(std::size_t slot) const
    {
        if (bounds.empty())
            return 0.0;
        if (slot == 0)
            return bounds.front() - 1.0;
        const std::size_t k = (slot - 1) / 2;
        if (slot % 2 == 1)
            return bounds[k];
        return k + 1 < bounds.size() ? 0.5 * (bounds[k] + bounds[k + 1]) : bounds.back() + 1.0;
    }

    template <typename Below, typename At, typename Between, typename Above>
    [[nodiscard]] detail::Range rangeOf(std::size_t slot, const Below& below, const At& at, const Between& between,
                                        const Above& above) const
    {
        if (bounds.empty())
            return below(std::numeric_limits<double>::infinity());
        if (slot == 0)
            return below(bounds.front());
        const std::size_t k = (slot - 1) / 2;
        if (slot % 2 == 1)
            return at(bounds[k]);
        return k + 1 < bounds.size() ? between(bounds[k], bounds[k + 1]) : above(bounds.back());
    }

    [[nodiscard]] detail::Range lines(std::size_t slot, const detail::RequirementIndex& index) const
    {
        return rangeOf(
            slot, [&](double l) { return index.linesBelow(l); }, [&](double l) { return index.linesAt(l); },
            [&](double a, double b) { return index.linesBetween(a, b); },
            [&](double l) { return index.linesAbove(l); });
    }
    [[nodiscard]] detail::Range samples(std::size_t slot, const detail::RequirementIndex& index) const
    {
        return rangeOf(
            slot, [&](double l) { return index.samplesBelow(l); }, [&](double l) { return index.samplesAt(l); },
            [&](double a, double b) { return index.samplesBetween(a, b); },
            [&](double l) { return index.samplesAbove(l); });
    }
};

// The optical-density part: residual exposure/MPE behind the eyewear, summed over additive lines. Per piece of the
// item, the lines' ratios are summed per region and scaled by the piece's attenuation (the same sum as line by
// line, only grouped).
void checkDensity(const ParsedEyewear& eyewear, const ItemPieces& pieces, const OutputRequirement& req,
                  const detail::RequirementIndex& index, OutputCheck& out)
{
    const hazard::HazardResult& h = req.hazard;
    out.requiredOd = h.requiredOd;
    if (!eyewear.hasOdData()) {
        worsen(out.verdict, Verdict::CannotTell);
        out.reasons.emplace_back("no spectral OD table and no EN 207/EN 208 marking: the optical density is not known");
        out.marginOd = std::numeric_limits<double>::quiet_NaN(); // unknown, not zero
        return;
    }
    std::array<double, detail::kRegionCount> residual{};
    double worstResidual = -1.0;
    std::size_t worstHazardIndex = 0;
    bool anyUnrated = false;
    double unratedFrom = 0;
    double unratedTo = 0;
    for (std::size_t slot = 0; slot < pieces.od.size(); ++slot) {
        const detail::Range range = pieces.lines(slot, index);
        if (range.empty())
            continue;
        const OdWinner& provided = pieces.od[slot];
        const double attenuation = std::pow(10.0, -provided.od);
        const auto sums = index.ratioSums(range);
        for (std::size_t r = 0; r < detail::kRegionCount; ++r)
            residual[r] += sums[r] * attenuation;
        const std::size_t strongest = index.strongest(range);
        const double r = index.ratioAt(strongest) * attenuation;
        const std::size_t order = index.hazardIndexAt(strongest);
        if (r > worstResidual || (r == worstResidual && order < worstHazardIndex)) {
            worstResidual = r;
            worstHazardIndex = order;
            out.worstWavelength_nm = index.lambdaAt(strongest);
            out.providedOd = provided.od;
        }
        double first = 0;
        double last = 0;
        if (provided.kind == OdWinner::Kind::None && index.significantIn(range, first, last)) {
            unratedFrom = anyUnrated ? std::min(unratedFrom, first) : first;
            unratedTo = anyUnrated ? std::max(unratedTo, last) : last;
            anyUnrated = true;
        }
    }
    // As limits::combineLines: each present region's sum over the regions that add with it; the largest governs.
    double governingSum = 0.0;
    for (std::size_t r = 0; r < detail::kRegionCount; ++r) {
        if (!index.regionsPresent()[r])
            continue;
        double sum = 0.0;
        for (std::size_t k = 0; k < detail::kRegionCount; ++k) {
            if (limits::additive(limits::Target::Eye, static_cast<limits::SpectralRegion>(r),
                                 static_cast<limits::SpectralRegion>(k)))
                sum += residual[k];
        }
        governingSum = std::max(governingSum, sum);
    }
    out.marginOd = governingSum > 0.0 ? -std::log10(governingSum) : std::numeric_limits<double>::infinity();
    if (governingSum <= 1.0)
        return;
    worsen(out.verdict, Verdict::FallsShort);
    if (anyUnrated)
        out.reasons.push_back(fmt::format("wavelength range: not rated at {}{}, where {} emits", nm(unratedFrom),
                                          unratedFrom == unratedTo ? "" : " to " + nm(unratedTo), req.outputName));
    out.reasons.push_back(fmt::format("OD: {} needs OD {:.1f}, the eyewear gives {:.1f} at {} (short by {:.2f})",
                                      req.outputName, hazard::roundOdUp(h.requiredOd), out.providedOd,
                                      nm(out.worstWavelength_nm), -out.marginOd));
}

// The damage part: EN 207 levels per mode against the markings (or EN 208 levels for alignment eyewear).
void checkLevels(const ParsedEyewear& eyewear, const ItemPieces& pieces, const OutputRequirement& req,
                 const detail::RequirementIndex& index, OutputCheck& out)
{
    out.requiredLevels = index.requiredLevels;
    if (eyewear.en207.empty()) {
        if (!eyewear.en208.empty()) {
            if (!req.alignment.visible) {
                worsen(out.verdict, Verdict::FallsShort);
                out.reasons.push_back(fmt::format("wavelength range: alignment eyewear (EN 208) is for 400-700 nm; "
                                                  "{} is outside it",
                                                  req.outputName));
                return;
            }
            const bool ok = std::any_of(eyewear.en208.begin(), eyewear.en208.end(), [&](const En208Marking& m) {
                return m.level >= req.alignment.level &&
                       std::all_of(req.levels.begin(), req.levels.end(), [&](const LevelRequirement& l) {
                           return std::any_of(m.wavelengths.begin(), m.wavelengths.end(),
                                              [&](const WavelengthSpan& s) { return s.contains(l.lambda_nm); });
                       });
            });
            if (!ok) {
                worsen(out.verdict, Verdict::FallsShort);
                out.reasons.push_back(fmt::format("damage level: {} needs alignment level RB{} ({})", req.outputName,
                                                  req.alignment.level, req.alignment.basis));
            }
            out.reasons.emplace_back("alignment eyewear (EN 208): for visible alignment work only, it lets through up "
                                     "to the Class 2 level by design");
            return;
        }
        worsen(out.verdict, Verdict::CannotTell);
        out.reasons.emplace_back("no EN 207 marking: whether the filter withstands the beam is not known");
        return;
    }
    // Shortfalls are gathered per mode over the wavelengths, so a band reads as one reason, not one per sample.
    struct Gap {
        double from = 0;
        double to = 0;
        int needed = 0;
        int marked = 0;
        bool any = false;
    };
    std::array<Gap, kModeCount> unmarked{};
    std::array<Gap, kModeCount> tooLow{};
    auto note = [](Gap& gap, double lambda, int needed, int marked) {
        gap.from = gap.any ? std::min(gap.from, lambda) : lambda;
        gap.to = gap.any ? std::max(gap.to, lambda) : lambda;
        gap.needed = std::max(gap.needed, needed);
        gap.marked = gap.any ? std::min(gap.marked, marked) : marked;
        gap.any = true;
    };
    // Per piece of the item and per mode: the samples needing more than the piece's marked level.
    for (std::size_t slot = 0; slot < pieces.level.size(); ++slot) {
        const detail::Range range = pieces.samples(slot, index);
        if (range.empty())
            continue;
        for (int mode = 0; mode < kModeCount; ++mode) {
            const int best = pieces.level[slot][static_cast<std::size_t>(mode)];
            const int needed = index.highestLevel(mode, range);
            if (needed <= best)
                continue;
            Gap& gap = best == 0 ? unmarked[static_cast<std::size_t>(mode)] : tooLow[static_cast<std::size_t>(mode)];
            note(gap, index.sampleLambdaAt(index.firstAbove(mode, range, best)), needed, best);
            note(gap, index.sampleLambdaAt(index.lastAbove(mode, range, best)), needed, best);
        }
    }
    const bool correctionMissing = index.correctionMissing;
    const bool beyondLb10 = index.beyondLb10;
    auto where = [](const Gap& g) { return g.from == g.to ? nm(g.from) : nm(g.from) + " to " + nm(g.to); };
    for (int i = 0; i < kModeCount; ++i) {
        const char mode = letter(static_cast<Mode>(i));
        const Gap& missing = unmarked[static_cast<std::size_t>(i)];
        const Gap& low = tooLow[static_cast<std::size_t>(i)];
        if (missing.any)
            out.reasons.push_back(fmt::format("damage level: no mode {} marking covers {} ({} needs {} LB{})", mode,
                                              where(missing), req.outputName, mode, missing.needed));
        if (low.any)
            out.reasons.push_back(fmt::format("damage level: {} needs {} LB{} at {}, marked LB{}", req.outputName, mode,
                                              low.needed, where(low), low.marked));
        if (missing.any || low.any)
            worsen(out.verdict, Verdict::FallsShort);
    }
    if (beyondLb10) {
        worsen(out.verdict, Verdict::FallsShort);
        out.reasons.push_back(
            fmt::format("damage level: {} needs more than LB10: no EN 207 eyewear is adequate", req.outputName));
    }
    if (correctionMissing && out.verdict == Verdict::Covers) {
        out.verdict = Verdict::CannotTell;
        out.reasons.emplace_back("beam-diameter correction (DGUV 203-042 5.2) not applied: the large beam may need "
                                 "higher levels than marked, so the levels are lower bounds");
    }
}

} // namespace

std::string_view toString(Verdict verdict)
{
    switch (verdict) {
    case Verdict::Covers:
        return "covers";
    case Verdict::CannotTell:
        return "cannot tell";
    case Verdict::FallsShort:
        return "falls short";
    }
    return "cannot tell";
}

Result<ParsedEyewear> parseEyewear(const model::EyewearItem& item)
{
    ParsedEyewear parsed{item, {}, {}};
    for (std::size_t i = 0; i < item.en207Markings.size(); ++i) {
        auto marking = parseEn207(item.en207Markings[i]);
        if (!marking) {
            InputError error = marking.error();
            error.field = fmt::format("{}: en207[{}]: {}", item.name, i, error.field);
            return std::unexpected(error);
        }
        parsed.en207.push_back(*marking);
    }
    for (std::size_t i = 0; i < item.en208Markings.size(); ++i) {
        auto marking = parseEn208(item.en208Markings[i]);
        if (!marking) {
            InputError error = marking.error();
            error.field = fmt::format("{}: en208[{}]: {}", item.name, i, error.field);
            return std::unexpected(error);
        }
        parsed.en208.push_back(*marking);
    }
    for (std::size_t i = 0; i < item.spectralOd.size(); ++i) {
        const model::OdRow& row = item.spectralOd[i];
        if (!std::isfinite(row.od) || row.od < 0.0 || row.od > 20.0 || !(row.from <= row.to))
            return fail(fmt::format("{}: od table row {}", item.name, i + 1),
                        fmt::format("{}-{} OD {}", units::format(row.from), units::format(row.to), row.od),
                        "a wavelength range from <= to and an OD from 0 to 20");
    }
    return parsed;
}

ProvidedOd providedOd(const ParsedEyewear& eyewear, double lambda_nm)
{
    const OdWinner winner = bestOd(eyewear, lambda_nm);
    ProvidedOd out;
    out.rated = winner.kind != OdWinner::Kind::None;
    out.od = winner.od;
    out.source = sourceOf(eyewear, winner);
    return out;
}

Result<OutputRequirement> requirementFor(const hazard::HazardRequest& request, std::string outputName,
                                         std::string caseName)
{
    auto hazardResult = hazard::evaluateHazard(request);
    if (!hazardResult)
        return std::unexpected(hazardResult.error());
    auto levels = requiredLevels(request);
    if (!levels)
        return std::unexpected(levels.error());
    auto alignment = requiredAlignmentLevel(request);
    if (!alignment)
        return std::unexpected(alignment.error());
    return OutputRequirement{std::move(outputName), std::move(caseName), std::move(*hazardResult), std::move(*levels),
                             *alignment};
}

Result<std::vector<OutputRequirement>> requirementsFor(const model::Laser& laser, limits::RuleChoice rules,
                                                       limits::C5Option c5)
{
    std::vector<OutputRequirement> out;
    for (const model::Output& output : laser.outputs) {
        std::vector<model::NamedExposureCase> cases = output.exposureCases;
        if (cases.empty())
            cases.push_back(model::NamedExposureCase{0, "intrabeam at the exit", model::ExposureCase{}});
        for (const model::NamedExposureCase& c : cases) {
            hazard::HazardRequest request{output.emission, output.beam, c.exposureCase, rules, c5};
            auto requirement = requirementFor(request, output.name, c.name);
            if (!requirement) {
                InputError error = requirement.error();
                error.field = fmt::format("{} / {} / {}: {}", laser.name, output.name, c.name, error.field);
                return std::unexpected(error);
            }
            out.push_back(std::move(*requirement));
        }
    }
    return out;
}

namespace {

OutputCheck checkIndexed(const ParsedEyewear& eyewear, const ItemPieces& pieces, const OutputRequirement& requirement,
                         const detail::RequirementIndex& index)
{
    OutputCheck out;
    out.outputName = requirement.outputName;
    out.caseName = requirement.caseName;
    checkDensity(eyewear, pieces, requirement, index, out);
    checkLevels(eyewear, pieces, requirement, index, out);
    return out;
}

} // namespace

OutputCheck checkOutput(const ParsedEyewear& eyewear, const OutputRequirement& requirement)
{
    return checkIndexed(eyewear, ItemPieces(eyewear), requirement, detail::RequirementIndex(requirement));
}

ProtectionCheck checkAll(const ParsedEyewear& eyewear, const std::vector<OutputRequirement>& outputs)
{
    std::vector<detail::RequirementIndex> indices;
    indices.reserve(outputs.size());
    for (const OutputRequirement& requirement : outputs)
        indices.emplace_back(requirement);
    return detail::checkAll(eyewear, outputs, indices);
}

namespace detail {

ProtectionCheck checkAll(const ParsedEyewear& eyewear, const std::vector<OutputRequirement>& outputs,
                         const std::vector<RequirementIndex>& indices)
{
    const ItemPieces pieces(eyewear);
    ProtectionCheck check;
    check.marginOd = std::numeric_limits<double>::infinity();
    check.outputs.reserve(outputs.size());
    for (std::size_t i = 0; i < outputs.size(); ++i) {
        OutputCheck one = checkIndexed(eyewear, pieces, outputs[i], indices[i]);
        worsen(check.verdict, one.verdict);
        check.marginOd = std::min(check.marginOd, one.marginOd);
        check.outputs.push_back(std::move(one));
    }
    return check;
}

} // namespace detail

} // namespace beamwarden::eyewear
