#include "nohd.hpp"

#include "beamwarden/hazard/geometry.hpp"
#include "beamwarden/limits/additivity.hpp"
#include "beamwarden/limits/mpememo.hpp"
#include "beamwarden/limits/report.hpp"

#include <algorithm>
#include <array>
#include <cmath>
#include <fmt/core.h>
#include <functional>
#include <numbers>
#include <optional>

namespace beamwarden::hazard {

namespace {

constexpr double kNearest_m = 1e-6;
constexpr double kFarthest_m = 1e7; // 10 000 km: beyond it the model (clear air, no curvature) means nothing

// Sum over the largest additive group of (power share / MPE): the output acts as one line with MPE 1/this.
double inverseEffectiveLimit(const HazardResult& result)
{
    std::vector<limits::LineRatio> shares;
    for (const LineResult& line : result.lines)
        shares.push_back(limits::LineRatio{line.sample.wavelength, line.sample.powerFraction / line.limit});
    return limits::combineLines(limits::Target::Eye, shares).governingSum;
}

HazardDistance zero(std::string model)
{
    return HazardDistance{DistanceKind::Zero, {}, {}, {}, {}, std::move(model)};
}

HazardDistance finite(double value, std::string model)
{
    HazardDistance d{DistanceKind::Finite, units::Length::fromSi(value), {}, {}, {}, std::move(model)};
    return d;
}

// The largest r at which ratio(r) > 1, for a ratio that does not grow with distance. Each ratio costs an MPE per
// spectral sample, so the root is found by regula falsi in (ln r, ln ratio), where a ratio falling as r^-1 or r^-2 is
// a straight line, with the Illinois safeguard against a stuck end and a bisection step whenever interpolation is
// not possible; the bracket [lo, hi] always has ratio(lo) > 1 >= ratio(hi), and its upper end is returned, so the
// radius is never short of the true one.
HazardDistance solve(const std::function<double(double)>& ratio, std::string model)
{
    const double atFarthest = ratio(kFarthest_m);
    if (atFarthest > 1.0)
        return HazardDistance{DistanceKind::Unbounded, {}, {}, {}, {}, std::move(model)};
    const double atNearest = ratio(kNearest_m);
    if (atNearest <= 1.0)
        return zero(std::move(model));
    double lo = std::log(kNearest_m);
    double hi = std::log(kFarthest_m);
    double gLo = std::log(atNearest);  // > 0
    double gHi = std::log(atFarthest); // <= 0, or -inf for a ratio of 0
    int keptSide = 0;                  // +1: lo kept in the last step, -1: hi kept
    for (int i = 0; i < 200 && hi - lo > 1e-13; ++i) {
        double mid = 0.5 * (lo + hi);
        if (std::isfinite(gLo) && std::isfinite(gHi) && gLo > gHi) {
            const double interpolated = lo + gLo * (hi - lo) / (gLo - gHi);
            // Keep the trial strictly inside, so that every step shrinks the bracket.
            const double margin = 1e-3 * (hi - lo);
            mid = std::clamp(interpolated, lo + margin, hi - margin);
        }
        const double g = std::log(ratio(std::exp(mid)));
        if (g > 0.0) {
            lo = mid;
            gLo = g;
            if (keptSide == -1)
                gHi *= 0.5; // Illinois: hi stayed twice; halve its value so the next trial moves towards it
            keptSide = -1;
        } else {
            hi = mid;
            gHi = g;
            if (keptSide == +1)
                gLo *= 0.5;
            keptSide = +1;
        }
    }
    return finite(std::exp(hi), std::move(model)); // the upper end: never short of the true distance
}

// The diffuse radius costs one MPE per spectral sample for every trial distance. Within a band, the samples' limits
// change with the apparent source alike (through C6, T2, C5), so the root is first found with each sample's limit at
// the point scaled as its region's strongest sample's limit scales, which costs one MPE per region and trial. That
// guess is then checked with every sample's own limit just inside and just outside it; only if the check fails is
// the root searched with every sample's limit at every trial. Either way the radius is bracketed by exact ratios.
template <typename Ratio, typename LimitAt>
HazardDistance solveDiffuse(const HazardResult& result, const Ratio& exactRatio, const LimitAt& limitAt,
                            double quantity, const model::ExposureCase& c, const model::Beam& beam,
                            const std::string& model)
{
    constexpr std::size_t kRegions = 4;
    std::array<std::size_t, kRegions> strongest{};
    std::array<bool, kRegions> present{};
    std::vector<std::size_t> regionOf(result.lines.size());
    for (std::size_t i = 0; i < result.lines.size(); ++i) {
        const auto region = static_cast<std::size_t>(limits::spectralRegion(result.lines[i].sample.wavelength));
        regionOf[i] = region;
        if (!present[region] || result.lines[i].ratio > result.lines[strongest[region]].ratio)
            strongest[region] = i;
        present[region] = true;
    }
    auto guessRatio = [&](double r) {
        const PointGeometry g = geometryAt(c, beam, r);
        std::array<double, kRegions> scale{};
        for (std::size_t region = 0; region < kRegions; ++region) {
            if (present[region]) {
                const LineResult& rep = result.lines[strongest[region]];
                scale[region] = limitAt(rep, g.sourceAngle_rad) / rep.limit;
            }
        }
        std::vector<limits::LineRatio> ratios;
        ratios.reserve(result.lines.size());
        for (std::size_t i = 0; i < result.lines.size(); ++i) {
            const LineResult& line = result.lines[i];
            ratios.push_back(limits::LineRatio{line.sample.wavelength, quantity * line.sample.powerFraction *
                                                                           g.powerFactor * g.pointIrradiancePerWatt /
                                                                           (line.limit * scale[regionOf[i]])});
        }
        return limits::combineLines(limits::Target::Eye, ratios).governingSum;
    };
    const HazardDistance guess = solve(guessRatio, model);
    if (guess.kind == DistanceKind::Finite) {
        const double r = guess.value.si();
        const double outside = r * (1.0 + 1e-10);
        const double inside = r * (1.0 - 1e-10);
        if (exactRatio(outside) <= 1.0 && exactRatio(inside) > 1.0)
            return finite(outside, model); // bracketed by exact ratios; the upper end, never short
    }
    // Zero and unbounded cost the exact solver two trials to confirm; a failed check, a full search.
    return solve(exactRatio, model);
}

HazardDistance beamCase(double q, double a, double phi, double powerFactor)
{
    // q = 4 P / (pi MPE): the diameter^2 at which the on-axis peak equals the MPE.
    const double reach = q * powerFactor;
    if (reach <= a * a)
        return zero("below the MPE from the exit on (4P/(pi MPE) <= a^2)");
    if (phi <= 0.0)
        return HazardDistance{DistanceKind::Unbounded, {}, {}, {}, {}, "collimated beam (zero divergence)"};
    HazardDistance d = finite(std::sqrt(reach - a * a) / phi, "quadrature beam growth, d^2 = a^2 + (phi r)^2");
    d.quadrature = d.value;
    d.linear = units::Length::fromSi((std::sqrt(reach) - a) / phi);
    return d;
}

} // namespace

HazardDistance hazardDistance(const HazardRequest& request, const HazardResult& result)
{
    const model::Emission& e = request.emission;
    const model::ExposureCase& c = request.exposureCase;
    const double quantity = e.pulsed ? e.pulseEnergy.si() : e.averagePower.si();
    const double invLimit = inverseEffectiveLimit(result);
    const double a = request.beam.diameter63().si();
    const double phi = request.beam.divergence63().si();
    const double q = 4.0 * quantity * invLimit / std::numbers::pi;

    switch (c.viewing) {
    case model::Viewing::Direct:
        return beamCase(q, a, phi, 1.0);
    case model::Viewing::Specular: {
        HazardDistance d = beamCase(q, a, phi, c.reflectance);
        d.model += ", along the folded path from the laser";
        return d;
    }
    case model::Viewing::Lens: {
        // Beyond the focus the beam diverges with full angle b0/f from a point: (f/b0) sqrt(4P/(pi MPE)).
        const double f = c.focalLength.si();
        const double beyondFocus = f / a * std::sqrt(q);
        return finite(f + beyondFocus, fmt::format("lens: (f/b0) sqrt(4P/(pi MPE)) = {} beyond the focus, "
                                                   "plus the focal length",
                                                   units::format(units::Length::fromSi(beyondFocus))));
    }
    case model::Viewing::Fibre: {
        const double nohd = 1.7 / c.numericalAperture * std::sqrt(quantity * invLimit / std::numbers::pi);
        return finite(nohd, "multimode fibre: (1.7/NA) sqrt(P/(pi MPE))");
    }
    case model::Viewing::Diffuse: {
        // The limit depends on r through the apparent size of the lit spot, so the radius is found numerically.
        const double cosTheta = std::cos(c.viewingAngle.si());
        auto evaluateAt = [&](const LineResult& line, double alpha) -> std::optional<double> {
            limits::MpeRequest mpe = line.mpe.request;
            mpe.sourceAngle = units::Angle::fromSi(alpha);
            const auto evaluated = limits::evaluateMpe(mpe);
            if (!evaluated)
                return std::nullopt;
            return e.pulsed ? evaluated->perPulse().si() : evaluated->irradiance().si();
        };
        std::vector<double> smallLimits;
        for (const LineResult& line : result.lines)
            smallLimits.push_back(evaluateAt(line, 0.0).value_or(line.limit));
        // Should the engine refuse an angle, the small-source limit (the lowest) stands in: never a laxer one.
        auto limitAt = [&](const LineResult& line, double alpha) {
            const auto index = static_cast<std::size_t>(&line - result.lines.data());
            return evaluateAt(line, alpha).value_or(smallLimits[index]);
        };
        auto ratio = [&](double r) {
            const PointGeometry g = geometryAt(c, request.beam, r);
            std::vector<limits::LineRatio> ratios;
            for (const LineResult& line : result.lines)
                ratios.push_back(limits::LineRatio{line.sample.wavelength,
                                                   quantity * line.sample.powerFraction * g.powerFactor *
                                                       g.pointIrradiancePerWatt / limitAt(line, g.sourceAngle_rad)});
            return limits::combineLines(limits::Target::Eye, ratios).governingSum;
        };
        const std::string model = "diffuse reflection, rho P cos(theta) / (pi r^2), with C6 from the lit spot's "
                                  "apparent size";
        HazardDistance d = [&] {
            const limits::MpeMemo::Pause trialAnglesNeverReturn;
            return solveDiffuse(result, ratio, limitAt, quantity, c, request.beam, model);
        }();
        // Beside it, the radius with the spot as a small source: each line's MPE at alpha = 0.
        std::vector<limits::LineRatio> smallShares;
        for (const LineResult& line : result.lines)
            smallShares.push_back(
                limits::LineRatio{line.sample.wavelength, line.sample.powerFraction / limitAt(line, 0.0)});
        const double invSmall = limits::combineLines(limits::Target::Eye, smallShares).governingSum;
        d.smallSource =
            units::Length::fromSi(std::sqrt(c.reflectance * quantity * cosTheta * invSmall / std::numbers::pi));
        return d;
    }
    case model::Viewing::Aided: {
        auto ratio = [&](double r) { return quantity * invLimit * peakPerWatt(c, request.beam, r); };
        return solve(ratio, "magnifying optics: collection gain tau min(M^2, (min(d, D_o)/7 mm)^2) on the beam, "
                            "quadrature beam growth");
    }
    }
    return zero("");
}

void describeConventions(HazardResult& result)
{
    const HazardRequest& request = result.request;
    auto& conv = result.conventions;
    const model::Beam& beam = request.beam;
    conv.push_back(fmt::format("beam diameter and divergence as given at {}; used at 1/e (63 %): d63 = {}, "
                               "divergence {}",
                               model::toString(beam.definition), units::format(beam.diameter63()),
                               units::format(beam.divergence63())));
    if (request.exposureCase.viewing == model::Viewing::Diffuse)
        conv.push_back("diffuse: irradiance at the eye rho P cos(theta) / (pi r^2), a point value (no aperture "
                       "averaging)");
    else if (beam.profile == model::BeamProfile::Gaussian)
        conv.push_back(fmt::format("declared Gaussian profile: the power through the {} limiting aperture centred "
                                   "on the beam, 1 - exp(-(D/d63)^2), over the aperture's area",
                                   units::format(result.aperture)));
    else
        conv.push_back(fmt::format("profile not declared Gaussian: P / max(A_beam, A_aperture) with the {} "
                                   "limiting aperture (never below the exact value)",
                                   units::format(result.aperture)));
    conv.push_back("NOHD from the on-axis peak 4P/(pi d^2), without aperture averaging (conservative)");
    conv.push_back("exposure duration basis: " + result.basis.reason);
    if (result.lines.size() > 1)
        conv.push_back("several wavelengths: exposure/MPE ratios add for lines acting on the same tissue "
                       "(IEC additivity table); each band's OD is uniform over its additive group, which is "
                       "sufficient for the sum");

    auto& notes = result.notes;
    const double t = result.basis.duration.seconds();
    const double shortest = request.emission.spectrum.shortest().nanometres();
    const double longest = request.emission.spectrum.longest().nanometres();
    if (t <= 0.25 && (shortest < 400.0 || longest > 700.0))
        notes.emplace_back("A 0.25 s basis assumes the aversion response, which exists only for visible light "
                           "(400-700 nm); part of this output lies outside it.");
    if (t < 2.0 && !result.basis.isDefault)
        notes.emplace_back("DGUV advice: do not rely on the aversion response; German practice designs for 2 s "
                           "(trained) to 3 s (untrained).");
    if (result.nohd.kind == DistanceKind::Zero)
        notes.emplace_back("The exposure stays below the MPE from the exit on: NOHD = 0.");
    if (result.nohd.kind == DistanceKind::Unbounded)
        notes.emplace_back("The hazard does not end within 10 000 km under this model (a beam without divergence "
                           "never falls below the MPE); enter the measured divergence.");
    bool reconstructed = false;
    for (const LineResult& line : result.lines)
        reconstructed = reconstructed || line.mpe.restsOnReconstructedRow();
    if (reconstructed)
        notes.emplace_back("At least one MPE behind this figure rests on a row reconstructed from public material: "
                           "verify it against the standard's text before relying on it.");
    // The limit engine's own notes for the governing line (below the table, supercontinuum, C5 readings).
    for (std::string& note : limits::resultNotes(result.lines[result.governingLine].mpe)) {
        if (!note.starts_with("This figure rests on a row reconstructed"))
            notes.push_back(std::move(note));
    }
}

} // namespace beamwarden::hazard
