// Required OD and NOHD for one output and exposure case (hazard-and-eyewear.md sections 1, 3, 5).
#include "beamwarden/hazard/geometry.hpp"
#include "beamwarden/hazard/hazard.hpp"
#include "beamwarden/limits/additivity.hpp"
#include "nohd.hpp"

#include <algorithm>
#include <array>
#include <cmath>
#include <fmt/core.h>

namespace beamwarden::hazard {

namespace {

using limits::MpeRequest;
using limits::PulseRule;

ExposureBasis chooseBasis(const HazardRequest& request)
{
    const units::Duration chosen = request.exposureCase.exposure;
    if (chosen.si() <= 0.0)
        return defaultBasis(request.emission.spectrum);
    ExposureBasis basis{chosen, false, "chosen by the user"};
    const double t = chosen.seconds();
    if (t == 0.25)
        basis.reason = "aversion response (0.25 s), chosen by the user";
    else if (t == 2.0)
        basis.reason = "active turning away (2 s, DGUV practice), chosen by the user";
    else if (t == 10.0)
        basis.reason = "unintentional infrared viewing (10 s), chosen by the user";
    return basis;
}

MpeRequest mpeRequestFor(const HazardRequest& request, units::Wavelength wavelength, units::Duration basis,
                         double sourceAngle)
{
    MpeRequest mpe;
    mpe.wavelength = wavelength;
    mpe.target = limits::Target::Eye;
    mpe.sourceAngle = units::Angle::fromSi(sourceAngle);
    mpe.rules = request.rules;
    mpe.c5 = request.c5;
    const model::Emission& e = request.emission;
    if (!e.pulsed) {
        mpe.duration = basis;
        return mpe;
    }
    mpe.duration = e.pulseDuration;
    limits::PulseTrain train{e.prf, basis, std::nullopt};
    if (e.burst)
        train.burst = limits::Burst{e.burst->pulsesPerBurst, e.burst->burstRate};
    mpe.train = train;
    return mpe;
}

// The limit in the unit the exposure is formed in: per pulse (J/m^2) or as irradiance over the basis (W/m^2).
double limitOf(const limits::MpeResult& mpe, bool pulsed)
{
    return pulsed ? mpe.perPulse().si() : mpe.irradiance().si();
}

const limits::LimitTerm& governingTerm(const limits::MpeResult& mpe)
{
    const limits::SetOutcome& set = mpe.governing();
    if (!set.train)
        return set.single.governingTerm();
    switch (set.train->governingRule) {
    case PulseRule::SinglePulse:
        return set.train->singlePulse.basis;
    case PulseRule::AveragePower:
        return set.train->average.basis;
    case PulseRule::PulseTrain:
        return set.train->repeated.basis;
    }
    return set.single.governingTerm();
}

std::vector<RuleOd> odPerRule(const limits::MpeResult& mpe, double exposure)
{
    std::vector<RuleOd> out;
    const limits::SetOutcome& set = mpe.governing();
    if (!set.train)
        return out;
    for (const limits::RuleOutcome* rule : {&set.train->singlePulse, &set.train->average, &set.train->repeated}) {
        RuleOd od{rule->rule, rule->applies, rule->perPulse.si(), 0.0};
        if (rule->applies)
            od.od = std::max(0.0, std::log10(exposure / rule->perPulse.si()));
        out.push_back(od);
    }
    return out;
}

// OD per sample: uniform attenuation over every additive group the sample belongs to is sufficient for each group
// (sum of ratio_j 10^-OD_j <= 1), even where the additivity table is not transitive.
void requiredOdPerBand(HazardResult& result, const limits::AdditivityResult& sums)
{
    // The worst sum a sample takes part in depends only on its region: one pass per region keeps this linear.
    constexpr std::size_t kRegions = 4;
    std::vector<limits::SpectralRegion> regionOf(result.lines.size());
    for (std::size_t i = 0; i < result.lines.size(); ++i)
        regionOf[i] = limits::spectralRegion(result.lines[i].sample.wavelength);
    std::array<double, kRegions> worstFor{};
    for (std::size_t r = 0; r < kRegions; ++r) {
        const auto region = static_cast<limits::SpectralRegion>(r);
        for (std::size_t k = 0; k < result.lines.size(); ++k) {
            if (limits::additive(limits::Target::Eye, region, regionOf[k]))
                worstFor[r] = std::max(worstFor[r], sums.combinedRatio[k]);
        }
    }
    std::vector<double> od(result.lines.size(), 0.0);
    for (std::size_t i = 0; i < result.lines.size(); ++i) {
        const double worst = worstFor[static_cast<std::size_t>(regionOf[i])];
        od[i] = worst > 1.0 ? std::log10(worst) : 0.0;
    }
    // Neighbouring samples of one band with the same requirement are reported as one band.
    for (std::size_t i = 0; i < result.lines.size(); ++i) {
        const model::SpectralSample& s = result.lines[i].sample;
        const units::Wavelength from = s.wavelength - s.width / 2.0;
        const units::Wavelength to = s.wavelength + s.width / 2.0;
        const bool joins = !result.bands.empty() && s.width.si() > 0.0 && od[i] == result.bands.back().requiredOd &&
                           std::abs(from.si() - result.bands.back().to.si()) < 1e-15;
        if (joins) {
            result.bands.back().to = to;
            result.bands.back().ratio += result.lines[i].ratio;
        } else {
            result.bands.push_back(BandOd{from, to, result.lines[i].ratio, od[i]});
        }
    }
}

} // namespace

ExposureBasis defaultBasis(const model::Spectrum& spectrum)
{
    if (spectrum.shortest().nanometres() < 400.0)
        return ExposureBasis{units::Duration::fromSi(3e4), true,
                             "30000 s: repeated or prolonged UV exposure over a working day, the worst case IEC TR "
                             "60825-14 clause 5.1 advises below 400 nm (default)"};
    return ExposureBasis{units::Duration::fromSi(100.0), true,
                         "100 s: worst-case accidental exposure, as IEC TR 60825-14 clause 5.1 advises above 400 nm "
                         "(default)"};
}

double roundOdUp(double od)
{
    return std::ceil(od * 10.0) / 10.0;
}

Result<HazardResult> evaluateHazard(const HazardRequest& raw)
{
    auto emission = model::completeAndValidate(raw.emission);
    if (!emission)
        return std::unexpected(emission.error());
    auto beam = model::validate(raw.beam);
    if (!beam)
        return std::unexpected(beam.error());
    auto exposureCase = model::validate(raw.exposureCase);
    if (!exposureCase)
        return std::unexpected(exposureCase.error());

    HazardResult result;
    result.request = raw;
    result.request.emission = *emission;
    const HazardRequest& request = result.request;
    const model::Emission& e = request.emission;
    result.pulsed = e.pulsed;
    result.exposureUnit = e.pulsed ? "J/m2" : "W/m2";
    result.basis = chooseBasis(request);
    if (e.pulsed && result.basis.duration < e.pulseDuration)
        return fail("exposure", units::formatExact(result.basis.duration),
                    "an exposure duration at least as long as one pulse (" + units::format(e.pulseDuration) + ")");

    const double r = request.exposureCase.distance.si();
    result.pointDistance = request.exposureCase.distance;
    const PointGeometry point = geometryAt(request.exposureCase, request.beam, r);
    result.sourceAngleAtPoint = units::Angle::fromSi(point.sourceAngle_rad);
    const double quantity = e.pulsed ? e.pulseEnergy.si() : e.averagePower.si();

    std::vector<limits::LineRatio> ratios;
    for (const model::SpectralSample& sample : e.spectrum.samples) {
        auto mpe = limits::evaluateMpe(
            mpeRequestFor(request, sample.wavelength, result.basis.duration, point.sourceAngle_rad));
        if (!mpe)
            return std::unexpected(mpe.error());
        LineResult line{sample, *mpe, 0.0, limitOf(*mpe, e.pulsed), 0.0};
        const double aperture = governingTerm(*mpe).aperture.si();
        const double perWatt = point.pointSource
                                   ? point.powerFactor * point.pointIrradiancePerWatt
                                   : point.powerFactor * exposurePerWatt(request.beam.profile, point.d63_m, aperture);
        line.exposure = quantity * sample.powerFraction * perWatt;
        line.ratio = line.exposure / line.limit;
        result.aperture = units::Length::fromSi(aperture);
        ratios.push_back(limits::LineRatio{sample.wavelength, line.ratio});
        result.lines.push_back(std::move(line));
    }

    const limits::AdditivityResult sums = limits::combineLines(limits::Target::Eye, ratios);
    result.governingLine = sums.governingLine;
    const LineResult& governing = result.lines[result.governingLine];
    for (const LineResult& line : result.lines)
        result.exposureAtPoint += line.exposure;
    result.limit = governing.limit;
    result.combinedRatio = sums.governingSum;
    result.requiredOd = result.combinedRatio > 1.0 ? std::log10(result.combinedRatio) : 0.0;
    result.displayedOd = roundOdUp(result.requiredOd);
    result.governingRule =
        governing.mpe.governing().train ? governing.mpe.governing().train->governingRule : PulseRule::SinglePulse;
    if (result.lines.size() == 1)
        result.perRule = odPerRule(governing.mpe, governing.exposure);
    requiredOdPerBand(result, sums);

    result.nohd = hazardDistance(request, result);
    describeConventions(result);
    return result;
}

} // namespace beamwarden::hazard
