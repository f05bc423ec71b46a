// Every limit that applies at one wavelength and duration under one rule set (exposure-limits.md section 6.1 item 2).
#include "beamwarden/limits/factors.hpp"
#include "beamwarden/limits/mpe.hpp"
#include "rowindex.hpp"
#include "wavelengthfactors.hpp"

#include <algorithm>
#include <cmath>

namespace beamwarden::limits {

namespace {

constexpr double kShortestTabulated_s = 1e-13;

void addFactor(LimitTerm& term, Factor factor, double value)
{
    if (term.factorCount < term.factors.size())
        term.factors[term.factorCount++] = AppliedFactor{factor, value};
}

// The aperture belongs to the row's band: at 1400 nm the retinal row keeps 7 mm, the corneal row takes 1 mm.
double apertureForRow(const LimitRow& row, Target target, double lambda_nm, double duration_s)
{
    const double inside = std::clamp(lambda_nm, row.lambdaFrom_nm + 1e-6, row.lambdaTo_nm - 1e-6);
    return factors::apertureDiameter(target, inside, duration_s);
}

// Writes into `term` (a slot of the result), so that a kept term is never copied.
void evaluateRow(LimitTerm& term, const RuleSet& set, const LimitRow& row, WavelengthFactors& at, double t,
                 double alpha, double skinArea_m2, double alphaMaxOverride)
{
    term = LimitTerm{};
    term.row = &row;
    term.duration = units::Duration::fromSi(t);
    term.belowTable = t < kShortestTabulated_s;

    double factor = 1.0;
    if ((row.factors & kC1) != 0)
        addFactor(term, Factor::C1, row.coefficient * std::pow(t, row.exponent));
    if ((row.factors & kC2) != 0) {
        const double c2 = at.c2();
        factor *= c2;
        addFactor(term, Factor::C2, c2);
    }
    if ((row.factors & kT1) != 0)
        addFactor(term, Factor::T1, at.t1());
    if ((row.factors & kC3) != 0) {
        const double c3 = at.c3();
        factor *= c3;
        addFactor(term, Factor::C3, c3);
    }
    if ((row.factors & kC4) != 0) {
        const double c4 = at.c4();
        factor *= c4;
        addFactor(term, Factor::C4, c4);
    }
    if ((row.factors & kC7) != 0) {
        const double c7 = at.c7(set.c7);
        factor *= c7;
        addFactor(term, Factor::C7, c7);
    }
    double c6 = 1.0;
    double c6Whole = 1.0;
    if ((row.factors & kC6) != 0) {
        const double alphaMax = alphaMaxOverride > 0.0 ? alphaMaxOverride : factors::alphaMax(set.alphaMax, t);
        c6 = factors::c6(alpha, alphaMax);
        c6Whole = factors::c6WholeSource(alpha, alphaMax);
        term.alphaMax = units::Angle::fromSi(alphaMax);
        term.fieldOfView = units::Angle::fromSi(alphaMax);
        addFactor(term, Factor::C6, c6);
    }

    double h = 0.0;
    switch (row.kind) {
    case FormulaKind::ConstantH:
        h = row.coefficient * factor;
        break;
    case FormulaKind::ConstantE:
        h = row.coefficient * factor * t;
        break;
    case FormulaKind::PowerLawH:
        h = row.coefficient * std::pow(t, row.exponent) * factor;
        break;
    case FormulaKind::PowerLawUntilT2: {
        const double t2 = factors::t2(alpha);
        addFactor(term, Factor::T2, t2);
        h = row.coefficient * std::pow(std::min(t, t2), row.exponent) * std::max(1.0, t / t2) * factor;
        break;
    }
    case FormulaKind::AreaScaledE:
        h = row.coefficient / std::min(skinArea_m2, 0.1) * t;
        break;
    }

    term.withinField = units::RadiantExposure::fromSi(h * c6);
    double whole = h * c6Whole;
    if (row.effect == Effect::RetinalPhotochemical) {
        // Photochemical limits are averaged over gamma_ph; a larger uniform source may carry (alpha/gamma)^2 more.
        const double gamma = factors::gammaPh(t);
        term.fieldOfView = units::Angle::fromSi(gamma);
        if (alpha > gamma)
            whole *= (alpha / gamma) * (alpha / gamma);
    }
    term.wholeSource = units::RadiantExposure::fromSi(whole);
    term.aperture = units::Length::fromSi(apertureForRow(row, row.target, at.lambda_nm, t));
}

bool rowApplies(const LimitRow& row, Target target, double lambda_nm, double t, bool extended, double skinArea_m2)
{
    if (row.target != target || lambda_nm < row.lambdaFrom_nm || lambda_nm > row.lambdaTo_nm ||
        t < row.durationFrom_s || t > row.durationTo_s)
        return false;
    if ((row.source == SourceSize::Small && extended) || (row.source == SourceSize::Extended && !extended))
        return false;
    if (row.kind == FormulaKind::AreaScaledE && skinArea_m2 < 0.01)
        return false;
    return true;
}

// Keeps one term per effect: where rows of one effect meet at a breakpoint, the lower value holds. The candidate was
// evaluated into the first free slot (terms[count]) or, with all slots taken, into `spare`.
void keepLowerPerEffect(LimitSet& set, LimitTerm& candidate)
{
    for (std::uint8_t i = 0; i < set.count; ++i) {
        if (set.terms[i].row->effect == candidate.row->effect) {
            if (candidate.wholeSource < set.terms[i].wholeSource)
                set.terms[i] = candidate;
            return;
        }
    }
    if (set.count < set.terms.size()) {
        if (&candidate != &set.terms[set.count])
            set.terms[set.count] = candidate;
        ++set.count;
        return;
    }
    // Never drop a lower limit for want of room: replace the highest.
    auto highest = std::max_element(set.terms.begin(), set.terms.end(), [](const LimitTerm& a, const LimitTerm& b) {
        return a.wholeSource < b.wholeSource;
    });
    if (candidate.wholeSource < highest->wholeSource)
        *highest = candidate;
}

} // namespace

LimitSet evaluateLimits(const RuleSet& set, Target target, units::Wavelength wavelength, units::Duration duration,
                        units::Angle sourceAngle, units::Area skinArea, double alphaMaxOverride_rad)
{
    WavelengthFactors at(wavelength.nanometres());
    return evaluateLimits(set, target, at, duration, sourceAngle, skinArea, alphaMaxOverride_rad);
}

LimitSet evaluateLimits(const RuleSet& set, Target target, WavelengthFactors& at, units::Duration duration,
                        units::Angle sourceAngle, units::Area skinArea, double alphaMaxOverride_rad)
{
    const double lambda_nm = at.lambda_nm;
    const double t = duration.seconds();
    const double alpha = sourceAngle.radians();
    const bool extended = alpha > factors::kAlphaMin_rad;

    LimitSet result;
    LimitTerm spare;
    for (const LimitRow* row : rowIndex(set).candidates(lambda_nm)) {
        if (!rowApplies(*row, target, lambda_nm, t, extended, skinArea.si()))
            continue;
        LimitTerm& candidate = result.count < result.terms.size() ? result.terms[result.count] : spare;
        evaluateRow(candidate, set, *row, at, t, alpha, skinArea.si(), alphaMaxOverride_rad);
        keepLowerPerEffect(result, candidate);
    }
    // A candidate that lost to a term of its own effect may still sit in the first free slot: clear it, so that the
    // result carries only the terms it counts.
    if (result.count < result.terms.size())
        result.terms[result.count] = LimitTerm{};
    for (std::uint8_t i = 1; i < result.count; ++i) {
        if (result.terms[i].wholeSource < result.terms[result.governing].wholeSource)
            result.governing = i;
    }
    return result;
}

} // namespace beamwarden::limits
