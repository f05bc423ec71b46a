// Protection checks of eyewear against outputs (hazard-and-eyewear.md sections 1.2, 1.4, 6.3-6.6).
#include "beamwarden/eyewear/protection.hpp"

#include "beamwarden/limits/additivity.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/core.h>
#include <limits>

namespace beamwarden::eyewear {

namespace {

std::string nm(double lambda)
{
    return fmt::format("{:g} nm", std::round(lambda * 10.0) / 10.0);
}

void worsen(Verdict& verdict, Verdict candidate)
{
    verdict = std::max(verdict, candidate);
}

// The optical-density part: residual exposure/MPE behind the eyewear, summed over additive lines.
void checkDensity(const ParsedEyewear& eyewear, const OutputRequirement& req, OutputCheck& out)
{
    const hazard::HazardResult& h = req.hazard;
    out.requiredOd = h.requiredOd;
    if (!eyewear.hasOdData()) {
        worsen(out.verdict, Verdict::CannotTell);
        out.reasons.emplace_back("no spectral OD table and no EN 207/EN 208 marking: the optical density is not known");
        out.marginOd = std::numeric_limits<double>::quiet_NaN(); // unknown, not zero
        return;
    }
    std::vector<limits::LineRatio> residual;
    double worstResidual = -1.0;
    std::vector<double> unrated;
    for (const hazard::LineResult& line : h.lines) {
        const double lambda = line.sample.wavelength.nanometres();
        const ProvidedOd provided = providedOd(eyewear, lambda);
        const double r = line.ratio * std::pow(10.0, -provided.od);
        residual.push_back(limits::LineRatio{line.sample.wavelength, r});
        if (!provided.rated && line.ratio > 1e-6)
            unrated.push_back(lambda);
        if (r > worstResidual) {
            worstResidual = r;
            out.worstWavelength_nm = lambda;
            out.providedOd = provided.od;
        }
    }
    const limits::AdditivityResult sums = limits::combineLines(limits::Target::Eye, residual);
    out.marginOd = sums.governingSum > 0.0 ? -std::log10(sums.governingSum) : std::numeric_limits<double>::infinity();
    if (sums.governingSum <= 1.0)
        return;
    worsen(out.verdict, Verdict::FallsShort);
    if (!unrated.empty()) {
        const auto [lo, hi] = std::minmax_element(unrated.begin(), unrated.end());
        out.reasons.push_back(fmt::format("wavelength range: not rated at {}{}, where {} emits", nm(*lo),
                                          *lo == *hi ? "" : " to " + nm(*hi), req.outputName));
    }
    out.reasons.push_back(fmt::format("OD: {} needs OD {:.1f}, the eyewear gives {:.1f} at {} (short by {:.2f})",
                                      req.outputName, hazard::roundOdUp(h.requiredOd), out.providedOd,
                                      nm(out.worstWavelength_nm), -out.marginOd));
}

// The damage part: EN 207 levels per mode against the markings (or EN 208 levels for alignment eyewear).
void checkLevels(const ParsedEyewear& eyewear, const OutputRequirement& req, OutputCheck& out)
{
    for (const LevelRequirement& level : req.levels) {
        for (const ModeRequirement& m : level.modes) {
            auto& slot = out.requiredLevels[static_cast<std::size_t>(m.mode)];
            slot = std::max(slot, m.level);
        }
    }
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
    bool correctionMissing = false;
    bool beyondLb10 = false;
    for (const LevelRequirement& level : req.levels) {
        correctionMissing = correctionMissing || level.beamDiameterCorrectionMissing;
        for (const ModeRequirement& m : level.modes) {
            if (m.level > 10) {
                beyondLb10 = true;
                continue;
            }
            int best = 0;
            for (const En207Marking& marking : eyewear.en207) {
                for (const MarkingTerm& term : marking.terms) {
                    if (term.has(m.mode) && term.covers(level.lambda_nm))
                        best = std::max(best, term.level);
                }
            }
            if (best >= m.level)
                continue;
            note(best == 0 ? unmarked[static_cast<std::size_t>(m.mode)] : tooLow[static_cast<std::size_t>(m.mode)],
                 level.lambda_nm, m.level, best);
        }
    }
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
    ProvidedOd best;
    auto consider = [&](double od, std::string source) {
        if (!best.rated || od > best.od) {
            best.od = od;
            best.source = std::move(source);
        }
        best.rated = true;
    };
    for (const model::OdRow& row : eyewear.item.spectralOd) {
        if (lambda_nm >= row.from.nanometres() && lambda_nm <= row.to.nanometres())
            consider(row.od, fmt::format("OD table {:g}-{:g} nm: {}{:g}", row.from.nanometres(), row.to.nanometres(),
                                         row.atLeast ? ">= " : "", row.od));
    }
    for (const En207Marking& marking : eyewear.en207) {
        for (const MarkingTerm& term : marking.terms) {
            if (term.covers(lambda_nm))
                consider(term.level,
                         fmt::format("marking {}: LB{} promises OD >= {}", format(marking), term.level, term.level));
        }
    }
    for (const En208Marking& marking : eyewear.en208) {
        for (const WavelengthSpan& span : marking.wavelengths) {
            if (span.contains(lambda_nm))
                consider(marking.level, fmt::format("alignment marking {}: RB{} read as OD >= {} (reconstructed)",
                                                    format(marking), marking.level, marking.level));
        }
    }
    return best;
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

OutputCheck checkOutput(const ParsedEyewear& eyewear, const OutputRequirement& requirement)
{
    OutputCheck out;
    out.outputName = requirement.outputName;
    out.caseName = requirement.caseName;
    checkDensity(eyewear, requirement, out);
    checkLevels(eyewear, requirement, out);
    return out;
}

ProtectionCheck checkAll(const ParsedEyewear& eyewear, const std::vector<OutputRequirement>& outputs)
{
    ProtectionCheck check;
    check.marginOd = std::numeric_limits<double>::infinity();
    for (const OutputRequirement& requirement : outputs) {
        OutputCheck one = checkOutput(eyewear, requirement);
        worsen(check.verdict, one.verdict);
        check.marginOd = std::min(check.marginOd, one.marginOd);
        check.outputs.push_back(std::move(one));
    }
    return check;
}

} // namespace beamwarden::eyewear
